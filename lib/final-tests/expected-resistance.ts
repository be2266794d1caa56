/**
 * The final winding resistance against what the winding data predicts. A rewind to the same data (or to
 * the approved redesign) should measure close to the resistance predicted from turns, wire and mean turn
 * length; a clear difference asks for a check of turns, connections or wire size before the motor leaves.
 * Shown as information beside the verdicts, not as a pass/fail rule: the mean turn length is itself an
 * estimate, so the prediction carries a few percent of uncertainty [common practice].
 */
import { correctResistanceOhm, lineToLineFromPhaseOhm, type Connection } from '@/lib/engine/resistance';

/** The predicted winding the final readings are compared with. */
export interface ExpectedResistance {
  /** Where the prediction comes from, in words for the page. */
  source: string;
  /** Predicted phase resistance at 20 °C, Ω. */
  phaseOhm20: number;
  connection: Connection;
}

export interface FinalResistanceComparison {
  /** The prediction on the same basis as the readings (line-to-line or phase) at the readings' temperature. */
  expectedOhm: number;
  /** Mean of the three final readings. */
  finalAverageOhm: number;
  /** (final − expected)/expected, percent. */
  differencePercent: number;
  temperatureC: number;
  between: 'line-to-line' | 'phase';
}

/** Difference beyond which the page asks for a check (a shop's habit, configurable here) [common practice]. */
export const RESISTANCE_CHECK_PERCENT = 5;

export function compareFinalResistance(
  expected: ExpectedResistance,
  final: { readings: readonly (number | undefined)[]; temperatureC?: number | undefined; between: 'line-to-line' | 'phase' },
): FinalResistanceComparison | null {
  const readings = final.readings.filter((r): r is number => r !== undefined && Number.isFinite(r) && r > 0);
  if (readings.length !== 3 || final.temperatureC === undefined || !(expected.phaseOhm20 > 0)) return null;
  const phaseAtT = correctResistanceOhm(expected.phaseOhm20, 20, final.temperatureC);
  const expectedOhm = final.between === 'phase' ? phaseAtT : lineToLineFromPhaseOhm(phaseAtT, expected.connection);
  const finalAverageOhm = readings.reduce((a, b) => a + b, 0) / readings.length;
  const differencePercent = ((finalAverageOhm - expectedOhm) / expectedOhm) * 100;
  return Number.isFinite(differencePercent)
    ? { expectedOhm, finalAverageOhm, differencePercent, temperatureC: final.temperatureC, between: final.between }
    : null;
}
