/**
 * Space harmonics of the three-phase stator MMF, computed from the layout with balanced sinusoidal currents
 * [derived; verified numerically by FFT of the slot-current staircase in tests/unit/engine].
 *
 * With i_x = I·cos(ωt − β_x) and X_x[n] = Σ polarity·turns·e^{j n θ_s} (slot-star.ts), the MMF step function
 * has, at mechanical order n, a forward wave of amplitude I·|Σ_x e^{−jβ_x} X_x[n]|/(2πn) and a backward wave
 * of amplitude I·|Σ_x e^{+jβ_x} X_x[n]|/(2πn) ampere-turns (working wave: (3/2)·(4/π)·k_w1·N_ph/P per
 * ampere). The current sequence (β_B = ±120°) is chosen so the working wave runs forward. For a balanced
 * winding this gives: triplens cancelled, ν = 6k+1 forward at n_s/ν, ν = 6k−1 backward at n_s/ν, amplitude
 * relative to the working wave (k_wν/ν)/k_w1.
 * These are space harmonics; time harmonics of the supply current turn at ν times synchronous speed.
 */
import { magnitude, PHASES, SlotStar, ZERO_FACTOR, type Phasor } from './slot-star';
import type { Phase, SlotTable } from './winding-layout';

/** Direction of a space harmonic relative to the working wave ("both": pulsating, only in unbalanced layouts). */
export type MmfDirection = 'forward' | 'backward' | 'both' | 'cancelled';

/** One order of the three-phase MMF. */
export interface MmfHarmonic {
  /** Electrical order ν = n/p. */
  order: number;
  mechanicalOrder: number;
  /** Forward and backward wave amplitudes relative to the working wave. */
  forward: number;
  backward: number;
  /** Peak of order ν relative to the working wave (forward + backward). */
  relativeAmplitude: number;
  /** What one phase alone would give: (k_wν/ν)/k_w1 of phase A. */
  singlePhaseRelative: number;
  direction: MmfDirection;
  /** Speed as a fraction of synchronous speed: +1/ν forward, −1/ν backward, 0 when cancelled. */
  speedFraction: number;
  /** Speed in rpm: speedFraction·120 f / P. */
  speedRpm: number;
}

/** The whole spectrum, with the working-wave amplitude and synchronous speed. */
export interface MmfSpectrum {
  /** Working-wave amplitude in ampere-turns per ampere (peak) of coil current. */
  fundamentalAmpereTurnsPerAmp: number;
  /** Phase-current sequence that makes the working wave run forward. */
  currentSequence: 'ABC' | 'ACB';
  synchronousRpm: number;
  harmonics: MmfHarmonic[];
}

const rotate = (z: Phasor, deg: number): Phasor => {
  const r = (deg * Math.PI) / 180;
  return { re: z.re * Math.cos(r) - z.im * Math.sin(r), im: z.re * Math.sin(r) + z.im * Math.cos(r) };
};

/** Current phase lag β_x in degrees for a sequence. */
export const currentLagDeg = (sequence: 'ABC' | 'ACB'): Record<Phase, number> =>
  sequence === 'ABC' ? { A: 0, B: 120, C: 240 } : { A: 0, B: 240, C: 120 };

/** |Σ_x e^{∓jβ_x} X_x[n]|: sign −1 gives the forward wave, +1 the backward wave. */
function waveSum(star: SlotStar, n: number, lag: Record<Phase, number>, sign: 1 | -1): number {
  const x = star.phasors(n);
  let re = 0;
  let im = 0;
  for (const ph of PHASES) {
    const z = rotate(x[ph], sign * lag[ph]);
    re += z.re;
    im += z.im;
  }
  return magnitude({ re, im });
}

/** v/f1, or 0 when the working wave is missing or v is rounding noise. */
const relativeTo = (f1: number, v: number): number => (f1 > 0 && v / f1 > ZERO_FACTOR ? v / f1 : 0);

/** The sequence under which the working wave (n = p) runs forward. */
export function forwardSequence(star: SlotStar): 'ABC' | 'ACB' {
  const p = star.polePairs;
  return waveSum(star, p, currentLagDeg('ABC'), -1) >= waveSum(star, p, currentLagDeg('ACB'), -1) ? 'ABC' : 'ACB';
}

/** Space-harmonic spectrum for electrical orders up to maxOrder (whole orders, plus fractional ones present). */
export function mmfSpectrum(table: SlotTable, supply: { frequencyHz: number }, maxOrder = 49, star = new SlotStar(table)): MmfSpectrum {
  const p = star.polePairs;
  const sequence = forwardSequence(star);
  const lag = currentLagDeg(sequence);
  const synchronousRpm = (60 * supply.frequencyHz) / p;
  const f1 = waveSum(star, p, lag, -1) / p;
  const kw1A = star.factor('A', p);
  const harmonics: MmfHarmonic[] = [];
  for (let n = 1; n <= Math.floor(maxOrder * p); n++) {
    const kwA = star.factor('A', n);
    const present = PHASES.some((ph) => star.factor(ph, n) > 0);
    if (n % p !== 0 && !present) continue;
    const nu = n / p;
    const forward = relativeTo(f1, waveSum(star, n, lag, -1) / n);
    const backward = relativeTo(f1, waveSum(star, n, lag, 1) / n);
    const direction: MmfDirection =
      forward > 0 && backward > 0 ? 'both' : forward > 0 ? 'forward' : backward > 0 ? 'backward' : 'cancelled';
    const speedFraction = direction === 'cancelled' ? 0 : (forward >= backward ? 1 : -1) / nu;
    harmonics.push({
      order: nu,
      mechanicalOrder: n,
      forward,
      backward,
      relativeAmplitude: forward + backward,
      singlePhaseRelative: kw1A > 0 ? kwA / nu / kw1A : 0,
      direction,
      speedFraction,
      speedRpm: speedFraction * synchronousRpm,
    });
  }
  return { fundamentalAmpereTurnsPerAmp: f1 / (2 * Math.PI), currentSequence: sequence, synchronousRpm, harmonics };
}

/** A vertex of the MMF staircase. */
export interface MmfPoint {
  /** Mechanical angle round the bore from the centre of slot 1, degrees. */
  angleDeg: number;
  /** MMF in ampere-turns for 1 A peak coil current. */
  value: number;
}

/**
 * The MMF round the gap at one instant (ωt = timeDeg) as the vertices of its staircase: it steps by
 * Σ_x i_x·polarity·turns at each slot centre and is flat between, with its mean removed. [derived]
 */
export function mmfWaveform(table: SlotTable, timeDeg = 0, star = new SlotStar(table)): MmfPoint[] {
  const S = table.slots;
  const lag = currentLagDeg(forwardSequence(star));
  const current = { A: 0, B: 0, C: 0 };
  for (const ph of PHASES) current[ph] = Math.cos(((timeDeg - lag[ph]) * Math.PI) / 180);
  const plateaus: number[] = [];
  let level = 0;
  for (let s = 0; s < S; s++) {
    for (const ph of PHASES) level += current[ph] * (star.weights.weights[ph][s] ?? 0);
    plateaus.push(level);
  }
  const mean = plateaus.reduce((a, b) => a + b, 0) / S;
  const points: MmfPoint[] = [];
  let before = level - mean;
  plateaus.forEach((v, s) => {
    const angleDeg = (360 * s) / S;
    points.push({ angleDeg, value: before }, { angleDeg, value: v - mean });
    before = v - mean;
  });
  points.push({ angleDeg: 360, value: before });
  return points;
}
