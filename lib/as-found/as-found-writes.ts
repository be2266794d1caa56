/**
 * Writes of the as-found sheet: saving (one transaction: the sheet with its searchable copies, a revision
 * row, the job event, and the saver's draft cleared), drafts, and the length-unit preference. Callers
 * (server actions) have checked the session and role and parsed the input with the schemas.
 */
import { db, Prisma } from '@/lib/db/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { recordJobEvent } from '@/lib/jobs/job-writes';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import type { DraftPayload } from '@/lib/as-found/draft-schema';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import type { LengthUnit } from './length-entry';
import { SHEET_MESSAGES } from './as-found-messages';
import { layoutLabel } from '@/lib/engine/notation';
import { isRecordLocked } from '@/lib/jobs/record-locks';

type Tx = Prisma.TransactionClient;

async function editableJob(tx: Tx, jobId: string) {
  const job = await tx.job.findUnique({
    where: { id: jobId },
    select: {
      id: true,
      number: true,
      status: true,
      heldFrom: true,
      motor: { select: { manufacturer: true, model: true, outputKw: true } },
    },
  });
  if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
  if (isRecordLocked('asFoundSheet', job.status, job.heldFrom))
    throw new DomainError('frozen', SHEET_MESSAGES.frozen(STATUS_LABELS[job.status]));
  return job;
}

/** JSON with object keys sorted: JSONB stores keys in its own order, so plain stringify would differ. */
function canonical(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonical).join(',')}]`;
  if (v && typeof v === 'object')
    return `{${Object.entries(v as Record<string, unknown>)
      .filter(([, x]) => x !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : 1))
      .map(([k, x]) => `${JSON.stringify(k)}:${canonical(x)}`)
      .join(',')}}`;
  return JSON.stringify(v ?? null);
}

/** The top-level sections whose content changed, for the job's timeline. */
function changedSections(before: unknown, after: WindingSheet): string[] {
  const old = (typeof before === 'object' && before !== null ? before : {}) as Record<string, unknown>;
  const keys = ['core', 'winding', 'wires', 'insulation', 'supply', 'resistance', 'notes'] as const;
  return keys.filter((k) => canonical(old[k]) !== canonical(after[k]));
}

export interface SaveSheetInput {
  jobId: string;
  /** The revision the form was loaded from; null when the form started without a saved sheet. */
  baseRevision: number | null;
  sheet: WindingSheet;
}

/** Saves the sheet if nobody saved since `baseRevision`; returns the new revision. */
export async function saveSheet(userId: string, input: SaveSheetInput): Promise<{ revision: number; sheetId: string }> {
  try {
    return await db().$transaction(async (tx) => {
      const job = await editableJob(tx, input.jobId);
      const s = input.sheet;
      const columns = {
        data: s as unknown as Prisma.InputJsonObject,
        slots: s.core.slots,
        poles: s.supply.poles,
        boreMm: s.core.boreMm,
        coreLengthMm: s.core.coreLengthMm,
        lineVoltageV: s.supply.lineVoltageV,
        frequencyHz: s.supply.frequencyHz,
        outputKw: s.supply.ratedOutputKw ?? job.motor.outputKw ?? null,
        manufacturer: job.motor.manufacturer || null,
        model: job.motor.model ?? null,
        updatedById: userId,
      };
      const existing = await tx.windingSheet.findUnique({
        where: { jobId: input.jobId },
        select: { id: true, revision: true, data: true },
      });
      let sheetId: string;
      let revision: number;
      if (!existing) {
        if (input.baseRevision !== null) throw new DomainError('stale', SHEET_MESSAGES.staleCreated);
        const created = await tx.windingSheet.create({ data: { jobId: input.jobId, revision: 1, ...columns } });
        sheetId = created.id;
        revision = 1;
      } else {
        if (input.baseRevision === null) throw new DomainError('stale', SHEET_MESSAGES.staleCreated);
        const updated = await tx.windingSheet.updateMany({
          where: { jobId: input.jobId, revision: input.baseRevision },
          data: { ...columns, revision: { increment: 1 } },
        });
        if (updated.count === 0) throw new DomainError('stale', SHEET_MESSAGES.stale(existing.revision));
        sheetId = existing.id;
        revision = input.baseRevision + 1;
      }
      await tx.windingSheetRevision.create({ data: { sheetId, revision, data: columns.data, savedById: userId } });
      await tx.sheetDraft.deleteMany({ where: { jobId: input.jobId, userId } });
      const changed = existing ? changedSections(existing.data, s) : [];
      const summary = `${s.core.slots} slots, ${s.supply.poles} poles, ${layoutLabel(s.winding)}`;
      await recordJobEvent(tx, {
        jobId: input.jobId,
        userId,
        kind: 'SHEET',
        message: existing
          ? `As-found data sheet revised (revision ${revision})${changed.length ? `: ${changed.join(', ')} changed` : ', no changes'}.`
          : `As-found data sheet recorded (revision 1): ${summary}.`,
        data: { revision, changed },
      });
      return { revision, sheetId };
    });
  } catch (err) {
    // Two first saves racing: the unique jobId refuses the second, which is a stale save like any other.
    if (err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002')
      throw new DomainError('stale', SHEET_MESSAGES.staleCreated);
    throw err;
  }
}

/** Stores (replaces) the user's draft of a job's sheet; returns when it was stored. */
export async function saveDraft(userId: string, jobId: string, draft: DraftPayload): Promise<{ savedAt: Date }> {
  return db().$transaction(async (tx) => {
    await editableJob(tx, jobId);
    const data = draft as unknown as Prisma.InputJsonObject;
    const row = await tx.sheetDraft.upsert({
      where: { jobId_userId: { jobId, userId } },
      create: { jobId, userId, data },
      update: { data },
    });
    return { savedAt: row.updatedAt };
  });
}

export async function discardDraft(userId: string, jobId: string): Promise<void> {
  await db().sheetDraft.deleteMany({ where: { jobId, userId } });
}

export async function setLengthUnit(userId: string, lengthUnit: LengthUnit): Promise<void> {
  await db().userPreference.upsert({ where: { userId }, create: { userId, lengthUnit }, update: { lengthUnit } });
}
