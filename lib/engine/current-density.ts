/**
 * Current density in the stator conductors, in A/mm² and in circular mils per ampere.
 */
import type { Connection } from './resistance';
import { fail, finiteOr, type EngineResult } from './result';
import { ampsPerMm2ToCmilPerAmp } from './units';

/** Inputs for the current density of one winding. */
export interface CurrentDensityInput {
  /** Full-load line current, A. */
  lineCurrentA: number;
  connection: Connection;
  /** Parallel paths per phase, a. */
  parallelPaths: number;
  /** Bare copper area of one turn (all wires in hand), mm². */
  conductorAreaPerTurnMm2: number;
}

/** Phase and path current and the resulting current density. */
export interface CurrentDensity {
  /** Star: I_line; delta: I_line/√3. */
  phaseCurrentA: number;
  /** Current in one parallel path: I_phase/a. */
  pathCurrentA: number;
  /** J = I_path / A_turn, A/mm². */
  ampsPerMm2: number;
  /** CM/A = 1973.5/J [derived]. */
  circularMilsPerAmp: number;
}

/**
 * J = (I_phase/a)/A_turn, with I_phase = I_line (star) or I_line/√3 (delta); CM/A = 1973.5/J [derived].
 * Expects finite positive inputs; currentDensityChecked() validates first.
 */
export function currentDensity(input: CurrentDensityInput): CurrentDensity {
  const phaseCurrentA = input.connection === 'star' ? input.lineCurrentA : input.lineCurrentA / Math.sqrt(3);
  const pathCurrentA = phaseCurrentA / input.parallelPaths;
  const ampsPerMm2 = pathCurrentA / input.conductorAreaPerTurnMm2;
  return { phaseCurrentA, pathCurrentA, ampsPerMm2, circularMilsPerAmp: ampsPerMm2ToCmilPerAmp(ampsPerMm2) };
}

/** currentDensity with its inputs checked: an 'invalid-input' error names the first bad field. */
export function currentDensityChecked(input: CurrentDensityInput): EngineResult<CurrentDensity> {
  const fields: [keyof CurrentDensityInput, number][] = [
    ['lineCurrentA', input.lineCurrentA],
    ['parallelPaths', input.parallelPaths],
    ['conductorAreaPerTurnMm2', input.conductorAreaPerTurnMm2],
  ];
  for (const [field, value] of fields) {
    if (!(value > 0) || !Number.isFinite(value)) {
      return fail('invalid-input', `${field} must be a positive number.`, 'Fill in the current and the wire data.', field);
    }
  }
  const result = currentDensity(input);
  // A product of finite numbers can still overflow; both outputs must be finite and positive.
  const product = result.ampsPerMm2 * result.circularMilsPerAmp;
  return finiteOr(result.ampsPerMm2 > 0 && result.circularMilsPerAmp > 0 ? product : Number.NaN, () => result, 'Current density');
}

/** A typical current-density range with its source. */
export interface CurrentDensityRange {
  minAPerMm2: number;
  maxAPerMm2: number;
  /** Where the range comes from, as shown to the user. */
  source: string;
}

/**
 * Textbook current densities for induction-motor stator windings [from memory; keep configurable and
 * compare new against old first]: 3–5 A/mm² (Sawhney), 3–8 A/mm² for totally enclosed machines (Pyrhönen).
 */
export const TYPICAL_CURRENT_DENSITY: Readonly<Record<'inductionStator' | 'totallyEnclosed', CurrentDensityRange>> = {
  inductionStator: {
    minAPerMm2: 3,
    maxAPerMm2: 5,
    // Both ranges are recalled [from memory]; the printed source names the book only.
    source: 'Sawhney, A Course in Electrical Machine Design: induction-motor stators',
  },
  totallyEnclosed: {
    minAPerMm2: 3,
    maxAPerMm2: 8,
    source: 'Pyrhönen et al., Design of Rotating Electrical Machines: totally enclosed machines',
  },
};
