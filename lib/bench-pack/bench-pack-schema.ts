/**
 * Bench pack schemas: the shop's bench-pack settings form (wire allowance in percent, lead convention) and
 * the options in the bench pack's address (lead convention, leads brought out, paper, revision, basis).
 * Unknown or bad option values fall back to the defaults rather than failing the page.
 */
import { z } from 'zod';
import { requiredNumber } from '@/lib/validation/fields';

export const LEAD_CONVENTIONS = ['iec', 'nema'] as const;
export const PAPER_SIZES = ['a4', 'letter'] as const;

/** Settings form: allowance for leads, jumpers and waste (%), and the convention shown first. */
export const benchSettingsSchema = z.object({
  version: z.coerce.number().int().min(0).max(1_000_000),
  wireAllowancePercent: requiredNumber({ label: 'Allowance for leads and waste', min: 0, max: 100, unit: '%' }),
  leadConvention: z.enum(LEAD_CONVENTIONS, { error: 'Choose IEC 60034-8 or NEMA MG 1 Part 2.' }),
});
export type BenchSettingsInput = z.input<typeof benchSettingsSchema>;
export type BenchSettings = z.output<typeof benchSettingsSchema>;

/** Options of one bench pack, from the query string. */
export const benchPackQuerySchema = z.object({
  marking: z.enum(LEAD_CONVENTIONS).optional().catch(undefined),
  leads: z.coerce
    .number()
    .pipe(z.union([z.literal(3), z.literal(6), z.literal(12)]))
    .optional()
    .catch(undefined),
  paper: z.enum(PAPER_SIZES).optional().catch(undefined),
  rev: z.coerce.number().int().positive().max(100_000).optional().catch(undefined),
  /** 'original': the as-found winding (a rewind to the original), even when a redesign exists. */
  basis: z.enum(['redesign', 'original']).optional().catch(undefined),
});
export type BenchPackQuery = z.output<typeof benchPackQuerySchema>;

/** Reads the options from a query-string record or URLSearchParams (first value of each key). */
export function parseBenchPackQuery(raw: Record<string, string | string[] | undefined> | URLSearchParams): BenchPackQuery {
  const get = (k: string): string | undefined => {
    if (raw instanceof URLSearchParams) return raw.get(k) ?? undefined;
    const v = raw[k];
    return Array.isArray(v) ? v[0] : v;
  };
  const picked = Object.fromEntries(['marking', 'leads', 'paper', 'rev', 'basis'].map((k) => [k, get(k)?.slice(0, 20)]));
  return benchPackQuerySchema.parse(picked);
}

/** The query string for a set of options (only those given). */
export function benchPackSearch(q: BenchPackQuery): string {
  const p = new URLSearchParams();
  if (q.marking) p.set('marking', q.marking);
  if (q.leads) p.set('leads', String(q.leads));
  if (q.paper) p.set('paper', q.paper);
  if (q.rev) p.set('rev', String(q.rev));
  if (q.basis) p.set('basis', q.basis);
  const s = p.toString();
  return s ? `?${s}` : '';
}
