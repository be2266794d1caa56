/**
 * What a rewound motor is expected to deliver on its new supply, from the usual same-core assumptions:
 * flux density and current density kept, so the torque is kept; power then follows the speed, and the
 * line current follows power over voltage (power scales with V·I at equal efficiency and power factor).
 */
import { synchronousSpeedRpm } from '../speed';
import type { ExpectedRating, RedesignOriginal, RedesignTarget } from './types';

/** Stated with every redesign; the sheet prints them beside the figures. */
export const RATING_ASSUMPTIONS: readonly string[] = [
  // [derived] from the flux and current-density equivalence (reference §3); printed without the marker.
  'Torque is kept: the new winding keeps the gap flux density and the current density of the original in the same core.',
  'Power follows the synchronous speed: P_new = P_old × n_new/n_old; with a frequency change the speed and the power change together.',
  'Line current follows power over voltage (P = √3·V·I·η·cos φ with efficiency and power factor unchanged): I_new = I_old × (P_new/P_old) × (V_old/V_new).',
  'Slip is taken as the same fraction of synchronous speed as on the original nameplate.',
  'A pole change also alters power factor, efficiency and starting performance: these figures are first estimates for a qualified person to review.',
];

/** Speed, power, current and torque ratios for a supply change (see RATING_ASSUMPTIONS). */
export function expectedRating(
  original: RedesignOriginal,
  target: Pick<RedesignTarget, 'lineVoltageV' | 'frequencyHz' | 'poles'>,
): ExpectedRating {
  const synchronousRpmOld = synchronousSpeedRpm(original.supply.frequencyHz, original.winding.poles);
  const synchronousRpmNew = synchronousSpeedRpm(target.frequencyHz, target.poles);
  const speedRatio = synchronousRpmNew / synchronousRpmOld;
  const powerRatio = speedRatio;
  return {
    synchronousRpmOld,
    synchronousRpmNew,
    speedRatio,
    powerRatio,
    lineCurrentRatio: (powerRatio * original.supply.lineVoltageV) / target.lineVoltageV,
    torqueRatio: 1,
    assumptions: [...RATING_ASSUMPTIONS],
  };
}

/** Phase current per line ampere: star 1, delta 1/√3. */
export const phasePerLine = (connection: 'star' | 'delta'): number => (connection === 'star' ? 1 : 1 / Math.sqrt(3));
