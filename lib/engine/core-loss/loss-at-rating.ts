/**
 * The change in the core's loss at the motor's own working density, from the loop tests' change in W/kg:
 *
 *   ΔP_fe = (p_ref,after − p_ref,before)·m_y·(B_y,rated/B_ref)²
 *
 * with B_y,rated the back-iron density of the winding at rated voltage (docs/engineering/flux-density.md) and the same B²
 * assumption as specific-loss.ts. Only meaningful at the test frequency: the caller passes null when the
 * tests ran at another frequency than the rating. Back iron only: the teeth see other densities and are
 * left out (stated on the screen) [common practice approximation].
 * Check [derived]: (1.8362 − 1.6977) W/kg · 14.726 kg · (1.2045/1.3)² = 1.7513 W.
 */
import { LOSS_DENSITY_EXPONENT } from './specific-loss';

export const coreLossChangeAtRatingW = (
  wattsPerKgBefore: number,
  wattsPerKgAfter: number,
  backIronMassKg: number,
  ratedBackIronT: number,
  referenceT: number,
): number => (wattsPerKgAfter - wattsPerKgBefore) * backIronMassKg * (ratedBackIronT / referenceT) ** LOSS_DENSITY_EXPONENT;
