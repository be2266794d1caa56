/**
 * A core-loss (loop) test record: one schema for the form (`useForm<CoreTestFormInput, unknown, CoreTestForm>`),
 * the server action and the JSON stored in CoreLossTest.data. Metric with the unit in each name; the screen
 * shows imperial beside it. Hot spots are placed by slot number and axial distance from the drive-end face;
 * the server also checks them against the core on the as-found sheet (slot count, core length).
 */
import { z } from 'zod';
import { optionalNumber, optionalText, requiredNumber } from '@/lib/validation/fields';
import { testedAtSchema } from '@/lib/final-tests/test-record-schema';

export const CORE_TEST_STAGES = ['BEFORE_STRIPPING', 'AFTER_STRIPPING', 'AFTER_REPAIRS'] as const;
export type CoreTestStageValue = (typeof CORE_TEST_STAGES)[number];
export const CORE_TEST_STAGE_LABELS: Record<CoreTestStageValue, string> = {
  BEFORE_STRIPPING: 'Before stripping',
  AFTER_STRIPPING: 'After stripping',
  AFTER_REPAIRS: 'After core repairs',
};
export const MAX_HOT_SPOTS = 50;

/** Optional text; the shared text builder already refuses NUL characters (lib/validation/safe-text.ts). */
const text = (max: number) => optionalText(max);
const temperature = (label: string, max = 250) => optionalNumber({ label, min: -40, max, unit: '°C' });

export const hotSpotSchema = z.object({
  slot: requiredNumber({ label: 'Slot', int: true, min: 1, max: 1000 }),
  axialPositionMm: requiredNumber({ label: 'Distance from the drive-end face', min: 0, max: 10_000, unit: 'mm' }),
  riseK: requiredNumber({ label: 'Temperature rise', min: 0, max: 500, unit: 'K' }),
});

export const coreTestDataSchema = z.object({
  loopTurns: requiredNumber({ label: 'Loop turns', int: true, min: 1, max: 10_000 }),
  voltageV: requiredNumber({ label: 'Applied voltage', positive: true, max: 15_000, unit: 'V' }),
  currentA: requiredNumber({ label: 'Current', positive: true, max: 100_000, unit: 'A' }),
  watts: requiredNumber({ label: 'Watts', min: 0, max: 10_000_000, unit: 'W' }),
  frequencyHz: requiredNumber({ label: 'Frequency', min: 1, max: 1000, unit: 'Hz' }),
  durationMin: optionalNumber({ label: 'Duration', positive: true, max: 1440, unit: 'min' }),
  ambientC: temperature('Ambient temperature', 60),
  coreStartC: temperature('Core temperature at the start'),
  coreEndC: temperature('Core temperature at the end'),
  hotSpots: z.array(hotSpotSchema).max(MAX_HOT_SPOTS, `At most ${MAX_HOT_SPOTS} hot spots per test.`),
  instrument: text(100),
  notes: text(1000),
});
export type CoreTestData = z.output<typeof coreTestDataSchema>;

/** New record (no recordId) or an edit of one record under its version. */
export const coreTestFormSchema = z.object({
  jobId: z.uuid('The job is not valid.'),
  recordId: z.preprocess((v) => (v === '' || v === null ? undefined : v), z.uuid().optional()),
  version: z.preprocess((v) => (v === '' || v === null ? undefined : v), z.number().int().positive().optional()),
  stage: z.enum(CORE_TEST_STAGES, { error: 'Pick when the test was made.' }),
  testedAt: testedAtSchema,
  testedById: z.uuid('Pick who tested from the list.'),
  data: coreTestDataSchema,
});
export type CoreTestFormInput = z.input<typeof coreTestFormSchema>;
export type CoreTestForm = z.output<typeof coreTestFormSchema>;

/** Shop settings for the core test and the losses statement, in the units the form shows (percent, T, A/m, K). */
export const coreLossSettingsSchema = z.object({
  version: z.number().int().min(0),
  testFluxDensityT: requiredNumber({ label: 'Test flux density', min: 0.5, max: 2, unit: 'T' }),
  fieldStrengthAPerM: requiredNumber({ label: 'Magnetising field strength', min: 10, max: 10_000, unit: 'A/m' }),
  coreLossRiseLimitPercent: requiredNumber({ label: 'Core-loss rise limit', min: 1, max: 200, unit: '%' }),
  hotSpotRiseLimitK: requiredNumber({ label: 'Hot-spot limit', min: 1, max: 100, unit: 'K' }),
  copperLossRiseLimitPercent: requiredNumber({ label: 'Copper-loss rise limit', min: 0, max: 100, unit: '%' }),
});
export type CoreLossSettingsFormInput = z.input<typeof coreLossSettingsSchema>;
export type CoreLossSettingsForm = z.output<typeof coreLossSettingsSchema>;
