/**
 * Iron mass of the stator core.
 *
 *   back iron   m_y = ρ_fe·A_y·l_m                                   (ring of section A_y on its mean path)
 *   teeth       m_t = ρ_fe·L_fe·[π/4·((D + 2h_s)² − D²) − S·h_s·(b_top + b_bottom)/2]
 *   whole core  m   = m_y + m_t
 *
 * ρ_fe = 7650 kg/m³ for non-oriented silicon (electrical) steel [from memory: 7600–7750 kg/m³ depending on
 * the silicon content; configurable by passing another density]. The loop test's W/kg is taken over the
 * back iron, the iron the test flux passes through [common practice]; the whole-core mass is for handling.
 * Example A core: m_y = 7650·2.85e-3·0.67544 = 14.726 kg [derived].
 */
export const SILICON_STEEL_DENSITY_KG_PER_M3 = 7650;

export const backIronMassKg = (areaM2: number, meanPathM: number, densityKgPerM3 = SILICON_STEEL_DENSITY_KG_PER_M3): number =>
  densityKgPerM3 * areaM2 * meanPathM;

/** Teeth between bore and slot bottom: annulus minus trapezoidal slots, times the net iron length. */
export function teethMassKg(
  t: { boreM: number; slotDepthM: number; slots: number; slotWidthTopM: number; slotWidthBottomM: number; netIronLengthM: number },
  densityKgPerM3 = SILICON_STEEL_DENSITY_KG_PER_M3,
): number {
  const annulus = (Math.PI / 4) * ((t.boreM + 2 * t.slotDepthM) ** 2 - t.boreM ** 2);
  const slots = t.slots * t.slotDepthM * ((t.slotWidthTopM + t.slotWidthBottomM) / 2);
  return densityKgPerM3 * t.netIronLengthM * Math.max(0, annulus - slots);
}
