/**
 * Mean magnetic path length of the back iron: the circumference at the middle of the yoke,
 *
 *   l_m = π·(D_o − d_y)
 *
 * (the mean diameter of a ring of outside diameter D_o and radial depth d_y is D_o − d_y) [derived].
 * Example A core: π·(240 − 25) mm = 675.44 mm [derived].
 */
export const meanMagneticPathM = (outsideDiameterM: number, backIronDepthM: number): number =>
  Math.PI * (outsideDiameterM - backIronDepthM);
