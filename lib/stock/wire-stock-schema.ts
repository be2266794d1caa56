/**
 * A wire size on hand, as the stock form and the server take it. The size must be one the wire tables
 * know (AWG 4/0–44 or a metric nominal diameter), so the redesign search can use it.
 */
import { z } from 'zod';
import { parseAwg } from '@/lib/engine/awg';
import { parseMetricSize } from '@/lib/engine/metric-wire';
import { optionalNumber, optionalText, uuid } from '../validation/fields';
import { noNul } from '@/lib/validation/safe-text';

export const wireStockSchema = z
  .object({
    standard: z.enum(['awg', 'metric'], { error: 'Wire standard is AWG or metric.' }),
    size: z.preprocess(
      (v) => (typeof v === 'string' ? v.trim() : v),
      noNul(z.string({ error: 'Enter the wire size.' }).min(1, 'Enter the wire size.').max(20, 'At most 20 characters.')),
    ),
    enamelGrade: z.coerce.number().pipe(z.union([z.literal(1), z.literal(2), z.literal(3)], { error: 'Enamel grade is 1, 2 or 3.' })),
    quantityKg: optionalNumber({ label: 'Quantity', positive: true, max: 100_000, unit: 'kg' }),
    note: optionalText(200),
  })
  .superRefine((w, ctx) => {
    if (w.standard === 'awg' && parseAwg(w.size) === null)
      ctx.addIssue({ code: 'custom', path: ['size'], message: `AWG ${w.size} is not a gauge from 4/0 to 44.` });
    if (w.standard === 'metric' && parseMetricSize(w.size) === null)
      ctx.addIssue({ code: 'custom', path: ['size'], message: `${w.size} mm is not a nominal metric wire diameter (e.g. 0.85, 1.06).` });
  });
export type WireStockInput = z.input<typeof wireStockSchema>;
export type WireStockEntry = z.output<typeof wireStockSchema>;

export const removeWireStockSchema = z.object({ id: uuid('Stock row') });
