/**
 * Three-phase stator winding layouts: the types every winding calculation shares, the builder of the
 * standard 60°-belt layout (lap or concentric, single or double layer, integral or fractional q), and the
 * check of a slot table drawn by the winder. Field paths in errors follow the winding data sheet
 * (lib/as-found/winding-sheet-schema.ts, lib/engine/winding-sheet.ts): `core.slots`, `supply.poles`, `winding.spans.0`, `winding.slotTable.3.slot`.
 */
import { canBalance, gcd, slotsPerPolePerPhase } from './closed-form';
import { fail, ok, type EngineResult } from './result';

/** The three phases. */
export type Phase = 'A' | 'B' | 'C';
/** Direction of a coil side's current: +1 going, −1 returning. */
export type Polarity = 1 | -1;
/** Layer 1 is the top of the slot (next to the gap), layer 2 the bottom. Single-layer windings use 1. */
export type Layer = 1 | 2;

/** One coil side: the conductors of one coil lying in one slot. */
export interface CoilSide {
  /** Slot number as the winder counts it, 1 … S. */
  slot: number;
  layer: Layer;
  phase: Phase;
  /** +1 going in, −1 coming back: the direction of the coil's current in this slot. */
  polarity: Polarity;
  turns: number;
  /** Which coil this side belongs to (two sides per coil). Needed to judge parallel paths exactly. */
  coil?: number;
}

/** A layout: every coil side with its slot, layer, phase, polarity and turns. */
export interface SlotTable {
  slots: number;
  poles: number;
  layers: Layer;
  /** 'standard' when built here, 'explicit' when drawn by the winder. */
  source: 'standard' | 'explicit';
  sides: CoilSide[];
}

/** A winding as the data sheet describes it; `slotTable` overrides the standard layout. */
export interface WindingSpec {
  slots: number;
  poles: number;
  layers: Layer;
  style: 'lap' | 'concentric';
  /** Single layer only: whole-coiled (one group per pole) or half-coiled (one group per pole pair). */
  singleLayerCoiling?: 'whole' | 'half';
  /** Coil spans in slot pitches ("1–8" is 7): one for lap, one per coil of a group for concentric. */
  spans: number[];
  /** Turns per coil, one per span. */
  turnsPerCoil: number[];
  parallelPaths: number;
  connection: 'star' | 'delta';
  /** A layout drawn by the winder; when present it replaces the standard layout. */
  slotTable?: CoilSide[];
}

/** Upper limits that keep every calculation bounded; far beyond any real stator. */
export const LAYOUT_LIMITS = { maxSlots: 600, maxPoles: 200, maxTurns: 10_000 } as const;

/** Belt order around the slot star, 60° each: A+, C−, B+, A−, C+, B−. */
const BELTS: ReadonlyArray<readonly [Phase, Polarity]> = [
  ['A', 1],
  ['C', -1],
  ['B', 1],
  ['A', -1],
  ['C', 1],
  ['B', -1],
];

const isWhole = (n: number, min: number, max: number): boolean => Number.isInteger(n) && n >= min && n <= max;

/** Checks slots and poles alone: whole numbers, in range, and able to carry a balanced three-phase winding. */
export function checkSlotsAndPoles(slots: number, poles: number): EngineResult<{ slots: number; poles: number }> {
  if (!isWhole(slots, 3, LAYOUT_LIMITS.maxSlots))
    return fail(
      'invalid-input',
      `Slots must be a whole number from 3 to ${LAYOUT_LIMITS.maxSlots}, not ${slots}.`,
      'Count the stator slots again.',
      'core.slots',
    );
  if (!isWhole(poles, 2, LAYOUT_LIMITS.maxPoles) || poles % 2 !== 0)
    return fail(
      'invalid-input',
      `Poles must be an even whole number from 2 to ${LAYOUT_LIMITS.maxPoles}, not ${poles}.`,
      'Poles come in pairs: 2, 4, 6, 8 …',
      'supply.poles',
    );
  if (!canBalance(slots, poles))
    return fail(
      'unbalanced-layout',
      `${slots} slots cannot carry a balanced three-phase ${poles}-pole winding: ${slots}/(3·gcd(${slots}, ${poles / 2})) = ${(slots / (3 * gcd(slots, poles / 2))).toFixed(3)} is not a whole number.`,
      'Check the slot count and the pole count; this combination needs a special (unbalanced) winding.',
      'core.slots',
    );
  return ok({ slots, poles });
}

function checkSpansAndTurns(spec: WindingSpec): EngineResult<null> {
  const { spans, turnsPerCoil, slots } = spec;
  if (!Array.isArray(spans) || spans.length === 0)
    return fail('invalid-input', 'Give at least one coil span.', 'Enter the span in slot pitches: "1–8" is 7.', 'winding.spans');
  if (!Array.isArray(turnsPerCoil) || turnsPerCoil.length !== spans.length)
    return fail(
      'invalid-input',
      `Give one turns-per-coil figure for each span (${spans.length} span(s), ${turnsPerCoil?.length ?? 0} turns figure(s)).`,
      'Concentric groups list the turns of each coil, outside coil first.',
      'winding.turnsPerCoil',
    );
  for (const [i, y] of spans.entries()) {
    if (!Number.isInteger(y) || y < 1)
      return fail(
        'invalid-input',
        `Span ${y} is not a whole number of slots of at least 1.`,
        'A coil in slots 1 and 8 has span 7.',
        `winding.spans.${i}`,
      );
    if (y >= slots)
      return fail(
        'span-too-large',
        `Span ${y} is not less than the ${slots} slots of the core.`,
        'Spans count slot pitches: "1–8" is 7, not 8.',
        `winding.spans.${i}`,
      );
  }
  for (const [i, n] of turnsPerCoil.entries())
    if (!isWhole(n, 1, LAYOUT_LIMITS.maxTurns))
      return fail(
        'invalid-input',
        `Turns per coil must be a whole number from 1 to ${LAYOUT_LIMITS.maxTurns}, not ${n}.`,
        'Count the turns of one coil.',
        `winding.turnsPerCoil.${i}`,
      );
  if (spec.style === 'lap' && spans.length !== 1)
    return fail('invalid-input', 'A lap winding has a single span.', 'Choose concentric for coils of several spans.', 'winding.spans');
  return ok(null);
}

/** Belt index 0…5 of slot index s (0-based) from its position on the slot star, in exact integer steps. */
const beltOf = (s: number, slots: number, p: number): number => Math.floor((6 * ((s * p) % slots)) / slots);

/** Consecutive runs of slots in the same belt, starting at a belt change (indices are 0-based). */
function beltRuns(slots: number, p: number): { start: number; length: number; belt: number }[] {
  const belts = Array.from({ length: slots }, (_, s) => beltOf(s, slots, p));
  let first = belts.findIndex((b, s) => b !== belts[(s - 1 + slots) % slots]);
  if (first < 0) first = 0;
  const runs: { start: number; length: number; belt: number }[] = [];
  for (let k = 0; k < slots; k++) {
    const s = (first + k) % slots;
    const b = belts[s] ?? 0;
    const last = runs[runs.length - 1];
    if (last && last.belt === b && k > 0) last.length++;
    else runs.push({ start: s, length: 1, belt: b });
  }
  return runs;
}

interface CoilPlan {
  /** 0-based slot of the going side and the polarity it has. */
  inSlot: number;
  span: number;
  turns: number;
  phase: Phase;
  polarity: Polarity;
}

/** Spans and turns sorted outside coil first, as concentric groups nest. */
function nested(spec: WindingSpec): { span: number; turns: number }[] {
  const coils = spec.spans.map((span, i) => ({ span, turns: spec.turnsPerCoil[i] ?? 0 }));
  return spec.style === 'concentric' ? coils.sort((a, b) => b.span - a.span) : coils;
}

function doubleLayerPlan(spec: WindingSpec): EngineResult<CoilPlan[]> {
  const p = spec.poles / 2;
  const group = nested(spec);
  const plan: CoilPlan[] = [];
  for (const run of beltRuns(spec.slots, p)) {
    if (spec.style === 'concentric' && run.length !== group.length)
      return fail(
        'not-applicable',
        `Concentric groups of ${group.length} coil(s) do not fit the belts of this winding (a belt of ${run.length} slot(s)).`,
        `Give ${run.length} spans per group, or wind it lap (fractional-slot double-layer windings are lap).`,
        'winding.spans',
      );
    const [phase, polarity] = BELTS[run.belt] ?? ['A', 1];
    for (let i = 0; i < run.length; i++) {
      const c = spec.style === 'lap' ? group[0] : group[i];
      if (c) plan.push({ inSlot: (run.start + i) % spec.slots, span: c.span, turns: c.turns, phase, polarity });
    }
  }
  return ok(plan);
}

function singleLayerPlan(spec: WindingSpec): EngineResult<CoilPlan[]> {
  const { slots, poles } = spec;
  const q = slots / (3 * poles);
  if (!Number.isInteger(q))
    return fail(
      'not-applicable',
      `A single-layer 60°-belt winding needs whole slots per pole per phase; here q = ${slotsPerPolePerPhase(slots, poles).z}/${slotsPerPolePerPhase(slots, poles).d}.`,
      'Use a double-layer winding for fractional slots.',
      'winding.layers',
    );
  const whole = spec.singleLayerCoiling === 'whole';
  if (whole && q % 2 !== 0)
    return fail(
      'not-applicable',
      `Whole coiling splits each belt in two, which needs an even q; here q = ${q}.`,
      'Choose half-coiled.',
      'winding.singleLayerCoiling',
    );
  const tau = 3 * q;
  const perGroup = whole ? q / 2 : q;
  const group = nested(spec);
  if (spec.style === 'concentric' && group.length !== perGroup)
    return fail(
      'invalid-input',
      `A ${whole ? 'whole' : 'half'}-coiled group here has ${perGroup} coil(s), not ${group.length}.`,
      `Give ${perGroup} spans, e.g. ${usualSingleLayerSpans(q, whole).join(', ')}.`,
      'winding.spans',
    );
  const plan: CoilPlan[] = [];
  // Each group leaves from (part of) a belt and returns in the same phase's belt one pole pitch on.
  for (let start = 0; start < slots; start += q) {
    const [phase, polarity] = BELTS[beltOf(start, slots, poles / 2)] ?? ['A', 1];
    if (!whole && polarity < 0) continue;
    const first = start + (whole ? q / 2 : 0);
    const outSet = new Set(Array.from({ length: perGroup }, (_, i) => (start + tau + i) % slots));
    for (let i = 0; i < perGroup; i++) {
      const c = spec.style === 'lap' ? group[0] : group[i];
      if (!c) continue;
      const out = (first + i + c.span) % slots;
      if (!outSet.has(out))
        return fail(
          'invalid-input',
          `Span ${c.span} does not reach the return belt of a ${whole ? 'whole' : 'half'}-coiled single-layer winding with q = ${q}.`,
          `Usual spans here: ${usualSingleLayerSpans(q, whole).join(', ')}${spec.style === 'lap' ? ` (lap: ${whole ? tau - q / 2 : tau})` : ''}.`,
          'winding.spans',
        );
      outSet.delete(out);
      plan.push({ inSlot: (first + i) % slots, span: c.span, turns: c.turns, phase, polarity });
    }
  }
  return ok(plan);
}

/** Nested concentric spans of a single-layer group, outside coil first: τ+q−1, τ+q−3 … (half-coiled). */
export function usualSingleLayerSpans(q: number, whole: boolean): number[] {
  const tau = 3 * q;
  const n = whole ? q / 2 : q;
  const outer = whole ? tau - 1 : tau + q - 1;
  return Array.from({ length: n }, (_, i) => outer - 2 * i);
}

function sidesFromPlan(plan: CoilPlan[], spec: WindingSpec): EngineResult<SlotTable> {
  const layers = spec.layers;
  const taken = new Set<string>();
  const sides: CoilSide[] = [];
  for (const [coil, c] of plan.entries()) {
    const outSlot = (c.inSlot + c.span) % spec.slots;
    const pair: [number, Layer, Polarity][] = [
      [c.inSlot, 1, c.polarity],
      [outSlot, layers === 2 ? 2 : 1, c.polarity === 1 ? -1 : 1],
    ];
    for (const [s, layer, polarity] of pair) {
      const key = `${s}/${layer}`;
      if (taken.has(key))
        return fail(
          'invalid-input',
          `Two coil sides land in slot ${s + 1}${layers === 2 ? `, layer ${layer}` : ''}.`,
          'Check the spans: concentric spans usually step by 2 slots.',
          'winding.spans',
        );
      taken.add(key);
      sides.push({ slot: s + 1, layer, phase: c.phase, polarity, turns: c.turns, coil: coil + 1 });
    }
  }
  sides.sort((a, b) => a.slot - b.slot || a.layer - b.layer);
  return ok({ slots: spec.slots, poles: spec.poles, layers, source: 'standard', sides });
}

/**
 * Builds the standard 60°-belt layout. Each slot's going side is put in the belt (A+, C−, B+, A−, C+, B−)
 * that holds its phasor on the slot star (electrical angle s·p·360°/S): the usual slot-star allocation,
 * which also yields balanced fractional double-layer layouts. Double layer: the return side lies one span
 * on in layer 2. Single layer: groups join a belt to its partner one pole pitch on (half-coiled: one group
 * per pole pair; whole-coiled: half-belts, one group per pole). [derived, docs/engineering/winding-factor.md]
 */
export function buildStandardLayout(spec: WindingSpec): EngineResult<SlotTable> {
  const base = checkSlotsAndPoles(spec.slots, spec.poles);
  if (!base.ok) return base;
  if (spec.layers !== 1 && spec.layers !== 2)
    return fail(
      'invalid-input',
      `Layers must be 1 or 2, not ${String(spec.layers)}.`,
      'Count the coil sides in one slot.',
      'winding.layers',
    );
  if (spec.style !== 'lap' && spec.style !== 'concentric')
    return fail('invalid-input', 'Style must be lap or concentric.', 'Lap: all coils one span; concentric: nested coils.', 'winding.style');
  const spans = checkSpansAndTurns(spec);
  if (!spans.ok) return spans;
  const plan = spec.layers === 2 ? doubleLayerPlan(spec) : singleLayerPlan(spec);
  return plan.ok ? sidesFromPlan(plan.value, spec) : plan;
}

/** The layout to analyse: the winder's slot table when given, else the standard layout. */
export function windingLayout(spec: WindingSpec): EngineResult<SlotTable> {
  if (spec.slotTable && spec.slotTable.length > 0) {
    const base = checkSlotsAndPoles(spec.slots, spec.poles);
    if (!base.ok) return base;
    return checkSlotTable({
      slots: spec.slots,
      poles: spec.poles,
      layers: spec.layers === 1 ? 1 : 2,
      source: 'explicit',
      sides: spec.slotTable,
    });
  }
  return buildStandardLayout(spec);
}

/**
 * Checks a slot table drawn by the winder: slots 1…S, one side per slot and layer, phases A/B/C, polarity
 * ±1, whole positive turns, every phase present; when coil numbers are given, two sides per coil of the
 * same phase and turns and opposite polarity. Balance is judged separately (phase-balance.ts).
 */
export function checkSlotTable(table: SlotTable): EngineResult<SlotTable> {
  const at = (i: number, f: string): string => `winding.slotTable.${i}.${f}`;
  const seen = new Set<string>();
  const coils = new Map<number, CoilSide[]>();
  const withCoil = table.sides.filter((s) => s.coil !== undefined).length;
  if (withCoil !== 0 && withCoil !== table.sides.length)
    return fail(
      'invalid-input',
      'Some coil sides have a coil number and some do not.',
      'Number every coil side or none.',
      'winding.slotTable',
    );
  for (const [i, s] of table.sides.entries()) {
    if (!isWhole(s.slot, 1, table.slots))
      return fail(
        'invalid-input',
        `Slot ${s.slot} is not between 1 and ${table.slots}.`,
        'Slots are numbered 1 to the slot count.',
        at(i, 'slot'),
      );
    if (s.layer !== 1 && (s.layer !== 2 || table.layers !== 2))
      return fail(
        'invalid-input',
        `Layer ${String(s.layer)} does not exist in a ${table.layers}-layer winding.`,
        'Use layer 1 (top) and, for double layer, 2 (bottom).',
        at(i, 'layer'),
      );
    if (s.phase !== 'A' && s.phase !== 'B' && s.phase !== 'C')
      return fail('invalid-input', `Phase ${String(s.phase)} is not A, B or C.`, 'Mark each coil side A, B or C.', at(i, 'phase'));
    if (s.polarity !== 1 && s.polarity !== -1)
      return fail(
        'invalid-input',
        `Polarity ${String(s.polarity)} is not +1 or −1.`,
        'Going sides +1, return sides −1.',
        at(i, 'polarity'),
      );
    if (!isWhole(s.turns, 1, LAYOUT_LIMITS.maxTurns))
      return fail(
        'invalid-input',
        `Turns ${s.turns} must be a whole number from 1 to ${LAYOUT_LIMITS.maxTurns}.`,
        'Count the turns of the coil.',
        at(i, 'turns'),
      );
    const key = `${s.slot}/${s.layer}`;
    if (seen.has(key))
      return fail(
        'invalid-input',
        `Slot ${s.slot}, layer ${s.layer} holds two coil sides.`,
        'Each slot layer holds one coil side.',
        at(i, 'slot'),
      );
    seen.add(key);
    if (s.coil !== undefined) coils.set(s.coil, [...(coils.get(s.coil) ?? []), s]);
  }
  for (const ph of ['A', 'B', 'C'] as const)
    if (!table.sides.some((s) => s.phase === ph))
      return fail(
        'unbalanced-layout',
        `Phase ${ph} has no coil sides.`,
        'A three-phase winding needs coils in A, B and C.',
        'winding.slotTable',
      );
  for (const [id, pair] of coils) {
    const [a, b] = pair;
    if (pair.length !== 2 || !a || !b || a.phase !== b.phase || a.turns !== b.turns || a.polarity === b.polarity)
      return fail(
        'invalid-input',
        `Coil ${id} must have two sides of one phase and turns, one +1 and one −1.`,
        'Check the coil numbers in the slot table.',
        'winding.slotTable',
      );
  }
  return ok({ ...table, sides: [...table.sides].sort((x, y) => x.slot - y.slot || x.layer - y.layer) });
}

/**
 * One layer of a slot table as the winder writes it: the phase letter per slot, upper case going (+1),
 * lower case returning (−1), '·' for an empty slot layer. Index 0 is slot 1.
 */
export function slotRow(table: SlotTable, layer: Layer): string[] {
  const row = new Array<string>(table.slots).fill('·');
  for (const s of table.sides)
    if (s.layer === layer && s.slot >= 1 && s.slot <= table.slots) row[s.slot - 1] = s.polarity > 0 ? s.phase : s.phase.toLowerCase();
  return row;
}
