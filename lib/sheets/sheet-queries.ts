/**
 * Reads of the as-found winding data sheet. The redesign and job-sheet modules read the sheet only
 * through `getAsFoundSheet`, so the sheet module may change how it stores drafts or history freely.
 */
import { db } from '@/lib/db/client';
import { windingSheetSchema, type WindingSheet } from '@/lib/schemas/winding-sheet';

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
