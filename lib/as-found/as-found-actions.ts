'use server';

/**
 * Server actions of the as-found sheet and the winding library. Each goes through `guardedAction`:
 * session, then role, then the zod schema, then the write.
 */
import { z } from 'zod';
import { guardedAction } from '@/lib/auth/guard';
import { db } from '@/lib/db/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { success } from '@/lib/errors/action-result';
import { draftSaveSchema, type DraftPayload } from '@/lib/as-found/draft-schema';
import { windingSheetSchema } from '@/lib/as-found/winding-sheet-schema';
import { LENGTH_UNITS } from './length-entry';
import { prefillFromNameplate } from './prefill';
import { getLengthUnit } from './as-found-queries';
import { sheetToForm } from './as-found-form';
import { SHEET_MESSAGES } from './as-found-messages';
import { discardDraft, saveDraft, saveSheet, setLengthUnit } from './as-found-writes';

const saveSchema = z.object({
  jobId: z.uuid(),
  baseRevision: z.number().int().positive().nullable(),
  sheet: windingSheetSchema,
});

export async function saveAsFoundSheet(raw: unknown) {
  return guardedAction('sheet.edit', 'record or change data sheets', saveSchema, async (user, input) => {
    const r = await saveSheet(user.id, input);
    return success(r, SHEET_MESSAGES.saved(r.revision));
  })(raw);
}

export async function saveSheetDraft(raw: unknown) {
  return guardedAction('sheet.edit', 'record or change data sheets', draftSaveSchema, async (user, input) => {
    const { savedAt } = await saveDraft(user.id, input.jobId, input.draft);
    return success({ savedAt: savedAt.toISOString() });
  })(raw);
}

export async function discardSheetDraft(raw: unknown) {
  return guardedAction('sheet.edit', 'record or change data sheets', z.object({ jobId: z.uuid() }), async (user, input) => {
    await discardDraft(user.id, input.jobId);
    return success(null, 'Draft discarded.');
  })(raw);
}

export async function chooseLengthUnit(raw: unknown) {
  return guardedAction('job.read', 'change your settings', z.object({ unit: z.enum(LENGTH_UNITS) }), async (user, input) => {
    await setLengthUnit(user.id, input.unit);
    return success(null);
  })(raw);
}

/**
 * "Use for job N": the matched sheet's core, winding, wires and insulation become the user's draft for job
 * N, with the supply from job N's own nameplate and no resistance readings (those belong to the old motor).
 * The sheet page then opens with that draft; nothing is saved until the winder saves.
 */
export async function copyLibrarySheetToJob(raw: unknown) {
  const schema = z.object({ jobNumber: z.number().int().positive(), sheetId: z.uuid() });
  return guardedAction('sheet.edit', 'record or change data sheets', schema, async (user, input) => {
    const [job, source] = await Promise.all([
      db().job.findUnique({ where: { number: input.jobNumber }, select: { id: true, motor: true } }),
      db().windingSheet.findUnique({ where: { id: input.sheetId }, select: { data: true, job: { select: { number: true } } } }),
    ]);
    if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
    const parsed = source ? windingSheetSchema.safeParse(source.data) : null;
    if (!source || !parsed?.success) throw new DomainError('not-found', MESSAGES.notFound('data sheet'));
    const unit = await getLengthUnit(user.id);
    const copied = sheetToForm(
      { ...parsed.data, resistance: undefined, notes: `Core and winding copied from job ${source.job.number}'s data sheet.` },
      unit,
    );
    const values = prefillFromNameplate(job.motor, copied);
    const draft: DraftPayload = { unit, values, ...(parsed.data.winding.slotTable ? { slotTable: parsed.data.winding.slotTable } : {}) };
    await saveDraft(user.id, job.id, draft);
    return success(
      { jobNumber: input.jobNumber },
      `Copied job ${source.job.number}'s core and winding into job ${input.jobNumber}'s sheet.`,
    );
  })(raw);
}
