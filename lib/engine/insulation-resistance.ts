/**
 * Insulation resistance (IR) and polarization index (PI) rules of IEEE 43.
 */
import type { InsulationClass } from './nameplate';
import { fail, ok, type EngineResult } from './result';
import type { Verdict } from './verdict';

/**
 * IR corrected to 40 °C: IR_40 = IR_T·0.5^((40 − T)/10), i.e. IR halves for every 10 °C rise (IEEE 43).
 * An approximation: IEEE 43 itself prefers measuring at a known temperature or a measured curve.
 */
export function irCorrectedTo40C(irMOhm: number, temperatureC: number): number {
  return irMOhm * 0.5 ** ((40 - temperatureC) / 10);
}

/** Polarization index: PI = IR_10min/IR_1min (IEEE 43). */
export function polarizationIndex(ir1MinMOhm: number, ir10MinMOhm: number): number {
  return ir10MinMOhm / ir1MinMOhm;
}

/** Minimum PI (IEEE 43): 1.5 for class A insulation, 2.0 for classes B, F and H. */
export function minimumPolarizationIndex(insulationClass: InsulationClass): number {
  return insulationClass === 'A' ? 1.5 : 2.0;
}

/**
 * Which IEEE 43 minimum applies: 'older' windings (most made before about 1970, field windings and
 * others not listed), 'form-wound' (most AC windings built after about 1970 with form-wound coils), or
 * 'random-wound' (random-wound stators, and form-wound coils rated below 1 kV).
 */
export type IrMinimumCategory = 'older' | 'form-wound' | 'random-wound';

/** Minimum IR_1min at 40 °C, MΩ (IEEE 43): older kV + 1, form-wound 100, random-wound 5. */
export function minimumIr1MinMOhm(category: IrMinimumCategory, ratedLineVoltageV: number): number {
  if (category === 'older') return ratedLineVoltageV / 1000 + 1;
  return category === 'form-wound' ? 100 : 5;
}

const CATEGORY_TEXT: Readonly<Record<IrMinimumCategory, string>> = {
  older: 'kV + 1 MΩ (older windings)',
  'form-wound': '100 MΩ (form-wound, after about 1970)',
  'random-wound': '5 MΩ (random-wound, or below 1 kV)',
};

/** Recommended IR/PI test voltage range, V DC, with the rule text. */
export interface IrTestVoltage {
  minV: number;
  maxV: number;
  rule: string;
}

/**
 * DC test voltage for IR and PI by winding rating (IEEE 43): below 1000 V → 500 V. Higher ratings
 * [from memory: IEEE 43 Table 1]: 1000–2500 V → 500–1000 V; 2501–5000 V → 1000–2500 V;
 * 5001–12 000 V → 2500–5000 V; above 12 000 V → 5000–10 000 V.
 */
export function irTestVoltageDc(ratedLineVoltageV: number): IrTestVoltage {
  const v = ratedLineVoltageV;
  if (v < 1000) return { minV: 500, maxV: 500, rule: 'IEEE 43: 500 V DC for windings rated below 1000 V' };
  const band: [number, number, string] =
    v <= 2500
      ? [500, 1000, '1000–2500 V']
      : v <= 5000
        ? [1000, 2500, '2501–5000 V']
        : v <= 12000
          ? [2500, 5000, '5001–12 000 V']
          : [5000, 10000, 'above 12 000 V'];
  return {
    minV: band[0],
    maxV: band[1],
    // Bands recalled [from memory] from IEEE 43's table; the sheet names the standard.
    rule: `IEEE 43: ${band[0]}–${band[1]} V DC for windings rated ${band[2]}`,
  };
}

const invalidReading = (field: string): EngineResult<never> =>
  fail('invalid-input', `${field} must be a number of megohms, zero or more.`, 'Enter the megohmmeter reading.', field);

/**
 * IR verdict: IR_1min corrected to 40 °C (approximation above) must reach the IEEE 43 minimum for the
 * winding's category.
 */
export function insulationResistanceVerdict(input: {
  ir1MinMOhm: number;
  temperatureC: number;
  category: IrMinimumCategory;
  ratedLineVoltageV: number;
}): EngineResult<Verdict> {
  if (!(input.ir1MinMOhm >= 0) || !Number.isFinite(input.ir1MinMOhm)) return invalidReading('ir1MinMOhm');
  if (!Number.isFinite(input.temperatureC) || !Number.isFinite(input.ratedLineVoltageV) || input.ratedLineVoltageV < 0) {
    return fail('invalid-input', 'Temperature and rated voltage must be numbers.', 'Fill in both.', 'temperatureC');
  }
  const value = irCorrectedTo40C(input.ir1MinMOhm, input.temperatureC);
  const limit = minimumIr1MinMOhm(input.category, input.ratedLineVoltageV);
  if (!Number.isFinite(value))
    return fail('non-finite-result', 'The corrected IR is out of range.', 'Check the temperature.', 'temperatureC');
  return ok({
    pass: value >= limit,
    value,
    limit,
    rule: `IEEE 43: IR 1 min at 40 °C ≥ ${CATEGORY_TEXT[input.category]}; corrected by 0.5^((40 − T)/10) (approximation)`,
  });
}

/** Above this IR_1min at 40 °C (MΩ), IEEE 43 lets the PI be disregarded [from memory]. */
export const PI_NOT_REQUIRED_ABOVE_MOHM = 5000;

/**
 * PI verdict (IEEE 43): PI = IR_10/IR_1 ≥ 1.5 (class A) or 2.0 (B, F, H). When IR_1 at 40 °C exceeds
 * 5000 MΩ the PI is not meaningful and the verdict passes with that noted [from memory].
 */
export function polarizationIndexVerdict(input: {
  ir1MinMOhm: number;
  ir10MinMOhm: number;
  temperatureC: number;
  insulationClass: InsulationClass;
}): EngineResult<Verdict> {
  if (!(input.ir1MinMOhm > 0) || !Number.isFinite(input.ir1MinMOhm)) return invalidReading('ir1MinMOhm');
  if (!(input.ir10MinMOhm >= 0) || !Number.isFinite(input.ir10MinMOhm)) return invalidReading('ir10MinMOhm');
  if (!Number.isFinite(input.temperatureC)) {
    return fail('invalid-input', 'The winding temperature must be a number.', 'Enter the temperature in °C.', 'temperatureC');
  }
  const value = polarizationIndex(input.ir1MinMOhm, input.ir10MinMOhm);
  if (!Number.isFinite(value)) {
    return fail('non-finite-result', 'The PI is out of range.', 'Check both megohmmeter readings.', 'ir1MinMOhm');
  }
  const limit = minimumPolarizationIndex(input.insulationClass);
  const rule = `IEEE 43: PI ≥ ${limit.toFixed(1)} for class ${input.insulationClass} insulation`;
  const ir40 = irCorrectedTo40C(input.ir1MinMOhm, input.temperatureC);
  if (ir40 > PI_NOT_REQUIRED_ABOVE_MOHM) {
    // The 5000 MΩ exemption is recalled [from memory] from IEEE 43.
    return ok({ pass: true, value, limit, rule: `${rule}; not required as IR 1 min at 40 °C exceeds 5000 MΩ` });
  }
  return ok({ pass: value >= limit, value, limit, rule });
}
