/**
 * Enamel build: how much the insulation adds to a round wire's diameter.
 *
 * APPROXIMATION. The IEC 60317-0-1 minimum-increase and maximum-overall-diameter tables are not held here
 * (not recalled reliably enough to type in). Instead, a typical grade-2 (heavy build) increase is modelled
 * as a power law Δ = c·d^x through the two end points of the reference's statement "heavy/grade-2 build is
 * about 5–8 % over bare for 0.5–1.6 mm wire" [derived from IS 13730-0-1]: 8 % at 0.5 mm and 5 % at 1.6 mm.
 * Grades 1 and 3 scale that increase by 0.6 and 1.4 [from memory: the IEC grade steps are roughly even,
 * and AWG single/heavy/triple builds are one, two and three film thicknesses]. Outside 0.5–1.6 mm the
 * model is an extrapolation. For slot-fill decisions, prefer a measured overall diameter over a sample.
 */

export type EnamelGrade = 1 | 2 | 3;

/** Reference anchors for the grade-2 model [derived from IS 13730-0-1]. */
export const GRADE2_ANCHORS = {
  small: { bareMm: 0.5, increaseFraction: 0.08 },
  large: { bareMm: 1.6, increaseFraction: 0.05 },
} as const;

/** Grade multipliers on the grade-2 increase [from memory, approximation]. */
export const ENAMEL_GRADE_FACTOR: Readonly<Record<EnamelGrade, number>> = { 1: 0.6, 2: 1, 3: 1.4 };

const { small, large } = GRADE2_ANCHORS;
/** Exponent x of Δ = c·d^x, fitted through both anchors: x − 1 = ln(f_large/f_small)/ln(d_large/d_small). */
export const GRADE2_EXPONENT = 1 + Math.log(large.increaseFraction / small.increaseFraction) / Math.log(large.bareMm / small.bareMm);
/** Coefficient c (mm^(1−x)) of Δ = c·d^x, so that Δ(0.5 mm) = 8 % of 0.5 mm. */
export const GRADE2_COEFFICIENT = (small.increaseFraction * small.bareMm) / small.bareMm ** GRADE2_EXPONENT;

/**
 * Typical increase in diameter from the enamel, mm: Δ = factor(grade)·c·d^x (see the file comment:
 * an approximation fitted to the reference, not the IEC table).
 */
export function enamelIncreaseMm(bareDiameterMm: number, grade: EnamelGrade): number {
  return ENAMEL_GRADE_FACTOR[grade] * GRADE2_COEFFICIENT * bareDiameterMm ** GRADE2_EXPONENT;
}

/** Typical overall (insulated) diameter, mm: d + Δ (approximation, see enamelIncreaseMm). */
export function typicalOverallDiameterMm(bareDiameterMm: number, grade: EnamelGrade): number {
  return bareDiameterMm + enamelIncreaseMm(bareDiameterMm, grade);
}
