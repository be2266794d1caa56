/**
 * Job board timings on an in-memory embedded database: the same board queries with 500 jobs and with
 * 50,000 jobs, and the ratio between them from the same run (the board must stay fast as the shop grows).
 */
import { randomUUID } from 'node:crypto';
import { closeDb, db } from '@/lib/db/client';
import { prepareDatabase } from '@/lib/setup/prepare';
import { listBoard } from '@/lib/jobs/job-queries';
import { boardQuerySchema } from '@/lib/jobs/job-schema';
import { JOB_STATUSES } from '@/lib/jobs/job-schema';

process.env.COILWRIGHT_DATA_DIR = 'memory://';
process.env.COILWRIGHT_SEED_DEMO = '0';
delete process.env.DATABASE_URL;

const QUERIES: [string, Record<string, string>][] = [
  ['open jobs, by promised date, page 1', {}],
  ['open jobs, jump to job 41,000 (by number)', { sort: 'number', from: '41000' }],
  ['any status, jump to a promised date', { status: 'ANY', from: '2026-12-15' }],
  ['search by job number', { q: '1777' }],
  ['search by customer text', { q: 'customer 37' }],
  ['search by serial', { q: 'SN-0012345' }],
  ['overdue only', { due: 'overdue' }],
  ['sorted by customer', { sort: 'customer' }],
  ['one status', { status: 'WINDING' }],
];

async function fill(total: number, startAt: number): Promise<void> {
  const existing = await db().customer.count();
  const customers = Array.from({ length: 200 - existing > 0 ? 200 - existing : 0 }, (_, i) => ({
    id: randomUUID(),
    company: `Customer ${existing + i}`,
  }));
  if (customers.length) await db().customer.createMany({ data: customers });
  const allCustomers = await db().customer.findMany({ select: { id: true } });
  const day = 86_400_000;
  for (let done = 0; done < total; done += 5000) {
    const n = Math.min(5000, total - done);
    const motors = Array.from({ length: n }, (_, i) => ({
      id: randomUUID(),
      customerId: allCustomers[(startAt + done + i) % allCustomers.length]!.id,
      manufacturer: 'Bench Motors',
      model: `BM-${(startAt + done + i) % 977}`,
      serial: `SN-${String(startAt + done + i).padStart(7, '0')}`,
      ratedVoltageV: 400,
      frequencyHz: 50,
      speedRpm: 1460,
    }));
    await db().motor.createMany({ data: motors });
    await db().job.createMany({
      data: motors.map((m, i) => ({
        number: 1000 + startAt + done + i,
        customerId: m.customerId,
        motorId: m.id,
        status: JOB_STATUSES[(startAt + done + i) % JOB_STATUSES.length]!,
        receivedAt: new Date(Date.now() - ((startAt + done + i) % 400) * day),
        promisedAt: new Date(Date.now() + (((startAt + done + i) % 60) - 30) * day),
        reportedFault: 'bench',
      })),
    });
  }
}

async function time(query: Record<string, string>): Promise<number> {
  const q = boardQuerySchema.parse(query);
  await listBoard(q);
  const runs: number[] = [];
  for (let i = 0; i < 7; i++) {
    const t0 = performance.now();
    await listBoard(q);
    runs.push(performance.now() - t0);
  }
  return runs.sort((a, b) => a - b)[3]!;
}

await prepareDatabase();
await fill(500, 0);
await db().$executeRawUnsafe('ANALYZE');
const small = new Map<string, number>();
for (const [name, q] of QUERIES) small.set(name, await time(q));
const t0 = performance.now();
await fill(49_500, 500);
await db().$executeRawUnsafe('ANALYZE');
process.stdout.write(
  `\nJob board (embedded PostgreSQL in memory); 49,500 jobs added in ${((performance.now() - t0) / 1000).toFixed(1)} s\n`,
);
process.stdout.write(`${'query'.padEnd(40)} ${'500 jobs'.padStart(10)} ${'50,000 jobs'.padStart(12)} ${'ratio'.padStart(7)}\n`);
for (const [name, q] of QUERIES) {
  const big = await time(q);
  const s = small.get(name)!;
  process.stdout.write(
    `${name.padEnd(40)} ${`${s.toFixed(1)} ms`.padStart(10)} ${`${big.toFixed(1)} ms`.padStart(12)} ${(big / s).toFixed(1).padStart(6)}×\n`,
  );
}
await closeDb();
