/**
 * Layout families of a redesign: the layers, style and spans to try on the new pole count, each analysed
 * once (winding factor, harmonics, allowed circuits) with one turn per coil; turns and circuits scale the
 * result linearly, so the search never re-analyses a layout.
 */
import { analyseWinding, type WindingAnalysis } from '../analyse-winding';
import { usualSingleLayerSpans, type WindingSpec } from '../winding-layout';
import type { LayoutFamily, RedesignOriginal, RedesignTarget, RejectedFamily } from './types';
import { spansLabel, layoutLabel } from '../notation';

/** Most circuits the search offers when the engineer does not list them. */
export const MAX_DEFAULT_PATHS = 8;

/** k_w5, k_w7 and the MMF harmonic content √Σ(relative amplitude²) over every order but the working one. */
export function harmonicSummary(a: Pick<WindingAnalysis, 'factors' | 'mmf'>): LayoutFamily['harmonics'] {
  const kw = (order: number): number => a.factors.find((f) => f.order === order)?.kw ?? 0;
  const mmfDistortion = Math.sqrt(a.mmf.harmonics.filter((h) => h.order !== 1).reduce((s, h) => s + h.relativeAmplitude ** 2, 0));
  return { kw5: kw(5), kw7: kw(7), mmfDistortion };
}

/** Turn-weighted mean span. */
export const meanSpan = (spans: readonly number[], turns: readonly number[]): number => {
  const total = turns.reduce((a, b) => a + b, 0);
  return total > 0 ? spans.reduce((s, y, i) => s + y * (turns[i] ?? 0), 0) / total : (spans[0] ?? 0);
};

/** Short-pitched lap spans from about 2/3 of the pole pitch to the full pitch, most usual (≈ 5/6) first. */
export function usualLapSpans(slots: number, poles: number): number[] {
  const tau = slots / poles;
  const lo = Math.max(1, Math.ceil((2 * tau) / 3));
  const hi = Math.max(lo, Math.floor(tau));
  const spans: number[] = [];
  for (let y = lo; y <= hi; y++) spans.push(y);
  return spans.sort((a, b) => Math.abs(a - (5 * tau) / 6) - Math.abs(b - (5 * tau) / 6) || a - b);
}

/** The layout specs to try, with one turn per coil. */
function layoutSpecs(original: RedesignOriginal, target: RedesignTarget): WindingSpec[] {
  const w = original.winding;
  const base = { slots: w.slots, poles: target.poles, parallelPaths: 1, connection: 'star' as const };
  const polesKept = target.poles === w.poles;
  const keep = target.layers === 'keep' && !w.slotTable;
  if (target.spans.length > 0) {
    const layers = keep ? w.layers : 2;
    if (keep && w.style === 'concentric' && w.spans.length > 1)
      return [{ ...base, layers, style: 'concentric', ...(w.singleLayerCoiling ? { singleLayerCoiling: w.singleLayerCoiling } : {}), spans: [...target.spans].sort((a, b) => b - a), turnsPerCoil: target.spans.map(() => 1) }];
    return target.spans.map((y) => ({ ...base, layers, style: 'lap', ...(layers === 1 ? { singleLayerCoiling: w.singleLayerCoiling ?? 'half' } : {}), spans: [y], turnsPerCoil: [1] }));
  }
  if (keep && polesKept) {
    return [{ ...base, layers: w.layers, style: w.style, ...(w.singleLayerCoiling ? { singleLayerCoiling: w.singleLayerCoiling } : {}), spans: [...w.spans], turnsPerCoil: w.spans.map(() => 1) }];
  }
  if (keep && w.layers === 1) {
    const q = w.slots / (3 * target.poles);
    const whole = w.singleLayerCoiling === 'whole';
    const spans = Number.isInteger(q) ? usualSingleLayerSpans(q, whole) : [];
    if (spans.length > 0)
      return [{ ...base, layers: 1, style: spans.length > 1 ? 'concentric' : 'lap', singleLayerCoiling: whole ? 'whole' : 'half', spans, turnsPerCoil: spans.map(() => 1) }];
  }
  return usualLapSpans(w.slots, target.poles).map((y) => ({ ...base, layers: 2, style: 'lap', spans: [y], turnsPerCoil: [1] }));
}

/** "double-layer lap 1–8" / "single-layer concentric 1–12, 1–10". */
export function describeLayout(spec: Pick<WindingSpec, 'layers' | 'style' | 'spans'>): string {
  return `${layoutLabel(spec)} ${spansLabel(spec.spans)}`;
}

/** Analyses each layout to try; layouts the core cannot carry come back as rejections with the engine's reason. */
export function layoutFamilies(original: RedesignOriginal, target: RedesignTarget): { families: LayoutFamily[]; rejected: RejectedFamily[] } {
  const families: LayoutFamily[] = [];
  const rejected: RejectedFamily[] = [];
  for (const spec of layoutSpecs(original, target)) {
    const r = analyseWinding({ winding: spec, supply: { lineVoltageV: target.lineVoltageV, frequencyHz: target.frequencyHz } });
    if (!r.ok) {
      rejected.push({ family: describeLayout(spec), reason: `${r.error.message} ${r.error.hint}` });
      continue;
    }
    const a = r.value;
    if (a.balance.verdict !== 'balanced' || !(a.windingFactor > 0)) {
      rejected.push({ family: describeLayout(spec), reason: `The layout is not balanced on ${target.poles} poles: ${a.balance.reasons.join(' ')}` });
      continue;
    }
    const perSlot = new Map<number, number>();
    for (const s of a.layout.sides) perSlot.set(s.slot, (perSlot.get(s.slot) ?? 0) + s.turns);
    families.push({
      layers: spec.layers,
      style: spec.style,
      ...(spec.singleLayerCoiling && spec.layers === 1 ? { singleLayerCoiling: spec.singleLayerCoiling } : {}),
      spans: spec.spans,
      windingFactor: a.windingFactor,
      allowedPaths: a.parallelPaths.allowed,
      fractional: a.fractional,
      harmonics: harmonicSummary(a),
      sidesPerSlot: Math.max(0, ...perSlot.values()),
      coilsPerPhase: a.layout.sides.length / 2 / 3,
      meanSpan: meanSpan(spec.spans, spec.turnsPerCoil),
    });
  }
  return { families, rejected };
}
