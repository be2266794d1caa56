/**
 * The ranking rule of the redesign search, as a careful engineer would sign it (reference §3, written out in
 * docs/engineering/redesign-ranking.md):
 *
 * 1. Tiers. The as-found layout and wires in hand, re-turned or reconnected, come first when they meet every
 *    limit; over-pitched spans (evaluated only when asked for) come last; everything else between.
 * 2. Within a tier, a score: one point per 5 % of unforced density move (gap, tooth, a yoke rise; a yoke fall
 *    forced by more poles is free), one per 5 % rise of current density (a fall is free), plus the winder's
 *    effort points below. Lower is better.
 * 3. Ties: lower k_w5/k_w7, then fewer circuits, then fewer strands, then closeness, then the key (a total
 *    order independent of the stock order).
 *
 * The effort points are shop practice [common practice, from memory: weights chosen so that one extra
 * circuit weighs as much as 15 % of flux density move, an extra size 10 %]; they are constants here so the rule shown on
 * the screen and the rule applied are the same.
 */
import type { Candidate, EffortItem } from './types';

/** Points of the ranking rule. */
export const RANKING_POINTS = {
  /**
   * One point per this much unforced density move or current-density rise (fraction): the width of the
   * usual +5 % rise limit, so a move the limits allow never outweighs an extra circuit.
   */
  closenessStep: 0.05,
  /** Per parallel circuit above the original's: more jumpers, more chances of a wrong connection. */
  extraCircuit: 3,
  /** Per wire in hand above one. */
  strand: 1,
  /** Per wire size above one in the conductor. */
  extraSize: 2,
  /** Per size thinner than the shop minimum: slow to wind, easy to break or nick. */
  thinWire: 4,
  /** Turns per coil differ from the as-found coils (the old coils no longer serve as a pattern). */
  turnsChanged: 1,
  /** Star ↔ delta: leads re-marked, terminal links changed. */
  connectionChanged: 1,
  /** Another span on the same poles: the former is set up anew. */
  spanChanged: 1,
  /** Another layer count or coil style: a different coil and insertion. */
  layersChanged: 2,
  /** A double-layer span under 2/3 of the pole pitch: low winding factor, crowded end turns. */
  shortSpan: 2,
  /** An over-pitched span: long end turns, more copper, harder insertion (also ranked last). */
  overPitch: 3,
  /** One point per this much of the larger of k_w5 and k_w7. */
  harmonicStep: 0.05,
  /** A fractional-slot layout: sub-harmonic or even orders, noise and stray losses. */
  fractional: 3,
} as const;

/** The rule in one sentence, shown above the candidates. */
export const RANKING_RULE =
  'Rewinding with the as-found wire (re-turned or reconnected) comes first when it meets every limit; the rest are ordered by one point per 5 % that a flux density moves without being forced to (a back-iron fall from more poles and a lower current density cost nothing) plus the winder’s effort — extra circuits, more wires in hand, more than one size, wire thinner than the shop minimum, hard or changed spans, 5th and 7th harmonics — with over-pitched spans, when asked for, last.';

/** What the ranking needs to know about a candidate. */
export type RankFacts = Pick<Candidate, 'key' | 'score' | 'closeness' | 'overPitched' | 'keepsAsFoundWire' | 'harmonics'> & {
  winding: Pick<Candidate['winding'], 'parallelPaths'>;
  wires: Pick<Candidate['wires'], 'strands'>;
};

/** 0: keeps the as-found wire; 1: the rest; 2: over-pitched. */
export const tierOf = (c: Pick<RankFacts, 'overPitched' | 'keepsAsFoundWire'>): number => (c.overPitched ? 2 : c.keepsAsFoundWire ? 0 : 1);

/** The larger of k_w5 and k_w7. */
export const harmonicOf = (h: Pick<Candidate['harmonics'], 'kw5' | 'kw7'>): number => Math.max(Math.abs(h.kw5), Math.abs(h.kw7));

const EPS = 1e-9;
const cmp = (a: number, b: number): number => (Math.abs(a - b) <= EPS ? 0 : a - b);

/** The ranking order (a total order): tier, score, harmonics, circuits, strands, closeness, key. */
export function compareCandidates(a: RankFacts, b: RankFacts): number {
  return (
    tierOf(a) - tierOf(b) ||
    cmp(a.score, b.score) ||
    cmp(harmonicOf(a.harmonics), harmonicOf(b.harmonics)) ||
    a.winding.parallelPaths - b.winding.parallelPaths ||
    a.wires.strands - b.wires.strands ||
    cmp(a.closeness, b.closeness) ||
    (a.key < b.key ? -1 : a.key > b.key ? 1 : 0)
  );
}

/** The facts the effort points are counted from. */
export interface EffortFacts {
  circuits: number;
  originalCircuits: number;
  strands: number;
  sizes: number;
  /** Sizes in the conductor thinner than the shop minimum. */
  thinSizes: number;
  turnsChanged: boolean;
  connectionChanged: boolean;
  /** Span changed with the poles kept (on a pole change every span changes: no point for that). */
  spanChanged: boolean;
  layersChanged: boolean;
  pitch: number;
  layers: number;
  overPitched: boolean;
  kw5: number;
  kw7: number;
  fractional: boolean;
}

/** The winder's effort, itemised (non-decreasing in circuits and strands: see the property tests). */
export function effortItems(f: EffortFacts): EffortItem[] {
  const P = RANKING_POINTS;
  const out: EffortItem[] = [];
  const extra = Math.max(0, f.circuits - f.originalCircuits);
  if (extra > 0) out.push({ what: `${extra} circuit${extra === 1 ? '' : 's'} more than the original`, points: extra * P.extraCircuit });
  if (f.strands > 1) out.push({ what: `${f.strands} wires in hand`, points: (f.strands - 1) * P.strand });
  if (f.sizes > 1) out.push({ what: `${f.sizes} wire sizes`, points: (f.sizes - 1) * P.extraSize });
  if (f.thinSizes > 0)
    out.push({
      what: `${f.thinSizes === 1 ? 'a size' : `${f.thinSizes} sizes`} thinner than the shop minimum`,
      points: f.thinSizes * P.thinWire,
    });
  if (f.turnsChanged) out.push({ what: 'turns per coil changed', points: P.turnsChanged });
  if (f.connectionChanged) out.push({ what: 'connection changed', points: P.connectionChanged });
  if (f.spanChanged) out.push({ what: 'span changed', points: P.spanChanged });
  if (f.layersChanged) out.push({ what: 'layers or coil style changed', points: P.layersChanged });
  if (f.overPitched) out.push({ what: `over-pitched span (${(f.pitch * 100).toFixed(0)} % of the pole pitch)`, points: P.overPitch });
  else if (f.layers === 2 && f.pitch < 2 / 3 - EPS)
    out.push({ what: `short span (${(f.pitch * 100).toFixed(0)} % of the pole pitch)`, points: P.shortSpan });
  const h = harmonicOf(f);
  if (h > 0) out.push({ what: `k_w5/k_w7 up to ${h.toFixed(3)}`, points: h / P.harmonicStep });
  if (f.fractional) out.push({ what: 'fractional-slot layout', points: P.fractional });
  return out;
}

/** Score: closeness in steps plus the effort points. */
export const scoreOf = (closeness: number, effort: readonly EffortItem[]): number =>
  closeness / RANKING_POINTS.closenessStep + effort.reduce((s, e) => s + e.points, 0);
