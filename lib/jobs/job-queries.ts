/**
 * Reads for the job board and the job page. The board filters, searches, sorts and pages in the database
 * (indexed columns), so it stays fast with tens of thousands of jobs.
 */
import { db, type Prisma } from '@/lib/db/client';
import { isoDayInZone } from '@/lib/presentation/format';
import { encodeBoardCursor, PAGE_SIZE, type BoardCursor, type BoardQuery } from '@/lib/jobs/job-schema';
import {
  asStatuses,
  cursorOf,
  jumpCursor,
  keyDirection,
  reverse,
  segmentOrder,
  segments,
  segmentWhere,
  SORT_SPECS,
  type Dir,
} from './board-keyset';
import { CLOSED_STATUSES } from './status-flow';

/** Today in the shop's time zone, as the midnight-UTC calendar date promised dates are stored in. */
export function startOfToday(now = new Date()): Date {
  return new Date(`${isoDayInZone(now)}T00:00:00.000Z`);
}

/** Counting stops here: the board says "1,000+" rather than reading every match to count it. */
export const BOARD_COUNT_CAP = 1000;

/** Which jobs a board query covers: open ones by default; every status when asked or when the search has a digit. */
export function boardScope(q: BoardQuery): 'open' | 'any' | 'chosen' {
  if (q.status.includes('ANY')) return 'any';
  if (q.status.length > 0) return q.status.every((s) => s === 'OPEN') ? 'open' : 'chosen';
  // A job number, serial, model or PO search must reach shipped and returned motors too.
  return q.q && /\d/.test(q.q) ? 'any' : 'open';
}

export function boardWhere(q: BoardQuery, now = new Date()): Prisma.JobWhereInput {
  const and: Prisma.JobWhereInput[] = [];
  const scope = boardScope(q);
  if (scope === 'open') and.push({ isOpen: true });
  if (scope === 'chosen') {
    const chosen = asStatuses(q.status);
    and.push(q.status.includes('OPEN') ? { OR: [{ isOpen: true }, { status: { in: chosen } }] } : { status: { in: chosen } });
  }
  if (q.customerId) and.push({ customerId: q.customerId });
  if (q.assigneeId) and.push({ assigneeId: q.assigneeId === 'none' ? null : q.assigneeId });
  const today = startOfToday(now);
  if (q.due === 'overdue') and.push({ promisedAt: { lt: today }, isOpen: true });
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

const BOARD_SELECT = {
  id: true,
  number: true,
  status: true,
  priority: true,
  promisedAt: true,
  receivedAt: true,
  version: true,
  customerId: true,
  customerName: true,
  motor: {
    select: { manufacturer: true, model: true, serial: true, outputKw: true, ratedVoltageV: true, speedRpm: true, frequencyHz: true },
  },
  assignee: { select: { id: true, name: true } },
} satisfies Prisma.JobSelect;

/**
 * One page of the board, read by position (see board-keyset.ts): `next`/`previous` are the cursors of
 * the neighbouring pages (null at either end); `count` is exact up to BOARD_COUNT_CAP, else `capped`.
 */
export async function listBoard(q: BoardQuery, now = new Date()) {
  const where = boardWhere(q, now);
  const spec = SORT_SPECS[q.sort];
  const keyDir = keyDirection(spec, q.dir);
  const jump = q.after || q.before ? undefined : jumpCursor(spec, keyDir, q.from);
  const forward = !q.before;
  const cursor = q.before ?? q.after ?? jump;
  const scanDir = forward ? keyDir : reverse(keyDir);

  const read = async (d: Dir, c: BoardCursor | undefined) => {
    const segs = segments(spec, d);
    const first = c ? Math.max(0, segs.indexOf(spec.nullable && c.value === null ? 'null' : 'value')) : 0;
    const out: Awaited<ReturnType<typeof readSegment>> = [];
    for (let i = first; i < segs.length && out.length <= PAGE_SIZE; i++) {
      const seg = segs[i]!;
      out.push(...(await readSegment(seg, d, i === first ? c : undefined, PAGE_SIZE + 1 - out.length)));
    }
    return out;
  };
  const readSegment = (seg: 'value' | 'null', d: Dir, c: BoardCursor | undefined, take: number) =>
    db().job.findMany({
      where: { AND: [where, segmentWhere(spec, seg, d, c)] },
      orderBy: segmentOrder(spec, seg, d),
      take,
      select: BOARD_SELECT,
    });

  let rows = await read(scanDir, cursor);
  let hasPrevious = !!cursor;
  let hasNext = rows.length > PAGE_SIZE;
  rows = rows.slice(0, PAGE_SIZE);
  if (!forward) {
    rows.reverse();
    hasPrevious = hasNext;
    hasNext = true;
    if (!hasPrevious) {
      // Back at the start: show a full first page rather than a short one.
      rows = await read(keyDir, undefined);
      hasNext = rows.length > PAGE_SIZE;
      rows = rows.slice(0, PAGE_SIZE);
    }
  }
  // No count when the first page already holds every match; otherwise count, but only up to the cap.
  const count = !cursor && !hasNext ? rows.length : await db().job.count({ where, take: BOARD_COUNT_CAP + 1 });
  const today = startOfToday(now);
  const cursorAt = (r: (typeof rows)[number]) => encodeBoardCursor(cursorOf(spec, r));
  return {
    count: Math.min(count, BOARD_COUNT_CAP),
    capped: count > BOARD_COUNT_CAP,
    scope: boardScope(q),
    next: hasNext && rows.length ? cursorAt(rows[rows.length - 1]!) : null,
    previous: hasPrevious && rows.length ? cursorAt(rows[0]!) : null,
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

/** Customers whose company name contains `text` (any case), for the board's customer typeahead. */
export async function findCustomers(text: string, take = 10) {
  return db().customer.findMany({
    where: { company: { contains: text, mode: 'insensitive' } },
    orderBy: { company: 'asc' },
    take,
    select: { id: true, company: true },
  });
}

export async function customerName(id: string) {
  return (await db().customer.findUnique({ where: { id }, select: { company: true } }))?.company ?? null;
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
    include: {
      customer: { select: { id: true, company: true } },
      jobs: { select: { number: true, receivedAt: true }, orderBy: { receivedAt: 'desc' } },
    },
    take: 5,
  });
}
