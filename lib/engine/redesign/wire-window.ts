/**
 * The wire sets of one copper-area window, reduced once to what any slot can use. For a winding the search
 * wants, among the sets whose insulated area fits the slot, the one with the fewest ranking points and the
 * one closest to the original current density. Both are answered by a frontier over the insulated area: the
 * sets that no leaner set beats. The window depends only on the current (connection, circuits), not on the
 * span or the turns, so one enumeration serves every layout and turn count that shares it.
 */
import { RANKING_POINTS } from './ranking';
import { forEachWireSet, makeWireSet, type WireGroups, type WireSetView } from './wire-sets';
import type { WireSet } from './types';

interface Rec {
  group: number[];
  counts: number[];
  ins: number;
  points: number;
  dev: number;
}

const EPS = 1e-9;
/** "a is at least as good as b" for each pick (smaller is better; no allocation: this runs per set). */
type AtLeast = (a: Rec, b: Rec) => boolean;
const bestAtLeast: AtLeast = (a, b) => a.points <= b.points + EPS;
const closestAtLeast: AtLeast = (a, b) => a.dev < b.dev - EPS || (a.dev <= b.dev + EPS && a.points <= b.points + EPS);

/** Keeps the sets not beaten by a leaner one (sorted by insulated area, key strictly improving). */
function offer(front: Rec[], r: Rec, atLeast: AtLeast, keep: () => Rec): boolean {
  for (const f of front) if (f.ins <= r.ins + 1e-12 && atLeast(f, r)) return false;
  const kept = keep();
  let j = 0;
  for (let i = 0; i < front.length; i++) {
    const f = front[i] as Rec;
    if (!(f.ins >= r.ins - 1e-12 && atLeast(r, f))) front[j++] = f;
  }
  front.length = j;
  let at = front.findIndex((f) => f.ins > r.ins);
  if (at < 0) at = front.length;
  front.splice(at, 0, kept);
  return true;
}

/** One enumerated window. */
export interface WireWindow {
  looked: number;
  /** Work spent: sets visited plus partial counts tried. */
  steps: number;
  exhausted: boolean;
  leastFill: Rec | null;
  best: Rec[];
  closest: Rec[];
}

/** Enumerates the sets with copper area in [minArea, maxArea] once (see the file comment). */
export function wireWindow(
  g: WireGroups,
  groupPoints: Map<number[], number>,
  minArea: number,
  maxArea: number,
  idealArea: number,
  budget: number,
): WireWindow {
  const best: Rec[] = [];
  const closest: Rec[] = [];
  let leastFill: Rec | null = null;
  // One scratch record per window; a set that is kept gets its own copy (the view's arrays are reused).
  const r: Rec = { group: [], counts: [], ins: 0, points: 0, dev: 0 };
  const { n, steps, exhausted } = forEachWireSet(
    g,
    minArea,
    maxArea,
    (v: WireSetView) => {
      const ratio = idealArea / v.areaMm2;
      r.group = v.group;
      r.ins = v.insulatedAreaMm2;
      r.points =
        (ratio > 1 ? (ratio - 1) / RANKING_POINTS.closenessStep : 0) +
        (v.strands - 1) * RANKING_POINTS.strand +
        (groupPoints.get(v.group) ?? 0);
      r.dev = Math.abs(ratio - 1);
      let copy: Rec | null = null;
      const keep = (): Rec => (copy ??= { group: v.group, counts: [...v.counts], ins: r.ins, points: r.points, dev: r.dev });
      if (!leastFill || r.ins < leastFill.ins - 1e-12) leastFill = keep();
      offer(best, r, bestAtLeast, keep);
      offer(closest, r, closestAtLeast, keep);
    },
    budget,
  );
  return { looked: n, steps, exhausted, leastFill, best, closest };
}

/** The last frontier set that fits the slot (the best that fits). */
const fitting = (front: readonly Rec[], cap: number): Rec | null => {
  let out: Rec | null = null;
  for (const r of front) if (r.ins <= cap) out = r;
  return out;
};

/** The picks for one slot capacity (insulated area per conductor), and the leanest set that carries the current. */
export function pickFromWindow(g: WireGroups, w: WireWindow, capInsulated: number): { picks: WireSet[]; leastFill: WireSet | null } {
  const build = (r: Rec | null): WireSet | null => (r ? makeWireSet(g.wires, r.group, r.counts) : null);
  const picks = [build(fitting(w.best, capInsulated)), build(fitting(w.closest, capInsulated))].filter(
    (s, i, all): s is WireSet => s !== null && all.findIndex((t) => t?.label === s.label) === i,
  );
  return { picks, leastFill: build(w.leastFill) };
}
