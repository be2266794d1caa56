/**
 * The test loop as a transformer winding round the back iron: a sinusoidal flux of peak B·A through N turns
 * induces the rms voltage
 *
 *   E = √2·π·f·N·B·A        (= 4.44·f·N·B·A; the transformer EMF equation, the same as docs/engineering/flux-density.md's
 *                            E = 4.44·f·N·Φ with Φ = B·A and no winding factor: the loop links all the flux)
 *
 * B is the peak flux density in the back iron (tesla), A its net cross-section (m²). Solved for B or N.
 * Example A core, 1.3 T, 50 Hz, A 2.85e-3 m²: 4.4429·50·1.3·2.85e-3 = 0.82305 V per turn [derived].
 */
import { EMF_CONSTANT } from '../flux';

/** E = √2·π·f·N·B·A, volts rms. */
export const loopVoltageV = (frequencyHz: number, turns: number, fluxDensityT: number, areaM2: number): number =>
  EMF_CONSTANT * frequencyHz * turns * fluxDensityT * areaM2;

/** B = E/(√2·π·f·N·A), tesla peak: the density a voltage drives round the core. */
export const loopFluxDensityT = (voltageV: number, frequencyHz: number, turns: number, areaM2: number): number =>
  voltageV / (EMF_CONSTANT * frequencyHz * turns * areaM2);

/**
 * Fewest whole turns that keep the density at or below the target on the available supply:
 * N = ⌈E/(√2·π·f·B·A)⌉ (rounding up lowers B; rounding down would over-flux the core). Never below 1.
 */
export function loopTurnsFor(supplyVoltageV: number, frequencyHz: number, fluxDensityT: number, areaM2: number): number {
  const exact = supplyVoltageV / (EMF_CONSTANT * frequencyHz * fluxDensityT * areaM2);
  // A tolerance so that an exact fit (e.g. 230.0000001 turns from rounding) is not pushed one turn up.
  return Math.max(1, Math.ceil(exact - 1e-9));
}
