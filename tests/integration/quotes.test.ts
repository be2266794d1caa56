import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { moveStatus } from '@/lib/jobs/job-actions';
import { bookLabour, recordDecision, saveEstimate, sendQuote, startEstimate } from '@/lib/quotes/quote-actions';
import { labourComparison } from '@/lib/quotes/labour-queries';
import { QUOTE_MESSAGES } from '@/lib/quotes/quote-messages';
import { QUOTE_GATE_MESSAGES } from '@/lib/quotes/quote-gates';
import { estimateTotals } from '@/lib/quotes/estimate-totals';
import type { EstimateLineInput, EstimateSaveInput } from '@/lib/quotes/quote-schema';
import { quoteDocument } from '@/lib/quotes/quote-document';
import { renderQuotePdf } from '@/lib/quotes/quote-pdf';
import { rewindCopperFor } from '@/lib/quotes/rewind-source';
import { saveCommercialSettings } from '@/lib/settings/commercial-actions';
import { COMMERCIAL_STALE } from '@/lib/settings/commercial-writes';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ADMIN, FRONT_DESK, WINDER } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';

useTestDatabase();

const LABOUR: EstimateLineInput = {
  kind: 'LABOUR',
  description: 'Strip, rewind and varnish stator',
  reference: 'Winder',
  quantity: '6.5',
  unit: 'h',
  unitPrice: '95.00',
  taxRate: '7.5',
};
const BEARING: EstimateLineInput = {
  kind: 'PART',
  description: 'Bearing, drive end',
  reference: '6309-2Z-C3',
  quantity: '1',
  unit: 'each',
  unitPrice: '48.20',
  taxRate: '7.5',
};

async function jobIn(status: 'INSPECTION', skip = 0) {
  return db().job.findFirstOrThrow({ where: { status }, orderBy: { number: 'asc' }, skip });
}

async function openDraft(jobId: string) {
  const r = await startEstimate({ jobId });
  if (!r.ok) throw new Error(r.message);
  return db().quote.findUniqueOrThrow({ where: { id: r.data.quoteId } });
}

const save = (q: { id: string; version: number }, lines: EstimateLineInput[], over: Partial<EstimateSaveInput> = {}) =>
  saveEstimate({ quoteId: q.id, version: q.version, currency: 'USD', discount: '0', notes: '', lines, ...over });

describe('estimates and quote revisions', () => {
  let jobId = '';
  beforeAll(async () => {
    jobId = (await jobIn('INSPECTION')).id;
  });
  beforeEach(() => signOutTest());

  it('checks the session and the role before anything else', async () => {
    expect(await startEstimate({ jobId })).toMatchObject({ ok: false, code: 'unauthenticated' });
    await actAs(WINDER.email);
    expect(await startEstimate({ jobId })).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await db().quote.count({ where: { jobId } })).toBe(0);
  });

  it('saves lines as integers, refuses a stale save, NUL text and more decimals than the currency has', async () => {
    await actAs(FRONT_DESK.email);
    const q = await openDraft(jobId);
    expect(q).toMatchObject({ revision: 1, status: 'DRAFT', currency: 'USD' });
    expect(await save(q, [LABOUR, BEARING])).toMatchObject({ ok: true, data: { version: 2 } });
    const lines = await db().quoteLine.findMany({ where: { quoteId: q.id }, orderBy: { position: 'asc' } });
    expect(lines.map((l) => [l.quantityMilli, l.unitPriceMinor, l.taxRateBp])).toEqual([
      [6500, 9500, 750],
      [1000, 4820, 750],
    ]);

    expect(await save(q, [LABOUR])).toMatchObject({ ok: false, code: 'stale', message: QUOTE_MESSAGES.stale });
    const nul = await save({ ...q, version: 2 }, [{ ...LABOUR, description: 'Rewind\u0000' }]);
    expect(nul).toMatchObject({ ok: false, code: 'invalid' });
    expect(Object.keys(nul.ok ? {} : (nul.fieldErrors ?? {}))).toContain('lines.0.description');
    const cents = await save({ ...q, version: 2 }, [{ ...LABOUR, unitPrice: '95.005' }]);
    expect(cents.ok ? {} : cents.fieldErrors).toHaveProperty(['lines.0.unitPrice']);
    expect(await db().quoteLine.count({ where: { quoteId: q.id } })).toBe(2);
  });

  it('"Quote sent" is refused until a quote is sent; sending freezes totals, terms and validity', async () => {
    await actAs(FRONT_DESK.email);
    const job = await db().job.findUniqueOrThrow({ where: { id: jobId } });
    expect(await moveStatus({ jobId, version: job.version, to: 'QUOTE_SENT' })).toMatchObject({
      ok: false,
      message: QUOTE_GATE_MESSAGES.needsSent,
    });

    const q = await db().quote.findFirstOrThrow({ where: { jobId, revision: 1 }, include: { lines: true } });
    const sent = await sendQuote({ quoteId: q.id, version: q.version });
    const expected = estimateTotals(q.lines, { currency: 'USD', taxMode: 'ON_TOTAL', discountBp: 0 });
    // 6.5 h × 95.00 = 617.50; bearing 48.20; 665.70 × 7.5 % = 49.9275 → 49.93; total 715.63 [derived]
    expect(expected.totalMinor).toBe(71563);
    expect(sent).toMatchObject({ ok: true, data: { totalMinor: 71563 } });
    const stored = await db().quote.findUniqueOrThrow({ where: { id: q.id } });
    expect(stored).toMatchObject({ status: 'SENT', subtotalMinor: 66570n, taxMinor: 4993n, totalMinor: 71563n });
    expect(stored.terms).toBeTruthy();
    expect(
      stored.validUntil!.getTime() - Date.UTC(stored.sentAt!.getUTCFullYear(), stored.sentAt!.getUTCMonth(), stored.sentAt!.getUTCDate()),
    ).toBe(30 * 86_400_000);

    expect(await save({ id: q.id, version: stored.version }, [LABOUR])).toMatchObject({
      ok: false,
      code: 'frozen',
      message: QUOTE_MESSAGES.frozen,
    });
    expect(await moveStatus({ jobId, version: job.version, to: 'QUOTE_SENT' })).toMatchObject({ ok: true });
    const moved = await db().job.findUniqueOrThrow({ where: { id: jobId } });
    expect(await moveStatus({ jobId, version: moved.version, to: 'CUSTOMER_APPROVED' })).toMatchObject({
      ok: false,
      message: QUOTE_GATE_MESSAGES.needsAccepted,
    });
  });

  it('a revision keeps the earlier quote as sent, and the decision goes on the latest one', async () => {
    await actAs(FRONT_DESK.email);
    const rev2 = await openDraft(jobId);
    expect(rev2.revision).toBe(2);
    expect(await db().quoteLine.count({ where: { quoteId: rev2.id } })).toBe(2);
    const rev1 = await db().quote.findFirstOrThrow({ where: { jobId, revision: 1 } });
    const decision = {
      decision: 'ACCEPTED' as const,
      decidedBy: 'R. Okafor',
      decidedOn: '2026-12-01',
      method: 'EMAIL' as const,
      customerOrderNumber: 'PO-88123',
      note: '',
    };
    expect(await recordDecision({ quoteId: rev1.id, version: rev1.version, ...decision })).toMatchObject({
      ok: false,
      message: QUOTE_MESSAGES.notLatest,
    });

    expect(
      await save(
        rev2,
        [LABOUR, BEARING, { ...BEARING, description: 'Bearing, opposite end', reference: '6307-2Z-C3', unitPrice: '31.75' }],
        { discount: '5' },
      ),
    ).toMatchObject({ ok: true });
    const sent = await sendQuote({ quoteId: rev2.id, version: rev2.version + 1 });
    expect(sent.ok).toBe(true);
    const after = await db().quote.findMany({ where: { jobId }, orderBy: { revision: 'asc' } });
    expect(after.map((q) => [q.revision, q.status, q.totalMinor])).toEqual([
      [1, 'SENT', 71563n],
      [2, 'SENT', after[1]!.totalMinor],
    ]);

    const r2 = after[1]!;
    expect(await recordDecision({ quoteId: r2.id, version: r2.version, ...decision })).toMatchObject({ ok: true });
    expect(await recordDecision({ quoteId: r2.id, version: r2.version + 1, ...decision })).toMatchObject({
      ok: false,
      message: QUOTE_MESSAGES.decided,
    });
    expect(await db().quote.findUniqueOrThrow({ where: { id: r2.id } })).toMatchObject({
      status: 'ACCEPTED',
      customerOrderNumber: 'PO-88123',
      decidedBy: 'R. Okafor',
      decisionMethod: 'EMAIL',
    });

    const job = await db().job.findUniqueOrThrow({ where: { id: jobId } });
    expect(await moveStatus({ jobId, version: job.version, to: 'CUSTOMER_APPROVED' })).toMatchObject({ ok: true });
    const events = await db().jobEvent.findMany({ where: { jobId, kind: 'QUOTE' }, orderBy: { at: 'asc' } });
    expect(events.at(-1)?.message).toContain('accepted by R. Okafor on 2026-12-01 (by email), order PO-88123');
  });

  it('prints the quote as a PDF with its number, lines, total, terms, validity and safety notices', async () => {
    const job = await db().job.findUniqueOrThrow({ where: { id: jobId } });
    const doc = await quoteDocument(job.number, 1);
    const text = pdfText(await renderQuotePdf(doc!));
    expect(text).toContain(`Quote Q${job.number}-1`);
    expect(text).toContain('6309-2Z-C3');
    expect(text).toContain('$715.63');
    expect(text).toContain('Valid until');
    expect(text).toContain('Isolation and lockout');
    expect(text).toContain('Payment within 30 days');
  });

  it('a declined quote leaves "Customer approved" shut and "Returned unrepaired" open', async () => {
    await actAs(FRONT_DESK.email);
    const other = await jobIn('INSPECTION', 1);
    const q = await openDraft(other.id);
    await save(q, [LABOUR]);
    await sendQuote({ quoteId: q.id, version: q.version + 1 });
    await moveStatus({ jobId: other.id, version: other.version, to: 'QUOTE_SENT' });
    const sent = await db().quote.findUniqueOrThrow({ where: { id: q.id } });
    expect(
      await recordDecision({
        quoteId: q.id,
        version: sent.version,
        decision: 'DECLINED',
        decidedBy: 'Plant manager',
        decidedOn: '2026-12-01',
        method: 'PHONE',
        customerOrderNumber: '',
        note: 'Buying a new motor',
      }),
    ).toMatchObject({ ok: true });
    const job = await db().job.findUniqueOrThrow({ where: { id: other.id } });
    expect(await moveStatus({ jobId: other.id, version: job.version, to: 'CUSTOMER_APPROVED' })).toMatchObject({
      ok: false,
      message: QUOTE_GATE_MESSAGES.needsAccepted,
    });
    expect(await moveStatus({ jobId: other.id, version: job.version, to: 'RETURNED_UNREPAIRED' })).toMatchObject({ ok: true });
  });
});

describe('labour booked against the estimate', () => {
  beforeEach(() => signOutTest());

  it('sets the hours booked beside the accepted quote’s labour hours', async () => {
    const job = await db().quote.findFirstOrThrow({ where: { status: 'ACCEPTED' }, select: { jobId: true, revision: true } });
    const winder = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    expect(await bookLabour({ jobId: job.jobId, personId: winder.id, task: 'Strip', hours: '4', workedOn: '2026-12-01' })).toMatchObject({
      ok: false,
      code: 'unauthenticated',
    });
    await actAs(WINDER.email);
    expect(
      await bookLabour({ jobId: job.jobId, personId: winder.id, task: 'Strip and clean core', hours: '4', workedOn: '2026-12-01' }),
    ).toMatchObject({ ok: true });
    expect(
      await bookLabour({ jobId: job.jobId, personId: winder.id, task: 'Wind and connect', hours: '3.25', workedOn: '2026-12-02' }),
    ).toMatchObject({ ok: true });
    const bad = await bookLabour({ jobId: job.jobId, personId: winder.id, task: 'x', hours: '25', workedOn: '2026-12-02' });
    expect(bad.ok ? {} : bad.fieldErrors).toHaveProperty(['hours']);
    const c = await labourComparison(job.jobId);
    expect(c).toMatchObject({ actualMilli: 7250, estimateMilli: 6500, estimateSource: `revision ${job.revision} (accepted)` });
    expect(c.bookings.map((b) => [b.personName, b.hoursMilli])).toEqual([
      [WINDER.name, 4000],
      [WINDER.name, 3250],
    ]);
  });
});

describe('rewind material from the winding', () => {
  it('takes the copper from the as-found sheet when no redesign is approved', async () => {
    const rows = await db().windingSheet.findMany({
      where: { job: { redesigns: { none: { status: 'APPROVED' } } } },
      orderBy: { createdAt: 'asc' },
      select: { jobId: true },
    });
    let stored = null;
    for (const row of rows) {
      const s = await getAsFoundSheet(row.jobId);
      if (s?.sheet.winding.meanTurnLengthMm !== undefined) {
        stored = s;
        break;
      }
    }
    if (!stored) throw new Error('the demo shop should have an as-found sheet with a mean turn length');
    const r = await rewindCopperFor(stored.jobId);
    expect(r).toMatchObject({ ok: true, source: `as-found sheet, revision ${stored.revision}` });
    const a = analyseSheet(stored.sheet);
    if (!r.ok || !a.ok) throw new Error('expected both');
    const mlt = stored.sheet.winding.meanTurnLengthMm ?? 0;
    const conductorM = (3 * a.value.winding.seriesTurnsPerPhase * stored.sheet.winding.parallelPaths * mlt) / 1000;
    expect(r.copper.conductorLengthM).toBeCloseTo(conductorM, 9);
  });
});

describe('commercial settings', () => {
  beforeEach(() => signOutTest());
  const form = {
    version: 0,
    currency: 'EUR',
    taxMode: 'PER_LINE',
    defaultTaxRate: '21',
    labourRate: '72.50',
    copperPricePerKg: '13.10',
    copperAllowance: '10',
    insulationAllowance: '15',
    varnishAllowance: '8',
    quoteValidityDays: 45,
    quoteTerms: 'Our terms.',
    warrantyDays: 365,
  };

  it('only an administrator saves them, and a stale save is refused', async () => {
    await actAs(FRONT_DESK.email);
    expect(await saveCommercialSettings(form)).toMatchObject({ ok: false, code: 'forbidden' });
    await actAs(ADMIN.email);
    expect(await saveCommercialSettings(form)).toMatchObject({ ok: true, data: { version: 1 } });
    expect(await saveCommercialSettings(form)).toMatchObject({ ok: false, code: 'stale', message: COMMERCIAL_STALE });
    expect(await db().commercialSettings.findUniqueOrThrow({ where: { id: 'shop' } })).toMatchObject({
      currency: 'EUR',
      labourRateMinor: 7250,
      defaultTaxRateBp: 2100,
      quoteValidityDays: 45,
    });
    const bad = await saveCommercialSettings({ ...form, version: 1, labourRate: '72.505' });
    expect(bad.ok ? {} : bad.fieldErrors).toHaveProperty(['labourRate']);
  });
});
