/**
 * Issue 12: a process killed during the first start left 4 of 40 demo jobs, no sheets and no job counter,
 * and every intake then failed on a duplicate job number 1001. The seed now runs in one transaction,
 * completes a half-done seed on the next start, and derives the counter from the jobs.
 */
import { describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { DEMO_USERS } from '@/lib/setup/demo/demo-data';
import { demoSeedNeeded, repairJobCounter, seedDemoShop } from '@/lib/setup/demo/seed-demo';
import { submitIntake } from '@/lib/jobs/job-actions';
import { allowedMoves } from '@/lib/jobs/status-flow';
import { useTestDatabase } from '../support/test-db';
import { actAs } from '../support/session';
import { FRONT_DESK } from '../support/demo-users';

useTestDatabase();

const DEMO_JOBS = 40;

async function wipeAll(): Promise<void> {
  const tables = await db().$queryRaw<{ tablename: string }[]>`
    SELECT tablename FROM pg_tables WHERE schemaname = current_schema() AND tablename <> '_prisma_migrations'`;
  await db().$executeRawUnsafe(`TRUNCATE ${tables.map((t) => `"${t.tablename}"`).join(', ')} CASCADE`);
}

async function intakeNumber(): Promise<number> {
  await actAs(FRONT_DESK.email);
  const fd = new FormData();
  fd.set(
    'payload',
    JSON.stringify({
      customer: { mode: 'new', company: 'Seed Recovery Test Works' },
      motor: {
        manufacturer: 'Testwell',
        serial: `SR-${Math.random().toString(36).slice(2, 9)}`,
        ratedVoltageV: 400,
        frequencyHz: 50,
        speedRpm: 1460,
        outputValue: 11,
        outputUnit: 'kW',
        phases: 3,
      },
      job: { priority: 'NORMAL', reportedFault: 'Tripping on start' },
    }),
  );
  const r = await submitIntake(fd);
  if (!r.ok) throw new Error(`intake refused: ${r.message} ${JSON.stringify(r.fieldErrors)}`);
  return r.data.number;
}

describe('demo data', () => {
  it('every demo sheet has its revision-1 history row', async () => {
    const sheets = await db().windingSheet.findMany({ include: { revisions: true } });
    expect(sheets.length).toBeGreaterThan(10);
    for (const s of sheets) expect(s.revisions.map((r) => r.revision)).toEqual([1]);
  });

  it('no demo event is dated in the future, and each follows its job’s intake', async () => {
    const now = new Date();
    const events = await db().jobEvent.findMany({ include: { job: { select: { receivedAt: true } } } });
    for (const e of events) {
      expect(e.at.getTime()).toBeLessThanOrEqual(now.getTime());
      expect(e.at.getTime()).toBeGreaterThanOrEqual(e.job.receivedAt.getTime());
    }
  });

  it('an on-hold demo job resumes to the status its history says it was held from', async () => {
    const held = await db().job.findMany({
      where: { status: 'ON_HOLD' },
      include: { events: { where: { kind: 'STATUS' }, orderBy: { at: 'asc' } } },
    });
    expect(held.length).toBeGreaterThan(0);
    for (const j of held) {
      const last = j.events.at(-1);
      expect(last?.toStatus).toBe('ON_HOLD');
      expect(j.heldFrom).toBe(last?.fromStatus);
      expect(allowedMoves('ON_HOLD', j.heldFrom, 'ADMIN')[0]).toBe(last?.fromStatus);
    }
  });
});

describe('seed recovery', () => {
  it('a seed that fails part-way leaves nothing behind, and the next start seeds it whole', async () => {
    await wipeAll();
    // Fail the very last write of the seed, as a kill would interrupt it.
    await db().$executeRawUnsafe(
      `CREATE FUNCTION seed_test_fail() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION 'simulated crash'; END $$`,
    );
    await db().$executeRawUnsafe(
      `CREATE TRIGGER seed_test_fail BEFORE INSERT ON "ShopSettings" FOR EACH ROW EXECUTE FUNCTION seed_test_fail()`,
    );
    try {
      await expect(seedDemoShop(db())).rejects.toThrow();
    } finally {
      await db().$executeRawUnsafe(`DROP TRIGGER seed_test_fail ON "ShopSettings"`);
      await db().$executeRawUnsafe(`DROP FUNCTION seed_test_fail()`);
    }
    expect(await db().user.count()).toBe(0);
    expect(await db().job.count()).toBe(0);
    expect(await db().motor.count()).toBe(0);
    expect(await demoSeedNeeded(db())).toBe(true);
    await seedDemoShop(db());
    expect(await db().job.count()).toBe(DEMO_JOBS);
    expect(await demoSeedNeeded(db())).toBe(false);
  });

  it('a half-seeded database (4 jobs, no sheets, no counter) is completed on restart and intake works', async () => {
    const fresh = await db().job.findMany({
      orderBy: { number: 'asc' },
      select: { number: true, status: true, receivedAt: true, heldFrom: true },
    });
    const freshSheets = await db().windingSheet.count();
    // What the old row-by-row seed left when killed about 8 s in.
    await db().windingSheet.deleteMany({});
    await db().jobEvent.deleteMany({ where: { job: { number: { gt: 1004 } } } });
    await db().job.deleteMany({ where: { number: { gt: 1004 } } });
    await db().wireStock.deleteMany({});
    await db().shopSettings.deleteMany({});
    await db().jobCounter.deleteMany({});
    expect(await db().job.count()).toBe(4);

    expect(await demoSeedNeeded(db())).toBe(true);
    await seedDemoShop(db());
    const after = await db().job.findMany({
      orderBy: { number: 'asc' },
      select: { number: true, status: true, receivedAt: true, heldFrom: true },
    });
    expect(after.map((j) => [j.number, j.status, j.heldFrom])).toEqual(fresh.map((j) => [j.number, j.status, j.heldFrom]));
    expect(await db().windingSheet.count()).toBe(freshSheets);
    expect(await db().wireStock.count()).toBeGreaterThan(0);
    expect(await db().user.count()).toBe(DEMO_USERS.length);
    expect(await demoSeedNeeded(db())).toBe(false);
    expect(await intakeNumber()).toBe(1001 + DEMO_JOBS);
  });

  it('a missing or behind job counter is derived from the jobs, so intake never reuses a number', async () => {
    const top = (await db().job.aggregate({ _max: { number: true } }))._max.number ?? 0;
    await db().jobCounter.deleteMany({});
    await repairJobCounter(db());
    expect(await intakeNumber()).toBe(top + 1);
    await db().jobCounter.update({ where: { id: 'job' }, data: { value: 1001 } });
    await repairJobCounter(db());
    expect(await intakeNumber()).toBe(top + 2);
    // and it never moves the counter backwards
    await db().jobCounter.update({ where: { id: 'job' }, data: { value: top + 50 } });
    await repairJobCounter(db());
    expect((await db().jobCounter.findUniqueOrThrow({ where: { id: 'job' } })).value).toBe(top + 50);
  });
});
