import { z } from 'zod';
import { customerSchema } from './customer-schema';
import { motorSchema } from './motor-schema';
import { optionalDate, optionalText, requiredText } from '../validation/fields';
import { NUL_MESSAGE, hasNul, noNul } from '@/lib/validation/safe-text';
import { JobStatus, Priority } from '@/lib/db/generated/enums';

/** Statuses and priorities come from the database's own enums (prisma/schema/shop.prisma): one list each. */
export const JOB_STATUSES = Object.values(JobStatus);
export const PRIORITIES = Object.values(Priority);

const jobDetails = {
  promisedAt: optionalDate,
  priority: z.enum(PRIORITIES, { error: 'Pick a priority.' }).default('NORMAL'),
  customerPo: optionalText(60),
  reportedFault: requiredText('Reported fault', 2000),
  notes: optionalText(4000),
  assigneeId: z.preprocess((v) => (v === '' ? undefined : v), z.uuid('Pick a person from the list.').optional()),
};

/** Intake: an existing or a new customer, an existing (returning) or a new motor, and the job. */
export const intakeSchema = z.object({
  customer: z.discriminatedUnion('mode', [
    z.object({ mode: z.literal('existing'), customerId: z.uuid('Pick a customer from the list.') }),
    z.object({ mode: z.literal('new'), ...customerSchema.shape }),
  ]),
  existingMotorId: z.preprocess((v) => (v === '' ? undefined : v), z.uuid().optional()),
  motor: motorSchema,
  job: z.object(jobDetails),
  /** Made once per form by the browser: a retry of the same intake returns the first job, never a second. */
  requestKey: z.uuid().optional(),
});
export type IntakeInput = z.input<typeof intakeSchema>;
export type Intake = z.output<typeof intakeSchema>;

/** Editing a job's details: `version` is the one the form was loaded with (optimistic locking). */
export const jobEditSchema = z.object({
  jobId: z.uuid(),
  version: z.number().int().positive(),
  ...jobDetails,
});
export type JobEditInput = z.input<typeof jobEditSchema>;

export const statusMoveSchema = z.object({
  jobId: z.uuid(),
  version: z.number().int().positive(),
  to: z.enum(JOB_STATUSES),
  note: optionalText(500),
});

/** An engineer's written release of a shop-path gate (see lib/jobs/shop-gates.ts). */
export const gateDecisionSchema = z.object({
  jobId: z.uuid(),
  decision: z.enum(['ready-override', 'keep-original-winding'], { error: 'Pick which decision this is.' }),
  reason: requiredText('Reason', 1000).refine(
    (s) => s.length >= 10,
    'Write the reason in a sentence (at least 10 characters): it is printed on the job sheet.',
  ),
});

/** A shop job number as it appears in a URL (`/jobs/[number]/…`). */
export const jobNumberSchema = z.coerce.number().int().positive().max(2_000_000_000);
/** The `[number]` route segment of every job screen and download. */
export const jobNumberParamsSchema = z.object({ number: jobNumberSchema });

export const BOARD_SORTS = ['number', 'promisedAt', 'receivedAt', 'status', 'customer', 'priority'] as const;
export const DUE_FILTERS = ['any', 'overdue', 'today', 'week'] as const;
export const PAGE_SIZE = 25;

const oneOrMany = <T extends z.ZodType>(s: T) => z.preprocess((v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]), z.array(s));

/**
 * A position on the board: the sort key's value of a row (ISO date, name, enum or number as text; null for
 * "no promised date") and its job number, which breaks ties. Written in the URL as `<number>~<value>` or
 * `<number>~` for null.
 */
export interface BoardCursor {
  number: number;
  value: string | null;
}
export const boardCursorSchema = z
  .string()
  .max(300)
  .regex(/^\d{1,10}~/)
  .transform((s): BoardCursor => {
    const at = s.indexOf('~');
    const value = s.slice(at + 1);
    return { number: Number(s.slice(0, at)), value: value === '' ? null : value };
  });
export const encodeBoardCursor = (c: BoardCursor): string => `${c.number}~${c.value ?? ''}`;

/** The job board's search params, parsed with zod (a bad URL falls back to defaults, never crashes). */
export const boardQuerySchema = z.object({
  /** Empty: open jobs (or, for a search containing a digit, every status); 'ANY': every status. */
  status: oneOrMany(z.enum([...JOB_STATUSES, 'OPEN', 'ANY'])).catch([]),
  customerId: z.uuid().optional().catch(undefined),
  assigneeId: z
    .union([z.uuid(), z.literal('none')])
    .optional()
    .catch(undefined),
  due: z.enum(DUE_FILTERS).default('any').catch('any'),
  q: noNul(z.string().trim().max(80)).optional().catch(undefined),
  sort: z.enum(BOARD_SORTS).default('promisedAt').catch('promisedAt'),
  dir: z.enum(['asc', 'desc']).default('asc').catch('asc'),
  /** Rows after this position (next page) or before it (previous page). */
  after: boardCursorSchema.optional().catch(undefined),
  before: boardCursorSchema.optional().catch(undefined),
  /** Jump: start at this value of the sort key (a date, a job number or the start of a customer's name). */
  from: z.string().trim().max(80).optional().catch(undefined),
});
export type BoardQuery = z.output<typeof boardQuerySchema>;

/** Why the board ignored the search text (shown beside the box), or null when it was used or absent. */
export function boardSearchRefusal(raw: unknown): string | null {
  if (typeof raw !== 'string' || raw.trim() === '') return null;
  if (hasNul(raw)) return `Search: ${NUL_MESSAGE}`;
  if (raw.trim().length > 80) return 'Search: at most 80 characters.';
  return null;
}
