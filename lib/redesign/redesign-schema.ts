/**
 * Redesign schemas: the request form (target supply, options and limits, limits typed in percent) whose
 * output is the engine's RedesignRequest (fractions); the stored request read back from the database; the
 * choose and approve actions; the shop-settings form. One schema per entity, used by form and server.
 */
import { z } from 'zod';
import type { RedesignLimits, RedesignRequest } from '@/lib/engine/redesign/types';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { requiredNumber, uuid } from '../validation/fields';
import { noNul } from '@/lib/validation/safe-text';

/** "7, 8" or "7 8" → [7, 8]; "" → []. Messages name the field. */
const wholeList = (label: string, max: number) =>
  z.preprocess(
    (v) =>
      typeof v === 'string'
        ? v
            .split(/[\s,;]+/)
            .filter(Boolean)
            .map((x) => Number(x))
        : (v ?? []),
    z
      .array(
        z
          .number({ error: `${label}: whole numbers separated by commas.` })
          .int(`${label}: whole numbers only.`)
          .min(1, `${label}: at least 1.`)
          .max(max, `${label}: at most ${max}.`),
        { error: `${label}: whole numbers separated by commas.` },
      )
      .max(8, `${label}: at most 8 values.`),
  );

const percent = (label: string, max: number) => requiredNumber({ label, min: 0, max, unit: '%' });

/** Limits as the forms show them: percentages and plain numbers. */
export const limitsFormSchema = z.object({
  gapRisePercent: percent('Gap rise', 100),
  gapFallPercent: percent('Gap fall', 99),
  toothRisePercent: percent('Tooth rise', 100),
  toothFallPercent: percent('Tooth fall', 99),
  yokeRisePercent: percent('Yoke rise', 100),
  yokeFallPercent: percent('Yoke fall', 99),
  currentDensityRisePercent: percent('Current-density rise', 100),
  currentDensityMaxAPerMm2: requiredNumber({ label: 'Current density limit', positive: true, max: 30, unit: 'A/mm²' }),
  slotFillMaxPercent: requiredNumber({ label: 'Slot fill limit', positive: true, max: 100, unit: '%' }),
  maxStrandsInHand: requiredNumber({ label: 'Wires in hand', int: true, min: 1, max: 40 }),
  maxWireSizes: requiredNumber({ label: 'Sizes per conductor', int: true, min: 1, max: 3 }),
  mixedSizeRatioMax: requiredNumber({ label: 'Mixed-size ratio', min: 1, max: 3 }),
  minWireBareMm: requiredNumber({ label: 'Thinnest wire', min: 0, max: 5, unit: 'mm' }),
  harmonicKwMax: requiredNumber({ label: 'k_w5 / k_w7 limit', positive: true, max: 1 }),
});
export type LimitsForm = z.output<typeof limitsFormSchema>;
export type LimitsFormInput = z.input<typeof limitsFormSchema>;

/** Form limits → engine limits (fractions). */
export function limitsFromForm(f: LimitsForm): RedesignLimits {
  return {
    gap: { over: f.gapRisePercent / 100, under: f.gapFallPercent / 100 },
    tooth: { over: f.toothRisePercent / 100, under: f.toothFallPercent / 100 },
    yoke: { over: f.yokeRisePercent / 100, under: f.yokeFallPercent / 100 },
    currentDensityRise: f.currentDensityRisePercent / 100,
    currentDensityMaxAPerMm2: f.currentDensityMaxAPerMm2,
    slotFillMax: f.slotFillMaxPercent / 100,
    maxStrandsInHand: f.maxStrandsInHand,
    maxWireSizes: f.maxWireSizes as 1 | 2 | 3,
    mixedSizeRatioMax: f.mixedSizeRatioMax,
    minWireBareMm: f.minWireBareMm,
    harmonicKwMax: f.harmonicKwMax,
  };
}

/** Engine limits → form values (percent, rounded to 0.01 so 0.05 shows as 5, not 5.000000001). */
export function limitsToForm(l: RedesignLimits): LimitsForm {
  const p = (v: number) => Math.round(v * 10_000) / 100;
  return {
    gapRisePercent: p(l.gap.over),
    gapFallPercent: p(l.gap.under),
    toothRisePercent: p(l.tooth.over),
    toothFallPercent: p(l.tooth.under),
    yokeRisePercent: p(l.yoke.over),
    yokeFallPercent: p(l.yoke.under),
    currentDensityRisePercent: p(l.currentDensityRise),
    currentDensityMaxAPerMm2: l.currentDensityMaxAPerMm2,
    slotFillMaxPercent: p(l.slotFillMax),
    maxStrandsInHand: l.maxStrandsInHand,
    maxWireSizes: l.maxWireSizes,
    mixedSizeRatioMax: l.mixedSizeRatioMax,
    minWireBareMm: l.minWireBareMm,
    harmonicKwMax: l.harmonicKwMax,
  };
}

export const CONNECTION_CHOICES = ['star', 'delta', 'either'] as const;
export const LAYER_CHOICES = ['keep', 'double-lap'] as const;

/** The request form: which job, the new supply and options, and the limits. */
export const redesignRequestFormSchema = z.object({
  jobId: uuid('Job'),
  /** The draft being replaced, when there is one (optimistic locking). */
  draftVersion: z.preprocess((v) => (v === '' || v === null ? undefined : v), z.coerce.number().int().positive().optional()),
  target: z.object({
    lineVoltageV: requiredNumber({ label: 'Line voltage', positive: true, max: 15_000, unit: 'V' }),
    frequencyHz: requiredNumber({ label: 'Frequency', positive: true, max: 400, unit: 'Hz' }),
    poles: requiredNumber({ label: 'Poles', int: true, min: 2, max: 200 }).refine((p) => p % 2 === 0, 'Poles come in pairs: 2, 4, 6, 8 …'),
    connection: z.enum(CONNECTION_CHOICES, { error: 'Connection is star, delta or either.' }),
    spans: wholeList('Spans', 599),
    layers: z.enum(LAYER_CHOICES, { error: 'Choose keep or double-layer lap.' }),
    parallelPaths: wholeList('Circuits', 64),
    /** A checkbox: over-pitched spans are evaluated only when ticked. */
    allowOverPitch: z.preprocess((v) => v === true || v === 'on' || v === 'true', z.boolean()).optional(),
  }),
  limits: limitsFormSchema,
});
export type RedesignRequestFormInput = z.input<typeof redesignRequestFormSchema>;
export type RedesignRequestForm = z.output<typeof redesignRequestFormSchema>;

/** Form output → the request the engine and the database hold. */
export const requestFromForm = (f: RedesignRequestForm): RedesignRequest => ({
  target: { ...f.target, allowOverPitch: f.target.allowOverPitch ?? false },
  limits: limitsFromForm(f.limits),
});

const fraction = z.number().min(0).max(1);
/** A request as stored (fractions): checked when read back so a damaged row fails loudly, not silently. */
export const storedRequestSchema = z.object({
  target: z.object({
    lineVoltageV: z.number().positive(),
    frequencyHz: z.number().positive(),
    poles: z.number().int().min(2),
    connection: z.enum(CONNECTION_CHOICES),
    spans: z.array(z.number().int()),
    layers: z.enum(LAYER_CHOICES),
    parallelPaths: z.array(z.number().int()),
    // Requests stored before over-pitch became an explicit choice did not ask for it.
    allowOverPitch: z.boolean().default(false),
  }),
  limits: z.object({
    gap: z.object({ over: fraction, under: fraction }),
    tooth: z.object({ over: fraction, under: fraction }),
    yoke: z.object({ over: fraction, under: fraction }),
    currentDensityRise: fraction,
    currentDensityMaxAPerMm2: z.number().positive(),
    slotFillMax: fraction,
    maxStrandsInHand: z.number().int().min(1),
    maxWireSizes: z.union([z.literal(1), z.literal(2), z.literal(3)]),
    mixedSizeRatioMax: z.number().min(1),
    // Added with the ranking rule; older rows get the shop defaults of that change.
    minWireBareMm: z.number().min(0).default(DEFAULT_REDESIGN_LIMITS.minWireBareMm),
    harmonicKwMax: z.number().positive().max(1).default(DEFAULT_REDESIGN_LIMITS.harmonicKwMax),
  }),
});

/** Choosing a candidate of a draft revision. */
export const chooseCandidateSchema = z.object({
  redesignId: uuid('Redesign'),
  version: z.coerce.number().int().positive(),
  key: noNul(z.string().min(1, 'Choose a candidate.').max(400)),
});

/** Approving a draft revision: the note says what was checked. */
export const approveRedesignSchema = z.object({
  redesignId: uuid('Redesign'),
  version: z.coerce.number().int().positive(),
  note: z.preprocess(
    (v) => (typeof v === 'string' ? v.trim() : v),
    noNul(
      z
        .string({ error: 'Write an approval note.' })
        .min(3, 'Write an approval note: what you checked and any condition.')
        .max(2000, 'At most 2000 characters.'),
    ),
  ),
});

/** Shop settings form: the redesign limits with the version it was loaded from. */
export const shopSettingsSchema = z.object({ version: z.coerce.number().int().nonnegative(), limits: limitsFormSchema });
export type ShopSettingsInput = z.input<typeof shopSettingsSchema>;
