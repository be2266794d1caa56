/**
 * Speed, slip, pole count and torque of induction motors from nameplate data.
 */
import { fail, ok, type EngineResult } from './result';
import { hpToKw } from './units';

/** Synchronous speed, rpm: n_s = 120·f/P. */
export function synchronousSpeedRpm(frequencyHz: number, poles: number): number {
  return (120 * frequencyHz) / poles;
}

/** Slip as a fraction: s = (n_s − n)/n_s. */
export function slip(synchronousRpm: number, rpm: number): number {
  return (synchronousRpm - rpm) / synchronousRpm;
}

/** Most poles accepted when inferring from speed; beyond that the speed is taken as a typing error. */
export const MAX_POLES_FROM_SPEED = 128;

/** Largest slip this module treats as "normal" when inferring poles from speed [common practice]. */
export const MAX_NORMAL_SLIP = 0.15;

/** Error messages of polesFromSpeed, pinned by the tests. */
export const POLES_FROM_SPEED_MESSAGES = {
  invalid: 'Frequency and speed must be positive numbers.',
  tooFast: 'The speed is above the synchronous speed of a 2-pole machine at this frequency.',
  slipTooHigh: 'The speed gives an unusually high slip for any pole count.',
  tooSlow: 'The speed is too low for an induction motor at this frequency.',
} as const;

/**
 * Pole count from rated speed, assuming normal slip: P = 2·floor(60·f/n), right while the slip is below
 * 1/(p + 1) (n above the synchronous speed of the next pole count) [derived]. 60 Hz 1750 rpm → 4;
 * 50 Hz 965 rpm → 6. Errors when the inputs are not positive, when n exceeds 60·f (faster than 2 poles),
 * when more than MAX_POLES_FROM_SPEED poles would result, or when the implied slip exceeds MAX_NORMAL_SLIP.
 */
export function polesFromSpeed(frequencyHz: number, rpm: number): EngineResult<number> {
  if (!(frequencyHz > 0) || !(rpm > 0) || !Number.isFinite(frequencyHz) || !Number.isFinite(rpm)) {
    return fail('invalid-input', POLES_FROM_SPEED_MESSAGES.invalid, 'Enter the nameplate frequency and speed.', 'rpm');
  }
  // The small allowance keeps an exactly synchronous speed (1500 rpm at 50 Hz) from rounding down.
  const pairs = Math.floor((60 * frequencyHz) / rpm + 1e-9);
  if (pairs < 1) {
    return fail('invalid-input', POLES_FROM_SPEED_MESSAGES.tooFast, 'Check the speed and the frequency.', 'rpm');
  }
  const poles = 2 * pairs;
  if (poles > MAX_POLES_FROM_SPEED) {
    return fail('invalid-input', POLES_FROM_SPEED_MESSAGES.tooSlow, 'Check the speed and the frequency.', 'rpm');
  }
  if (slip(synchronousSpeedRpm(frequencyHz, poles), rpm) > MAX_NORMAL_SLIP) {
    return fail(
      'not-applicable',
      POLES_FROM_SPEED_MESSAGES.slipTooHigh,
      'Count the poles from the winding instead, or check the nameplate speed.',
      'rpm',
    );
  }
  return ok(poles);
}

/** N·m per (kW/rpm): 60 000/(2π) ≈ 9549. */
export const NM_PER_KW_PER_RPM = 60_000 / (2 * Math.PI);

/** Torque, N·m: T = 9549·P[kW]/n[rpm] (exactly 60 000/(2π)). */
export function torqueNm(kw: number, rpm: number): number {
  return (NM_PER_KW_PER_RPM * kw) / rpm;
}

/** Torque, N·m, from horsepower (1 hp = 745.7 W). */
export function torqueNmFromHp(hp: number, rpm: number): number {
  return torqueNm(hpToKw(hp), rpm);
}
