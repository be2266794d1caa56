/**
 * A sheet draft: the raw values of the sheet form as typed (not validated: half-typed numbers are the point
 * of a draft), but shaped like the form and limited in size so the drafts table cannot be used as a bin.
 */
import { z } from 'zod';
import { LENGTH_UNITS } from '@/lib/as-found/length-entry';
import { coilSideSchema } from './winding-sheet-schema';
import { noNul } from '@/lib/validation/safe-text';

/** Largest draft accepted, as JSON text. A full sheet form is 2–4 kB; a 2400-side slot table ~150 kB. */
export const MAX_DRAFT_BYTES = 256 * 1024;

const typed = noNul(z.string().max(5000));
const section = z.record(z.string().max(40), z.union([typed, z.array(z.unknown()).max(24)]));

/** What the client sends and what is stored. */
export const draftPayloadSchema = z.object({
  unit: z.enum(LENGTH_UNITS),
  values: z.object({
    core: z.record(z.string().max(40), typed),
    winding: z.record(z.string().max(40), z.union([typed, z.array(z.record(z.string().max(10), typed)).max(12)])),
    wires: z.array(z.record(z.string().max(20), typed)).max(4),
    insulation: z.record(z.string().max(40), typed),
    supply: z.record(z.string().max(40), typed),
    resistance: section,
    notes: typed,
  }),
  slotTable: z.array(coilSideSchema).max(2400).optional(),
  /** The saved revision the draft was started from (null: none was saved), so a save made from a restored
   * draft is refused as stale when someone saved a newer revision meanwhile. Older drafts lack it. */
  baseRevision: z.number().int().positive().nullable().optional(),
});
export type DraftPayload = z.output<typeof draftPayloadSchema>;

/** Saving a draft for one job. */
export const draftSaveSchema = z
  .object({ jobId: z.uuid(), draft: draftPayloadSchema })
  .refine((v) => JSON.stringify(v.draft).length <= MAX_DRAFT_BYTES, {
    message: `A draft may be at most ${MAX_DRAFT_BYTES / 1024} kB.`,
    path: ['draft'],
  });
