/**
 * Coil groups of a layout, as the winder makes them: the coils of one phase wound one after another without
 * cutting the wire (one group per pole for double-layer and whole-coiled windings, one per pole pair for
 * half-coiled ones), listed round the stator with their slots, spans, turns and sense.
 *
 * Groups are read from the layout itself, not assumed: two coils of one phase belong to the same group when
 * one pair of their sides lies in neighbouring slots and the other pair within two slots (lap coils step
 * together, concentric coils nest), with the same current direction at each pair. [derived]
 *
 * Every group is wound alike, from a "start" side to a "finish" side:
 * - double layer: the start is the top (layer 1) side, the finish the bottom (layer 2) side;
 * - single layer: the start is the side from which the other lies less than half the bore further on in
 *   slot order (ties: the side that carries +1).
 * A group's sense is the current direction of its start side in the layout: +1 where current enters at the
 * start for positive phase current ("forward"), −1 where it enters at the finish ("reversed"). Reversed
 * groups are what the alternate-pole connection (finish to finish, start to start) produces.
 */
import { fail, ok, type EngineResult } from '../result';
import type { CoilSide, Layer, Phase, Polarity, SlotTable } from '../winding-layout';

/** One coil of a group, as it lies in the core. */
export interface GroupCoil {
  /** Coil number in the layout. */
  coil: number;
  startSlot: number;
  startLayer: Layer;
  finishSlot: number;
  finishLayer: Layer;
  /** Slot pitches from start to finish ("1–8" is 7): the shorter way for double layer, onwards in slot order for single layer. */
  span: number;
  turns: number;
}

/** One coil group. */
export interface CoilGroup {
  /** Number round the stator, 1 … (from slot 1 onwards). */
  number: number;
  phase: Phase;
  /** Number of this group within its phase, round the stator: A1, A2 … */
  indexInPhase: number;
  /** +1 forward (current enters at the start), −1 reversed (enters at the finish). */
  sense: Polarity;
  /** Pole under the middle of the group's start sides, 1 … P. */
  pole: number;
  /** Coils in winding order: first start slot first. */
  coils: GroupCoil[];
  /** Σ turns of the group's coils. */
  turns: number;
  /** The group's EMF phasor at the working wave (Σ polarity·turns·e^{jθ} over its sides), for the checks. */
  phasor: { re: number; im: number };
}

/** All groups of a layout, round the stator. */
export interface CoilGroups {
  slots: number;
  poles: number;
  layers: Layer;
  groups: CoilGroup[];
  /** Groups of each phase, in the order round the stator. */
  byPhase: Record<Phase, CoilGroup[]>;
}

interface Oriented {
  coil: number;
  start: CoilSide;
  finish: CoilSide;
}

const ring = (a: number, b: number, slots: number): number => {
  const d = Math.abs(a - b) % slots;
  return Math.min(d, slots - d);
};
const forward = (from: number, to: number, slots: number): number => (((to - from) % slots) + slots) % slots;

/** Two sides pair up inside a group: same layer, same current direction, `lo`…`hi` slots apart. */
const pairs = (u: CoilSide, v: CoilSide, lo: number, hi: number, slots: number): boolean => {
  const d = ring(u.slot, v.slot, slots);
  return u.layer === v.layer && u.polarity === v.polarity && d >= lo && d <= hi;
};

/** True when two coils of one phase sit side by side in one group (file comment), either way round. */
function neighbours(x: [CoilSide, CoilSide], y: [CoilSide, CoilSide], slots: number): boolean {
  const [x1, x2] = x;
  for (const [y1, y2] of [
    [y[0], y[1]],
    [y[1], y[0]],
  ] as const)
    if ((pairs(x1, y1, 1, 1, slots) && pairs(x2, y2, 1, 2, slots)) || (pairs(x2, y2, 1, 1, slots) && pairs(x1, y1, 1, 2, slots)))
      return true;
  return false;
}

function find(parent: number[], i: number): number {
  let r = i;
  while (parent[r] !== r) r = parent[r] ?? r;
  let j = i;
  while (parent[j] !== r) {
    const next = parent[j] ?? r;
    parent[j] = r;
    j = next;
  }
  return r;
}

/** Middle of a run of slots going round in slot order, as a 0-based position (may pass S). */
function middleOfRun(slots: number[], total: number): number {
  const first = firstOfRun(slots, total);
  const last = Math.max(...slots.map((s) => forward(first, s, total)));
  return first - 1 + last / 2;
}

/**
 * Orients a group: within it every +1 side pairs with +1 sides, so its sides form a +1 set and a −1 set;
 * the start set is the top layer (double layer) or the set from which the other lies less than half the
 * bore on (single layer; ties: the +1 set).
 */
function orientGroup(members: [CoilSide, CoilSide][], table: SlotTable): Oriented[] {
  const plusFirst = members.map(([a, b]) => (a.polarity > 0 ? [a, b] : [b, a]) as [CoilSide, CoilSide]);
  let plusStarts: boolean;
  const head = plusFirst[0];
  if (table.layers === 2 && head && head[0].layer !== head[1].layer) plusStarts = head[0].layer === 1;
  else {
    const mp = middleOfRun(
      plusFirst.map((c) => c[0].slot),
      table.slots,
    );
    const mn = middleOfRun(
      plusFirst.map((c) => c[1].slot),
      table.slots,
    );
    const pn = forward(mp, mn, table.slots);
    const np = forward(mn, mp, table.slots);
    plusStarts = Math.abs(pn - np) < 1e-9 ? true : pn < np;
  }
  return plusFirst.map(([plus, minus]) => ({ coil: plus.coil ?? 0, start: plusStarts ? plus : minus, finish: plusStarts ? minus : plus }));
}

/** The slot from which a run of start slots begins going round in slot order (the one whose predecessor is not in the run). */
function firstOfRun(starts: number[], slots: number): number {
  const set = new Set(starts);
  const lead = starts.filter((s) => !set.has(((s - 2 + slots) % slots) + 1));
  return Math.min(...(lead.length > 0 ? lead : starts));
}

function phasorOf(coils: Oriented[], slots: number, polePairs: number): { re: number; im: number } {
  let re = 0;
  let im = 0;
  for (const c of coils)
    for (const s of [c.start, c.finish]) {
      const th = (2 * Math.PI * (((s.slot - 1) * polePairs) % slots)) / slots;
      re += s.polarity * s.turns * Math.cos(th);
      im += s.polarity * s.turns * Math.sin(th);
    }
  return { re, im };
}

/**
 * The coil groups of a layout. Needs coil numbers on every side (the standard layout has them; a slot table
 * drawn without them cannot say which sides make a coil).
 */
export function coilGroups(table: SlotTable): EngineResult<CoilGroups> {
  if (table.sides.length === 0 || table.sides.some((s) => s.coil === undefined))
    return fail(
      'not-applicable',
      'The slot table has no coil numbers, so the coils and their groups cannot be traced.',
      'Number the coil sides in the slot table (two sides per coil), or use the standard layout.',
      'winding.slotTable',
    );
  const pairs0 = new Map<number, CoilSide[]>();
  for (const s of table.sides) pairs0.set(s.coil ?? 0, [...(pairs0.get(s.coil ?? 0) ?? []), s]);
  const coils: [CoilSide, CoilSide][] = [];
  for (const [id, pair] of pairs0) {
    const [a, b] = pair;
    if (pair.length !== 2 || !a || !b || a.phase !== b.phase || a.polarity === b.polarity)
      return fail(
        'invalid-input',
        `Coil ${id} must have two sides of one phase, one going and one returning.`,
        'Check the coil numbers in the slot table.',
        'winding.slotTable',
      );
    coils.push([a, b]);
  }
  const parent = coils.map((_, i) => i);
  for (let i = 0; i < coils.length; i++)
    for (let j = i + 1; j < coils.length; j++) {
      const x = coils[i];
      const y = coils[j];
      if (x && y && x[0].phase === y[0].phase && neighbours(x, y, table.slots)) parent[find(parent, j)] = find(parent, i);
    }
  const sets = new Map<number, [CoilSide, CoilSide][]>();
  coils.forEach((c, i) => {
    const r = find(parent, i);
    sets.set(r, [...(sets.get(r) ?? []), c]);
  });
  const p = table.poles / 2;
  const polePitch = table.slots / table.poles;
  const raw = [...sets.values()].map((set) => {
    const members = orientGroup(set, table);
    const first = firstOfRun(
      members.map((c) => c.start.slot),
      table.slots,
    );
    // Winding order: from the first start slot on round the bore.
    const ordered = [...members].sort((a, b) => forward(first, a.start.slot, table.slots) - forward(first, b.start.slot, table.slots));
    const head = ordered[0];
    const middle = first - 1 + (ordered.length - 1) / 2;
    return {
      first,
      phase: head?.start.phase ?? 'A',
      sense: (head?.start.polarity ?? 1) as Polarity,
      pole: (Math.floor(middle / polePitch) % table.poles) + 1,
      coils: ordered.map((c) => ({
        coil: c.coil,
        startSlot: c.start.slot,
        startLayer: c.start.layer,
        finishSlot: c.finish.slot,
        finishLayer: c.finish.layer,
        span: table.layers === 2 ? ring(c.start.slot, c.finish.slot, table.slots) : forward(c.start.slot, c.finish.slot, table.slots),
        turns: c.start.turns,
      })),
      turns: ordered.reduce((t, c) => t + c.start.turns, 0),
      phasor: phasorOf(ordered, table.slots, p),
    };
  });
  raw.sort((a, b) => a.first - b.first || a.phase.localeCompare(b.phase));
  const count: Record<Phase, number> = { A: 0, B: 0, C: 0 };
  const groups: CoilGroup[] = raw.map((g, i) => ({
    number: i + 1,
    phase: g.phase,
    indexInPhase: ++count[g.phase],
    sense: g.sense,
    pole: g.pole,
    coils: g.coils,
    turns: g.turns,
    phasor: g.phasor,
  }));
  const byPhase: Record<Phase, CoilGroup[]> = { A: [], B: [], C: [] };
  for (const g of groups) byPhase[g.phase].push(g);
  return ok({ slots: table.slots, poles: table.poles, layers: table.layers, groups, byPhase });
}

/** "A3". */
export const groupLabel = (g: Pick<CoilGroup, 'phase' | 'indexInPhase'>): string => `${g.phase}${g.indexInPhase}`;
