/**
 * Winding DC resistance: prediction from the winding data, temperature correction, star/delta
 * conversion, unbalance between phases, and predicted-against-measured comparison.
 */
import {
  COPPER_RESISTIVITY_20C_OHM_MM2_PER_M,
  COPPER_TEMP_CONSTANT_IEEE,
  REFERENCE_TEMPERATURE_C,
  type CopperTempConstant,
} from './copper';
import { fail, finiteOr, type EngineResult } from './result';
import type { Verdict } from './verdict';

/** Three-phase winding connection. */
export type Connection = 'star' | 'delta';

/** One wire size in hand: bare area of one strand and how many strands of it make up a turn. */
export interface StrandGroup {
  areaMm2: number;
  count: number;
}

/** Winding data for a phase-resistance prediction. */
export interface PhaseResistanceInput {
  /** Coils in one phase, C (double layer: S/3; single layer: S/6). */
  coilsPerPhase: number;
  /** Turns per coil, N_c. */
  turnsPerCoil: number;
  /** Mean length of one turn, m. */
  meanTurnLengthM: number;
  /** Parallel paths (circuits) per phase, a. */
  parallelPaths: number;
  /** Wires in hand; several sizes may be mixed. Conductor area per turn = Σ count·area. */
  strands: readonly StrandGroup[];
  /** Temperature to report the resistance at, °C. */
  temperatureC: number;
  /** Copper temperature constant: 234.5 (IEEE, the default) or 235 (IEC 60034). */
  tempConstant?: CopperTempConstant;
}

/** Conductor area of one turn, mm² = Σ count·area over the wires in hand. */
export const conductorAreaPerTurnMm2 = (strands: readonly StrandGroup[]): number =>
  strands.reduce((sum, s) => sum + s.count * s.areaMm2, 0);

/**
 * Phase resistance, Ω: R_ph = ρ20·(C·N_c·MLT)/(a²·Σ count·area), corrected from 20 °C to temperatureC by
 * (k + t)/(k + 20). ρ20 = 1/58 Ω·mm²/m (IEC 60028). The a² is because each of the a paths holds C/a coils
 * and the a paths are in parallel. Example A: C 12, N_c 14, MLT 0.56 m, 2 × 0.85 mm → 1.4293 Ω at 20 °C.
 * Expects finite positive inputs; phaseResistance() validates first.
 */
export function phaseResistanceOhm(input: PhaseResistanceInput): number {
  const { coilsPerPhase, turnsPerCoil, meanTurnLengthM, parallelPaths, strands, temperatureC } = input;
  const lengthM = coilsPerPhase * turnsPerCoil * meanTurnLengthM;
  const r20 = (COPPER_RESISTIVITY_20C_OHM_MM2_PER_M * lengthM) / (parallelPaths ** 2 * conductorAreaPerTurnMm2(strands));
  return correctResistanceOhm(r20, REFERENCE_TEMPERATURE_C, temperatureC, input.tempConstant);
}

/** phaseResistanceOhm with its inputs checked: an 'invalid-input' error names the first bad field. */
export function phaseResistance(input: PhaseResistanceInput): EngineResult<number> {
  const positives: [string, number][] = [
    ['coilsPerPhase', input.coilsPerPhase],
    ['turnsPerCoil', input.turnsPerCoil],
    ['meanTurnLengthM', input.meanTurnLengthM],
    ['parallelPaths', input.parallelPaths],
    ['conductorArea', conductorAreaPerTurnMm2(input.strands)],
  ];
  for (const [field, value] of positives) {
    if (!(value > 0) || !Number.isFinite(value)) {
      return fail('invalid-input', `${field} must be a positive number.`, 'Fill in the winding data.', field);
    }
  }
  const k = input.tempConstant ?? COPPER_TEMP_CONSTANT_IEEE;
  if (!Number.isFinite(input.temperatureC) || input.temperatureC <= -k) {
    return fail('invalid-input', 'The temperature is not a usable value.', 'Enter the winding temperature in °C.', 'temperatureC');
  }
  return finiteOr(phaseResistanceOhm(input), (r) => r, 'Phase resistance');
}

/**
 * Copper resistance at another temperature: R_to = R_from·(k + t_to)/(k + t_from), k = 234.5 (IEEE) or
 * 235 (IEC 60034).
 */
export function correctResistanceOhm(r: number, fromC: number, toC: number, k: number = COPPER_TEMP_CONSTANT_IEEE): number {
  return (r * (k + toC)) / (k + fromC);
}

/** Resistance measured between two line terminals from the phase resistance: star 2·R_ph, delta (2/3)·R_ph. */
export function lineToLineFromPhaseOhm(rPhase: number, connection: Connection): number {
  return connection === 'star' ? 2 * rPhase : (2 / 3) * rPhase;
}

/** Phase resistance from a line-to-line reading: star R_LL/2, delta (3/2)·R_LL. */
export function phaseFromLineToLineOhm(rLineToLine: number, connection: Connection): number {
  return connection === 'star' ? rLineToLine / 2 : 1.5 * rLineToLine;
}

/** Spread of a set of resistance readings. */
export interface ResistanceUnbalance {
  maxOhm: number;
  minOhm: number;
  averageOhm: number;
  /** (max − min)/average (ANSI/EASA AR100-2020 definition); 0 for no readings or an all-zero set. */
  unbalanceFraction: number;
}

/** Resistance unbalance of a set of readings: (max − min)/average (ANSI/EASA AR100-2020). */
export function resistanceUnbalance(readings: readonly number[]): ResistanceUnbalance {
  if (readings.length === 0) return { maxOhm: 0, minOhm: 0, averageOhm: 0, unbalanceFraction: 0 };
  const maxOhm = Math.max(...readings);
  const minOhm = Math.min(...readings);
  const averageOhm = readings.reduce((a, b) => a + b, 0) / readings.length;
  const unbalanceFraction = maxOhm === minOhm || averageOhm === 0 ? 0 : (maxOhm - minOhm) / Math.abs(averageOhm);
  return { maxOhm, minOhm, averageOhm, unbalanceFraction };
}

/** Random-wound (round wire) or form-wound (pre-formed coils), as AR100 distinguishes them. */
export type WindingKind = 'random' | 'form';

/** Largest acceptable resistance unbalance: 2 % random-wound, 1 % form-wound (ANSI/EASA AR100-2020). */
export function unbalanceLimitFraction(kind: WindingKind): number {
  return kind === 'random' ? 0.02 : 0.01;
}

/**
 * Unbalance verdict: (max − min)/average ≤ 2 % random-wound, ≤ 1 % form-wound (ANSI/EASA AR100-2020).
 * Needs at least two readings, all positive.
 */
export function resistanceUnbalanceVerdict(readings: readonly number[], kind: WindingKind): EngineResult<Verdict> {
  if (readings.length < 2 || readings.some((r) => !(r > 0) || !Number.isFinite(r))) {
    return fail(
      'invalid-input',
      'Resistance unbalance needs at least two positive readings.',
      'Enter the readings for every phase (or every pair of leads).',
      'readings',
    );
  }
  const value = resistanceUnbalance(readings).unbalanceFraction;
  const limit = unbalanceLimitFraction(kind);
  return finiteOr(
    value,
    (v) => ({
      pass: v <= limit,
      value: v,
      limit,
      rule: `ANSI/EASA AR100-2020: (max − min)/average ≤ ${limit * 100} % for ${kind}-wound windings`,
    }),
    'Resistance unbalance',
  );
}

/** Predicted against measured: (measured − predicted)/predicted × 100, in percent (positive: measured higher). */
export function compareResistance(predicted: number, measured: number): number {
  return ((measured - predicted) / predicted) * 100;
}
