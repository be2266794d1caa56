/**
 * Position (keyset) paging for the job board: a page starts after or before a row's (sort key, job number)
 * instead of skipping N rows, so page 400 costs what page 1 costs, and a job inserted while someone pages
 * never shifts or repeats the rows they see. Each sort has an index that starts with the same columns
 * (prisma/schema/shop.prisma), so every page is one index range read.
 *
 * "No promised date" sorts as later than every date (PostgreSQL's own order for NULL): last going up,
 * first going down. The NULL rows form their own segment, read by job number once the dated rows run out.
 */
import type { Prisma } from '@/lib/db/client';
import type { JobStatus, Priority } from '@/lib/db/generated/enums';
import { JOB_STATUSES, type BoardCursor, type BoardQuery } from '@/lib/jobs/job-schema';

export type Dir = 'asc' | 'desc';
type Field = 'number' | 'promisedAt' | 'receivedAt' | 'customerName' | 'status' | 'priority';
type Kind = 'number' | 'date' | 'text' | 'enum';

interface SortSpec {
  field: Field;
  kind: Kind;
  nullable: boolean;
  /** Enum values in the database's order (PostgreSQL compares enums by declaration order). */
  order?: readonly string[];
  /** Priority "ascending" means most urgent first (the board's wording), i.e. the enum descending. */
  flip?: boolean;
}

const PRIORITIES: readonly Priority[] = ['LOW', 'NORMAL', 'HIGH', 'URGENT'];

export const SORT_SPECS: Record<BoardQuery['sort'], SortSpec> = {
  number: { field: 'number', kind: 'number', nullable: false },
  promisedAt: { field: 'promisedAt', kind: 'date', nullable: true },
  receivedAt: { field: 'receivedAt', kind: 'date', nullable: false },
  customer: { field: 'customerName', kind: 'text', nullable: false },
  status: { field: 'status', kind: 'enum', nullable: false, order: JOB_STATUSES },
  priority: { field: 'priority', kind: 'enum', nullable: false, order: PRIORITIES, flip: true },
};

export const reverse = (d: Dir): Dir => (d === 'asc' ? 'desc' : 'asc');

/** The direction the key column is read in for this sort and the user's chosen direction. */
export const keyDirection = (spec: SortSpec, dir: Dir): Dir => (spec.flip ? reverse(dir) : dir);

/** The cursor value of a row's sort key. */
export function cursorOf(spec: SortSpec, row: Record<Field, unknown>): BoardCursor {
  const v = row[spec.field];
  const value = v === null || v === undefined ? null : v instanceof Date ? v.toISOString() : String(v);
  return { number: Number(row.number), value };
}

/** A jump ("start at") turned into a position just before the first row at or past that value. */
export function jumpCursor(spec: SortSpec, dir: Dir, from: string | undefined): BoardCursor | undefined {
  if (!from) return undefined;
  const before = dir === 'asc' ? 0 : 2 ** 31 - 1;
  if (spec.kind === 'number')
    return /^#?\d{1,9}$/.test(from) ? { number: Number(from.replace('#', '')) + (dir === 'asc' ? -1 : 1), value: null } : undefined;
  if (spec.kind === 'date') {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(from) || Number.isNaN(Date.parse(from))) return undefined;
    // Going down, "from 2026-12-01" includes that whole day.
    const at = dir === 'asc' ? `${from}T00:00:00.000Z` : `${from}T23:59:59.999Z`;
    return { number: before, value: at };
  }
  if (spec.kind === 'text') return { number: before, value: from };
  return undefined;
}

type Segment = 'value' | 'null';

/** The segments a scan in direction `d` reads, in order. */
export function segments(spec: SortSpec, d: Dir): Segment[] {
  if (!spec.nullable) return ['value'];
  return d === 'asc' ? ['value', 'null'] : ['null', 'value'];
}

function typed(spec: SortSpec, v: string): Date | number | string {
  if (spec.kind === 'date') return new Date(v);
  if (spec.kind === 'number') return Number(v);
  return v;
}

/** Rows strictly after `c` in scan direction `d`, within one segment (no cursor: the whole segment). */
export function segmentWhere(spec: SortSpec, seg: Segment, d: Dir, c: BoardCursor | undefined): Prisma.JobWhereInput {
  const after = d === 'asc' ? 'gt' : 'lt';
  const atOrAfter = d === 'asc' ? 'gte' : 'lte';
  if (spec.field === 'number') return c ? { number: { [after]: c.number } } : {};
  if (seg === 'null') return c && c.value === null ? { [spec.field]: null, number: { [after]: c.number } } : { [spec.field]: null };
  const notNull: Prisma.JobWhereInput = spec.nullable ? { [spec.field]: { not: null } } : {};
  if (!c || c.value === null) return notNull;
  if (spec.kind === 'enum') {
    const order = spec.order ?? [];
    const i = order.indexOf(c.value);
    if (i < 0) return notNull;
    const later = d === 'asc' ? order.slice(i + 1) : order.slice(0, i);
    return { OR: [{ [spec.field]: { in: later } }, { [spec.field]: c.value, number: { [after]: c.number } }] };
  }
  const v = typed(spec, c.value);
  // "key ≥ v" first: the index range starts at v; the OR then drops the rows of v already shown.
  return { AND: [{ [spec.field]: { [atOrAfter]: v } }, { OR: [{ [spec.field]: { [after]: v } }, { number: { [after]: c.number } }] }] };
}

export function segmentOrder(spec: SortSpec, seg: Segment, d: Dir): Prisma.JobOrderByWithRelationInput[] {
  if (spec.field === 'number' || seg === 'null') return [{ number: d }];
  return [{ [spec.field]: d }, { number: d }];
}

/** Status values typed for Prisma from the schema's list. */
export const asStatuses = (s: readonly string[]): JobStatus[] => JOB_STATUSES.filter((x) => s.includes(x));
