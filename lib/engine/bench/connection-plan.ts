/**
 * How the coil groups of each phase are joined: into `a` parallel circuits of groups in series, each circuit
 * run from the phase's start lead to its finish lead, and the three phases in star or delta.
 *
 * A circuit takes a block of neighbouring groups of its phase (groups 1 … n/a, then n/a+1 … 2n/a …): short
 * jumpers, and for every path count the layout allows, each block holds whole repeating sections of the
 * winding, so the circuits carry identical EMF phasors [derived, reference §3]. If neighbouring blocks do not
 * match, every a-th group is taken instead; if that fails too the count is refused. Every circuit is checked:
 * same turns, same phasor (to 1e-9 of its magnitude).
 *
 * Groups in series follow the layout's current directions: after a forward group (current in at its start,
 * out at its finish) a forward group is joined finish to start (consecutive-pole connection) and a reversed
 * group finish to finish (alternate-pole connection); after a reversed group, which current leaves at its
 * start, the next forward group is joined start to start. [derived]
 */
import { fail, ok, type EngineResult } from '../result';
import type { Phase } from '../winding-layout';
import { coilGroups, groupLabel, type CoilGroup, type CoilGroups } from './coil-groups';
import type { SlotTable } from '../winding-layout';

/** Where a lead or jumper is fixed on a group. */
export type GroupEnd = 'start' | 'finish';

/** One group in a circuit, with the end current enters by. */
export interface CircuitStep {
  group: CoilGroup;
  /** 'start' for a forward group, 'finish' for a reversed one. */
  enter: GroupEnd;
  leave: GroupEnd;
}

/** One jumper between two groups of a circuit. */
export interface Jumper {
  from: { label: string; end: GroupEnd };
  to: { label: string; end: GroupEnd };
}

/** One parallel circuit of a phase: groups in series from the phase start to the phase finish. */
export interface Circuit {
  phase: Phase;
  /** 1 … a. */
  index: number;
  steps: CircuitStep[];
  jumpers: Jumper[];
  turns: number;
  phasor: { re: number; im: number };
}

/** How the groups of a phase follow one another. */
export type PoleConnection = 'alternate' | 'consecutive' | 'mixed';

/** The connection plan of a whole winding. */
export interface ConnectionPlan {
  groups: CoilGroups;
  parallelPaths: number;
  connection: 'star' | 'delta';
  circuits: Record<Phase, Circuit[]>;
  /** Alternate: neighbouring groups reversed (finish to finish); consecutive: all alike (finish to start). */
  poleConnection: PoleConnection;
  /** 'blocks' of neighbouring groups, or 'interleaved' (every a-th group). */
  grouping: 'blocks' | 'interleaved';
}

const PHASES: readonly Phase[] = ['A', 'B', 'C'];
const TOLERANCE = 1e-9;

function chain(phase: Phase, index: number, groups: CoilGroup[]): Circuit {
  const steps: CircuitStep[] = groups.map((g) =>
    g.sense > 0 ? { group: g, enter: 'start', leave: 'finish' } : { group: g, enter: 'finish', leave: 'start' },
  );
  const jumpers: Jumper[] = [];
  for (let i = 1; i < steps.length; i++) {
    const a = steps[i - 1];
    const b = steps[i];
    if (a && b) jumpers.push({ from: { label: groupLabel(a.group), end: a.leave }, to: { label: groupLabel(b.group), end: b.enter } });
  }
  const phasor = groups.reduce((z, g) => ({ re: z.re + g.phasor.re, im: z.im + g.phasor.im }), { re: 0, im: 0 });
  return { phase, index, steps, jumpers, turns: groups.reduce((t, g) => t + g.turns, 0), phasor };
}

/** True when every circuit has the first one's turns and phasor. */
function matched(circuits: Circuit[]): boolean {
  const ref = circuits[0];
  if (!ref) return false;
  const m = Math.hypot(ref.phasor.re, ref.phasor.im);
  if (!(m > 0)) return false;
  return circuits.every(
    (c) => c.turns === ref.turns && Math.hypot(c.phasor.re - ref.phasor.re, c.phasor.im - ref.phasor.im) <= TOLERANCE * m,
  );
}

function split(phase: Phase, groups: CoilGroup[], paths: number, how: 'blocks' | 'interleaved'): Circuit[] {
  const per = groups.length / paths;
  return Array.from({ length: paths }, (_, k) =>
    chain(phase, k + 1, how === 'blocks' ? groups.slice(k * per, (k + 1) * per) : groups.filter((_, i) => i % paths === k)),
  );
}

/** Alternate when neighbouring groups of a phase round the stator have opposite senses, consecutive when all alike. */
function poleConnectionOf(groups: CoilGroups): PoleConnection {
  let alternate = 0;
  let consecutive = 0;
  for (const ph of PHASES) {
    const list = groups.byPhase[ph];
    for (let i = 1; i < list.length; i++) {
      if (list[i]?.sense === list[i - 1]?.sense) consecutive++;
      else alternate++;
    }
  }
  if (alternate > 0 && consecutive > 0) return 'mixed';
  return alternate > 0 ? 'alternate' : 'consecutive';
}

/**
 * The connection plan of a layout for `paths` parallel circuits and a star or delta connection. Refuses a
 * path count that does not divide the groups of every phase into circuits of equal turns and phasor.
 */
export function connectionPlan(table: SlotTable, paths: number, connection: 'star' | 'delta'): EngineResult<ConnectionPlan> {
  if (!Number.isInteger(paths) || paths < 1)
    return fail(
      'invalid-input',
      `Parallel circuits must be a whole number of at least 1, not ${paths}.`,
      'Count the circuits of one phase.',
      'winding.parallelPaths',
    );
  const found = coilGroups(table);
  if (!found.ok) return found;
  const groups = found.value;
  const counts = PHASES.map((ph) => groups.byPhase[ph].length);
  if (counts.some((n) => n !== counts[0]))
    return fail(
      'unbalanced-layout',
      `The phases have different numbers of coil groups (${counts.join(', ')}).`,
      'Check the layout: a balanced winding has as many groups in every phase.',
      'winding',
    );
  const n = counts[0] ?? 0;
  if (n % paths !== 0)
    return fail(
      'parallel-paths-not-allowed',
      `${n} group(s) per phase cannot be shared among ${paths} parallel circuits.`,
      'Choose a circuit count that divides the groups per phase.',
      'winding.parallelPaths',
    );
  for (const how of ['blocks', 'interleaved'] as const) {
    const circuits = {} as Record<Phase, Circuit[]>;
    for (const ph of PHASES) circuits[ph] = split(ph, groups.byPhase[ph], paths, how);
    if (PHASES.every((ph) => matched(circuits[ph])))
      return ok({ groups, parallelPaths: paths, connection, circuits, poleConnection: poleConnectionOf(groups), grouping: how });
  }
  return fail(
    'parallel-paths-not-allowed',
    `${paths} parallel circuit(s) would not carry identical voltages in this layout; current would circulate between them.`,
    'Choose a circuit count the layout allows.',
    'winding.parallelPaths',
  );
}
