/**
 * Issue 12 findings at the server-action layer: a retried intake (lost reply, server killed after the
 * commit) made duplicate jobs; a NUL in a company name said "Something went wrong"; a zero-byte photo
 * said "Photos added." while storing nothing; a pool wait surfaced as "Something went wrong".
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { db } from '@/lib/db/client';
import { submitIntake, uploadJobPhotos } from '@/lib/jobs/job-actions';
import { NUL_MESSAGE } from '@/lib/validation/safe-text';
import { MESSAGES } from '@/lib/errors/domain-errors';
import { toActionFailure } from '@/lib/errors/action-result';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { FRONT_DESK, WINDER } from '../support/demo-users';

useTestDatabase();

function intakeForm(extra: Record<string, unknown> = {}, company = 'Idempotent Pumps Ltd'): FormData {
  const fd = new FormData();
  fd.set(
    'payload',
    JSON.stringify({
      customer: { mode: 'new', company },
      motor: {
        manufacturer: 'Testwell',
        serial: `ID-${Math.random().toString(36).slice(2, 9)}`,
        ratedVoltageV: 400,
        frequencyHz: 50,
        speedRpm: 1460,
        outputValue: 7.5,
        outputUnit: 'kW',
        phases: 3,
      },
      job: { priority: 'NORMAL', reportedFault: 'Hums, will not start' },
      ...extra,
    }),
  );
  return fd;
}

beforeEach(() => signOutTest());

describe('intake idempotency', () => {
  it('the same request key twice gives one job and the first answer both times', async () => {
    await actAs(FRONT_DESK.email);
    const before = await db().job.count();
    const requestKey = randomUUID();
    const first = await submitIntake(intakeForm({ requestKey }));
    const again = await submitIntake(intakeForm({ requestKey }));
    expect(first.ok && again.ok).toBe(true);
    if (!first.ok || !again.ok) return;
    expect(again.data.number).toBe(first.data.number);
    expect(await db().job.count()).toBe(before + 1);
  });

  it('parallel retries with one key make one job; different keys make one job each', async () => {
    await actAs(FRONT_DESK.email);
    const before = await db().job.count();
    const requestKey = randomUUID();
    const results = await Promise.all(Array.from({ length: 4 }, () => submitIntake(intakeForm({ requestKey }))));
    expect(results.every((r) => r.ok)).toBe(true);
    expect(new Set(results.map((r) => (r.ok ? r.data.number : 0))).size).toBe(1);
    expect(await db().job.count()).toBe(before + 1);
    const two = await Promise.all([
      submitIntake(intakeForm({ requestKey: randomUUID() })),
      submitIntake(intakeForm({ requestKey: randomUUID() })),
    ]);
    expect(two.every((r) => r.ok)).toBe(true);
    expect(await db().job.count()).toBe(before + 3);
  });

  it('another person cannot replay someone else’s key', async () => {
    await actAs(FRONT_DESK.email);
    const requestKey = randomUUID();
    expect((await submitIntake(intakeForm({ requestKey }))).ok).toBe(true);
    await actAs((await db().user.findFirstOrThrow({ where: { role: 'ADMIN' } })).email);
    const other = await submitIntake(intakeForm({ requestKey }));
    expect(other).toMatchObject({ ok: false, code: 'conflict' });
  });
});

describe('hostile input gets a clear refusal', () => {
  it('a NUL in the company name is a field error on that field, and nothing is written', async () => {
    await actAs(FRONT_DESK.email);
    const before = await db().customer.count();
    const r = await submitIntake(intakeForm({}, 'Acme\u0000 Pumps'));
    expect(r).toMatchObject({ ok: false, code: 'invalid' });
    if (!r.ok) expect(r.fieldErrors?.['customer.company']).toEqual([NUL_MESSAGE]);
    expect(await db().customer.count()).toBe(before);
  });

  it('a NUL in a key of an otherwise valid payload is refused by path before the schema', async () => {
    await actAs(FRONT_DESK.email);
    const r = await submitIntake(intakeForm({ 'x\u0000y': 1 }));
    expect(r).toMatchObject({ ok: false, code: 'invalid' });
    if (!r.ok) expect(r.fieldErrors?.['x\u0000y']).toEqual([NUL_MESSAGE]);
  });

  it('a zero-byte photo and an empty upload are refused with a message, storing nothing', async () => {
    await actAs(WINDER.email);
    const job = await db().job.findFirstOrThrow({ where: { number: 1005 } });
    const before = await db().attachment.count({ where: { jobId: job.id } });
    const empty = new FormData();
    empty.set('jobId', job.id);
    empty.set('kind', 'DAMAGE');
    expect(await uploadJobPhotos(empty)).toMatchObject({ ok: false, message: 'Choose at least one photo to add.' });
    const zero = new FormData();
    zero.set('jobId', job.id);
    zero.set('kind', 'DAMAGE');
    zero.append('photos', new File([], 'blank.jpg', { type: 'image/jpeg' }));
    const r = await uploadJobPhotos(zero);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/blank\.jpg is empty \(0 bytes\)/);
    expect(await db().attachment.count({ where: { jobId: job.id } })).toBe(before);
  });

  it('a pool wait or a lost database becomes "busy, nothing saved, try again"', () => {
    const poolWait = Object.assign(new Error('Transaction API error: Unable to start a transaction in the given time.'), { code: 'P2028' });
    expect(toActionFailure(poolWait)).toMatchObject({ ok: false, code: 'busy', message: MESSAGES.busy });
    const down = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    expect(toActionFailure(down)).toMatchObject({ ok: false, code: 'busy', message: MESSAGES.databaseDown });
    const restart = new Error('terminating connection due to administrator command');
    expect(toActionFailure(restart)).toMatchObject({ code: 'busy', message: MESSAGES.databaseDown });
    expect(toActionFailure(new Error('something else'))).toMatchObject({ code: 'unexpected' });
  });
});
