/**
 * Issue 9: the shop-path gates and the final-test verdict rules, enforced by the server actions themselves
 * (each refusal comes back from the action with its message; nothing is written).
 */
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { moveStatus, recordGateDecisionAction, saveJobDetails } from '@/lib/jobs/job-actions';
import { GATE_MESSAGES } from '@/lib/jobs/shop-gates';
import { loadJobSheet } from '@/lib/job-sheet/job-sheet-data';
import { renderJobSheetPdf } from '@/lib/job-sheet/job-sheet-pdf';
import { approveRedesignRevision, chooseCandidate, submitRedesignRequest } from '@/lib/redesign/redesign-actions';
import { loadRedesignContext, runSearch } from '@/lib/redesign/redesign-context';
import { limitsToForm, storedRequestSchema } from '@/lib/redesign/redesign-schema';
import type { TestRecordFormInput } from '@/lib/final-tests/test-record-schema';
import { saveTestRecordAction } from '@/lib/final-tests/record-actions';
import { listTestRecords } from '@/lib/final-tests/record-queries';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ENGINEER, FRONT_DESK, WINDER } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';
import { PASSING } from '../support/fixtures/final-test-fixtures';

useTestDatabase();

let winderId = '';
const job = async (id: string) => db().job.findUniqueOrThrow({ where: { id } });
const move = async (id: string, to: string) => {
  const j = await job(id);
  return moveStatus({ jobId: id, version: j.version, to });
};
function testForm(
  jobId: string,
  previousSequence: number,
  patch: (d: TestRecordFormInput['data']) => void = () => {},
): TestRecordFormInput {
  const data = structuredClone(PASSING);
  patch(data);
  return { jobId, previousSequence, testedAt: '2026-11-30T09:15', testedById: winderId, data };
}

beforeAll(async () => {
  winderId = (await db().user.findUniqueOrThrow({ where: { email: WINDER.email } })).id;
});
beforeEach(() => signOutTest());

describe('Testing → Ready', () => {
  let jobId = '';
  beforeAll(async () => {
    jobId = (await db().job.findFirstOrThrow({ where: { status: 'TESTING' }, orderBy: { number: 'asc' } })).id;
  });

  it('is refused on the server with no test record, with the reason in words', async () => {
    await actAs(WINDER.email);
    expect(await move(jobId, 'READY')).toMatchObject({ ok: false, code: 'conflict', message: GATE_MESSAGES.ready(null) });
    expect((await job(jobId)).status).toBe('TESTING');
  });

  it('is refused after a hipot of 500 V DC for 5 s against the proposed level, which the server judges FAIL', async () => {
    await actAs(WINDER.email);
    const saved = await saveTestRecordAction(
      testForm(jobId, 0, (d) => {
        d.hipot.appliedV = 500;
        d.hipot.durationS = 5;
      }),
    );
    expect(saved).toMatchObject({ ok: true, data: { verdict: 'FAIL', sequence: 1 } });
    const [rec] = await listTestRecords(jobId);
    expect(rec!.verdict).toBe('FAIL');
    expect(await move(jobId, 'READY')).toMatchObject({ ok: false, message: GATE_MESSAGES.ready({ sequence: 1, verdict: 'FAIL' }) });
  });

  it('refuses an override from a winder and one without a written reason', async () => {
    await actAs(WINDER.email);
    expect(await recordGateDecisionAction({ jobId, decision: 'ready-override', reason: 'Customer needs it today.' })).toMatchObject({
      ok: false,
      code: 'forbidden',
    });
    await actAs(ENGINEER.email);
    const short = await recordGateDecisionAction({ jobId, decision: 'ready-override', reason: 'ok' });
    expect(short.ok).toBe(false);
    if (!short.ok) expect(short.fieldErrors?.reason?.[0]).toMatch(/at least 10 characters/);
    expect(await db().jobEvent.count({ where: { jobId, kind: 'DECISION' } })).toBe(0);
  });

  it('is allowed after an engineer’s override with a reason, which the timeline and the job sheet print', async () => {
    await actAs(ENGINEER.email);
    const reason = 'Customer instructed a 500 V test only: winding 30 years old, accepted in writing (email 28 Nov).';
    expect(await recordGateDecisionAction({ jobId, decision: 'ready-override', reason })).toMatchObject({ ok: true });
    const event = await db().jobEvent.findFirstOrThrow({ where: { jobId, kind: 'DECISION' } });
    expect(event.message).toBe(
      `Engineer's override: Testing → Ready released without a passing final test (record #1, FAIL). Reason: ${reason}`,
    );
    expect(await move(jobId, 'READY')).toMatchObject({ ok: true });
    const sheet = await loadJobSheet((await job(jobId)).number);
    const text = pdfText(await renderJobSheetPdf(sheet!));
    expect(text).toContain('Released to Ready');
    expect(text).toContain(reason.slice(0, 40));
    // The fixture's 460 V basis differs from this 400 V plate: the sheet says so instead of calling it the plate's.
    expect(text).toContain('judged for the rating entered on this test record, 460 V');
    expect(text).toContain('Rewound to the as-found winding data.');
    expect(text).toMatch(/⚠ FAIL/);
    expect(text).toContain('below the proposed 3264 V');
  });

  it('passes with a passing record, and an override stops counting once a newer record is saved', async () => {
    const other = (await db().job.findMany({ where: { status: 'TESTING' }, orderBy: { number: 'asc' } }))[1]!.id;
    await actAs(WINDER.email);
    expect(
      await saveTestRecordAction(
        testForm(other, 0, (d) => {
          d.hipot.appliedV = 1000;
        }),
      ),
    ).toMatchObject({ ok: true, data: { verdict: 'FAIL' } });
    await actAs(ENGINEER.email);
    expect(
      await recordGateDecisionAction({ jobId: other, decision: 'ready-override', reason: 'Released against record one only.' }),
    ).toMatchObject({ ok: true });
    await actAs(WINDER.email);
    expect(
      await saveTestRecordAction(
        testForm(other, 1, (d) => {
          d.hipot.result = 'fail';
        }),
      ),
    ).toMatchObject({ ok: true, data: { verdict: 'FAIL', sequence: 2 } });
    expect(await move(other, 'READY')).toMatchObject({ ok: false, message: GATE_MESSAGES.ready({ sequence: 2, verdict: 'FAIL' }) });
    expect(await saveTestRecordAction(testForm(other, 2))).toMatchObject({ ok: true, data: { verdict: 'PASS', sequence: 3 } });
    expect(await move(other, 'READY')).toMatchObject({ ok: true });
  });

  it('prints a deliberately reduced hipot as a reduced-level test with its reason, never a pass', async () => {
    const third = (await db().job.findMany({ where: { status: 'TESTING' }, orderBy: { number: 'asc' } }))[0]!.id;
    await actAs(WINDER.email);
    const r = await saveTestRecordAction(
      testForm(third, 0, (d) => {
        d.hipot.appliedV = 2611;
        d.hipot.reducedReason = 'repeat test at the customer’s request';
      }),
    );
    expect(r).toMatchObject({ ok: true, data: { verdict: 'INCOMPLETE' } });
    const text = pdfText(await renderJobSheetPdf((await loadJobSheet((await job(third)).number))!));
    expect(text).toContain('Reduced-level test (repeat test at the customer’s request)');
    expect(text).toContain('NOT A FULL PASS');
    expect(await move(third, 'READY')).toMatchObject({ ok: false, code: 'conflict' });
  });
});

describe('Winding waits for the redesign when another supply was asked for; tests follow the as-repaired rating', () => {
  let jobId = '';
  let redesignId = '';
  let version = 0;
  beforeAll(async () => {
    // Demo job 1016: 0.75 kW 400 V 50 Hz, 4 poles, star, with an as-found sheet; put back to "customer approved".
    const row = await db().job.update({ where: { number: 1016 }, data: { status: 'CUSTOMER_APPROVED' } });
    jobId = row.id;
  });

  it('refuses to start winding while a redesign request for 460 V 60 Hz is not approved', async () => {
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest({
      jobId,
      target: { lineVoltageV: '460', frequencyHz: '60', poles: '4', connection: 'star', spans: '', layers: 'keep', parallelPaths: '' },
      limits: limitsToForm(DEFAULT_REDESIGN_LIMITS),
    });
    if (!r.ok) throw new Error(r.message);
    redesignId = r.data.id;
    version = r.data.version;
    await actAs(WINDER.email);
    expect(await move(jobId, 'WINDING')).toMatchObject({
      ok: false,
      code: 'conflict',
      message: GATE_MESSAGES.winding('a redesign request, revision 1'),
    });
  });

  it('starts winding once an engineer approves the revision', async () => {
    await actAs(ENGINEER.email);
    const ctx = await loadRedesignContext(jobId);
    if (!ctx.ok) throw new Error(ctx.reason);
    const row = await db().redesign.findUniqueOrThrow({ where: { id: redesignId } });
    const search = await runSearch(ctx.value, storedRequestSchema.parse(row.request));
    if (!search.ok || !search.value.candidates[0]) throw new Error('no candidate');
    const chosen = await chooseCandidate({ redesignId, version, key: search.value.candidates[0].key });
    if (!chosen.ok) throw new Error(chosen.message);
    const approved = await approveRedesignRevision({
      redesignId,
      version: chosen.data.version,
      note: 'Checked densities and fill for the 460 V 60 Hz supply.',
    });
    expect(approved.ok).toBe(true);
    await actAs(WINDER.email);
    expect(await move(jobId, 'WINDING')).toMatchObject({ ok: true });
    expect(await move(jobId, 'TESTING')).toMatchObject({ ok: true });
  });

  it('refuses a test basis of 400 V against the approved 460 V and judges for 460 V 60 Hz, redesign revision 1', async () => {
    await actAs(WINDER.email);
    const wrong = await saveTestRecordAction(
      testForm(jobId, 0, (d) => {
        d.basis.ratedVoltageV = 400;
        d.basis.frequencyHz = 50;
      }),
    );
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) expect(wrong.fieldErrors?.['data.basis.ratedVoltageV']?.[0]).toContain('revision 1, rates this motor 460 V');
    const ok = await saveTestRecordAction(
      testForm(jobId, 0, (d) => {
        d.basis.frequencyHz = 60;
        d.basis.ratingSource = 'nameplate';
      }),
    );
    expect(ok).toMatchObject({ ok: true, data: { verdict: 'PASS' } });
    const [rec] = await listTestRecords(jobId);
    expect(rec!.data.basis).toMatchObject({ ratedVoltageV: 460, frequencyHz: 60, ratingSource: 'redesign', redesignRevision: 1 });
    const sheet = (await loadJobSheet(1016))!;
    expect(sheet.tests?.judgedFor).toBe('judged for the as-repaired rating 460 V 60 Hz, redesign revision 1');
    const text = pdfText(await renderJobSheetPdf(sheet));
    expect(text).toContain('judged for the as-repaired rating 460 V 60 Hz, redesign revision 1');
    expect(text).toMatch(/Rewound to redesign revision 1 approved by Ravi Castellano on \d{4}-\d{2}-\d{2}\./);
    expect(text).toContain('Nameplate as repaired');
    expect(text).toContain('Issue 1');
  });

  it('keeps the sheet at Issue 1 while nothing it prints changes, and moves to Issue 2 when it does', async () => {
    expect((await loadJobSheet(1016))!.revision).toBe(1);
    await actAs(FRONT_DESK.email);
    const j = await job(jobId);
    expect(
      await saveJobDetails({
        jobId,
        version: j.version,
        priority: j.priority,
        reportedFault: j.reportedFault ?? 'x',
        customerPo: 'PO-NEW-4471',
      }),
    ).toMatchObject({ ok: true });
    expect((await loadJobSheet(1016))!.revision).toBe(2);
  });
});

describe('keeping the original winding, and shipping', () => {
  it('lets an engineer record why the original winding is kept; winding may then start', async () => {
    const row = await db().job.findFirstOrThrow({ where: { status: 'CUSTOMER_APPROVED' }, orderBy: { number: 'asc' } });
    await db().redesign.create({ data: { jobId: row.id, revision: 1, request: {}, sheetRevision: 1 } });
    await actAs(WINDER.email);
    expect(await move(row.id, 'WINDING')).toMatchObject({ ok: false, code: 'conflict' });
    await actAs(ENGINEER.email);
    expect(
      await recordGateDecisionAction({
        jobId: row.id,
        decision: 'keep-original-winding',
        reason: 'Customer withdrew the 60 Hz request by phone; rewind as found.',
      }),
    ).toMatchObject({ ok: true });
    await actAs(WINDER.email);
    expect(await move(row.id, 'WINDING')).toMatchObject({ ok: true });
  });

  it('refuses to ship a job with no winding record, and still lets it be returned unrepaired', async () => {
    const row = await db().job.findFirstOrThrow({ where: { status: 'RECEIVED', windingSheet: null }, orderBy: { number: 'asc' } });
    await db().job.update({ where: { id: row.id }, data: { status: 'READY' } });
    await actAs(FRONT_DESK.email);
    expect(await move(row.id, 'SHIPPED')).toMatchObject({ ok: false, code: 'conflict', message: GATE_MESSAGES.shipped });
    expect((await job(row.id)).status).toBe('READY');
    expect(await move(row.id, 'ON_HOLD')).toMatchObject({ ok: true });
    expect(await move(row.id, 'RETURNED_UNREPAIRED')).toMatchObject({ ok: true });
    expect((await loadJobSheet(row.number))!.statementOfWork).toBe('Returned unrepaired: the winding was not rewound.');
  });

  it('ships a ready job that has its winding data', async () => {
    const row = await db().job.findFirstOrThrow({ where: { status: 'READY', windingSheet: { isNot: null } }, orderBy: { number: 'asc' } });
    await actAs(FRONT_DESK.email);
    expect(await move(row.id, 'SHIPPED')).toMatchObject({ ok: true });
  });
});
