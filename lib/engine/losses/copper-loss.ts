/**
 * Stator copper (I²R) loss of a three-phase winding at a line current:
 *
 *   P_cu = 3·I_ph²·R_ph       with I_ph = I (star) or I/√3 (delta)
 *        = 1.5·I²·R_LL        (R_LL line-to-line: star 2·R_ph, delta (2/3)·R_ph; the form IEEE 112 and
 *                              IEC 60034-2-1 write it in [from memory]; the two are equal [derived])
 *
 * Check [derived]: example A winding, R_ph(20 °C) 1.4293 Ω, class F → 115 °C: ×349.5/254.5 = 1.9628 Ω;
 * at 5 A star: 3·25·1.9628 = 147.21 W.
 */
import type { Connection } from '../resistance';

export const phaseCurrentA = (lineCurrentA: number, connection: Connection): number =>
  connection === 'star' ? lineCurrentA : lineCurrentA / Math.sqrt(3);

/** P_cu = 3·I_ph²·R_ph, watts. */
export const statorCopperLossW = (lineCurrentA: number, phaseOhm: number, connection: Connection): number =>
  3 * phaseCurrentA(lineCurrentA, connection) ** 2 * phaseOhm;
