/**
 * Reads of the as-found winding data sheet. The redesign and job-sheet modules read the sheet only
 * through `getAsFoundSheet`, so the sheet module may change how it stores drafts or history freely.
 */
import { db } from '@/lib/db/client';
import { windingSheetSchema, type WindingSheet } from '@/lib/as-found/winding-sheet-schema';

export interface StoredSheet {
  id: string;
  jobId: string;
  revision: number;
  updatedAt: Date;
  sheet: WindingSheet;
}

/** The saved as-found sheet of a job (not a draft), parsed with the sheet schema; null when none is saved. */
export async function getAsFoundSheet(jobId: string): Promise<StoredSheet | null> {
  const row = await db().windingSheet.findUnique({ where: { jobId } });
  if (!row) return null;
  const parsed = windingSheetSchema.safeParse(row.data);
  if (!parsed.success) {
    // Stored sheets were validated on save; a failure here means the schema changed without a data migration.
    throw new Error(`Stored winding sheet ${row.id} no longer matches the sheet schema: ${parsed.error.message}`);
  }
  return { id: row.id, jobId: row.jobId, revision: row.revision, updatedAt: row.updatedAt, sheet: parsed.data };
}

/** The signed-in user's draft of a job's sheet, if any. */
export async function getSheetDraft(jobId: string, userId: string): Promise<{ data: unknown; updatedAt: Date } | null> {
  return db().sheetDraft.findUnique({ where: { jobId_userId: { jobId, userId } }, select: { data: true, updatedAt: true } });
}

/** How the user types lengths on the sheet form (millimetres unless they chose inches). */
export async function getLengthUnit(userId: string): Promise<'mm' | 'in'> {
  const pref = await db().userPreference.findUnique({ where: { userId }, select: { lengthUnit: true } });
  return pref?.lengthUnit === 'in' ? 'in' : 'mm';
}

/** Saved revisions of a sheet, newest first (without their data), with the name of who saved each. */
export async function listSheetRevisions(sheetId: string) {
  const rows = await db().windingSheetRevision.findMany({
    where: { sheetId },
    orderBy: { revision: 'desc' },
    select: { revision: true, savedAt: true, savedById: true },
    take: 50,
  });
  const ids = [...new Set(rows.map((r) => r.savedById).filter((id): id is string => id !== null))];
  const names = new Map(
    (await db().user.findMany({ where: { id: { in: ids } }, select: { id: true, name: true } })).map((u) => [u.id, u.name]),
  );
  return rows.map((r) => ({ ...r, savedBy: r.savedById ? (names.get(r.savedById) ?? 'a removed user') : 'unknown' }));
}

/** One earlier revision of a job's sheet, parsed with the sheet schema; null when there is no such revision. */
export async function getSheetRevision(jobId: string, revision: number): Promise<WindingSheet | null> {
  const row = await db().windingSheetRevision.findFirst({ where: { revision, sheet: { jobId } }, select: { data: true } });
  if (!row) return null;
  const parsed = windingSheetSchema.safeParse(row.data);
  return parsed.success ? parsed.data : null;
}

/** What the sheet screens need of a job: status, customer, nameplate, photos. */
export async function getJobForSheet(number: number) {
  return db().job.findUnique({
    where: { number },
    select: {
      id: true,
      number: true,
      status: true,
      heldFrom: true,
      customer: { select: { company: true } },
      motor: {
        select: {
          manufacturer: true,
          model: true,
          serial: true,
          frame: true,
          ratedVoltageV: true,
          frequencyHz: true,
          speedRpm: true,
          currentA: true,
          outputKw: true,
          connection: true,
          insulationClass: true,
        },
      },
      attachments: { orderBy: { createdAt: 'asc' }, select: { id: true, kind: true, filename: true } },
    },
  });
}
export type JobForSheet = NonNullable<Awaited<ReturnType<typeof getJobForSheet>>>;
