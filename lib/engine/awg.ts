/**
 * American Wire Gauge, 4/0 to 44.
 *
 * ASTM B258 defines the gauge by a formula: d = 0.005 in × 92^((36 − n)/39), with 4/0 = n −3, 3/0 −2,
 * 2/0 −1, 1/0 0. Published tables (ASTM B258 Table 1 and the magnet-wire tables that copy it) print that
 * diameter rounded to 0.1 mil. Both are kept here: the engine calculates with the formula value, which is
 * the definition and the value the published resistance tables are computed from (AWG 18: 6.385 Ω/1000 ft);
 * the rounded value is for display and for cross-checking a printed table.
 */
import { mmToInches, milsToMm } from './units';

/** Gauge number of 4/0, the thickest size held. */
export const AWG_MIN_N = -3;
/** Gauge number of the finest size held. */
export const AWG_MAX_N = 44;

/**
 * Published bare diameters in mils, 4/0 to 44, as printed in ASTM B258 and magnet-wire tables
 * [ASTM B258 formula, published magnet-wire tables; typed from memory of those tables]. Index = n + 3.
 * Each equals the formula diameter rounded to 0.1 mil; a unit test holds the two against each other.
 */
export const AWG_PUBLISHED_MILS: readonly number[] = [
  460.0, 409.6, 364.8, 324.9, 289.3, 257.6, 229.4, 204.3, 181.9, 162.0, 144.3, 128.5, 114.4, 101.9, 90.7, 80.8, 72.0, 64.1, 57.1, 50.8,
  45.3, 40.3, 35.9, 32.0, 28.5, 25.3, 22.6, 20.1, 17.9, 15.9, 14.2, 12.6, 11.3, 10.0, 8.9, 8.0, 7.1, 6.3, 5.6, 5.0, 4.5, 4.0, 3.5, 3.1, 2.8,
  2.5, 2.2, 2.0,
];

const OUGHT_LABELS: Record<number, string> = { [-3]: '4/0', [-2]: '3/0', [-1]: '2/0', 0: '1/0' };
const OUGHT_ALIASES: Record<string, number> = {
  '4/0': -3,
  '0000': -3,
  '3/0': -2,
  '000': -2,
  '2/0': -1,
  '00': -1,
  '1/0': 0,
  '0': 0,
};

/** Trade label of gauge number n: 4/0, 3/0, 2/0, 1/0, then "1" … "44". */
export function awgLabel(n: number): string {
  return OUGHT_LABELS[n] ?? String(n);
}

/**
 * Gauge number n from a label ("18", "4/0", "0000", "AWG 10", "#12"), or null when it is not a gauge
 * between 4/0 and 44.
 */
export function parseAwg(size: string): number | null {
  // No regular expression with a repeat before an anchor runs on the user's text: `/\s*awg$/` took
  // quadratic time on a long run of inner spaces. Prefixes and suffixes are cut with string methods.
  if (size.length > 40) return null;
  let s = size.trim().toLowerCase();
  if (s.startsWith('awg')) s = s.slice(3).trimStart();
  if (s.startsWith('#')) s = s.slice(1).trimStart();
  if (s.endsWith('awg')) s = s.slice(0, -3).trimEnd();
  const ought = OUGHT_ALIASES[s];
  if (ought !== undefined) return ought;
  if (!/^\d{1,2}$/.test(s)) return null;
  const n = Number(s);
  return n >= 1 && n <= AWG_MAX_N ? n : null;
}

/** Formula diameter in mils: d = 5 mil × 92^((36 − n)/39) (ASTM B258). Defined for any real n. */
export function awgFormulaDiameterMils(n: number): number {
  return 5 * 92 ** ((36 - n) / 39);
}

/** Formula diameter in millimetres (ASTM B258 formula; 1 mil = 0.0254 mm). */
export function awgFormulaDiameterMm(n: number): number {
  return milsToMm(awgFormulaDiameterMils(n));
}

/** Published (rounded to 0.1 mil) diameter in mils, or null outside 4/0 to 44 or for a non-integer n. */
export function awgPublishedDiameterMils(n: number): number | null {
  return Number.isInteger(n) ? (AWG_PUBLISHED_MILS[n + 3] ?? null) : null;
}

/**
 * Continuous gauge number for a bare diameter, the inverse of the ASTM B258 formula:
 * n = 36 − 39·log(d/0.005 in)/log 92. Useful to say "two strands of AWG 21 ≈ one AWG 18".
 */
export function awgNumberForDiameterMm(diameterMm: number): number {
  return 36 - (39 * Math.log(mmToInches(diameterMm) / 0.005)) / Math.log(92);
}
