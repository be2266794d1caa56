/**
 * Specific core loss from a loop-test reading, and the same loss brought to the planned test density so
 * that tests run at slightly different voltages compare fairly.
 *
 *   B_test  = E/(√2·π·f·N·A)                       (loop-emf.ts; E the applied voltage)
 *   p       = P/m_y                                (W/kg over the back iron; iron-mass.ts)
 *   p_ref   = p·(B_ref/B_test)^2                    (iron loss taken ∝ B² near the working density:
 *                                                   eddy-current loss goes as B², hysteresis as B^1.6–2
 *                                                   [common practice approximation, from memory])
 *
 * Assumptions stated on the screen: the applied voltage stands for the induced EMF (the loop's own
 * resistance drop is neglected), and the meter's watts are the core's loss (loop copper loss neglected).
 * Check [derived]: 25 W on a 14.726 kg back iron = 1.6977 W/kg; at 1.25 T, brought to 1.3 T: ×1.0816 = 1.8362 W/kg.
 */
import { fail, ok, type EngineResult } from '../result';
import { loopFluxDensityT } from './loop-emf';

/** Exponent of B in the normalisation p ∝ B^n [common practice approximation]. */
export const LOSS_DENSITY_EXPONENT = 2;
/** Readings more than this fraction away from the planned density normalise poorly: the screen says so. */
export const NORMALISATION_WARNING_FRACTION = 0.1;

export interface LoopReading {
  voltageV: number;
  currentA: number;
  watts: number;
  frequencyHz: number;
  turns: number;
}

export interface SpecificLoss {
  fluxDensityT: number;
  wattsPerKg: number;
  /** W/kg brought to the reference (planned) density. */
  wattsPerKgAtReference: number;
  referenceFluxDensityT: number;
  /** |B_test/B_ref − 1| > 10 %: the comparison leans on the B² assumption. */
  farFromReference: boolean;
  /** Apparent power E·I, VA, and the power factor P/(E·I) of the reading. */
  apparentPowerVA: number;
  powerFactor: number;
}

/** W/kg of one reading over the back-iron mass, and at the reference density. */
export function specificLoss(
  r: LoopReading,
  backIronAreaM2: number,
  backIronMassKg: number,
  referenceFluxDensityT: number,
): EngineResult<SpecificLoss> {
  const need: [number, string][] = [
    [r.voltageV, 'voltageV'],
    [r.currentA, 'currentA'],
    [r.frequencyHz, 'frequencyHz'],
    [r.turns, 'turns'],
    [backIronAreaM2, 'backIronAreaM2'],
    [backIronMassKg, 'backIronMassKg'],
    [referenceFluxDensityT, 'referenceFluxDensityT'],
  ];
  for (const [v, field] of need)
    if (!(Number.isFinite(v) && v > 0))
      return fail('invalid-input', `${field} must be more than zero (got ${v}).`, 'Check the test reading and the core data.', field);
  if (!(Number.isFinite(r.watts) && r.watts >= 0))
    return fail('invalid-input', `Watts must be zero or more (got ${r.watts}).`, 'Enter the wattmeter reading.', 'watts');
  const fluxDensityT = loopFluxDensityT(r.voltageV, r.frequencyHz, r.turns, backIronAreaM2);
  const wattsPerKg = r.watts / backIronMassKg;
  const wattsPerKgAtReference = wattsPerKg * (referenceFluxDensityT / fluxDensityT) ** LOSS_DENSITY_EXPONENT;
  const apparentPowerVA = r.voltageV * r.currentA;
  const value: SpecificLoss = {
    fluxDensityT,
    wattsPerKg,
    wattsPerKgAtReference,
    referenceFluxDensityT,
    farFromReference: Math.abs(fluxDensityT / referenceFluxDensityT - 1) > NORMALISATION_WARNING_FRACTION,
    apparentPowerVA,
    powerFactor: r.watts / apparentPowerVA,
  };
  return [fluxDensityT, wattsPerKg, wattsPerKgAtReference, value.powerFactor].every(Number.isFinite)
    ? ok(value)
    : fail('non-finite-result', 'The specific loss did not come out as a finite number.', 'Check the reading.');
}
