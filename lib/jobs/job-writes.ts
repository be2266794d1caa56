/**
 * Writes for jobs: intake, edits under optimistic locking, status moves, photos. Each runs in one
 * transaction and records a JobEvent, so the job's timeline is complete. Callers (server actions) have
 * already checked the session and role and parsed the input with the entity's zod schema.
 */
import { db, Prisma } from '@/lib/db/client';
import type { JobStatus, Role } from '@/lib/db/generated/enums';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import type { Intake } from '@/lib/jobs/job-schema';
import { z } from 'zod';
import type { jobEditSchema, statusMoveSchema } from '@/lib/jobs/job-schema';
import { toMotorRecord } from '@/lib/jobs/motor-schema';
import { isMoveAllowed, STATUS_LABELS } from './status-flow';
import { claimRequestKey, storeRequestResult } from '@/lib/errors/idempotency';
import { DECISION_EVENT_KIND, loadGateFacts } from './gate-facts';
import { decisionMessage, gateRefusal, type GateDecisionKind } from './shop-gates';
import { refuseByQuoteRules } from '@/lib/quotes/quote-gates';
import type { JobEventKind } from './job-events';

type Tx = Prisma.TransactionClient;
export const FIRST_JOB_NUMBER = 1001;

/**
 * The next shop number. The counter row is locked by the upsert until the transaction ends, so
 * concurrent intakes queue here; a rolled-back intake rolls the counter back too: no gaps, no duplicates.
 */
export async function allocateJobNumber(tx: Tx): Promise<number> {
  const rows = await tx.$queryRaw<{ value: number }[]>`
    INSERT INTO "JobCounter" ("id", "value") VALUES ('job', ${FIRST_JOB_NUMBER})
    ON CONFLICT ("id") DO UPDATE SET "value" = "JobCounter"."value" + 1
    RETURNING "value"`;
  const value = rows[0]?.value;
  if (value === undefined) throw new Error('job counter returned no row');
  return Number(value);
}

const intakeResultShape = z.object({ jobId: z.string(), number: z.number().int() });

const dateOrNull = (d: string | undefined): Date | null => (d ? new Date(`${d}T12:00:00Z`) : null);

export async function createIntake(userId: string, input: Intake): Promise<{ jobId: string; number: number; replayed?: boolean }> {
  return db().$transaction(async (tx) => {
    if (input.requestKey) {
      const first = await claimRequestKey(tx, input.requestKey, userId, 'intake', intakeResultShape);
      if (first) return { ...first, replayed: true };
    }
    const customerId =
      input.customer.mode === 'existing'
        ? (await tx.customer.findUnique({ where: { id: input.customer.customerId }, select: { id: true } }))?.id
        : (
            await tx.customer.create({
              data: {
                company: input.customer.company,
                phone: input.customer.phone ?? null,
                email: input.customer.email ?? null,
                address: input.customer.address ?? null,
                notes: input.customer.notes ?? null,
                ...(input.customer.contactName
                  ? {
                      contacts: {
                        create: {
                          name: input.customer.contactName,
                          phone: input.customer.phone ?? null,
                          email: input.customer.email ?? null,
                        },
                      },
                    }
                  : {}),
              },
            })
          ).id;
    if (!customerId)
      throw new DomainError('invalid', MESSAGES.invalid, { 'customer.customerId': ['That customer no longer exists; pick another.'] });

    const motorData = toMotorRecord(input.motor);
    let motorId: string;
    if (input.existingMotorId) {
      // A returning motor: keep its history, refresh the nameplate with what was read today.
      const updated = await tx.motor.updateMany({ where: { id: input.existingMotorId }, data: { ...motorData, customerId } });
      if (updated.count === 0)
        throw new DomainError('invalid', MESSAGES.invalid, { existingMotorId: ['That motor record no longer exists.'] });
      motorId = input.existingMotorId;
    } else {
      motorId = (await tx.motor.create({ data: { ...motorData, customerId } })).id;
    }

    const number = await allocateJobNumber(tx);
    const job = await tx.job.create({
      data: {
        number,
        customerId,
        motorId,
        promisedAt: dateOrNull(input.job.promisedAt),
        priority: input.job.priority,
        customerPo: input.job.customerPo ?? null,
        reportedFault: input.job.reportedFault,
        notes: input.job.notes ?? null,
        assigneeId: input.job.assigneeId ?? null,
      },
    });
    await tx.jobEvent.create({
      data: { jobId: job.id, userId, kind: 'CREATED', toStatus: 'RECEIVED', message: `Job ${number} logged at intake.` },
    });
    if (input.requestKey) await storeRequestResult(tx, input.requestKey, { jobId: job.id, number });
    return { jobId: job.id, number };
  });
}

async function refuseStale(tx: Tx, jobId: string): Promise<never> {
  const exists = await tx.job.findUnique({ where: { id: jobId }, select: { id: true } });
  if (!exists) throw new DomainError('not-found', MESSAGES.notFound('job'));
  throw new DomainError('stale', MESSAGES.stale);
}

type JobEdit = z.output<typeof jobEditSchema>;

/** The timeline names each edited detail in words with its old and new value ("Customer PO: — → 4471"). */
export const EDIT_LABELS: Record<(typeof EDITABLE)[number], string> = {
  promisedAt: 'Promised date',
  priority: 'Priority',
  customerPo: 'Customer PO',
  reportedFault: 'Reported fault',
  notes: 'Notes',
  assigneeId: 'Assigned to',
};

function editValue(key: (typeof EDITABLE)[number], v: unknown, people: ReadonlyMap<string, string>): string {
  if (v === null || v === undefined || v === '') return '—';
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  if (key === 'assigneeId') return people.get(String(v)) ?? 'a former user';
  if (key === 'priority') return String(v).toLowerCase();
  const s = String(v).replace(/\s+/g, ' ');
  return s.length > 80 ? `${s.slice(0, 77)}…` : s;
}

export function editLine(key: (typeof EDITABLE)[number], from: unknown, to: unknown, people: ReadonlyMap<string, string>): string {
  return `${EDIT_LABELS[key]}: ${editValue(key, from, people)} → ${editValue(key, to, people)}`;
}
const EDITABLE = ['promisedAt', 'priority', 'customerPo', 'reportedFault', 'notes', 'assigneeId'] as const;

/** Saves the job's details only if nobody changed the job since `version` was read. */
export async function updateJob(userId: string, input: JobEdit): Promise<{ version: number }> {
  return db().$transaction(async (tx) => {
    const before = await tx.job.findUnique({ where: { id: input.jobId } });
    if (!before) throw new DomainError('not-found', MESSAGES.notFound('job'));
    const data = {
      promisedAt: dateOrNull(input.promisedAt),
      priority: input.priority,
      customerPo: input.customerPo ?? null,
      reportedFault: input.reportedFault,
      notes: input.notes ?? null,
      assigneeId: input.assigneeId ?? null,
    };
    const result = await tx.job.updateMany({
      where: { id: input.jobId, version: input.version },
      data: { ...data, version: { increment: 1 } },
    });
    if (result.count === 0) await refuseStale(tx, input.jobId);
    const changed = EDITABLE.filter((k) => String(before[k] ?? '') !== String(data[k] ?? ''));
    const people = new Map(
      (
        await tx.user.findMany({
          where: { id: { in: [before.assigneeId, data.assigneeId].filter((x): x is string => !!x) } },
          select: { id: true, name: true },
        })
      ).map((u) => [u.id, u.name]),
    );
    await tx.jobEvent.create({
      data: {
        jobId: input.jobId,
        userId,
        kind: 'EDIT',
        message: changed.length ? changed.map((k) => editLine(k, before[k], data[k], people)).join('; ') : 'Saved without changes.',
        data: Object.fromEntries(changed.map((k) => [k, { from: before[k] ?? null, to: data[k] ?? null }])) as Prisma.InputJsonObject,
      },
    });
    return { version: input.version + 1 };
  });
}

type StatusMove = z.output<typeof statusMoveSchema>;

export async function moveJobStatus(userId: string, role: Role, input: StatusMove): Promise<{ version: number; status: JobStatus }> {
  const moved = await db().$transaction(async (tx) => {
    const job = await tx.job.findUnique({ where: { id: input.jobId }, select: { status: true, heldFrom: true, version: true } });
    if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
    if (job.version !== input.version) throw new DomainError('stale', MESSAGES.stale);
    if (!isMoveAllowed(job.status, job.heldFrom, input.to, role)) {
      throw new DomainError(
        'invalid',
        `A job in "${STATUS_LABELS[job.status]}" cannot move to "${STATUS_LABELS[input.to]}"${role === 'FRONT_DESK' || role === 'ADMIN' ? '' : ' by your role'}.`,
      );
    }
    // The records must support the move too (passing tests, an approved redesign, a winding record).
    const refusal = gateRefusal(job.status, input.to, await loadGateFacts(tx, input.jobId));
    if (refusal) throw new DomainError('conflict', refusal);
    await refuseByQuoteRules(tx, input.jobId, job.status, input.to);
    const result = await tx.job.updateMany({
      where: { id: input.jobId, version: input.version, status: job.status },
      data: {
        status: input.to,
        heldFrom: input.to === 'ON_HOLD' ? job.status : null,
        version: { increment: 1 },
      },
    });
    if (result.count === 0) await refuseStale(tx, input.jobId);
    await tx.jobEvent.create({
      data: {
        jobId: input.jobId,
        userId,
        kind: 'STATUS',
        fromStatus: job.status,
        toStatus: input.to,
        message: `${STATUS_LABELS[job.status]} → ${STATUS_LABELS[input.to]}${input.note ? `: ${input.note}` : ''}`,
      },
    });
    return { version: input.version + 1, status: input.to };
  });
  // A shipped job keeps the job sheet it shipped with. Rendering the PDF takes a second or so, so it runs
  // after the commit instead of holding the job's row lock; if it fails, the move still stands and the
  // first download of the sheet stores it (lib/job-sheet/job-sheet-snapshot.ts).
  if (moved.status === 'SHIPPED') {
    try {
      const { snapshotShippedJobSheet } = await import('@/lib/job-sheet/job-sheet-snapshot');
      await snapshotShippedJobSheet(input.jobId);
    } catch (err) {
      console.error('[coilwright] storing the shipped job sheet failed; it will be stored on first download', err);
    }
  }
  return moved;
}

/** Records any event on a job's timeline (used by the sheet, redesign and test modules too). */
export async function recordJobEvent(
  tx: Tx,
  event: { jobId: string; userId: string | null; kind: JobEventKind; message: string; data?: Prisma.InputJsonValue },
): Promise<void> {
  await tx.jobEvent.create({ data: { ...event, ...(event.data === undefined ? {} : { data: event.data }) } });
}

/**
 * Records an engineer's written decision that releases a shop-path gate (an override of the Ready gate,
 * or keeping the original winding although another supply was asked for). It goes on the timeline in
 * words and is printed on the job sheet; the gate reads it back from there.
 */
export async function recordGateDecision(
  userId: string,
  input: { jobId: string; decision: GateDecisionKind; reason: string },
): Promise<void> {
  await db().$transaction(async (tx) => {
    const job = await tx.job.findUnique({ where: { id: input.jobId }, select: { status: true } });
    if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
    const expected = input.decision === 'ready-override' ? 'TESTING' : 'CUSTOMER_APPROVED';
    if (job.status !== expected) {
      throw new DomainError(
        'conflict',
        `This decision is recorded while the job is in "${STATUS_LABELS[expected]}"; it is now in "${STATUS_LABELS[job.status]}".`,
      );
    }
    const facts = await loadGateFacts(tx, input.jobId);
    await tx.jobEvent.create({
      data: {
        jobId: input.jobId,
        userId,
        kind: DECISION_EVENT_KIND,
        message: decisionMessage(input.decision, input.reason, facts.latestTest),
        data: {
          decision: input.decision,
          reason: input.reason,
          recordSequence: input.decision === 'ready-override' ? (facts.latestTest?.sequence ?? null) : null,
        },
      },
    });
  });
}
