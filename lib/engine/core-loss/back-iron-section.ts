/**
 * Back-iron (yoke) cross-section, the area the loop test's flux passes through.
 *
 *   d_y  = (D_o − D)/2 − h_s                (back-iron depth; docs/engineering/flux-density.md)
 *   L_fe = (L − n_d·w_d)·k_fe                (net iron length: vent ducts out, stacking factor applied)
 *   A_y  = d_y·L_fe
 *
 * Example A core (D_o 240, D 150, h_s 20, L 120 mm, k_fe 0.95): d_y 25 mm, L_fe 114 mm, A_y 2850 mm² [derived].
 */
import type { CoreRing } from './core-ring';

export interface BackIronSection {
  depthM: number;
  netIronLengthM: number;
  areaM2: number;
}

/** Back-iron depth, net iron length and cross-section, m and m². The ring must be checked first. */
export function backIronSection(c: CoreRing): BackIronSection {
  const depthM = (c.outsideDiameterM - c.boreM) / 2 - c.slotDepthM;
  const netIronLengthM = (c.coreLengthM - (c.ventDucts ?? 0) * (c.ventDuctWidthM ?? 0)) * c.stackingFactor;
  return { depthM, netIronLengthM, areaM2: depthM * netIronLengthM };
}
