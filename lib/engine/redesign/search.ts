/**
 * The redesign search: every sensible winding for a new supply on the same core. For each layout family
 * (span, layers), connection and circuit count it finds the whole turns per coil that keep the gap, tooth
 * and yoke densities inside the shop's limits (closed form, turns.ts), then the wire set from stock that
 * keeps the current density of the original and fits the slot (wire-sets.ts). Candidates are ranked by how
 * close they keep the original densities (in 2 % bands), then by how simple they are for the winder.
 * Families that fail say why. Pure: no I/O, deterministic for the same inputs in any stock order.
 */
import { analyseWinding } from '../analyse-winding';
import { currentDensity } from '../current-density';
import { phaseVoltage } from '../flux';
import { fail, ok, type EngineResult } from '../result';
import { LAYOUT_LIMITS } from '../winding-layout';
import { expectedRating, phasePerLine } from './expected-rating';
import { describeLayout, layoutFamilies, MAX_DEFAULT_PATHS } from './families';
import { allowedTurnsRange, bestCompromiseTurns, ratiosAt, ratioViolations, turnsToTry, worstDeviation } from './turns';
import { checkRedesignInput } from './validate';
import { forEachWireSet, makeWireSet, partsLabel, wireGroups, type WireGroups, type WireSetView } from './wire-sets';
import type { Candidate, LayoutFamily, RedesignOriginal, RedesignRequest, RedesignSearch, RejectedFamily, StockWire, WireSet } from './types';
import { spansLabel, layoutLabel } from '../notation';

/** Turn counts tried per family (closest to the original densities first). */
const TURNS_PER_FAMILY = 3;
/** Wire sets are looked at up to this much copper over the area that holds the original current density. */
const AREA_WINDOW_OVER = 1.6;

const circle = (d: number): number => (Math.PI / 4) * d * d;

interface FamilyChoice {
  layout: LayoutFamily;
  connection: 'star' | 'delta';
  paths: number;
}

/** Width of a closeness band: candidates within one band are ordered by simplicity. */
export const CLOSENESS_BAND = 0.02;
/** Weight of the current-density change in the closeness (the flux densities count in full). */
export const CURRENT_DENSITY_WEIGHT = 0.25;
const band = (closeness: number): number => Math.floor(closeness / CLOSENESS_BAND);

/** Ranking: closeness band (2 %), then simplicity, then closeness, then the key (a total order). */
export function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    band(a.closeness) - band(b.closeness) ||
    a.simplicity - b.simplicity ||
    a.closeness - b.closeness ||
    (a.key < b.key ? -1 : a.key > b.key ? 1 : 0)
  );
}

/** Identity of a candidate: layout, turns, circuits, connection and wires. */
export function candidateKey(c: FamilyChoice, turns: number, wires: WireSet): string {
  const w = wires.parts.map((p) => `${p.count}x${p.wire.standard}:${p.wire.size}g${p.wire.enamelGrade}`).join('+');
  return `L${c.layout.layers}${c.layout.style[0]}${c.layout.spans.join('.')}-N${turns}-a${c.paths}-${c.connection === 'star' ? 'Y' : 'D'}-${w}`;
}

/** Simplicity of a wire set for the winder: strands, plus 2 for each extra size. */
const wireEffort = (s: Pick<WireSetView, 'strands' | 'group'>): number => s.strands + 2 * (s.group.length - 1);

interface Kept {
  view: WireSetView;
  dev: number;
  band: number;
  effort: number;
}

const keep = (v: WireSetView, dev: number): Kept => ({
  view: { ...v, group: v.group, counts: [...v.counts] }, dev, band: band(CURRENT_DENSITY_WEIGHT * dev), effort: wireEffort(v),
});

/**
 * Wire sets for one winding: the simplest whose current density is within the same closeness band as the
 * best, and the one closest in current density when that is another set. Also the leanest set that
 * carries the current regardless of fill, to explain a refusal.
 */
function pickWires(g: WireGroups, minArea: number, idealArea: number, capInsulated: number): { picks: WireSet[]; looked: number; leastFill: WireSet | null } {
  let closest: Kept | null = null;
  let simplest: Kept | null = null;
  let leastFill: Kept | null = null;
  const looked = forEachWireSet(g, minArea, idealArea * AREA_WINDOW_OVER, (v) => {
    const dev = Math.abs(idealArea / v.areaMm2 - 1);
    if (!leastFill || v.insulatedAreaMm2 < leastFill.view.insulatedAreaMm2) leastFill = keep(v, dev);
    if (v.insulatedAreaMm2 > capInsulated) return;
    const b = band(CURRENT_DENSITY_WEIGHT * dev);
    const e = wireEffort(v);
    if (!closest || dev < closest.dev - 1e-12 || (Math.abs(dev - closest.dev) <= 1e-12 && e < closest.effort)) closest = keep(v, dev);
    if (!simplest || b < simplest.band || (b === simplest.band && (e < simplest.effort || (e === simplest.effort && dev < simplest.dev - 1e-12)))) simplest = keep(v, dev);
  });
  const build = (k: Kept | null): WireSet | null => (k ? makeWireSet(g.wires, k.view.group, k.view.counts) : null);
  const picks = [build(simplest), build(closest)].filter((s, i, all): s is WireSet => s !== null && all.findIndex((t) => t?.label === s.label) === i);
  return { picks, looked, leastFill: build(leastFill) };
}

/** Searches the candidates for a request (see the file comment). */
export function searchRedesign(original: RedesignOriginal, request: RedesignRequest, stock: readonly StockWire[]): EngineResult<RedesignSearch> {
  const checked = checkRedesignInput(original, request);
  if (!checked.ok) return checked;
  const { target, limits } = request;
  const ow = original.winding;
  const old = analyseWinding({ winding: ow, supply: original.supply, core: original.core });
  if (!old.ok) return fail(old.error.code, `The as-found winding cannot be analysed: ${old.error.message}`, old.error.hint, old.error.field);
  const oldKw = old.value.windingFactor;
  const oldNph = old.value.seriesTurnsPerPhase;
  const oldArea = original.wires.reduce((s, w) => s + w.count * w.areaMm2, 0);
  const oldInsulated = original.wires.reduce((s, w) => s + w.count * circle(w.overallMm), 0);
  const perSlot = new Map<number, number>();
  for (const s of old.value.layout.sides) perSlot.set(s.slot, (perSlot.get(s.slot) ?? 0) + s.turns);
  const oldZs = Math.max(0, ...perSlot.values());
  const oldFill = (oldZs * oldInsulated) / original.grossSlotAreaMm2;
  // The as-found winding proves what the slot holds: when it already fills more than the shop limit, the
  // new winding may fill as much as it did, never more.
  const fillLimit = Math.max(limits.slotFillMax, oldFill);
  const oldJ = original.ratedCurrentA
    ? currentDensity({ lineCurrentA: original.ratedCurrentA, connection: ow.connection, parallelPaths: ow.parallelPaths, conductorAreaPerTurnMm2: oldArea }).ampsPerMm2
    : null;

  const expected = expectedRating(original, target);
  const { families, rejected: layoutRejections } = layoutFamilies(original, target);
  const rejected: RejectedFamily[] = [...layoutRejections];
  const sets = wireGroups(stock, limits);
  if (sets.wires.length === 0) rejected.push({ family: 'every family', reason: 'The wire stock is empty: add the sizes on hand on the stock page.' });

  const connections: ('star' | 'delta')[] = target.connection === 'either' ? ['star', 'delta'] : [target.connection];
  const poleRatio = target.poles / ow.poles;
  const vphRatio = phaseVoltage(target.lineVoltageV, 'star') / phaseVoltage(original.supply.lineVoltageV, ow.connection);
  const candidates: Candidate[] = [];
  let familiesTried = 0;
  let wireSetsConsidered = 0;

  for (const layout of families) {
    const paths = target.parallelPaths.length > 0 ? target.parallelPaths : layout.allowedPaths.filter((a) => a <= MAX_DEFAULT_PATHS);
    for (const connection of connections) {
      for (const a of paths) {
        familiesTried++;
        const choice: FamilyChoice = { layout, connection, paths: a };
        const family = `${describeLayout(layout)} · ${connection} · ${a} circuit${a === 1 ? '' : 's'}`;
        if (!layout.allowedPaths.includes(a)) {
          rejected.push({ family, reason: `${a} parallel circuits would not carry identical voltages in this layout; current would circulate (allowed: ${layout.allowedPaths.join(', ')}).` });
          continue;
        }
        // Φ ratio at one turn per coil: N_ph = C·N_c/a.
        const vph = connection === 'star' ? vphRatio : vphRatio * Math.sqrt(3);
        const r1 = vph * (original.supply.frequencyHz / target.frequencyHz) * ((oldNph * oldKw) / ((layout.coilsPerPhase / a) * layout.windingFactor));
        const range = allowedTurnsRange(r1, poleRatio, limits, LAYOUT_LIMITS.maxTurns);
        if (range.lo > range.hi) {
          const n = bestCompromiseTurns(r1, poleRatio, limits, LAYOUT_LIMITS.maxTurns);
          const why = ratioViolations(ratiosAt(r1, n, poleRatio), limits);
          rejected.push({ family, reason: `No whole number of turns keeps the flux densities inside the limits: the nearest, ${n} turns per coil, gives ${why.join('; ') || 'densities just outside the limits'}.` });
          continue;
        }
        // Current: I_path,new/I_path,old from the expected line current, the connection and the circuits.
        const pathRatio = expected.lineCurrentRatio * (phasePerLine(connection) / phasePerLine(ow.connection)) * (ow.parallelPaths / a);
        const idealArea = oldArea * pathRatio;
        let minArea = idealArea / (1 + limits.currentDensityRise);
        // I_path,new = J_old·A_old·(path ratio) = J_old·idealArea; it may not exceed the absolute limit.
        if (oldJ !== null) minArea = Math.max(minArea, (oldJ * idealArea) / limits.currentDensityMaxAPerMm2);
        const wireFailures: string[] = [];
        let found = 0;
        for (const turns of turnsToTry(r1, poleRatio, range, TURNS_PER_FAMILY)) {
          const zs = layout.sidesPerSlot * turns;
          const cap = (fillLimit * original.grossSlotAreaMm2) / zs;
          const pick = pickWires(sets, minArea, idealArea, cap);
          wireSetsConsidered += pick.looked;
          if (pick.picks.length === 0) {
            wireFailures.push(
              pick.leastFill
                ? `at ${turns} turns the leanest set that carries the current (${pick.leastFill.label}) fills ${((zs * pick.leastFill.insulatedAreaMm2) / original.grossSlotAreaMm2 * 100).toFixed(0)} % of the slot (limit ${(fillLimit * 100).toFixed(0)} %)`
                : `at ${turns} turns the stock cannot make ${minArea.toFixed(3)} mm² per turn with up to ${limits.maxStrandsInHand} wires in hand`,
            );
            continue;
          }
          found++;
          for (const wires of pick.picks) candidates.push(buildCandidate(original, choice, turns, wires, { r1, poleRatio, pathRatio, oldArea, oldJ, zs }));
        }
        if (found === 0) rejected.push({ family, reason: `No wire combination from stock fits the slot: ${wireFailures.join('; ')}.` });
      }
    }
  }

  candidates.sort(compareCandidates);
  candidates.forEach((c, i) => (c.rank = i + 1));
  return ok({
    candidates,
    rejected,
    familiesTried,
    wireSetsConsidered,
    expected,
    originalBasis: {
      seriesTurnsPerPhase: oldNph, windingFactor: oldKw, conductorAreaMm2: oldArea, conductorsPerSlot: oldZs,
      slotFill: oldFill, slotFillLimit: fillLimit, currentDensityAPerMm2: oldJ,
    },
  });
}

interface Basis {
  r1: number;
  poleRatio: number;
  pathRatio: number;
  oldArea: number;
  oldJ: number | null;
  zs: number;
}

function buildCandidate(original: RedesignOriginal, c: FamilyChoice, turns: number, wires: WireSet, b: Basis): Candidate {
  const ow = original.winding;
  const ratios = ratiosAt(b.r1, turns, b.poleRatio);
  const jRatio = (b.pathRatio * b.oldArea) / wires.areaMm2;
  const sorted = (xs: readonly number[]): string => [...xs].sort((p, q) => q - p).join(',');
  const sameSpans = sorted(c.layout.spans) === sorted(ow.spans);
  const sameLayers = c.layout.layers === ow.layers && c.layout.style === ow.style;
  const oldTurns = ow.turnsPerCoil.join('/');
  const changes: string[] = [];
  if (!ow.turnsPerCoil.every((t) => t === turns) || c.layout.spans.length !== ow.turnsPerCoil.length) changes.push(`turns per coil ${oldTurns} → ${turns}`);
  if (c.connection !== ow.connection) changes.push(`connection ${ow.connection} → ${c.connection}`);
  if (c.paths !== ow.parallelPaths) changes.push(`circuits ${ow.parallelPaths} → ${c.paths}`);
  if (!sameSpans) changes.push(`span ${spansLabel(ow.spans)} → ${spansLabel(c.layout.spans)}`);
  if (!sameLayers) changes.push(`${layoutLabel(ow)} → ${layoutLabel(c.layout)}`);
  const oldWires = partsLabel(original.wires.map((w) => ({ wire: w, count: w.count })));
  const newWires = wires.label;
  if (oldWires !== newWires) changes.push(`wire ${oldWires} → ${newWires}`);
  const simplicity = wires.strands + 2 * (wires.parts.length - 1) + (sameSpans ? 0 : 1) + (c.paths !== ow.parallelPaths ? 1 : 0) + (sameLayers ? 0 : 1) + (c.connection !== ow.connection ? 2 : 0);
  return {
    key: candidateKey(c, turns, wires),
    rank: 0,
    winding: {
      slots: ow.slots, poles: Math.round(b.poleRatio * ow.poles), layers: c.layout.layers, style: c.layout.style,
      ...(c.layout.singleLayerCoiling ? { singleLayerCoiling: c.layout.singleLayerCoiling } : {}),
      spans: [...c.layout.spans], turnsPerCoil: c.layout.spans.map(() => turns), parallelPaths: c.paths, connection: c.connection,
    },
    wires,
    seriesTurnsPerPhase: (c.layout.coilsPerPhase * turns) / c.paths,
    windingFactor: c.layout.windingFactor,
    fractional: c.layout.fractional,
    harmonics: { ...c.layout.harmonics },
    ratios,
    currentDensity: { ratio: jRatio, aPerMm2: b.oldJ === null ? null : b.oldJ * jRatio },
    conductorsPerSlot: b.zs,
    slotFill: (b.zs * wires.insulatedAreaMm2) / original.grossSlotAreaMm2,
    changes,
    closeness: worstDeviation(ratios) + CURRENT_DENSITY_WEIGHT * Math.abs(jRatio - 1),
    simplicity,
  };
}
