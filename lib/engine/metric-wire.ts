/**
 * Metric enamelled round copper wire: nominal bare diameters 0.050 to 5.000 mm.
 *
 * IEC 60317-0-1 takes its nominal conductor diameters from the Renard preferred-number series: the R20
 * values are the preferred sizes and the R40 values fill the gaps [from memory: the series and the
 * 0.050–5.000 mm span are recalled, not checked against the standard's table]. The diameters are the
 * rounded R40 preferred numbers of ISO 3, repeated every decade.
 */

export type RenardSeries = 'R20' | 'R40';

/** One nominal size of the metric series. */
export interface MetricNominalSize {
  /** Nominal bare diameter, mm. */
  diameterMm: number;
  /** R20 for a preferred size, R40 for an intermediate one. */
  series: RenardSeries;
}

/** Rounded R40 preferred numbers in one decade (ISO 3); every second one is also R20. */
const R40_MANTISSAS: readonly number[] = [
  1.0, 1.06, 1.12, 1.18, 1.25, 1.32, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2.0, 2.12, 2.24, 2.36, 2.5, 2.65, 2.8, 3.0, 3.15, 3.35, 3.55, 3.75, 4.0,
  4.25, 4.5, 4.75, 5.0, 5.3, 5.6, 6.0, 6.3, 6.7, 7.1, 7.5, 8.0, 8.5, 9.0, 9.5,
];

/** Smallest and largest nominal bare diameters held, mm [from memory]. */
export const METRIC_MIN_DIAMETER_MM = 0.05;
export const METRIC_MAX_DIAMETER_MM = 5.0;

/** Rounds to the micrometre so that 0.01 × 1.06 is 0.0106 and not 0.010600000000000002. */
const toMicron = (mm: number): number => Math.round(mm * 1e6) / 1e6;

function buildSeries(): MetricNominalSize[] {
  const sizes: MetricNominalSize[] = [];
  for (const decade of [0.01, 0.1, 1]) {
    R40_MANTISSAS.forEach((mantissa, i) => {
      const diameterMm = toMicron(mantissa * decade);
      if (diameterMm >= METRIC_MIN_DIAMETER_MM && diameterMm <= METRIC_MAX_DIAMETER_MM) {
        sizes.push({ diameterMm, series: i % 2 === 0 ? 'R20' : 'R40' });
      }
    });
  }
  return sizes;
}

/** Nominal bare diameters 0.050 to 5.000 mm, ascending (81 sizes) [from memory, see the file comment]. */
export const METRIC_NOMINAL_SIZES: readonly MetricNominalSize[] = buildSeries();

/**
 * The series size matching a label such as "0.85", "0.850", "0,85" or "0.85 mm", or null when the label
 * is not a number or not on the series.
 */
export function parseMetricSize(size: string): MetricNominalSize | null {
  // Linear on any input: the suffix is cut with string methods (a `/\s*mm$/` pattern backtracks
  // quadratically on inner spaces) and the number pattern has no overlapping repeats.
  if (size.length > 40) return null;
  let s = size.trim().toLowerCase();
  if (s.endsWith('mm')) s = s.slice(0, -2).trimEnd();
  s = s.replace(',', '.');
  if (!/^(?:\d+(?:\.\d+)?|\.\d+)$/.test(s)) return null;
  const d = Number(s);
  return METRIC_NOMINAL_SIZES.find((m) => Math.abs(m.diameterMm - d) < 5e-7) ?? null;
}

/** Label with three decimals, as wire is ordered: 0.85 → "0.850". */
export const metricLabel = (diameterMm: number): string => diameterMm.toFixed(3);
