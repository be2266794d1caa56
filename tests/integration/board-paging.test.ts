import { randomUUID } from 'node:crypto';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as customersRoute } from '@/app/api/customers/route';
import { db } from '@/lib/db/client';
import type { JobStatus, Priority } from '@/lib/db/generated/enums';
import { listBoard } from '@/lib/jobs/job-queries';
import { boardQuerySchema, JOB_STATUSES, PAGE_SIZE, type BoardQuery } from '@/lib/jobs/job-schema';
import { searchLibrary } from '@/lib/library/library-queries';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { FRONT_DESK } from '../support/demo-users';

useTestDatabase();

// Jobs of five invented customers, all found by the search word "pagetest" (no digit: open jobs only).
const COMPANIES = ['Pagetest Alder', 'Pagetest Birch', 'Pagetest Cedar', 'Pagetest Damson', 'Pagetest Elm'];
const PRIORITIES: Priority[] = ['LOW', 'NORMAL', 'HIGH', 'URGENT'];
const COUNT = 64;
const FIRST = 70_000;
const DAY = 86_400_000;
const base = Date.UTC(2026, 5, 1);

interface Made {
  number: number;
  company: string;
  status: JobStatus;
  priority: Priority;
  promisedAt: Date | null;
  receivedAt: Date;
}
const made: Made[] = [];
let customerIds: string[] = [];

async function addJob(i: number, number: number, status: JobStatus): Promise<Made> {
  const customerId = customerIds[i % customerIds.length]!;
  const motor = await db().motor.create({ data: { customerId, manufacturer: 'Pagetest Motors', serial: `PGT-${number}` } });
  // Few distinct dates so that ties (broken by job number) are common; every seventh job has no promise.
  const promisedAt = i % 7 === 0 ? null : new Date(base + (i % 5) * DAY);
  const receivedAt = new Date(base - (i % 4) * DAY);
  const priority = PRIORITIES[i % 4]!;
  await db().job.create({
    data: { number, customerId, motorId: motor.id, status, priority, promisedAt, receivedAt, reportedFault: 'paging test' },
  });
  return { number, company: COMPANIES[i % COMPANIES.length]!, status, priority, promisedAt, receivedAt };
}

beforeAll(async () => {
  customerIds = [];
  for (const company of COMPANIES) customerIds.push((await db().customer.create({ data: { company } })).id);
  const open = JOB_STATUSES.filter((s) => s !== 'SHIPPED' && s !== 'RETURNED_UNREPAIRED');
  for (let i = 0; i < COUNT; i++) made.push(await addJob(i, FIRST + i, open[i % open.length]!));
}, 120_000);

const cmp = (a: number | string, b: number | string) => (a < b ? -1 : a > b ? 1 : 0);
/** The order the board promises, computed here independently of the database. */
function expectedOrder(sort: BoardQuery['sort'], dir: 'asc' | 'desc', rows: Made[]): number[] {
  const s = dir === 'asc' ? 1 : -1;
  const key = (m: Made): number | string => {
    switch (sort) {
      case 'number':
        return m.number;
      case 'promisedAt':
        return m.promisedAt ? m.promisedAt.getTime() : Number.MAX_SAFE_INTEGER; // no promise sorts latest
      case 'receivedAt':
        return m.receivedAt.getTime();
      case 'customer':
        return m.company;
      case 'status':
        return JOB_STATUSES.indexOf(m.status);
      case 'priority':
        return -PRIORITIES.indexOf(m.priority); // "ascending" = most urgent first
    }
  };
  const tieDir = sort === 'priority' ? -s : s;
  return [...rows].sort((a, b) => s * cmp(key(a), key(b)) || tieDir * cmp(a.number, b.number)).map((m) => m.number);
}

async function walk(query: Record<string, string>): Promise<{ forward: number[][]; backward: number[][] }> {
  const forward: number[][] = [];
  let q = boardQuerySchema.parse(query);
  for (let guard = 0; guard < 20; guard++) {
    const page = await listBoard(q);
    forward.push(page.rows.map((r) => r.number));
    if (!page.next) break;
    q = boardQuerySchema.parse({ ...query, after: page.next });
  }
  // And back again from the last page with "previous".
  const backward: number[][] = [forward[forward.length - 1]!];
  let last = await listBoard(q);
  for (let guard = 0; guard < 20 && last.previous; guard++) {
    last = await listBoard(boardQuerySchema.parse({ ...query, before: last.previous }));
    backward.unshift(last.rows.map((r) => r.number));
  }
  return { forward, backward };
}

describe('the job board pages by position', () => {
  it.each([
    ['promisedAt', 'asc'],
    ['promisedAt', 'desc'],
    ['customer', 'asc'],
    ['status', 'asc'],
    ['priority', 'asc'],
    ['number', 'desc'],
    ['receivedAt', 'desc'],
  ] as const)(
    'sorted by %s %s, next reaches every job once and previous walks back the same pages',
    async (sort, dir) => {
      const { forward, backward } = await walk({ q: 'pagetest', sort, dir });
      expect(forward.flat()).toEqual(expectedOrder(sort, dir, made));
      expect(forward.slice(0, -1).every((p) => p.length === PAGE_SIZE)).toBe(true);
      expect(backward).toEqual(forward);
    },
    120_000,
  );

  it('keeps its place when a job is added before the position (no row repeated or skipped)', async () => {
    const query = { q: 'pagetest', sort: 'promisedAt' };
    const first = await listBoard(boardQuerySchema.parse(query));
    // A new job promised earlier than everything: offset paging would shift page 2 by one row.
    const early = await addJob(1, FIRST + 500, 'RECEIVED');
    await db().job.update({ where: { number: early.number }, data: { promisedAt: new Date(base - 30 * DAY) } });
    const second = await listBoard(boardQuerySchema.parse({ ...query, after: first.next! }));
    const order = expectedOrder('promisedAt', 'asc', made);
    expect(second.rows.map((r) => r.number)).toEqual(order.slice(PAGE_SIZE, 2 * PAGE_SIZE));
    const again = await listBoard(boardQuerySchema.parse(query));
    expect(again.rows[0]!.number).toBe(early.number);
    await db().job.delete({ where: { number: early.number } });
  });

  it('jumps to a promised date and to a job number', async () => {
    const byDate = await listBoard(boardQuerySchema.parse({ q: 'pagetest', from: '2026-06-03' }));
    const expected = expectedOrder(
      'promisedAt',
      'asc',
      made.filter((m) => !m.promisedAt || m.promisedAt.getTime() >= Date.UTC(2026, 5, 3)),
    );
    expect(byDate.rows.map((r) => r.number)).toEqual(expected.slice(0, PAGE_SIZE));
    expect(byDate.previous).not.toBeNull();
    const byNumber = await listBoard(boardQuerySchema.parse({ q: 'pagetest', sort: 'number', from: String(FIRST + 40) }));
    expect(byNumber.rows[0]!.number).toBe(FIRST + 40);
  });

  it('counts exactly when the matches fit and gives no count work to a short first page', async () => {
    const page = await listBoard(boardQuerySchema.parse({ q: 'pagetest' }));
    expect(page).toMatchObject({ count: COUNT, capped: false });
    const one = await listBoard(boardQuerySchema.parse({ q: 'pagetest alder' }));
    expect(one.count).toBe(one.rows.length);
    expect(one.next).toBeNull();
  });

  it('keeps the customer name on the job when the customer is renamed', async () => {
    await db().customer.update({ where: { id: customerIds[4]! }, data: { company: 'Pagetest Elm Renamed' } });
    const page = await listBoard(boardQuerySchema.parse({ q: 'pagetest', customerId: customerIds[4]! }));
    expect(page.rows.length).toBeGreaterThan(0);
    expect(page.rows.every((r) => r.customerName === 'Pagetest Elm Renamed')).toBe(true);
    await db().customer.update({ where: { id: customerIds[4]! }, data: { company: 'Pagetest Elm' } });
  });
});

describe('board search reaches every status', () => {
  let shipped: number;
  beforeAll(async () => {
    shipped = (await addJob(2, FIRST + 900, 'SHIPPED')).number;
  });

  it('leaves shipped jobs off the open board but finds them by serial, job number or "any status"', async () => {
    const open = await listBoard(boardQuerySchema.parse({ q: 'pagetest', sort: 'number', dir: 'desc' }));
    expect(open.rows.map((r) => r.number)).not.toContain(shipped);
    const bySerial = await listBoard(boardQuerySchema.parse({ q: `PGT-${shipped}` }));
    expect(bySerial.scope).toBe('any');
    expect(bySerial.rows.map((r) => r.number)).toEqual([shipped]);
    const byNumber = await listBoard(boardQuerySchema.parse({ q: String(shipped) }));
    expect(byNumber.rows.map((r) => r.number)).toContain(shipped);
    const any = await listBoard(boardQuerySchema.parse({ q: 'pagetest', status: 'ANY', sort: 'number', dir: 'desc' }));
    expect(any.rows[0]!.number).toBe(shipped);
  });

  it('marks the job closed in the indexed open flag, and open again if its status is corrected', async () => {
    expect((await db().job.findUniqueOrThrow({ where: { number: shipped } })).isOpen).toBe(false);
    await db().job.update({ where: { number: shipped }, data: { status: 'READY' } });
    expect((await db().job.findUniqueOrThrow({ where: { number: shipped } })).isOpen).toBe(true);
    await db().job.update({ where: { number: shipped }, data: { status: 'SHIPPED' } });
  });
});

describe('the customer typeahead route', () => {
  beforeEach(() => signOutTest());
  const call = (q: string) =>
    customersRoute(new Request(`http://x/api/customers?q=${encodeURIComponent(q)}`), { params: Promise.resolve({}) });

  it('refuses a visitor without a session before reading anything', async () => {
    expect((await call('pagetest')).status).toBe(401);
  });

  it('refuses a deactivated person', async () => {
    await actAs(FRONT_DESK.email);
    await db().user.update({ where: { email: FRONT_DESK.email }, data: { active: false } });
    try {
      expect((await call('pagetest')).status).toBe(401);
    } finally {
      await db().user.update({ where: { email: FRONT_DESK.email }, data: { active: true } });
    }
  });

  it('finds customers by part of the name, any case, and nothing for an empty or oversized query', async () => {
    await actAs(FRONT_DESK.email);
    const body = (await (await call('TEST BIR')).json()) as { customers: { id: string; company: string }[] };
    expect(body.customers).toEqual([{ id: customerIds[1], company: 'Pagetest Birch' }]);
    expect(await (await call('')).json()).toEqual({ customers: [] });
    expect(await (await call('x'.repeat(81))).json()).toEqual({ customers: [] });
  });
});

describe('the winding library text search', () => {
  beforeAll(async () => {
    const jobs = await db().job.findMany({ where: { number: { gte: FIRST, lt: FIRST + 3 } }, orderBy: { number: 'asc' } });
    for (const [i, job] of jobs.entries()) {
      await db().windingSheet.create({
        data: {
          id: randomUUID(),
          jobId: job.id,
          data: {},
          slots: 36,
          poles: 4,
          boreMm: 150,
          coreLengthMm: 120,
          lineVoltageV: 400,
          frequencyHz: 50,
          manufacturer: 'Quillfeather Electric',
          model: `QF-${i}`,
          updatedAt: new Date(base + i * DAY),
        },
      });
    }
  });

  it('finds part of a manufacturer or model in any case, newest first, and nothing for a miss', async () => {
    const hits = await searchLibrary({ text: 'LLFEATH' });
    expect(hits.rows.map((r) => r.model)).toEqual(['QF-2', 'QF-1', 'QF-0']);
    expect((await searchLibrary({ text: 'qf-1' })).rows.map((r) => r.model)).toEqual(['QF-1']);
    expect((await searchLibrary({ text: 'no such maker zzq' })).rows).toEqual([]);
  });

  it('can answer a text search from the trigram indexes alone (no sequential scan)', async () => {
    const plan = await db().$transaction(async (tx) => {
      await tx.$executeRawUnsafe('SET LOCAL enable_seqscan = off');
      return tx.$queryRawUnsafe<{ 'QUERY PLAN': string }[]>(
        `EXPLAIN SELECT id FROM "WindingSheet" WHERE "manufacturer" ILIKE '%zzqx%' OR "model" ILIKE '%zzqx%'`,
      );
    });
    const text = plan.map((r) => r['QUERY PLAN']).join('\n');
    expect(text).toContain('WindingSheet_manufacturer_trgm_idx');
    expect(text).toContain('WindingSheet_model_trgm_idx');
  });
});
