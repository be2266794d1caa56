/**
 * Copper a winding puts into the stator, per wire size, to check a candidate against the kilograms on hand.
 * m = 3·C·N_c·MLT·n·A·ρ_Cu for each size (C coils per phase, n wires of that size in hand, A its bare area),
 * with ρ_Cu = 8890 kg/m³ (IEC 60028 annealed copper). No allowance for leads and waste is added here: the
 * winder's bench pack adds the shop's allowance.
 */
import type { RedesignOriginal, WireSet } from './types';
import { meanSpan } from './families';

/** Density of annealed copper, kg/m³ (IEC 60028). */
export const COPPER_DENSITY_KG_PER_M3 = 8890;
/** End-turn length per coil end over the chord at mid-slot [common practice, from memory: 1.2 for random-wound lap coils]. */
const END_TURN_FACTOR = 1.2;
/** Straight extension of a coil beyond the core at each end, m [common practice, from memory: 10–20 mm on small motors]. */
const STRAIGHT_EXTENSION_M = 0.015;

/**
 * Mean turn length of a new layout, mm. With the as-found MLT: the core length is kept and the end turns
 * scale with the mean span [derived approximation]. Without it: 2·(L + 2·e) + 2·k·(π(D + d)/S)·ȳ, the
 * chord at mid-slot times an end-turn factor [common practice, from memory]. The winder checks it against
 * the old coils.
 */
export function meanTurnLengthMm(original: RedesignOriginal, newMeanSpan: number): number {
  const coreMm = original.core.coreLengthM * 1000;
  const ow = original.winding;
  const oldSpan = meanSpan(ow.spans, ow.turnsPerCoil);
  const m = original.meanTurnLengthMm;
  if (m !== undefined) {
    const endOld = (m - 2 * coreMm) / 2;
    if (!(endOld > 0) || !(oldSpan > 0)) return m;
    return 2 * coreMm + 2 * endOld * (newMeanSpan / oldSpan);
  }
  const { boreM, slotDepthM, slots } = original.core;
  const chordM = (Math.PI * (boreM + slotDepthM)) / slots;
  return 1000 * (2 * (original.core.coreLengthM + 2 * STRAIGHT_EXTENSION_M) + 2 * END_TURN_FACTOR * chordM * newMeanSpan);
}

/** Copper mass per size of a wire set on a layout, kg (in the order of the set's parts). */
export function wireMassKg(wires: WireSet, coilsPerPhase: number, turnsPerCoil: number, mltMm: number): number[] {
  const lengthPerStrandM = 3 * coilsPerPhase * turnsPerCoil * (mltMm / 1000);
  return wires.parts.map((p) => lengthPerStrandM * p.count * p.wire.areaMm2 * 1e-6 * COPPER_DENSITY_KG_PER_M3);
}
