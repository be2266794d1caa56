import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { getApprovedRedesignSummary } from '@/lib/job-sheet/redesign-summary';
import { expectedResistanceFor } from '@/lib/final-tests/expected-resistance-source';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { approveRedesignRevision, chooseCandidate, submitRedesignRequest } from '@/lib/redesign/redesign-actions';
import { loadRedesignContext, runSearch } from '@/lib/redesign/redesign-context';
import { getApprovedRedesign, getStoredSearch, listRedesigns } from '@/lib/redesign/redesign-queries';
import { REDESIGN_MESSAGES } from '@/lib/redesign/redesign-writes';
import { limitsToForm, storedRequestSchema, type RedesignRequestFormInput } from '@/lib/redesign/redesign-schema';
import { saveShopSettings } from '@/lib/settings/settings-actions';
import { getShopLimits } from '@/lib/settings/settings-queries';
import { addStockWire, deleteStockWire } from '@/lib/stock/stock-actions';
import { listStock } from '@/lib/stock/stock-queries';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ADMIN, ENGINEER, WINDER } from '../support/demo-users';

useTestDatabase();

/** Demo job 1016: 0.75 kW, 400 V 50 Hz, 4 poles, star, with an invented as-found sheet. */
const JOB_NUMBER = 1016;
let jobId = '';

beforeAll(async () => {
  jobId = (await db().job.findUniqueOrThrow({ where: { number: JOB_NUMBER }, select: { id: true } })).id;
});

function requestForm(target: Partial<RedesignRequestFormInput['target']>, draftVersion?: number): RedesignRequestFormInput {
  return {
    jobId,
    ...(draftVersion ? { draftVersion } : {}),
    target: {
      lineVoltageV: '460',
      frequencyHz: '60',
      poles: '4',
      connection: 'star',
      spans: '',
      layers: 'keep',
      parallelPaths: '',
      ...target,
    },
    limits: limitsToForm(DEFAULT_REDESIGN_LIMITS),
  };
}

async function firstCandidateKey(redesignId: string): Promise<string> {
  const row = await db().redesign.findUniqueOrThrow({ where: { id: redesignId } });
  const ctx = await loadRedesignContext(row.jobId);
  if (!ctx.ok) throw new Error(ctx.reason);
  const r = await runSearch(ctx.value, storedRequestSchema.parse(row.request));
  if (!r.ok || !r.value.candidates[0]) throw new Error('no candidate');
  return r.value.candidates[0].key;
}

describe('redesign request, choice and approval', () => {
  beforeEach(() => signOutTest());
  let redesignId = '';
  let version = 0;

  it('refuses a visitor and a winder before reading the request', async () => {
    expect(await submitRedesignRequest({ nonsense: true })).toMatchObject({ ok: false, code: 'unauthenticated' });
    await actAs(WINDER.email);
    expect(await submitRedesignRequest(requestForm({}))).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await db().redesign.count({ where: { jobId } })).toBe(0);
  });

  it('returns field errors for a bad target and writes nothing', async () => {
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest(requestForm({ lineVoltageV: '-460', spans: '7, x' }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const keys = Object.keys(r.fieldErrors ?? {});
    expect(keys).toContain('target.lineVoltageV');
    expect(keys.some((k) => k.startsWith('target.spans'))).toBe(true);
    expect(await db().redesign.count({ where: { jobId } })).toBe(0);
  });

  it('an engineer’s request for 460 V 60 Hz opens revision 1 as a draft and records it on the timeline', async () => {
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest(requestForm({}));
    expect(r).toMatchObject({ ok: true, data: { revision: 1 } });
    if (!r.ok) return;
    redesignId = r.data.id;
    version = r.data.version;
    const row = await db().redesign.findUniqueOrThrow({ where: { id: redesignId } });
    expect(row.status).toBe('DRAFT');
    expect(storedRequestSchema.parse(row.request).target).toMatchObject({ lineVoltageV: 460, frequencyHz: 60, connection: 'star' });
    expect(await db().jobEvent.count({ where: { jobId, kind: 'REDESIGN' } })).toBe(1);
  });

  it('refuses a choice made on an old version, and a key the search does not return', async () => {
    await actAs(ENGINEER.email);
    const key = await firstCandidateKey(redesignId);
    expect(await chooseCandidate({ redesignId, version: version + 5, key })).toMatchObject({ ok: false, code: 'stale' });
    expect(await chooseCandidate({ redesignId, version, key: 'L2l7-N1-a1-Y-nothing' })).toMatchObject({
      ok: false,
      message: REDESIGN_MESSAGES.candidateGone,
    });
  });

  it('records the chosen candidate', async () => {
    await actAs(ENGINEER.email);
    const r = await chooseCandidate({ redesignId, version, key: await firstCandidateKey(redesignId) });
    expect(r).toMatchObject({ ok: true, data: { rank: 1 } });
    if (r.ok) version = r.data.version;
  });

  it.each([
    { who: 'a winder', user: WINDER },
    { who: 'an administrator', user: ADMIN },
  ])('refuses approval by $who with a clear message, and the row stays a draft', async ({ user }) => {
    await actAs(user.email);
    const r = await approveRedesignRevision({ redesignId, version, note: 'Looks fine to me.' });
    expect(r).toMatchObject({ ok: false, code: 'forbidden' });
    if (!r.ok) expect(r.message).toBe('Your role does not allow you to approve a redesign: only an engineer may approve one.');
    expect((await db().redesign.findUniqueOrThrow({ where: { id: redesignId } })).status).toBe('DRAFT');
  });

  it('asks the engineer for an approval note', async () => {
    await actAs(ENGINEER.email);
    const r = await approveRedesignRevision({ redesignId, version, note: '' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fieldErrors?.note?.[0]).toMatch(/approval note/);
  });

  it('an engineer approves: who, when, note and the exact data are frozen in the snapshot', async () => {
    await actAs(ENGINEER.email);
    const r = await approveRedesignRevision({
      redesignId,
      version,
      note: 'Checked flux ratios and fill; fan and bearings checked for 1800 rpm.',
    });
    expect(r).toMatchObject({ ok: true, data: { revision: 1 } });
    const approved = await getApprovedRedesign(jobId);
    expect(approved?.revision).toBe(1);
    expect(approved?.approvedBy.name).toBe(ENGINEER.name);
    expect(approved?.note).toMatch(/fan and bearings/);
    expect(approved?.snapshot.request.target.lineVoltageV).toBe(460);
    expect(approved?.nameplate).toMatchObject({ lineVoltageV: 460, frequencyHz: 60, connection: 'star', synchronousRpm: 1800 });
    expect(approved?.snapshot.report.candidate.key).toBe(await firstCandidateKey(redesignId));
    expect(approved?.snapshot.report.warnings.map((w) => w.topic)).toEqual(
      expect.arrayContaining(['speed', 'frequency', 'certification', 'review']),
    );
    expect(await db().jobEvent.count({ where: { jobId, kind: 'REDESIGN_APPROVED' } })).toBe(1);
  });

  it('the job sheet prints what was approved: changed rows and the proposed nameplate', async () => {
    const summary = await getApprovedRedesignSummary(jobId);
    expect(summary).toMatchObject({ revision: 1, approvedBy: ENGINEER.name });
    expect(summary?.changes.length).toBeGreaterThan(0);
    expect(summary?.changes.every((c) => c.original !== c.redesigned)).toBe(true);
    expect(summary?.proposedNameplate).toEqual(expect.arrayContaining([{ label: 'Voltage, connection', value: '460 V, star (Y)' }]));
  });

  it('final resistance is then compared with the redesign’s prediction, and elsewhere with the as-found one', async () => {
    const approved = await getApprovedRedesign(jobId);
    const expected = await expectedResistanceFor(jobId, await getAsFoundSheet(jobId));
    expect(expected?.source).toBe('approved redesign, revision 1');
    expect(expected?.phaseOhm20).toBe(approved?.snapshot.report.rows.find((r) => r.key === 'resistance')?.values.candidate);
    const other = await db().job.findFirstOrThrow({ where: { status: 'TESTING', id: { not: jobId } } });
    const asFound = await expectedResistanceFor(other.id, await getAsFoundSheet(other.id));
    expect(asFound?.source).toMatch(/^as-found data sheet, revision \d+$/);
    expect(asFound?.phaseOhm20).toBeGreaterThan(0);
  });

  it('refuses to change the approved revision through the actions', async () => {
    await actAs(ENGINEER.email);
    const row = await db().redesign.findUniqueOrThrow({ where: { id: redesignId } });
    const key = row.chosenKey ?? '';
    expect(await chooseCandidate({ redesignId, version: row.version, key })).toMatchObject({
      ok: false,
      code: 'frozen',
      message: REDESIGN_MESSAGES.frozen(1),
    });
    expect(await approveRedesignRevision({ redesignId, version: row.version, note: 'Again.' })).toMatchObject({
      ok: false,
      code: 'frozen',
    });
  });

  it('the database itself refuses a raw UPDATE or DELETE of the approved row', async () => {
    await expect(db().$executeRaw`UPDATE "Redesign" SET "approvalNote" = 'tampered' WHERE "id" = ${redesignId}`).rejects.toThrow(
      /approved and frozen/,
    );
    await expect(db().$executeRaw`DELETE FROM "Redesign" WHERE "id" = ${redesignId}`).rejects.toThrow(/approved and frozen/);
    expect((await db().redesign.findUniqueOrThrow({ where: { id: redesignId } })).approvalNote).toMatch(/fan and bearings/);
  });

  it('a change opens revision 2, which needs approval again; revision 1 stays current until then', async () => {
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest(requestForm({ lineVoltageV: '690', frequencyHz: '50' }));
    expect(r).toMatchObject({ ok: true, data: { revision: 2 } });
    if (!r.ok) return;
    // A draft is an ordinary row: the trigger lets it change (control for the test above).
    await db().$executeRaw`UPDATE "Redesign" SET "updatedAt" = now() WHERE "id" = ${r.data.id}`;
    expect((await getApprovedRedesign(jobId))?.revision).toBe(1);
    const chosen = await chooseCandidate({ redesignId: r.data.id, version: r.data.version, key: await firstCandidateKey(r.data.id) });
    expect(chosen.ok).toBe(true);
    if (!chosen.ok) return;
    expect(
      await approveRedesignRevision({ redesignId: r.data.id, version: chosen.data.version, note: 'Insulation checked for 690 V.' }),
    ).toMatchObject({ ok: true });
    const current = await getApprovedRedesign(jobId);
    expect(current?.revision).toBe(2);
    expect(current?.nameplate.lineVoltageV).toBe(690);
    expect((await listRedesigns(jobId)).map((x) => [x.revision, x.status])).toEqual([
      [2, 'APPROVED'],
      [1, 'APPROVED'],
    ]);
  });

  it('each approval reserved the wire it winds; approving revision 2 released revision 1’s reservation (shown on the stock page)', async () => {
    const rows = await db().wireReservation.findMany({
      where: { redesign: { jobId } },
      include: { redesign: { select: { revision: true } } },
      orderBy: { createdAt: 'asc' },
    });
    const r1 = rows.filter((x) => x.redesign.revision === 1);
    const r2 = rows.filter((x) => x.redesign.revision === 2);
    expect(r1.length).toBeGreaterThan(0);
    expect(r1.every((x) => x.releasedAt !== null)).toBe(true);
    expect(r2.length).toBeGreaterThan(0);
    expect(r2.every((x) => x.releasedAt === null && x.kg > 0)).toBe(true);
    // The kilograms reserved are the approved candidate's wire needs.
    const approved = await getApprovedRedesign(jobId);
    expect(r2.map((x) => x.kg).reduce((a, b) => a + b, 0)).toBeCloseTo(
      (approved?.snapshot.report.candidate.wireNeeds ?? []).reduce((a, n) => a + n.kg, 0),
      9,
    );
    const stock = await listStock();
    const held = stock.filter((s) => s.reservations.some((x) => x.jobNumber === JOB_NUMBER && x.revision === 2));
    expect(held.length).toBe(r2.length);
    expect(stock.some((s) => s.reservations.some((x) => x.revision === 1 && x.jobNumber === JOB_NUMBER))).toBe(false);
  });
});

describe('the search result is stored with the revision', () => {
  beforeEach(() => signOutTest());

  it('a saved request stores its search; choosing reads it and does not search again (the stock emptied meanwhile)', async () => {
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest(requestForm({ lineVoltageV: '460', frequencyHz: '60' }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const stored = await getStoredSearch(r.data.id);
    expect(stored?.search.candidates.length).toBeGreaterThan(0);
    expect(stored?.search.candidates[0]?.keepsAsFoundWire).toBe(true);
    const key = stored?.search.candidates[1]?.key ?? '';
    // Were the choice searching again, the empty stock would drop every stock-made candidate.
    const saved = await db().wireStock.findMany();
    await db().wireReservation.deleteMany({ where: { redesignId: r.data.id } });
    await db().$transaction([
      db().wireReservation.deleteMany({ where: { releasedAt: { not: null } } }),
      db().wireStock.deleteMany({ where: { reservations: { none: {} } } }),
    ]);
    const chosen = await chooseCandidate({ redesignId: r.data.id, version: r.data.version, key });
    expect(chosen).toMatchObject({ ok: true, data: { rank: 2 } });
    await db().wireStock.createMany({
      data: saved.map(({ id, standard, size, enamelGrade, bareMm, quantityKg, note }) => ({
        id,
        standard,
        size,
        enamelGrade,
        bareMm,
        quantityKg,
        note,
      })),
      skipDuplicates: true,
    });
  });

  it('a request too wide for the work budget is refused with a "narrow the request" message and writes nothing', async () => {
    await actAs(ENGINEER.email);
    const before = await db().redesign.count({ where: { jobId } });
    const wide = requestForm({ connection: 'either', spans: '5, 6, 7, 8, 9, 10, 11, 12', parallelPaths: '1, 2, 3, 4, 6, 8, 12, 24' });
    const limits = {
      ...wide.limits,
      gapRisePercent: 100,
      gapFallPercent: 99,
      toothRisePercent: 100,
      toothFallPercent: 99,
      yokeRisePercent: 100,
      yokeFallPercent: 99,
      currentDensityRisePercent: 100,
      currentDensityMaxAPerMm2: 30,
      slotFillMaxPercent: 100,
      maxStrandsInHand: 40,
      maxWireSizes: 3,
      mixedSizeRatioMax: 3,
    };
    const r = await submitRedesignRequest({ ...wide, target: { ...wide.target, allowOverPitch: true }, limits });
    if (r.ok) {
      // Inside the budget on this core: then it must have stored a result.
      expect(await getStoredSearch(r.data.id)).not.toBeNull();
    } else {
      expect(r.message).toMatch(/Narrow the request: wires in hand \(now 40/);
      expect(await db().redesign.count({ where: { jobId } })).toBe(before);
    }
  }, 60_000);
});

describe('wire stock and shop settings', () => {
  beforeEach(() => signOutTest());

  it('the demo shop has a realistic stock of 25–40 sizes', async () => {
    const stock = await listStock();
    expect(stock.length).toBeGreaterThanOrEqual(25);
    expect(stock.length).toBeLessThanOrEqual(40);
    expect(new Set(stock.map((s) => s.standard))).toEqual(new Set(['awg', 'metric']));
  });

  it('a winder may not change the stock; an engineer adds, corrects and removes a size', async () => {
    await actAs(WINDER.email);
    expect(await addStockWire({ standard: 'metric', size: '0.315', enamelGrade: '2' })).toMatchObject({ ok: false, code: 'forbidden' });
    await actAs(ENGINEER.email);
    const bad = await addStockWire({ standard: 'metric', size: '0.333', enamelGrade: '2' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.fieldErrors?.size?.[0]).toMatch(/not a nominal metric wire diameter/);
    const added = await addStockWire({ standard: 'metric', size: '0.315', enamelGrade: '2', quantityKg: '3' });
    expect(added).toMatchObject({ ok: true, message: '0.315 mm grade 2 added to the stock.' });
    const again = await addStockWire({ standard: 'metric', size: '0.3150', enamelGrade: '2', quantityKg: '4' });
    expect(again).toMatchObject({ ok: true, message: expect.stringMatching(/already in stock/) });
    const row = (await listStock()).find((s) => s.size === '0.315');
    expect(row?.quantityKg).toBe(4);
    expect(await deleteStockWire({ id: row?.id })).toMatchObject({ ok: true });
    expect((await listStock()).some((s) => s.size === '0.315')).toBe(false);
  });

  it('only an administrator saves the shop limits, and a stale save is refused', async () => {
    const before = await getShopLimits();
    const form = { version: before.version, limits: { ...limitsToForm(before.limits), slotFillMaxPercent: '62' } };
    await actAs(ENGINEER.email);
    expect(await saveShopSettings(form)).toMatchObject({ ok: false, code: 'forbidden' });
    await actAs(ADMIN.email);
    expect(await saveShopSettings(form)).toMatchObject({ ok: true, data: { version: before.version + 1 } });
    expect((await getShopLimits()).limits.slotFillMax).toBeCloseTo(0.62, 12);
    expect(await saveShopSettings(form)).toMatchObject({ ok: false, code: 'stale' });
  });
});
