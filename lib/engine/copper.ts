/**
 * Copper conductor constants.
 */

/** Resistivity of annealed copper at 20 °C, ρ20 = 1/58 Ω·mm²/m (IEC 60028, 100 % IACS). */
export const COPPER_RESISTIVITY_20C_OHM_MM2_PER_M = 1 / 58;

/**
 * Inferred zero-resistance temperature of copper, °C below zero: 234.5 (IEEE practice, e.g. IEEE 112);
 * IEC 60034 uses 235. R_t2 = R_t1·(k + t2)/(k + t1).
 */
export type CopperTempConstant = 234.5 | 235;
/** 234.5 °C (IEEE practice) and 235 °C (IEC 60034). */
export const COPPER_TEMP_CONSTANT_IEEE: CopperTempConstant = 234.5;
export const COPPER_TEMP_CONSTANT_IEC: CopperTempConstant = 235;

/** Reference temperature of ρ20, °C. */
export const REFERENCE_TEMPERATURE_C = 20;

/** Density of annealed copper at 20 °C, 8890 kg/m³ (IEC 60028: 8.89 g/cm³). */
export const COPPER_DENSITY_KG_PER_M3 = 8890;

/**
 * Mass of a copper conductor, kg = length × bare area × density: L[m] × A[mm²] × 10⁻⁶ × 8890 kg/m³
 * (IEC 60028). Enamel is not counted (a few per cent of the copper; quoting adds an allowance).
 * Check [derived]: 564.48 m of 0.85 mm wire (A = π/4 × 0.85² = 0.567450 mm²) → 2.8476 kg.
 */
export function copperMassKg(lengthM: number, bareAreaMm2: number): number {
  return lengthM * bareAreaMm2 * 1e-6 * COPPER_DENSITY_KG_PER_M3;
}
