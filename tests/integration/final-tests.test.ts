import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { MESSAGES } from '@/lib/errors/domain-errors';
import { saveTestRecordAction } from '@/lib/final-tests/record-actions';
import { listTestRecords } from '@/lib/final-tests/record-queries';
import { TEST_MESSAGES } from '@/lib/final-tests/record-writes';
import type { TestRecordFormInput } from '@/lib/final-tests/test-record-schema';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ENGINEER, FRONT_DESK, WINDER } from '../support/demo-users';
import { PASSING } from '../support/fixtures/final-test-fixtures';

useTestDatabase();

let jobId = '';
let winderId = '';

beforeAll(async () => {
  jobId = (await db().job.findFirstOrThrow({ where: { status: 'TESTING' }, orderBy: { number: 'asc' } })).id;
  winderId = (await db().user.findUniqueOrThrow({ where: { email: WINDER.email } })).id;
});

function form(over: Partial<TestRecordFormInput> = {}): TestRecordFormInput {
  return { jobId, previousSequence: 0, testedAt: '2026-11-30T09:15', testedById: winderId, data: structuredClone(PASSING), ...over };
}

describe('recording final tests', () => {
  beforeEach(() => signOutTest());

  it('refuses a visitor without a session and the front desk (tests.record), writing nothing', async () => {
    expect(await saveTestRecordAction(form())).toMatchObject({ ok: false, code: 'unauthenticated' });
    await actAs(FRONT_DESK.email);
    expect(await saveTestRecordAction(form())).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await db().testRecord.count({ where: { jobId } })).toBe(0);
  });

  it('saves a record with the server’s verdict, instrument serials and a timeline event', async () => {
    await actAs(WINDER.email);
    const result = await saveTestRecordAction(form());
    expect(result).toMatchObject({ ok: true, data: { sequence: 1, version: 1, verdict: 'PASS' } });
    const [current] = await listTestRecords(jobId);
    expect(current).toMatchObject({ sequence: 1, verdict: 'PASS', testedBy: { name: WINDER.name } });
    expect(current!.testedAt.toISOString()).toBe('2026-11-30T09:15:00.000Z');
    expect(current!.instrumentSerials).toEqual(['MEG-1001', 'HP-77', 'SG-5', 'LR-2', 'VB-9']);
    expect(current!.data.ir.ir1MinMOhm).toBe(1000);
    const event = await db().jobEvent.findFirstOrThrow({ where: { jobId, kind: 'TESTS' }, orderBy: { at: 'desc' } });
    expect(event.message).toContain('Final tests #1 recorded: PASS');
  });

  it('ignores a verdict sent by the browser and judges the readings itself', async () => {
    await actAs(WINDER.email);
    const [current] = await listTestRecords(jobId);
    const bad = form({ recordId: current!.id, version: current!.version, previousSequence: 1 });
    bad.data.ir.ir1MinMOhm = 2; // below 5 MΩ at 40 °C for random-wound (IEEE 43)
    bad.data.ir.ir10MinMOhm = 5;
    const result = await saveTestRecordAction({ ...bad, verdict: 'PASS' });
    expect(result).toMatchObject({ ok: true, data: { verdict: 'FAIL', version: 2 } });
    expect((await db().testRecord.findUniqueOrThrow({ where: { id: current!.id } })).verdict).toBe('FAIL');
  });

  it('stores blank readings inside a set (one phase current missing) and reads them back as blank', async () => {
    await actAs(WINDER.email);
    const [current] = await listTestRecords(jobId);
    const partial = form({ recordId: current!.id, version: current!.version, previousSequence: 1 });
    partial.data.run.currentsA = [2.9, '', ''];
    partial.data.surge.phases = [{ result: 'pass', notes: '' }, { result: '' }, { result: '' }];
    const result = await saveTestRecordAction(partial);
    expect(result).toMatchObject({ ok: true, data: { verdict: 'INCOMPLETE' } });
    const [after] = await listTestRecords(jobId);
    expect(after!.data.run.currentsA).toEqual([2.9, undefined, undefined]);
    expect(after!.data.surge.phases[1]).toEqual({});
  });

  it('refuses a stale edit and keeps the newer save', async () => {
    await actAs(ENGINEER.email);
    const [current] = await listTestRecords(jobId);
    const stale = form({ recordId: current!.id, version: current!.version - 1, previousSequence: 1 });
    expect(await saveTestRecordAction(stale)).toMatchObject({ ok: false, code: 'stale', message: MESSAGES.stale });
    expect((await db().testRecord.findUniqueOrThrow({ where: { id: current!.id } })).version).toBe(current!.version);
  });

  it('returns field errors by path for incomplete readings and writes nothing', async () => {
    await actAs(WINDER.email);
    const before = await db().jobEvent.count({ where: { jobId } });
    const bad = form({ previousSequence: 1 });
    bad.data.ir.temperatureC = '';
    bad.data.run.speedRpm = -5;
    const result = await saveTestRecordAction(bad);
    expect(result).toMatchObject({ ok: false, code: 'invalid' });
    if (result.ok) return;
    expect(Object.keys(result.fieldErrors ?? {})).toEqual(expect.arrayContaining(['data.run.speedRpm']));
    expect(await db().jobEvent.count({ where: { jobId } })).toBe(before);
  });

  it('adds a retest as the new current record; a second retest from the same view is refused as stale', async () => {
    await actAs(WINDER.email);
    const results = await Promise.all([
      saveTestRecordAction(form({ previousSequence: 1 })),
      saveTestRecordAction(form({ previousSequence: 1 })),
    ]);
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.find((r) => !r.ok)).toMatchObject({ code: 'stale' });
    const records = await listTestRecords(jobId);
    expect(records.map((r) => r.sequence)).toEqual([2, 1]);
    expect(records[0]!.verdict).toBe('PASS');
  });

  it('keeps an earlier record as history: editing it is refused', async () => {
    await actAs(WINDER.email);
    const old = (await listTestRecords(jobId)).find((r) => r.sequence === 1)!;
    const result = await saveTestRecordAction(form({ recordId: old.id, version: old.version, previousSequence: 2 }));
    expect(result).toMatchObject({ ok: false, code: 'frozen', message: TEST_MESSAGES.notCurrent });
  });

  it('refuses a tester who is not on the staff list', async () => {
    await actAs(WINDER.email);
    const result = await saveTestRecordAction(form({ previousSequence: 2, testedById: crypto.randomUUID() }));
    expect(result).toMatchObject({ ok: false, code: 'invalid', fieldErrors: { testedById: [TEST_MESSAGES.unknownTester] } });
  });

  it('refuses new tests on a shipped job', async () => {
    await actAs(WINDER.email);
    const shipped = await db().job.findFirstOrThrow({ where: { status: 'SHIPPED' } });
    const result = await saveTestRecordAction(form({ jobId: shipped.id }));
    expect(result).toMatchObject({ ok: false, code: 'frozen' });
  });
});
