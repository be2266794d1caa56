/**
 * The winding library's search, as URL search params (a bookmarkable GET form). Bad values fall back to
 * "not given" instead of failing the page. Bore and core length are typed in the user's length unit with a
 * tolerance in the same unit; output and voltage match within a percentage.
 */
import { z } from 'zod';
import { jobNumberSchema } from '../jobs/job-schema';
import { noNul } from '@/lib/validation/safe-text';

const optNum = (max: number, int = false) =>
  z
    .preprocess(
      (v) => (typeof v === 'string' && v.trim() !== '' ? Number(v.trim().replace(',', '.')) : undefined),
      (int ? z.number().int() : z.number()).positive().max(max).optional(),
    )
    .catch(undefined);

export const libraryQuerySchema = z.object({
  slots: optNum(600, true),
  poles: optNum(200, true),
  bore: optNum(6000),
  boreTol: optNum(500),
  length: optNum(6000),
  lengthTol: optNum(500),
  kw: optNum(100_000),
  kwTolPct: optNum(100),
  volts: optNum(15_000),
  voltsTolPct: optNum(100),
  q: noNul(z.string().trim().max(80)).optional().catch(undefined),
  forJob: jobNumberSchema.optional().catch(undefined),
  /** Up to 3 sheet ids to show side by side (extra ones are dropped). */
  compare: z
    .preprocess((v) => (Array.isArray(v) ? v : typeof v === 'string' && v ? v.split(',') : []).slice(0, 3), z.array(z.uuid()))
    .catch([]),
  unit: z.enum(['mm', 'in']).optional().catch(undefined),
});
export type LibraryQuery = z.output<typeof libraryQuerySchema>;

/** Default tolerances: bore ±1 mm (≈0.04 in), core length ±5 mm (≈0.2 in), output ±10 %, voltage ±5 %. */
export const LIBRARY_DEFAULT_TOLERANCE = { boreMm: 1, lengthMm: 5, kwPct: 10, voltsPct: 5 } as const;
