/**
 * Phase balance from the slot-star sums: a balanced three-phase winding has three equal EMF phasors
 * 120° apart at the working order [derived, docs/engineering/winding-factor.md].
 */
import { angleDeg, magnitude, PHASES, type Phasor } from './slot-star';
import type { Phase } from './winding-layout';

/** How far from perfect balance a layout may be. */
export interface BalanceTolerance {
  /** Largest allowed (max − min)/mean of the three magnitudes. */
  magnitude: number;
  /** Largest allowed departure from 120° spacing, degrees. */
  angleDeg: number;
}

/** A correct layout balances to rounding error; these leave room for nothing more. */
export const DEFAULT_BALANCE_TOLERANCE: BalanceTolerance = { magnitude: 0.001, angleDeg: 0.1 };

/** Magnitudes, angles and the verdict. */
export interface PhaseBalance {
  /** |Σ polarity·turns·e^{jθ}| of each phase: proportional to its EMF. */
  magnitudes: Record<Phase, number>;
  /** Phase angles relative to A, degrees in (−180, 180]. */
  anglesDeg: Record<Phase, number>;
  /** 'ABC' when B sits 120° ahead of A on the slot star, 'ACB' when C does. */
  sequence: 'ABC' | 'ACB';
  /** (max − min)/mean of the magnitudes. */
  magnitudeSpread: number;
  /** Largest departure of B and C from their ideal ±120°, degrees. */
  angleErrorDeg: number;
  verdict: 'balanced' | 'unbalanced';
  reasons: string[];
  tolerance: BalanceTolerance;
}

const wrap180 = (deg: number): number => {
  const w = ((((deg + 180) % 360) + 360) % 360) - 180;
  return w === -180 ? 180 : w;
};

/**
 * Judges balance: spread = (max − min)/mean of |E_A|, |E_B|, |E_C|; angle error = max |(θ_B − θ_A) ∓ 120°|,
 * |(θ_C − θ_A) ± 120°| for the sequence B takes. Balanced when both are within tolerance. [derived]
 */
export function phaseBalance(phasors: Record<Phase, Phasor>, tolerance: BalanceTolerance = DEFAULT_BALANCE_TOLERANCE): PhaseBalance {
  const magnitudes = { A: magnitude(phasors.A), B: magnitude(phasors.B), C: magnitude(phasors.C) };
  const values = PHASES.map((ph) => magnitudes[ph]);
  const mean = (values[0]! + values[1]! + values[2]!) / 3;
  const a0 = angleDeg(phasors.A);
  const anglesDeg = { A: 0, B: wrap180(angleDeg(phasors.B) - a0), C: wrap180(angleDeg(phasors.C) - a0) };
  const sequence = anglesDeg.B >= 0 ? 'ABC' : 'ACB';
  const sign = sequence === 'ABC' ? 1 : -1;
  const reasons: string[] = [];
  if (!(mean > 0)) {
    reasons.push('The phases carry no EMF at the working order.');
    return { magnitudes, anglesDeg, sequence, magnitudeSpread: 0, angleErrorDeg: 0, verdict: 'unbalanced', reasons, tolerance };
  }
  const magnitudeSpread = (Math.max(...values) - Math.min(...values)) / mean;
  const angleErrorDeg = Math.max(Math.abs(wrap180(anglesDeg.B - sign * 120)), Math.abs(wrap180(anglesDeg.C + sign * 120)));
  if (magnitudeSpread > tolerance.magnitude)
    reasons.push(`Phase EMFs differ by ${(magnitudeSpread * 100).toFixed(2)} % (allowed ${(tolerance.magnitude * 100).toFixed(2)} %).`);
  if (angleErrorDeg > tolerance.angleDeg)
    reasons.push(`Phases are ${angleErrorDeg.toFixed(2)}° away from 120° spacing (allowed ${tolerance.angleDeg}°).`);
  return {
    magnitudes,
    anglesDeg,
    sequence,
    magnitudeSpread,
    angleErrorDeg,
    verdict: reasons.length === 0 ? 'balanced' : 'unbalanced',
    reasons,
    tolerance,
  };
}
