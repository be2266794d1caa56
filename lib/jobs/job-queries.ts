/**
 * Reads for the job board and the job page. The board filters, searches, sorts and pages in the database
 * (indexed columns), so it stays fast with tens of thousands of jobs.
 */
import { db, type Prisma } from '@/lib/db/client';
import type { JobStatus } from '@/lib/db/generated/enums';
import { PAGE_SIZE, type BoardQuery } from '@/lib/jobs/job-schema';
import { CLOSED_STATUSES, OPEN_STATUSES } from './status-flow';

export function startOfToday(now = new Date()): Date {
  return new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
}

export function boardWhere(q: BoardQuery, now = new Date()): Prisma.JobWhereInput {
  const and: Prisma.JobWhereInput[] = [];
  const statuses = q.status.flatMap((s) => (s === 'OPEN' ? OPEN_STATUSES : [s as JobStatus]));
  and.push({ status: { in: statuses.length ? statuses : OPEN_STATUSES } });
  if (q.customerId) and.push({ customerId: q.customerId });
  if (q.assigneeId) and.push({ assigneeId: q.assigneeId === 'none' ? null : q.assigneeId });
  const today = startOfToday(now);
  if (q.due === 'overdue') and.push({ promisedAt: { lt: today }, status: { notIn: CLOSED_STATUSES } });
  if (q.due === 'today') and.push({ promisedAt: { gte: today, lt: new Date(today.getTime() + 86_400_000) } });
  if (q.due === 'week') and.push({ promisedAt: { gte: today, lt: new Date(today.getTime() + 7 * 86_400_000) } });
  if (q.q) {
    // One trigram-indexed column holds number, customer, motor and PO (kept by database triggers).
    const text = q.q.toLowerCase();
    const or: Prisma.JobWhereInput[] = [{ searchText: { contains: text } }];
    const digits = text.replace(/^#/, '');
    if (/^\d{1,9}$/.test(digits)) or.unshift({ number: Number(digits) });
    and.push({ OR: or });
  }
  return { AND: and };
}

function boardOrder(q: BoardQuery): Prisma.JobOrderByWithRelationInput[] {
  const dir = q.dir;
  const nulls = { sort: dir, nulls: 'last' as const };
  switch (q.sort) {
    case 'number':
      return [{ number: dir }];
    case 'receivedAt':
      return [{ receivedAt: dir }, { number: dir }];
    case 'status':
      return [{ status: dir }, { number: 'asc' }];
    case 'customer':
      return [{ customer: { company: dir } }, { number: 'asc' }];
    case 'priority':
      return [{ priority: dir === 'asc' ? 'desc' : 'asc' }, { promisedAt: { sort: 'asc', nulls: 'last' } }, { number: 'asc' }];
    case 'promisedAt':
      return [{ promisedAt: nulls }, { number: 'asc' }];
  }
}

export async function listBoard(q: BoardQuery, now = new Date()) {
  const where = boardWhere(q, now);
  const [total, rows] = await Promise.all([
    db().job.count({ where }),
    db().job.findMany({
      where,
      orderBy: boardOrder(q),
      skip: (q.page - 1) * PAGE_SIZE,
      take: PAGE_SIZE,
      select: {
        id: true,
        number: true,
        status: true,
        priority: true,
        promisedAt: true,
        receivedAt: true,
        version: true,
        customer: { select: { id: true, company: true } },
        motor: { select: { manufacturer: true, model: true, serial: true, outputKw: true, ratedVoltageV: true, speedRpm: true, frequencyHz: true } },
        assignee: { select: { id: true, name: true } },
      },
    }),
  ]);
  const today = startOfToday(now);
  return {
    total,
    pages: Math.max(1, Math.ceil(total / PAGE_SIZE)),
    rows: rows.map((r) => ({ ...r, overdue: !!r.promisedAt && r.promisedAt < today && !CLOSED_STATUSES.includes(r.status) })),
  };
}
export type BoardRow = Awaited<ReturnType<typeof listBoard>>['rows'][number];

/** A job's id and number, for downloads that need nothing else of it. */
export async function findJobRef(number: number): Promise<{ id: string; number: number } | null> {
  return db().job.findUnique({ where: { number }, select: { id: true, number: true } });
}

export async function getJobByNumber(number: number) {
  return db().job.findUnique({
    where: { number },
    include: {
      customer: { include: { contacts: true } },
      motor: true,
      assignee: { select: { id: true, name: true } },
      events: { orderBy: { at: 'desc' }, include: { user: { select: { name: true } } } },
      attachments: { orderBy: { createdAt: 'asc' }, select: { id: true, kind: true, filename: true, sizeBytes: true, createdAt: true } },
    },
  });
}
export type JobPageData = NonNullable<Awaited<ReturnType<typeof getJobByNumber>>>;

/** Earlier jobs on the same motor, newest first (a returning motor keeps its history). */
export async function motorHistory(motorId: string, exceptJobId: string) {
  return db().job.findMany({
    where: { motorId, id: { not: exceptJobId } },
    orderBy: { receivedAt: 'desc' },
    select: { number: true, status: true, receivedAt: true, reportedFault: true },
  });
}

export async function listCustomers() {
  return db().customer.findMany({ orderBy: { company: 'asc' }, select: { id: true, company: true } });
}

export async function listStaff() {
  return db().user.findMany({ where: { active: true }, orderBy: { name: 'asc' }, select: { id: true, name: true, role: true } });
}

/** Motors whose serial matches (for recognising a returning motor at intake). */
export async function findMotorsBySerial(serial: string) {
  const s = serial.trim();
  if (s.length < 3) return [];
  return db().motor.findMany({
    where: { serial: { equals: s, mode: 'insensitive' } },
    include: { customer: { select: { id: true, company: true } }, jobs: { select: { number: true, receivedAt: true }, orderBy: { receivedAt: 'desc' } } },
    take: 5,
  });
}
