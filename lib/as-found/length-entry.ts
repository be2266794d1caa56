/**
 * Lengths on the sheet form are typed in millimetres or inches (the user's choice) and always stored in
 * millimetres. This is the one place the form converts, using lib/engine/units.ts; each rounding is named.
 */
import { inchesToMm, mmToInches } from '@/lib/engine/units';
import { parseDecimal } from '@/lib/validation/number-text';

/** How a user types lengths on the sheet form. */
export const LENGTH_UNITS = ['mm', 'in'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const isLengthUnit = (v: unknown): v is LengthUnit => v === 'mm' || v === 'in';

/** Stored millimetres keep 4 decimals (0.1 µm): far below any shop measurement, free of float dust like 25.400000000000002. */
export const roundStoredMm = (mm: number): number => Math.round(mm * 1e4) / 1e4;
/** Shown millimetres: 3 decimals (a micrometer reads 0.01 mm; one more keeps inch round trips exact). */
export const roundShownMm = (mm: number): number => Math.round(mm * 1e3) / 1e3;
/** Shown inches: 4 decimals (a "tenth", 0.0001 in, the finest a shop micrometer reads). */
export const roundShownInches = (inches: number): number => Math.round(inches * 1e4) / 1e4;

/** A typed length in `unit` → millimetres for storage. */
export function lengthToMm(value: number, unit: LengthUnit): number {
  return roundStoredMm(unit === 'mm' ? value : inchesToMm(value));
}

/** Stored millimetres → the number shown in `unit`. */
export function mmToLength(mm: number, unit: LengthUnit): number {
  return unit === 'mm' ? roundShownMm(mm) : roundShownInches(mmToInches(mm));
}

/**
 * What a length field held before the unit was switched: the text as typed and its unit, and the text
 * the switch showed instead. While the field still shows exactly that text, switching back restores
 * what was typed and saving converts the typed value (once), so a toggle never changes a stored value
 * (mm → in → mm used to turn 0.4 into 0.399).
 */
export interface TypedLength {
  text: string;
  unit: LengthUnit;
  shown: string;
}

/** Switches one field's text between units, keeping the typed value behind it. */
export function switchTypedLength(
  text: string,
  from: LengthUnit,
  to: LengthUnit,
  memory: TypedLength | undefined,
): { text: string; memory: TypedLength | undefined } {
  if (from === to) return { text, memory };
  const untouched = memory !== undefined && memory.shown === text;
  const typed = untouched ? memory : { text, unit: from, shown: text };
  if (typed.unit === to) return { text: typed.text, memory: undefined };
  const shown = convertTypedLength(typed.text, typed.unit, to);
  return shown === typed.text ? { text: shown, memory: undefined } : { text: shown, memory: { text: typed.text, unit: typed.unit, shown } };
}

/** The millimetres to store for a field: from what was typed, in the unit it was typed in. */
export function typedLengthToMm(text: string | undefined, unit: LengthUnit, memory: TypedLength | undefined): number | string | undefined {
  const source = memory !== undefined && memory.shown === (text ?? '') ? memory : { text: text ?? '', unit };
  const n = parseTypedNumber(source.text);
  return typeof n === 'number' ? lengthToMm(n, source.unit) : n;
}

/** Re-expresses a typed length when the user switches unit; text that is not a number is left as typed. */
export function convertTypedLength(text: string, from: LengthUnit, to: LengthUnit): string {
  if (from === to) return text;
  const n = parseTypedNumber(text);
  if (typeof n !== 'number') return text;
  return String(mmToLength(lengthToMm(n, from), to));
}

/**
 * A number as typed: blank → undefined, "12,5" → 12.5 (decimal comma), anything else unparsable is
 * returned as typed so the schema reports it ("Bore: enter a number in mm."). See lib/schemas/number-text.ts.
 */
export function parseTypedNumber(text: string | undefined | null): number | string | undefined {
  if (text === undefined || text === null) return undefined;
  const n = parseDecimal(String(text));
  return n === '' ? undefined : n;
}
