/**
 * Unit conversions done once, at the edge. Inside the engine every quantity is SI (metres, square metres,
 * tesla, webers, ohms, amperes, volts, hertz, kelvin differences in °C) and names carry their unit.
 */

export const MM_PER_INCH = 25.4;
/** 1 circular mil = (π/4)·(0.001 in)² = 5.067075e-4 mm², i.e. 1 mm² = 1973.525 CM [derived]. */
export const CIRCULAR_MILS_PER_MM2 = 1 / ((Math.PI / 4) * (MM_PER_INCH / 1000) ** 2);
/** 1 T = 1 Wb/m² = 1e8 lines / (1550.0031 in²) = 64.516 kilolines/in² [derived]. */
export const KILOLINES_PER_IN2_PER_TESLA = 1e8 / 1e3 / (1 / (MM_PER_INCH / 1000) ** 2);
export const WATTS_PER_HP = 745.7;
/** International avoirdupois pound, exact by definition. */
export const KG_PER_LB = 0.45359237;
/** 1 lbf·ft = 0.3048 m × 4.4482216152605 N = 1.3558179483 N·m (exact definitions). */
export const NM_PER_LBF_FT = 0.3048 * 4.4482216152605;
/** International foot, exact by definition. */
export const M_PER_FOOT = 0.3048;

export const inchesToMm = (inches: number): number => inches * MM_PER_INCH;
export const mmToInches = (mm: number): number => mm / MM_PER_INCH;
export const mmToM = (mm: number): number => mm / 1000;
export const mToMm = (m: number): number => m * 1000;
export const milsToMm = (mils: number): number => (mils / 1000) * MM_PER_INCH;
export const mmToMils = (mm: number): number => (mm / MM_PER_INCH) * 1000;
export const feetToM = (ft: number): number => ft * M_PER_FOOT;
export const mToFeet = (m: number): number => m / M_PER_FOOT;
export const mm2ToCircularMils = (mm2: number): number => mm2 * CIRCULAR_MILS_PER_MM2;
export const circularMilsToMm2 = (cm: number): number => cm / CIRCULAR_MILS_PER_MM2;
export const teslaToKilolinesPerIn2 = (t: number): number => t * KILOLINES_PER_IN2_PER_TESLA;
export const kilolinesPerIn2ToTesla = (kl: number): number => kl / KILOLINES_PER_IN2_PER_TESLA;
export const hpToKw = (hp: number): number => (hp * WATTS_PER_HP) / 1000;
export const kwToHp = (kw: number): number => (kw * 1000) / WATTS_PER_HP;
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
export const nmToLbfFt = (nm: number): number => nm / NM_PER_LBF_FT;
export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
export const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;
/** Amperes per mm² to circular mils per ampere: CM/A = 1973.5 / J [derived]. */
export const ampsPerMm2ToCmilPerAmp = (j: number): number => CIRCULAR_MILS_PER_MM2 / j;
