import { beforeAll, describe, expect, it, vi } from 'vitest';
import { db } from '@/lib/db/client';
import { moveStatus } from '@/lib/jobs/job-actions';
import { loadJobSheet } from '@/lib/job-sheet/job-sheet-data';
import { renderJobSheetPdf } from '@/lib/job-sheet/job-sheet-pdf';
import { jobSheetPdf } from '@/lib/job-sheet/job-sheet-snapshot';
import { CLOSING_STATEMENT, SAFETY_NOTICES } from '@/lib/job-sheet/safety-notices';
import type { ApprovedRedesignSummary } from '@/lib/job-sheet/redesign-summary';
import { saveTestRecordAction } from '@/lib/final-tests/record-actions';
import { GET } from '@/app/jobs/[number]/job-sheet/pdf/route';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { FRONT_DESK, WINDER } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';
import { PASSING } from '../support/fixtures/final-test-fixtures';

// The redesign module is built elsewhere: stand in for its provider to check the sheet prints what it returns.
const redesign = vi.hoisted(() => ({ forJob: '' as string, summary: null as ApprovedRedesignSummary | null }));
vi.mock('@/lib/job-sheet/redesign-summary', () => ({
  getApprovedRedesignSummary: async (jobId: string) => (jobId === redesign.forJob ? redesign.summary : null),
}));

useTestDatabase();

let job: { id: string; number: number; company: string };
let text = '';
const norm = (s: string) => s.replace(/\s+/g, ' ');

beforeAll(async () => {
  const row = await db().job.findFirstOrThrow({ where: { status: 'TESTING' }, orderBy: { number: 'asc' }, include: { customer: true } });
  job = { id: row.id, number: row.number, company: row.customer.company };
  await actAs(WINDER.email);
  const winder = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
  const data = structuredClone(PASSING);
  data.run.vibrationMmS = 4.2; // above the 3.8 mm/s limit: the sheet must show it failed
  const saved = await saveTestRecordAction({
    jobId: job.id,
    previousSequence: 0,
    testedAt: '2026-11-30T09:15',
    testedById: winder.id,
    data: { ...data, notes: 'Retest after re-balancing the rotor.' },
  });
  if (!saved.ok) throw new Error(saved.message);
  redesign.forJob = job.id;
  redesign.summary = {
    revision: 2,
    approvedBy: 'Ravi Castellano',
    approvedAt: new Date('2026-11-20T10:00:00Z'),
    note: 'Reconnected for the new 690 V supply.',
    changes: [
      { label: 'Turns per coil', original: '14', redesigned: '24' },
      { label: 'Connection', original: 'delta (Δ)', redesigned: 'star (Y)' },
    ],
    proposedNameplate: [
      { label: 'Voltage', value: '690 V' },
      { label: 'Current', value: '7.0 A' },
    ],
  };
  const sheet = await loadJobSheet(job.number);
  text = pdfText(await renderJobSheetPdf(sheet!));
});

describe('the job sheet PDF', () => {
  it('has every section, in order', () => {
    const headings = [
      'Motor repair job sheet',
      'Job',
      'Customer',
      'Nameplate as received',
      'As-found winding',
      'Winding as repaired',
      'Final tests',
      'Signatures',
      'Safety notices',
    ];
    let at = -1;
    for (const h of headings) {
      const next = text.indexOf(h, at + 1);
      expect(next, h).toBeGreaterThan(at);
      at = next;
    }
    expect(text).toContain(job.company);
    // Issue 9: the sheet is numbered by its issue (Issue 1 first), not by the count of timeline events.
    expect(text).toMatch(new RegExp(`Job ${job.number} · Issue 1 · \\d{4}-\\d{2}-\\d{2}`));
  });

  it('prints every safety notice and ends with the statement deferring to codes and licensed practice', () => {
    for (const n of SAFETY_NOTICES) {
      expect(text).toContain(`⚠ ${n.title}`);
      expect(text).toContain(norm(n.text));
    }
    const closing = text.indexOf(norm(CLOSING_STATEMENT));
    expect(closing).toBeGreaterThan(text.indexOf(norm(SAFETY_NOTICES.at(-1)!.text)));
    expect(text.indexOf('⚠', closing)).toBe(-1); // nothing after it but the footer
    expect(text).toContain('IEC 60079-19');
  });

  it('prints the numbers of the saved record and its verdicts (°F, in/s, Ω, µA glyphs included)', () => {
    for (const s of [
      'tested 2026-11-30 09:15 UTC',
      'Tomasz Brennan',
      'MEG-1001, HP-77, SG-5, LR-2, VB-9',
      '1,000 MΩ',
      '3,000 MΩ', // readings
      '250 MΩ (minimum 5 MΩ)', // IEEE 43: 1000 MΩ at 20 °C → 40 °C
      '3.00 (minimum 2.0)', // PI 3000/1000, class F
      '1920 V AC or 3264 V DC', // NEMA MG 1 / AR100 new winding, 460 V
      'Applied 3264 V DC for 60 s',
      '0.004 mA (4 µA)',
      '20 °C (68 °F)',
      '2.858 Ω → 2.914 Ω at 25 °C', // 2.858·(234.5+25)/(234.5+20), IEEE copper correction
      '0.21 % (limit 2 %)', // ANSI/EASA AR100-2020 unbalance, random-wound
      '4.2 mm/s (0.165 in/s)',
      '38 °C (100.4 °F)',
      '⚠ FAIL Vibration',
      'Overall verdict: ⚠ FAIL',
      'Retest after re-balancing the rotor.',
    ])
      expect(text, s).toContain(s);
  });

  it('marks an approved redesign as differing from the original, with the proposed nameplate', () => {
    expect(text).toContain('⚠ REDESIGNED WINDING: differs from the original');
    expect(text).toContain('Approved redesign revision 2, by Ravi Castellano on 2026-11-20');
    expect(text).toMatch(/Turns per coil 14 24/);
    expect(text).toContain('Voltage 690 V');
  });

  it('says the winding follows the original when no redesign was approved', async () => {
    const other = await db().job.findFirstOrThrow({ where: { status: 'READY' }, orderBy: { number: 'asc' } });
    const t = pdfText(await renderJobSheetPdf((await loadJobSheet(other.number))!));
    // Issue 9: the statement of work says exactly what the records support.
    expect(t).toContain('Rewound to the as-found winding data.');
    expect(t).toContain('No final tests have been recorded yet.');
  });
});

describe('the PDF route', () => {
  const call = (number: number | string) =>
    GET(new Request(`http://x/jobs/${number}/job-sheet/pdf`), { params: Promise.resolve({ number: String(number) }) });

  it('refuses a visitor without a session', async () => {
    signOutTest();
    expect((await call(job.number)).status).toBe(401);
  });

  it('gives the front desk a PDF download and a 404 for a job that does not exist', async () => {
    await actAs(FRONT_DESK.email);
    const res = await call(job.number);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(new RegExp(`^attachment; filename="job-${job.number}-sheet-rev\\d+\\.pdf"$`));
    expect(
      Buffer.from(await res.arrayBuffer())
        .subarray(0, 5)
        .toString(),
    ).toBe('%PDF-');
    expect((await call(999_999)).status).toBe(404);
    expect((await call('abc')).status).toBe(404);
  });
});

describe('a shipped job keeps the sheet it shipped with', () => {
  it('stores the sheet when the job moves to SHIPPED and serves that copy after later changes', async () => {
    await actAs(FRONT_DESK.email);
    const ready = await db().job.findFirstOrThrow({ where: { status: 'READY' }, orderBy: { number: 'desc' }, include: { customer: true } });
    const moved = await moveStatus({ jobId: ready.id, version: ready.version, to: 'SHIPPED' });
    expect(moved.ok).toBe(true);
    const snap = await db().jobSheetSnapshot.findUniqueOrThrow({ where: { jobId: ready.id } });
    expect(snap.sizeBytes).toBeGreaterThan(1000);
    // Later the customer's record is renamed: the shipped sheet still says what it said.
    await db().customer.update({ where: { id: ready.customerId }, data: { phone: '+00 0000 RENAMED' } });
    const served = await jobSheetPdf(ready.number);
    expect(served?.snapshot).toBe(true);
    const t = pdfText(served!.pdf);
    expect(t).not.toContain('RENAMED');
    expect(t).toContain('Status Shipped');
    const fresh = pdfText(await renderJobSheetPdf((await loadJobSheet(ready.number))!));
    expect(fresh).toContain('RENAMED');
  });

  it('stores the sheet of a job shipped before snapshots existed on its first download', async () => {
    const shipped = await db().job.findFirstOrThrow({ where: { status: 'SHIPPED', sheetSnapshot: null } });
    const first = await jobSheetPdf(shipped.number);
    expect(first?.snapshot).toBe(true);
    expect(await db().jobSheetSnapshot.count({ where: { jobId: shipped.id } })).toBe(1);
  });
});
