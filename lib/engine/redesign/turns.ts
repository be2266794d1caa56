/**
 * Turns per coil that keep the flux densities inside the limits. With one layout, connection and circuit
 * count, Φ_new/Φ_old = R₁/N_c, R₁ being the ratio at one turn per coil (docs/engineering/redesign.md); gap and tooth
 * densities scale with Φ·P_new/P_old, the yoke with Φ. Each density's limits then bound N_c from both
 * sides, so the allowed whole numbers are an interval found in closed form.
 */
import type { DensityChangeLimit, DensityRatios, RedesignLimits } from './types';

/** The densities a redesign checks, with their label for messages. */
export const DENSITIES = [
  { key: 'gap', label: 'gap flux density' },
  { key: 'tooth', label: 'tooth flux density' },
  { key: 'yoke', label: 'yoke (back-iron) flux density' },
] as const;

/** Density ratios at N_c turns. */
export function ratiosAt(ratioAtOneTurn: number, turns: number, poleRatio: number): DensityRatios {
  const flux = ratioAtOneTurn / turns;
  return { flux, gap: flux * poleRatio, tooth: flux * poleRatio, yoke: flux };
}

/** "+12.0 %" / "−3.5 %". */
export const signedPercent = (fraction: number): string => `${fraction >= 0 ? '+' : '−'}${Math.abs(fraction * 100).toFixed(1)} %`;

/** What is wrong with a set of ratios, one phrase per density out of its limit ([] when all fit). */
export function ratioViolations(r: DensityRatios, limits: Pick<RedesignLimits, 'gap' | 'tooth' | 'yoke'>): string[] {
  const out: string[] = [];
  for (const d of DENSITIES) {
    const lim: DensityChangeLimit = limits[d.key];
    const change = r[d.key] - 1;
    if (change > lim.over + 1e-12) out.push(`${d.label} ${signedPercent(change)} is over the ${signedPercent(lim.over)} limit`);
    else if (change < -lim.under - 1e-12) out.push(`${d.label} ${signedPercent(change)} is under the ${signedPercent(-lim.under)} limit`);
  }
  return out;
}

/** Worst relative move of any density: max |ratio − 1|. */
export const worstDeviation = (r: DensityRatios): number => Math.max(Math.abs(r.gap - 1), Math.abs(r.tooth - 1), Math.abs(r.yoke - 1));

/**
 * Worst move of any density that the redesign could have avoided. When the poles increase and the gap
 * density is kept, the yoke density falls by P_old/P_new whatever the turns (reference §3): that fall is
 * forced, so only a yoke rise counts then.
 */
export const unforcedDeviation = (r: DensityRatios, poleRatio: number): number =>
  Math.max(Math.abs(r.gap - 1), Math.abs(r.tooth - 1), poleRatio > 1 ? Math.max(0, r.yoke - 1) : Math.abs(r.yoke - 1));

/** The whole-number turns range allowed by every density limit (lo > hi when none). */
export function allowedTurnsRange(
  ratioAtOneTurn: number,
  poleRatio: number,
  limits: Pick<RedesignLimits, 'gap' | 'tooth' | 'yoke'>,
  maxTurns: number,
): { lo: number; hi: number } {
  let low = 1;
  let high = maxTurns;
  for (const d of DENSITIES) {
    const m = d.key === 'yoke' ? 1 : poleRatio;
    const lim = limits[d.key];
    // 1 − under ≤ m·R₁/N ≤ 1 + over  ⇔  m·R₁/(1 + over) ≤ N ≤ m·R₁/(1 − under)
    low = Math.max(low, (m * ratioAtOneTurn) / (1 + lim.over));
    high = lim.under < 1 ? Math.min(high, (m * ratioAtOneTurn) / (1 - lim.under)) : high;
  }
  // A hair of slack so a ratio sitting exactly on a limit (e.g. 1.05 with +5 %) is accepted.
  return { lo: Math.max(1, Math.ceil(low - 1e-9)), hi: Math.min(maxTurns, Math.floor(high + 1e-9)) };
}

/** The turns to try inside the range: the `count` closest to the original densities (forced falls aside), closest first. */
export function turnsToTry(ratioAtOneTurn: number, poleRatio: number, range: { lo: number; hi: number }, count: number): number[] {
  const all: number[] = [];
  // Only the neighbourhood of the ideal matters; cap the scan for very wide limits.
  // The gap density is the one to keep (the yoke follows the pole ratio); start at its ideal turns.
  const ideal = Math.max(range.lo, Math.min(range.hi, Math.round(ratioAtOneTurn * poleRatio)));
  for (let n = Math.max(range.lo, ideal - count - 1); n <= Math.min(range.hi, ideal + count + 1); n++) all.push(n);
  return all
    .map((n) => ({ n, dev: unforcedDeviation(ratiosAt(ratioAtOneTurn, n, poleRatio), poleRatio) }))
    .sort((a, b) => a.dev - b.dev || a.n - b.n)
    .slice(0, count)
    .map((x) => x.n);
}

/** The turns that come closest to the limits when none fits: the whole numbers around each density's ideal. */
export function bestCompromiseTurns(
  ratioAtOneTurn: number,
  poleRatio: number,
  limits: Pick<RedesignLimits, 'gap' | 'tooth' | 'yoke'>,
  maxTurns: number,
): number {
  const trial = new Set<number>();
  for (const ideal of [ratioAtOneTurn, ratioAtOneTurn * poleRatio, Math.sqrt(poleRatio) * ratioAtOneTurn])
    for (const n of [Math.floor(ideal), Math.ceil(ideal)]) if (n >= 1 && n <= maxTurns) trial.add(n);
  if (trial.size === 0) trial.add(Math.min(maxTurns, Math.max(1, Math.round(ratioAtOneTurn))));
  const excess = (n: number): number => {
    const r = ratiosAt(ratioAtOneTurn, n, poleRatio);
    let worst = 0;
    for (const d of DENSITIES) {
      const lim = limits[d.key];
      worst = Math.max(worst, r[d.key] - 1 - lim.over, -lim.under - (r[d.key] - 1));
    }
    return worst;
  };
  return [...trial].sort((a, b) => excess(a) - excess(b) || a - b)[0] ?? 1;
}
