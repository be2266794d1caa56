/**
 * Parallel paths (circuits) a layout allows. Paths in parallel must carry identical EMF phasors, or current
 * circulates between them [derived, docs/engineering/redesign.md]. The layout is searched for its repeating sections: a
 * shift of k slots that maps every coil of a phase onto a coil of the same phase (all polarities kept or
 * all reversed) while turning the slot star by a multiple of 180° electrical. The S/k sections then carry
 * equal phasors up to sign (a reversed section is simply connected the other way round), and any a that
 * divides S/k works. Each allowed a is then confirmed by summing the paths' phasors.
 */
import { fail, ok, type EngineResult } from './result';
import { magnitude, PHASES, type Phasor } from './slot-star';
import { LAYOUT_LIMITS, type CoilSide, type Phase, type SlotTable } from './winding-layout';
import { slotsPerPolePerPhase } from './closed-form';

/** One allowed path count and how closely its paths' phasors agree. */
export interface PathCheck {
  paths: number;
  /** max |E_path − E_path1| / |E_path1| at the working order: 0 up to rounding for an allowed count. */
  mismatch: number;
}

/** What the layout allows, and on what basis. */
export interface ParallelPathAnalysis {
  /** Every allowed number of parallel paths, ascending. */
  allowed: number[];
  /** Number of identical sections found in every phase. */
  sections: number;
  /** Whole coils are kept together ('coils'), or only coil sides were known ('coil-sides'). */
  basis: 'coils' | 'coil-sides';
  checks: PathCheck[];
  note?: string;
}

const divisors = (n: number): number[] => Array.from({ length: n }, (_, i) => i + 1).filter((d) => n % d === 0);

const TURN_KEY = LAYOUT_LIMITS.maxTurns + 1;
const SIDE_KEYS = 4 * (LAYOUT_LIMITS.maxSlots + 1) * TURN_KEY;
const sideKey = (slot: number, layer: number, polarity: number, turns: number): number =>
  ((slot * 2 + (layer - 1)) * 2 + (polarity > 0 ? 1 : 0)) * TURN_KEY + turns;

/** The units a path is built from: coils (two sides each) or, without coil numbers, single sides. */
function unitsOf(sides: CoilSide[], byCoil: boolean): CoilSide[][] {
  if (!byCoil) return sides.map((s) => [s]);
  const m = new Map<number, CoilSide[]>();
  for (const s of sides) m.set(s.coil ?? 0, [...(m.get(s.coil ?? 0) ?? []), s]);
  return [...m.values()];
}

/** Key of one side after a shift of `shift` slots with its polarity times `sign`. */
const shiftedSideKey = (s: CoilSide, shift: number, sign: number, slots: number): number =>
  sideKey(((s.slot - 1 + shift) % slots) + 1, s.layer, s.polarity * sign, s.turns);

/** A number naming a unit after a shift of `shift` slots with polarities times `sign` (sides in key order). */
function unitKey(unit: CoilSide[], shift: number, sign: number, slots: number): number {
  const [a, b] = unit;
  if (unit.length === 1 && a) return shiftedSideKey(a, shift, sign, slots);
  if (unit.length === 2 && a && b) {
    const ka = shiftedSideKey(a, shift, sign, slots);
    const kb = shiftedSideKey(b, shift, sign, slots);
    return ka < kb ? ka * SIDE_KEYS + kb : kb * SIDE_KEYS + ka;
  }
  return unit
    .map((s) => shiftedSideKey(s, shift, sign, slots))
    .sort((x, y) => x - y)
    .reduce((acc, k) => acc * SIDE_KEYS + k, 0);
}

/** Smallest valid shift of one phase's units, its polarity factor σ, and the number of sections S/k. */
function phaseSymmetry(units: CoilSide[][], slots: number, polePairs: number): { shift: number; sign: number } {
  const present = new Set(units.map((u) => unitKey(u, 0, 1, slots)));
  for (const k of divisors(slots)) {
    if (k === slots || (2 * k * polePairs) % slots !== 0) continue;
    for (const sign of [1, -1]) if (units.every((u) => present.has(unitKey(u, k, sign, slots)))) return { shift: k, sign };
  }
  return { shift: slots, sign: 1 };
}

/**
 * Puts one phase's units into sections along its symmetry (shift k, polarity factor σ): unit u and its
 * images g^i(u) (shifted i·k slots) go to sections 0 … n−1. Section i equals section 0 times
 * (σ·e^{j·k·p·360°/S})^i = ±1 and is connected reversed when that is −1; returns each unit's section and
 * its phasor at the working order with that reversal applied.
 */
function sectionedPhasors(
  units: CoilSide[][],
  slots: number,
  polePairs: number,
  sym: { shift: number; sign: number },
): { section: number[]; phasor: Phasor[] } {
  const n = slots / sym.shift;
  const rho = ((2 * sym.shift * polePairs) / slots) % 2 === 0 ? 1 : -1;
  const index = new Map(units.map((u, i) => [unitKey(u, 0, 1, slots), i]));
  const section = new Array<number>(units.length).fill(-1);
  units.forEach((u, i) => {
    if (section[i] !== -1) return;
    for (let k = 0; k < n; k++) {
      const j = index.get(unitKey(u, k * sym.shift, sym.sign ** k, slots));
      if (j === undefined || section[j] !== -1) break;
      section[j] = k;
    }
  });
  const phasor = units.map((u, i) => {
    const k = Math.max(0, section[i] ?? 0);
    const turn = (sym.sign * rho) ** k;
    let re = 0;
    let im = 0;
    for (const s of u) {
      const th = (2 * Math.PI * (((s.slot - 1) * polePairs) % slots)) / slots;
      re += turn * s.polarity * s.turns * Math.cos(th);
      im += turn * s.polarity * s.turns * Math.sin(th);
    }
    return { re, im };
  });
  return { section, phasor };
}

/** Phasor of each of `paths` paths when path j takes the sections i with i mod paths = j. */
function pathPhasors(split: { section: number[]; phasor: Phasor[] }, paths: number): Phasor[] {
  const out: Phasor[] = Array.from({ length: paths }, () => ({ re: 0, im: 0 }));
  split.phasor.forEach((z, i) => {
    const target = out[Math.max(0, split.section[i] ?? 0) % paths];
    if (target) {
      target.re += z.re;
      target.im += z.im;
    }
  });
  return out;
}

/**
 * Allowed parallel path counts of a layout: the divisors of the number of identical sections common to all
 * three phases, confirmed by comparing path phasors. Without coil numbers (a slot table of sides only) the
 * count of coils per phase must also divide; whole- and half-coiled single-layer windings then look alike,
 * so the note asks the winder to check. [derived, docs/engineering/redesign.md]
 */
export function allowedParallelPaths(table: SlotTable): ParallelPathAnalysis {
  const byCoil = table.sides.length > 0 && table.sides.every((s) => s.coil !== undefined);
  let sections = 0;
  const perPhase = new Map<Phase, { section: number[]; phasor: Phasor[] }>();
  for (const ph of PHASES) {
    const units = unitsOf(
      table.sides.filter((s) => s.phase === ph),
      byCoil,
    );
    const sym = phaseSymmetry(units, table.slots, table.poles / 2);
    perPhase.set(ph, sectionedPhasors(units, table.slots, table.poles / 2, sym));
    sections = sections === 0 ? table.slots / sym.shift : gcdInt(sections, table.slots / sym.shift);
  }
  const coilsPerPhase = PHASES.map((ph) => table.sides.filter((s) => s.phase === ph).length / 2);
  const checks: PathCheck[] = [];
  for (const a of divisors(Math.max(1, sections))) {
    if (!byCoil && coilsPerPhase.some((c) => c % a !== 0)) continue;
    let mismatch = 0;
    for (const ph of PHASES) {
      const entry = perPhase.get(ph);
      if (!entry) continue;
      // a divides `sections`, which divides this phase's own number of sections.
      const zs = pathPhasors(entry, a);
      const ref = zs[0] ?? { re: 0, im: 0 };
      const m0 = magnitude(ref);
      for (const z of zs) mismatch = Math.max(mismatch, m0 > 0 ? magnitude({ re: z.re - ref.re, im: z.im - ref.im }) / m0 : 0);
    }
    if (mismatch < 1e-9) checks.push({ paths: a, mismatch });
  }
  return {
    allowed: checks.map((c) => c.paths),
    sections,
    basis: byCoil ? 'coils' : 'coil-sides',
    checks,
    ...(byCoil
      ? {}
      : { note: 'The slot table has no coil numbers: paths were judged side by side. Check that each path takes whole coils.' }),
  };
}

function gcdInt(a: number, b: number): number {
  return b === 0 ? a : gcdInt(b, a % b);
}

/** Checks a chosen number of parallel paths against the layout; the error names the allowed counts. */
export function checkParallelPaths(table: SlotTable, paths: number): EngineResult<ParallelPathAnalysis> {
  const analysis = allowedParallelPaths(table);
  if (analysis.allowed.includes(paths)) return ok(analysis);
  return fail(
    'parallel-paths-not-allowed',
    `${paths} parallel path(s) would not carry identical voltages in this layout; current would circulate between them.`,
    `Allowed here: ${analysis.allowed.join(', ')}.`,
    'winding.parallelPaths',
  );
}

/**
 * Rule of thumb for regular 60°-belt windings [derived, docs/engineering/redesign.md]: double-layer integral lap: a divides
 * P; fractional double layer q = z/d: a divides 2p/d; single layer half-coiled: a divides P/2; whole-coiled:
 * a divides P. Check values: 36/4 → 1, 2, 4; 36/6 → 1, 2, 3, 6; 30/4 → 1, 2; 27/4 → 1.
 */
export function ruleOfThumbParallelPaths(slots: number, poles: number, layers: 1 | 2, coiling: 'whole' | 'half' = 'half'): number[] {
  const { d } = slotsPerPolePerPhase(slots, poles);
  if (layers === 1) return divisors(coiling === 'whole' ? poles : poles / 2);
  return divisors(d === 1 ? poles : poles / d);
}
