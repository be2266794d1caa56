/**
 * The redesign search: every sensible winding for a new supply on the same core. For each layout family
 * (span, layers), connection and circuit count it finds the whole turns per coil that keep the gap, tooth
 * and yoke densities inside the shop's limits (closed form, turns.ts), then the wire sets from stock that
 * keep the current density and fit the slot (wire-sets.ts, wire-window.ts). The as-found wires in hand are always tried on
 * the as-found layout. Candidates are ranked by the rule in ranking.ts; families that fail name the limit
 * that binds, with its numbers. The work is bounded (WORK_BUDGET): a request too wide to search comes back
 * as an error naming what to narrow. Pure: no I/O, deterministic for the same inputs in any stock order.
 */
import { analyseWinding } from '../analyse-winding';
import { currentDensity } from '../current-density';
import { phaseVoltage } from '../flux';
import { fail, ok, type EngineResult } from '../result';
import { LAYOUT_LIMITS } from '../winding-layout';
import { expectedRating, phasePerLine } from './expected-rating';
import { describeLayout, harmonicSummary, layoutFamilies, MAX_DEFAULT_PATHS } from './families';
import { compareCandidates, effortItems, harmonicOf, RANKING_POINTS, scoreOf } from './ranking';
import { allowedTurnsRange, bestCompromiseTurns, ratiosAt, ratioViolations, signedPercent, turnsToTry, unforcedDeviation } from './turns';
import { checkRedesignInput } from './validate';
import { meanTurnLengthMm, wireMassKg } from './wire-mass';
import { largestArea, partsLabel, wireGroups, type WireGroups } from './wire-sets';
import { pickFromWindow, wireWindow, type WireWindow } from './wire-window';
import { layoutLabel, spansLabel } from '../notation';
import type {
  AsFoundCheck,
  Candidate,
  LayoutFamily,
  RedesignLimits,
  RedesignOriginal,
  RedesignRequest,
  RedesignSearch,
  RejectedFamily,
  StockWire,
  WireNeed,
  WireSet,
} from './types';

/** Turn counts tried per family (closest to the original densities first). */
const TURNS_PER_FAMILY = 3;
/** Wire sets are looked at up to this much copper over the area that holds the original current density. */
const AREA_WINDOW_OVER = 1.35;
/**
 * Most work units (wire combinations looked at plus turn counts checked) one search may spend. The widest
 * default-limit searches use well under a tenth of it (bench: 48 slots, 40 sizes); a request past it is
 * refused with what to narrow rather than left to run for minutes.
 */
export const WORK_BUDGET = 400_000;

const circle = (d: number): number => (Math.PI / 4) * d * d;
const pct0 = (f: number): string => `${(f * 100).toFixed(0)} %`;

interface FamilyChoice {
  layout: LayoutFamily;
  connection: 'star' | 'delta';
  paths: number;
}

/** Identity of a candidate: layout, turns, circuits, connection and wires. */
export function candidateKey(c: FamilyChoice, turns: number, wires: WireSet): string {
  const w = wires.parts.map((p) => `${p.count}x${p.wire.standard}:${p.wire.size}g${p.wire.enamelGrade}`).join('+');
  return `L${c.layout.layers}${c.layout.style[0]}${c.layout.spans.join('.')}-N${turns}-a${c.paths}-${c.connection === 'star' ? 'Y' : 'D'}-${w}`;
}

/** Winder effort of a size group (extra sizes, thin sizes) in ranking points, once per group per search. */
function groupPoints(g: WireGroups, minWireMm: number): Map<number[], number> {
  const out = new Map<number[], number>();
  for (const group of g.groups) {
    const thin = group.filter((i) => (g.wires[i]?.bareMm ?? 0) < minWireMm - 1e-9).length;
    out.set(group, (group.length - 1) * RANKING_POINTS.extraSize + thin * RANKING_POINTS.thinWire);
  }
  return out;
}

/** The as-found wires in hand as a wire set, matched to the stock rows of the same sizes (kg on hand) when there are any. */
function asFoundWireSet(original: RedesignOriginal, stock: readonly StockWire[]): WireSet {
  const parts = original.wires
    .map((w) => {
      const row =
        stock.find((s) => s.standard === w.standard && s.size === w.size && s.enamelGrade === w.enamelGrade) ??
        stock.find((s) => s.label === w.label && s.enamelGrade === w.enamelGrade);
      const wire: StockWire = row ?? {
        standard: w.standard ?? 'metric',
        size: w.size ?? w.label,
        enamelGrade: w.enamelGrade,
        label: w.label,
        bareMm: w.bareMm,
        overallMm: w.overallMm,
        areaMm2: w.areaMm2,
        onHandKg: 0,
      };
      return { wire, count: w.count };
    })
    .sort((a, b) => b.wire.bareMm - a.wire.bareMm);
  return {
    parts,
    label: partsLabel(parts),
    areaMm2: parts.reduce((s, p) => s + p.count * p.wire.areaMm2, 0),
    insulatedAreaMm2: parts.reduce((s, p) => s + p.count * circle(p.wire.overallMm), 0),
    strands: parts.reduce((s, p) => s + p.count, 0),
  };
}

/** What to narrow when a request runs past the work budget: the widest settings first. */
export function narrowingAdvice(request: RedesignRequest): string[] {
  const { target, limits } = request;
  const out: string[] = [];
  if (limits.maxStrandsInHand > 10) out.push(`wires in hand (now ${limits.maxStrandsInHand}; 10 or fewer is usual)`);
  if (limits.maxWireSizes > 1 && limits.mixedSizeRatioMax > 1.3)
    out.push(`the mixed-size diameter ratio (now ${limits.mixedSizeRatioMax}; 1.3 is usual)`);
  if (limits.maxWireSizes === 3 && limits.maxStrandsInHand > 10) out.push('sizes per conductor (now 3; try 2)');
  const dens = Math.max(limits.gap.over, limits.gap.under, limits.tooth.over, limits.tooth.under, limits.yoke.over);
  if (dens > 0.2) out.push(`the flux-density limits (now up to ${pct0(dens)}; 5–10 % is usual)`);
  if (limits.currentDensityRise > 0.2) out.push(`the current-density rise (now ${pct0(limits.currentDensityRise)}; 5 % is usual)`);
  if (target.spans.length > 3) out.push(`the spans listed (now ${target.spans.length})`);
  if (target.parallelPaths.length > 3) out.push(`the circuits listed (now ${target.parallelPaths.length})`);
  if (target.connection === 'either') out.push('the connection (star or delta instead of either)');
  if (out.length === 0) out.push('wires in hand or sizes per conductor');
  return out;
}

/** The error of a search that ran past its budget. */
function tooWide(request: RedesignRequest, budget: number): EngineResult<never> {
  const what = narrowingAdvice(request);
  return fail(
    'too-wide',
    `The request is too wide to search in reasonable time (more than ${budget.toLocaleString('en-US')} steps through wire combinations and turn counts).`,
    `Narrow the request: ${what.join('; ')}.`,
    what[0]?.startsWith('wires in hand') ? 'limits.maxStrandsInHand' : undefined,
  );
}

/** Searches the candidates for a request (see the file comment). */
export function searchRedesign(
  original: RedesignOriginal,
  request: RedesignRequest,
  stock: readonly StockWire[],
  options: { budget?: number } = {},
): EngineResult<RedesignSearch> {
  const budget = options.budget ?? WORK_BUDGET;
  const checked = checkRedesignInput(original, request);
  if (!checked.ok) return checked;
  const { target, limits } = request;
  const ow = original.winding;
  const old = analyseWinding({ winding: ow, supply: original.supply, core: original.core });
  if (!old.ok)
    return fail(old.error.code, `The as-found winding cannot be analysed: ${old.error.message}`, old.error.hint, old.error.field);
  const oldKw = old.value.windingFactor;
  const oldNph = old.value.seriesTurnsPerPhase;
  const oldArea = original.wires.reduce((s, w) => s + w.count * w.areaMm2, 0);
  const oldInsulated = original.wires.reduce((s, w) => s + w.count * circle(w.overallMm), 0);
  const perSlot = new Map<number, number>();
  for (const s of old.value.layout.sides) perSlot.set(s.slot, (perSlot.get(s.slot) ?? 0) + s.turns);
  const oldZs = Math.max(0, ...perSlot.values());
  const oldFill = (oldZs * oldInsulated) / original.grossSlotAreaMm2;
  // The as-found winding proves what the slot holds: when it already fills more than the shop limit, the
  // new winding may fill as much as it did, never more. Likewise for thin wire and harmonics.
  const fillLimit = Math.max(limits.slotFillMax, oldFill);
  const minWireMm = Math.min(limits.minWireBareMm, ...original.wires.map((w) => w.bareMm));
  const harmonicLimit = Math.max(limits.harmonicKwMax, harmonicOf(harmonicSummary(old.value)));
  const oldJ = original.ratedCurrentA
    ? currentDensity({
        lineCurrentA: original.ratedCurrentA,
        connection: ow.connection,
        parallelPaths: ow.parallelPaths,
        conductorAreaPerTurnMm2: oldArea,
      }).ampsPerMm2
    : null;

  const expected = expectedRating(original, target);
  const { families, rejected: layoutRejections, spanNotes } = layoutFamilies(original, target);
  const rejected: RejectedFamily[] = [...layoutRejections];
  const sets = wireGroups(stock, limits);
  if (sets.wires.length === 0)
    rejected.push({
      family: 'every family',
      reason: 'The wire stock is empty: add the sizes on hand on the stock page.',
      binding: 'stock',
    });
  const asFoundWires = asFoundWireSet(original, stock);
  const gp = groupPoints(sets, minWireMm);
  // One enumeration per copper-area window: spans and turns that share a current share its sets.
  const windows = new Map<string, WireWindow>();
  const window = (lo: number, hi: number, ideal: number): WireWindow | null => {
    const key = `${lo.toPrecision(12)}|${hi.toPrecision(12)}|${ideal.toPrecision(12)}`;
    let w = windows.get(key);
    if (!w) {
      w = wireWindow(sets, gp, lo, hi, ideal, budget - work);
      wireSetsConsidered += w.looked;
      work += w.steps;
      windows.set(key, w);
    }
    return w.exhausted || work > budget ? null : w;
  };

  const connections: ('star' | 'delta')[] = target.connection === 'either' ? ['star', 'delta'] : [target.connection];
  const poleRatio = target.poles / ow.poles;
  const vphRatio = phaseVoltage(target.lineVoltageV, 'star') / phaseVoltage(original.supply.lineVoltageV, ow.connection);
  const byKey = new Map<string, Candidate>();
  const asFoundReasons: string[] = [];
  let familiesTried = 0;
  let turnsChecked = 0;
  let wireSetsConsidered = 0;
  /** Work units spent: wire-set enumeration steps and turn counts checked (bounded by the budget). */
  let work = 0;
  const ctx: BuildContext = { original, limits, poleRatio, oldArea, oldJ, minWireMm };

  for (const layout of families) {
    const h = harmonicOf(layout.harmonics);
    if (h > harmonicLimit + 1e-9) {
      familiesTried++;
      rejected.push({
        family: describeLayout(layout),
        reason: `k_w5 ${layout.harmonics.kw5.toFixed(3)} / k_w7 ${layout.harmonics.kw7.toFixed(3)}: the larger, ${h.toFixed(3)}, is over the ${harmonicLimit.toFixed(3)} harmonic limit.`,
        binding: 'harmonics',
      });
      if (layout.asFoundLayout)
        asFoundReasons.push(`the as-found layout is over the harmonic limit (${h.toFixed(3)} > ${harmonicLimit.toFixed(3)})`);
      continue;
    }
    const paths = target.parallelPaths.length > 0 ? target.parallelPaths : layout.allowedPaths.filter((a) => a <= MAX_DEFAULT_PATHS);
    for (const connection of connections) {
      for (const a of paths) {
        familiesTried++;
        const choice: FamilyChoice = { layout, connection, paths: a };
        const family = `${describeLayout(layout)} · ${connection} · ${a} circuit${a === 1 ? '' : 's'}`;
        if (!layout.allowedPaths.includes(a)) {
          rejected.push({
            family,
            reason: `${a} parallel circuits would not carry identical voltages in this layout; current would circulate (allowed: ${layout.allowedPaths.join(', ')}).`,
            binding: 'circuits',
          });
          continue;
        }
        // Φ ratio at one turn per coil: N_ph = C·N_c/a.
        const vph = connection === 'star' ? vphRatio : vphRatio * Math.sqrt(3);
        const r1 =
          vph *
          (original.supply.frequencyHz / target.frequencyHz) *
          ((oldNph * oldKw) / ((layout.coilsPerPhase / a) * layout.windingFactor));
        const range = allowedTurnsRange(r1, poleRatio, limits, LAYOUT_LIMITS.maxTurns);
        if (range.lo > range.hi) {
          turnsChecked++;
          work++;
          const n = bestCompromiseTurns(r1, poleRatio, limits, LAYOUT_LIMITS.maxTurns);
          const why = ratioViolations(ratiosAt(r1, n, poleRatio), limits);
          rejected.push({
            family,
            reason: `No whole number of turns keeps the flux densities inside the limits: the nearest, ${n} turns per coil, gives ${why.join('; ') || 'densities just outside the limits'}.`,
            binding: 'flux',
          });
          if (layout.asFoundLayout)
            asFoundReasons.push(
              `${connection}, ${a} circuit${a === 1 ? '' : 's'}: ${why[0] ?? 'flux densities outside the limits'} at ${n} turns`,
            );
          continue;
        }
        // Current: I_path,new/I_path,old from the expected line current, the connection and the circuits.
        const pathRatio = expected.lineCurrentRatio * (phasePerLine(connection) / phasePerLine(ow.connection)) * (ow.parallelPaths / a);
        const idealArea = oldArea * pathRatio;
        const riseFloor = idealArea / (1 + limits.currentDensityRise);
        // I_path,new = J_old·A_old·(path ratio) = J_old·idealArea; it may not exceed the absolute limit.
        const absFloor = oldJ !== null ? (oldJ * idealArea) / limits.currentDensityMaxAPerMm2 : 0;
        const minArea = Math.max(riseFloor, absFloor);
        const areaWhy =
          absFloor > riseFloor
            ? `${minArea.toFixed(3)} mm² per turn (the ${limits.currentDensityMaxAPerMm2} A/mm² current-density limit)`
            : `${minArea.toFixed(3)} mm² per turn (current density at most ${signedPercent(limits.currentDensityRise)} over the original)`;
        const wireFailures: { binding: RejectedFamily['binding']; text: string }[] = [];
        let found = 0;
        for (const turns of turnsToTry(r1, poleRatio, range, TURNS_PER_FAMILY)) {
          turnsChecked++;
          work++;
          const zs = layout.sidesPerSlot * turns;
          const cap = (fillLimit * original.grossSlotAreaMm2) / zs;
          const basis: Basis = { r1, pathRatio, zs, idealArea };
          if (layout.asFoundLayout) {
            const why = asFoundMisfit(asFoundWires, { minArea, cap, zs, fillLimit, gross: original.grossSlotAreaMm2, areaWhy });
            if (why === null) {
              const c = buildCandidate(ctx, choice, turns, asFoundWires, basis);
              byKey.set(c.key, c);
              found++;
            } else asFoundReasons.push(`${connection}, ${a} circuit${a === 1 ? '' : 's'}, ${turns} turns: ${why}`);
          }
          if (sets.wires.length === 0) continue;
          const windowTop = Math.max(minArea, idealArea) * AREA_WINDOW_OVER;
          const near = window(minArea, windowTop, idealArea);
          if (!near) return tooWide(request, budget);
          let pick = pickFromWindow(sets, near, cap);
          if (pick.picks.length === 0) {
            // Nothing near the original copper area fits: look at every heavier set too (a lower current
            // density is allowed), so a refusal names a real limit, not the edge of the search window.
            const heavy = window(windowTop, Number.POSITIVE_INFINITY, idealArea);
            if (!heavy) return tooWide(request, budget);
            const far = pickFromWindow(sets, heavy, cap);
            const lean =
              [pick.leastFill, far.leastFill]
                .filter((x): x is WireSet => x !== null)
                .sort((p, q) => p.insulatedAreaMm2 - q.insulatedAreaMm2)[0] ?? null;
            pick = { picks: far.picks, leastFill: lean };
          }
          if (pick.picks.length === 0) {
            wireFailures.push(
              wireMisfit(sets, limits, {
                turns,
                zs,
                minArea,
                areaWhy,
                fillLimit,
                gross: original.grossSlotAreaMm2,
                leastFill: pick.leastFill,
              }),
            );
            continue;
          }
          found++;
          for (const wires of pick.picks) {
            const c = buildCandidate(ctx, choice, turns, wires, basis);
            if (!byKey.has(c.key)) byKey.set(c.key, c);
          }
        }
        if (found === 0 && wireFailures.length > 0) {
          const binding = wireFailures.every((f) => f.binding === wireFailures[0]?.binding) ? wireFailures[0]?.binding : 'slot-fill';
          rejected.push({ family, reason: `No wire combination from stock fits: ${wireFailures.map((f) => f.text).join('; ')}.`, binding });
        }
      }
    }
  }

  const candidates = [...byKey.values()].sort(compareCandidates);
  candidates.forEach((c, i) => (c.rank = i + 1));
  const keeper = candidates.find((c) => c.keepsAsFoundWire) ?? null;
  const asFound: AsFoundCheck = keeper
    ? { key: keeper.key, reason: null }
    : { key: null, reason: asFoundReason(original, target, asFoundWires, families, asFoundReasons) };
  return ok({
    candidates,
    rejected,
    familiesTried,
    turnsChecked,
    wireSetsConsidered,
    asFound,
    spanNotes,
    expected,
    originalBasis: {
      seriesTurnsPerPhase: oldNph,
      windingFactor: oldKw,
      conductorAreaMm2: oldArea,
      conductorsPerSlot: oldZs,
      slotFill: oldFill,
      slotFillLimit: fillLimit,
      currentDensityAPerMm2: oldJ,
    },
  });
}

/** Why the as-found wires do not fit one winding (null when they do). */
function asFoundMisfit(
  w: WireSet,
  f: { minArea: number; cap: number; zs: number; fillLimit: number; gross: number; areaWhy: string },
): string | null {
  if (w.areaMm2 < f.minArea - 1e-12)
    return `${w.label} gives ${w.areaMm2.toFixed(3)} mm² per turn; the current needs at least ${f.areaWhy}`;
  if (w.insulatedAreaMm2 > f.cap + 1e-12)
    return `${w.label} fills ${pct0((f.zs * w.insulatedAreaMm2) / f.gross)} of the slot (limit ${pct0(f.fillLimit)})`;
  return null;
}

/** The sentence for "the as-found wires cannot be kept". */
function asFoundReason(
  original: RedesignOriginal,
  target: RedesignRequest['target'],
  w: WireSet,
  families: readonly LayoutFamily[],
  reasons: readonly string[],
): string {
  if (target.poles !== original.winding.poles)
    return `The pole count changes (${original.winding.poles} → ${target.poles}): the as-found layout cannot be kept.`;
  if (!families.some((f) => f.asFoundLayout))
    return target.layers !== 'keep'
      ? 'The request asks for another layout (double-layer lap), so the as-found layout is not tried.'
      : 'The spans requested are not the as-found spans, so the as-found layout is not tried.';
  const shown = reasons.slice(0, 4).join('; ');
  return `Keeping ${w.label} on the as-found layout does not meet the limits: ${shown}${reasons.length > 4 ? ` (and ${reasons.length - 4} more)` : ''}.`;
}

/** Which limit stops every wire set for one winding, with its numbers. */
function wireMisfit(
  g: WireGroups,
  limits: RedesignLimits,
  f: { turns: number; zs: number; minArea: number; areaWhy: string; fillLimit: number; gross: number; leastFill: WireSet | null },
): { binding: RejectedFamily['binding']; text: string } {
  if (f.leastFill) {
    const fill = (f.zs * f.leastFill.insulatedAreaMm2) / f.gross;
    return {
      binding: 'slot-fill',
      text: `at ${f.turns} turns the current needs ${f.areaWhy}; the leanest set from stock that carries it (${f.leastFill.label}, ${f.leastFill.areaMm2.toFixed(3)} mm²) fills ${pct0(fill)} of the slot (limit ${pct0(f.fillLimit)})`,
    };
  }
  const most = largestArea(g);
  if (most < f.minArea) {
    const thick = g.wires[0];
    return {
      binding: 'strands',
      text: `at ${f.turns} turns the current needs ${f.areaWhy}; ${g.maxStrands} wires in hand of the thickest size in stock (${thick?.label ?? '—'}) give only ${most.toFixed(3)} mm² (wires-in-hand limit ${limits.maxStrandsInHand})`,
    };
  }
  return {
    binding: 'stock-sizes',
    text: `at ${f.turns} turns no combination of the stock sizes (up to ${g.maxStrands} wires in hand, ${limits.maxWireSizes} size${limits.maxWireSizes === 1 ? '' : 's'}) reaches ${f.areaWhy}`,
  };
}

interface BuildContext {
  original: RedesignOriginal;
  limits: RedesignLimits;
  poleRatio: number;
  oldArea: number;
  oldJ: number | null;
  minWireMm: number;
}

interface Basis {
  r1: number;
  pathRatio: number;
  zs: number;
  idealArea: number;
}

function buildCandidate(x: BuildContext, c: FamilyChoice, turns: number, wires: WireSet, b: Basis): Candidate {
  const { original, poleRatio } = x;
  const ow = original.winding;
  const L = c.layout;
  const ratios = ratiosAt(b.r1, turns, poleRatio);
  const jRatio = b.idealArea / wires.areaMm2;
  const sorted = (xs: readonly number[]): string => [...xs].sort((p, q) => q - p).join(',');
  const polesKept = poleRatio === 1;
  const sameSpans = sorted(L.spans) === sorted(ow.spans);
  const sameLayers = L.layers === ow.layers && L.style === ow.style;
  const oldTurns = ow.turnsPerCoil.join('/');
  const turnsChanged = !ow.turnsPerCoil.every((t) => t === turns) || L.spans.length !== ow.turnsPerCoil.length;
  const changes: string[] = [];
  if (turnsChanged) changes.push(`turns per coil ${oldTurns} → ${turns}`);
  if (c.connection !== ow.connection) changes.push(`connection ${ow.connection} → ${c.connection}`);
  if (c.paths !== ow.parallelPaths) changes.push(`circuits ${ow.parallelPaths} → ${c.paths}`);
  if (!sameSpans || !polesKept) changes.push(`span ${spansLabel(ow.spans)} → ${spansLabel(L.spans)}`);
  if (!sameLayers) changes.push(`${layoutLabel(ow)} → ${layoutLabel(L)}`);
  const oldWires = partsLabel(original.wires.map((w) => ({ wire: w, count: w.count })));
  if (oldWires !== wires.label) changes.push(`wire ${oldWires} → ${wires.label}`);
  const keepsAsFoundWire = L.asFoundLayout && oldWires === wires.label;
  const closeness = unforcedDeviation(ratios, poleRatio) + Math.max(0, jRatio - 1);
  const effort = effortItems({
    circuits: c.paths,
    originalCircuits: ow.parallelPaths,
    strands: wires.strands,
    sizes: wires.parts.length,
    thinSizes: wires.parts.filter((p) => p.wire.bareMm < x.minWireMm - 1e-9).length,
    turnsChanged,
    connectionChanged: c.connection !== ow.connection,
    spanChanged: polesKept && !sameSpans,
    layersChanged: !sameLayers,
    pitch: L.pitch,
    layers: L.layers,
    overPitched: L.overPitched,
    kw5: L.harmonics.kw5,
    kw7: L.harmonics.kw7,
    fractional: L.fractional,
  });
  const mlt = meanTurnLengthMm(original, L.meanSpan);
  const kg = wireMassKg(wires, L.coilsPerPhase, turns, mlt);
  const wireNeeds: WireNeed[] = wires.parts.map((p, i) => {
    const need = kg[i] ?? 0;
    const onHand = p.wire.onHandKg ?? null;
    return { label: p.wire.label, kg: need, onHandKg: onHand, short: onHand !== null && need > onHand + 1e-9 };
  });
  return {
    key: candidateKey(c, turns, wires),
    rank: 0,
    winding: {
      slots: ow.slots,
      poles: Math.round(poleRatio * ow.poles),
      layers: L.layers,
      style: L.style,
      ...(L.singleLayerCoiling ? { singleLayerCoiling: L.singleLayerCoiling } : {}),
      spans: [...L.spans],
      turnsPerCoil: L.spans.map(() => turns),
      parallelPaths: c.paths,
      connection: c.connection,
    },
    wires,
    seriesTurnsPerPhase: (L.coilsPerPhase * turns) / c.paths,
    windingFactor: L.windingFactor,
    fractional: L.fractional,
    harmonics: { ...L.harmonics },
    subHarmonics: L.subHarmonics.map((s) => ({ ...s })),
    ratios,
    currentDensity: { ratio: jRatio, aPerMm2: x.oldJ === null ? null : x.oldJ * jRatio },
    conductorsPerSlot: b.zs,
    slotFill: (b.zs * wires.insulatedAreaMm2) / original.grossSlotAreaMm2,
    pitch: L.pitch,
    overPitched: L.overPitched,
    keepsAsFoundWire,
    changes,
    closeness,
    effort,
    score: scoreOf(closeness, effort),
    wireNeeds,
  };
}
