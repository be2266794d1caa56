/**
 * Slot-star phasor sums over the actual coil sides: the general winding-factor method for any layout
 * (integral, fractional, concentric, single or double layer, shop-drawn) [derived, docs/engineering/winding-factor.md].
 *
 * Order convention. Sums are taken per mechanical order n (the number of pole pairs of the space wave round
 * the whole bore): a side in slot s (1-based) contributes polarity·turns·e^{j·n·2π(s−1)/S}. Results are
 * reported by electrical order ν = n/p (p pole pairs of the working wave), so ν = 1 is the working wave and
 * fractional-slot windings show their even and sub-harmonic orders (ν = 1/2, 3/2 …) where they exist.
 * k_wν = |Σ| / Σ turns over the phase's sides (= Σ 2·turns over its coils).
 */
import type { Phase, SlotTable } from './winding-layout';

/** Phases in order. */
export const PHASES: readonly Phase[] = ['A', 'B', 'C'];

/** A complex number (phasor), real and imaginary parts. */
export interface Phasor {
  re: number;
  im: number;
}

/** |z|. */
export const magnitude = (z: Phasor): number => Math.hypot(z.re, z.im);
/** Angle in degrees, −180 < θ ≤ 180. */
export const angleDeg = (z: Phasor): number => (Math.atan2(z.im, z.re) * 180) / Math.PI;

/** Net ampere-conductor weight of each phase in each slot (Σ polarity·turns), and Σ turns per phase. */
export interface PhaseSlotWeights {
  weights: Record<Phase, Float64Array>;
  turns: Record<Phase, number>;
}

/** Collects Σ polarity·turns of each phase per slot (index 0 = slot 1) and Σ turns of each phase's sides. */
export function phaseSlotWeights(table: SlotTable): PhaseSlotWeights {
  const weights = { A: new Float64Array(table.slots), B: new Float64Array(table.slots), C: new Float64Array(table.slots) };
  const turns = { A: 0, B: 0, C: 0 };
  for (const side of table.sides) {
    const w = weights[side.phase];
    const i = side.slot - 1;
    w[i] = (w[i] ?? 0) + side.polarity * side.turns;
    turns[side.phase] += side.turns;
  }
  return { weights, turns };
}

/**
 * Phasor sums of a slot table, cached per bin. Because e^{j n 2π s/S} depends only on n mod S, mechanical
 * orders n and n + kS give the same sum: the slot harmonics ν = kS/p ± 1 share |k_w| with the working
 * wave (docs/engineering/winding-factor.md).
 */
export class SlotStar {
  readonly slots: number;
  readonly polePairs: number;
  readonly weights: PhaseSlotWeights;
  private readonly cos: Float64Array;
  private readonly sin: Float64Array;
  private readonly cache = new Map<number, Record<Phase, Phasor>>();

  constructor(table: SlotTable) {
    this.slots = table.slots;
    this.polePairs = table.poles / 2;
    this.weights = phaseSlotWeights(table);
    this.cos = new Float64Array(table.slots);
    this.sin = new Float64Array(table.slots);
    for (let k = 0; k < table.slots; k++) {
      this.cos[k] = Math.cos((2 * Math.PI * k) / table.slots);
      this.sin[k] = Math.sin((2 * Math.PI * k) / table.slots);
    }
  }

  /** Σ polarity·turns·e^{j n θ_s} per phase for mechanical order n (a whole number). */
  phasors(n: number): Record<Phase, Phasor> {
    const S = this.slots;
    const bin = ((n % S) + S) % S;
    const hit = this.cache.get(bin);
    if (hit) return hit;
    const out = {} as Record<Phase, Phasor>;
    for (const ph of PHASES) {
      const w = this.weights.weights[ph];
      let re = 0;
      let im = 0;
      for (let s = 0; s < S; s++) {
        const ws = w[s] ?? 0;
        if (ws === 0) continue;
        const k = (bin * s) % S;
        re += ws * (this.cos[k] ?? 0);
        im += ws * (this.sin[k] ?? 0);
      }
      out[ph] = { re, im };
    }
    this.cache.set(bin, out);
    return out;
  }

  /**
   * Winding factor of one phase at mechanical order n: |Σ| / Σ turns, snapped to 0 below ZERO_FACTOR
   * (symmetry cancels it; what is left is rounding) and to at most 1 (|Σ| ≤ Σ turns exactly).
   */
  factor(ph: Phase, n: number): number {
    const t = this.weights.turns[ph];
    const kw = t > 0 ? magnitude(this.phasors(n)[ph]) / t : 0;
    return kw > ZERO_FACTOR ? Math.min(1, kw) : 0;
  }
}

/** One phase at one order: its winding factor and EMF angle. */
export interface PhaseFactor {
  /** k_wν of this phase alone. */
  kw: number;
  /** Angle of the phase's EMF phasor at this order, degrees. */
  angleDeg: number;
}

/** Winding factors of the three phases at one order. */
export interface HarmonicWindingFactor {
  /** Electrical order ν = n/p. */
  order: number;
  /** Mechanical order n (pole pairs of the space wave). */
  mechanicalOrder: number;
  /** Mean of the three phases' k_wν (equal for a balanced layout). */
  kw: number;
  phases: Record<Phase, PhaseFactor>;
}

/** Factors smaller than this are treated as exactly zero (cancelled by symmetry). */
export const ZERO_FACTOR = 1e-9;

/**
 * k_wν per phase for every electrical order up to maxOrder: all whole orders ν = 1 … maxOrder, plus the
 * fractional orders (ν = n/p not whole) that the layout actually carries. [derived, docs/engineering/winding-factor.md]
 */
export function harmonicWindingFactors(table: SlotTable, maxOrder = 49, star = new SlotStar(table)): HarmonicWindingFactor[] {
  const p = star.polePairs;
  const out: HarmonicWindingFactor[] = [];
  const top = Math.floor(maxOrder * p);
  for (let n = 1; n <= top; n++) {
    const phasors = star.phasors(n);
    const phases = {} as Record<Phase, PhaseFactor>;
    let sum = 0;
    let present = false;
    for (const ph of PHASES) {
      const kw = star.factor(ph, n);
      phases[ph] = { kw, angleDeg: kw > ZERO_FACTOR ? angleDeg(phasors[ph]) : 0 };
      sum += kw;
      present ||= kw > ZERO_FACTOR;
    }
    if (n % p === 0 || present) out.push({ order: n / p, mechanicalOrder: n, kw: sum / 3, phases });
  }
  return out;
}
