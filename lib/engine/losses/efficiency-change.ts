/**
 * Efficiency after a change in losses, other losses unchanged:
 *
 *   losses before  L₀ = P_out·(1/η₀ − 1)         (from the nameplate efficiency η₀ at rated output)
 *   losses after   L₁ = L₀ + ΔP_cu + ΔP_fe
 *   efficiency     η₁ = P_out/(P_out + L₁)        (same output)
 *
 * [derived from η = P_out/(P_out + losses), the loss-summation definition of IEEE 112 and IEC 60034-2-1].
 * Check [derived]: 7.5 kW at 90.0 %: L₀ = 833.33 W; +50 W → η₁ = 7500/8383.33 = 89.463 %, −0.537 points.
 */
export interface EfficiencyChange {
  lossesBeforeW: number;
  lossesAfterW: number;
  efficiencyBefore: number;
  efficiencyAfter: number;
  /** (η₁ − η₀)·100, percentage points. */
  changePoints: number;
}

/** η₁ from η₀, the rated output and the change in losses. Efficiencies as fractions (0.9 = 90 %). */
export function efficiencyAfterLossChange(outputW: number, efficiencyBefore: number, lossChangeW: number): EfficiencyChange | null {
  if (!(outputW > 0 && efficiencyBefore > 0 && efficiencyBefore < 1 && Number.isFinite(lossChangeW))) return null;
  const lossesBeforeW = outputW * (1 / efficiencyBefore - 1);
  const lossesAfterW = lossesBeforeW + lossChangeW;
  if (!(lossesAfterW > 0)) return null;
  const efficiencyAfter = outputW / (outputW + lossesAfterW);
  return { lossesBeforeW, lossesAfterW, efficiencyBefore, efficiencyAfter, changePoints: (efficiencyAfter - efficiencyBefore) * 100 };
}
