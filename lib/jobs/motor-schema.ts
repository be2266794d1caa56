import { z } from 'zod';
import { hpToKw } from '@/lib/engine/units';
import { optionalNumber, optionalText, requiredText } from '../validation/fields';
import { THERMAL_CLASSES } from '@/lib/engine/winding-sheet';

export const CONNECTIONS = ['star', 'delta', 'star-delta', 'dual-voltage star', 'dual-voltage delta'] as const;
export const CONNECTION_LABELS: Record<(typeof CONNECTIONS)[number], string> = {
  star: 'Star (Y)',
  delta: 'Delta (Δ)',
  'star-delta': 'Star-delta start (Y/Δ)',
  'dual-voltage star': 'Dual voltage, star (YY/Y)',
  'dual-voltage delta': 'Dual voltage, delta (ΔΔ/Δ)',
};
/** The insulation classes a nameplate may state: the engine's one list. */
export const INSULATION_CLASSES = THERMAL_CLASSES;
export const OUTPUT_UNITS = ['kW', 'hp'] as const;

/** Fields a legible plate must give; with "plate unreadable" ticked they may be unknown. */
export const PLATE_REQUIRED = [
  ['ratedVoltageV', 'Rated voltage'],
  ['frequencyHz', 'Frequency'],
  ['speedRpm', 'Speed'],
] as const;

/**
 * The motor and its nameplate. Output may be entered in kW or hp; the server stores kW (`toMotorRecord`).
 * Only manufacturer, voltage, frequency and speed are required: a worn plate often hides the rest, and an
 * unreadable plate ("plate unreadable") lets voltage, frequency and speed be unknown too.
 */
export const motorSchema = z
  .object({
    manufacturer: requiredText('Manufacturer', 80),
    model: optionalText(80),
    serial: optionalText(80),
    frame: optionalText(40),
    outputValue: optionalNumber({ label: 'Output', positive: true, max: 100_000 }),
    outputUnit: z.enum(OUTPUT_UNITS).default('kW'),
    voltages: optionalText(40),
    ratedVoltageV: optionalNumber({ label: 'Rated voltage', positive: true, max: 15_000, unit: 'V' }),
    connection: z.enum(CONNECTIONS).optional(),
    currentA: optionalNumber({ label: 'Full-load current', positive: true, max: 20_000, unit: 'A' }),
    frequencyHz: optionalNumber({ label: 'Frequency', positive: true, max: 400, unit: 'Hz' }),
    speedRpm: optionalNumber({ label: 'Speed', positive: true, max: 24_000, unit: 'rpm' }),
    /** The plate cannot be read: voltage, frequency and speed may be left blank and are stored as unknown. */
    plateUnreadable: z.preprocess((v) => v === true || v === 'true' || v === 'on', z.boolean()).default(false),
    phases: z.preprocess(
      (v) => (v === '' || v === undefined ? 3 : Number(v)),
      z.union([z.literal(1), z.literal(3)], { error: 'Phases must be 1 or 3.' }),
    ),
    serviceFactor: optionalNumber({ label: 'Service factor', min: 1, max: 2 }),
    insulationClass: z.preprocess((v) => (v === '' ? undefined : v), z.enum(INSULATION_CLASSES).optional()),
    duty: optionalText(20),
    enclosure: optionalText(40),
    efficiencyPercent: optionalNumber({ label: 'Efficiency', positive: true, max: 100, unit: '%' }),
    powerFactor: optionalNumber({ label: 'Power factor', positive: true, max: 1 }),
    codeLetter: z.preprocess(
      (v) => (typeof v === 'string' ? v.trim().toUpperCase() || undefined : v),
      z
        .string()
        .regex(/^[A-HJ-NPR-V]$/, 'Code letter is one of A–H, J–N, P, R–V (NEMA MG 1).')
        .optional(),
    ),
    designLetter: z.preprocess(
      (v) => (typeof v === 'string' ? v.trim().toUpperCase() || undefined : v),
      z
        .string()
        .regex(/^[A-DN]$/, 'Design letter is A, B, C, D or N.')
        .optional(),
    ),
    bearingDriveEnd: optionalText(40),
    bearingOppositeEnd: optionalText(40),
  })
  .superRefine((m, ctx) => {
    if (m.plateUnreadable) return;
    for (const [key, label] of PLATE_REQUIRED) {
      if (m[key] === undefined)
        ctx.addIssue({
          code: 'custom',
          path: [key],
          message: `${label} is required. If the plate cannot be read, tick "Plate unreadable" and leave it blank (recorded as unknown).`,
        });
    }
  });

export type MotorInput = z.input<typeof motorSchema>;
export type MotorValues = z.output<typeof motorSchema>;

/** The columns stored for a motor: output always in kW. */
export function toMotorRecord(m: MotorValues) {
  const { outputValue, outputUnit, plateUnreadable: _unreadable, ...rest } = m;
  const outputKw = outputValue === undefined ? undefined : outputUnit === 'hp' ? hpToKw(outputValue) : outputValue;
  return { ...rest, outputKw: outputKw ?? null };
}
