/**
 * Closed-form winding factors for regular 60°-belt three-phase windings: the textbook cross-check of the
 * slot-star sums in slot-star.ts. Orders ν are electrical (ν = 1 is the working wave).
 */

const DEG = Math.PI / 180;

/** Greatest common divisor of two non-negative integers (Euclid). */
export function gcd(a: number, b: number): number {
  let x = Math.abs(Math.round(a));
  let y = Math.abs(Math.round(b));
  while (y > 0) [x, y] = [y, x % y];
  return x;
}

/** Slots per pole per phase as a fraction in lowest terms, q = S/(3P) = z/d. */
export interface SlotsPerPolePerPhase {
  z: number;
  d: number;
  value: number;
}

/** q = S/(mP) with m = 3, reduced to z/d (docs/engineering/winding-factor.md). Slots and poles are whole. */
export function slotsPerPolePerPhase(slots: number, poles: number): SlotsPerPolePerPhase {
  const g = gcd(slots, 3 * poles);
  return { z: slots / g, d: (3 * poles) / g, value: slots / (3 * poles) };
}

/**
 * A three-phase winding of S slots and 2p poles can be balanced only when S/(3·gcd(S, p)) is a whole
 * number, i.e. the denominator d of q is not a multiple of 3 [derived, docs/engineering/winding-factor.md].
 */
export function canBalance(slots: number, poles: number): boolean {
  const p = poles / 2;
  return (slots / (3 * gcd(slots, p))) % 1 === 0;
}

/**
 * Distribution factor k_dν = sin(ν·30°) / (z·sin(ν·30°/z)) for q = z/d in lowest terms; for integral q
 * (d = 1) this is the textbook sin(ν q α/2)/(q sin(ν α/2)) with α = 60°/q (Say, *Alternating Current
 * Machines*; Fitzgerald & Kingsley). Valid for odd integer ν; signed (a negative value is a phase
 * reversal, report |k_d|).
 */
export function distributionFactor(z: number, nu: number): number {
  const x = (nu * 30 * DEG) / z;
  const den = z * Math.sin(x);
  // sin(x) = 0 only at ν = 6zk (never odd); take the limit cos(zx)/cos(x) there rather than divide by zero.
  return Math.abs(den) < 1e-12 ? Math.cos(z * x) / Math.cos(x) : Math.sin(z * x) / den;
}

/**
 * Pitch (chording) factor k_pν = sin(ν·(y/τ)·90°), y span in slots, τ = S/P pole pitch in slots
 * (Say; Fitzgerald & Kingsley). Signed.
 */
export function pitchFactor(spanSlots: number, polePitchSlots: number, nu: number): number {
  return Math.sin(nu * (spanSlots / polePitchSlots) * 90 * DEG);
}

/**
 * Effective pitch factor of a concentric group whose coils share one centre line:
 * Σ N_i·sin(ν y_i/τ 90°) / Σ N_i [derived, docs/engineering/winding-factor.md]. Signed.
 */
export function concentricPitchFactor(spans: readonly number[], turns: readonly number[], polePitchSlots: number, nu: number): number {
  let num = 0;
  let den = 0;
  spans.forEach((y, i) => {
    const n = turns[i] ?? 0;
    num += n * pitchFactor(y, polePitchSlots, nu);
    den += n;
  });
  return den === 0 ? 0 : num / den;
}

/** Signed closed-form factors at one order ν. */
export interface ClosedFormFactors {
  nu: number;
  kd: number;
  kp: number;
  kw: number;
}

/**
 * k_wν = k_dν·k_pν for a double-layer 60°-belt lap winding (integral or fractional q = z/d) at odd integer
 * order ν. Returns null for even or non-integer orders: the closed form does not describe them (they come
 * from the belt asymmetry of fractional windings), use the slot-star sum instead.
 */
export function closedFormFactors(slots: number, poles: number, spanSlots: number, nu: number): ClosedFormFactors | null {
  if (!Number.isInteger(nu) || nu % 2 === 0) return null;
  const { z } = slotsPerPolePerPhase(slots, poles);
  const kd = distributionFactor(z, nu);
  const kp = pitchFactor(spanSlots, slots / poles, nu);
  return { nu, kd, kp, kw: kd * kp };
}
