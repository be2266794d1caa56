/**
 * Layout families of a redesign: the layers, style and spans to try on the new pole count, each analysed
 * once (winding factor, harmonics, allowed circuits) with one turn per coil; turns and circuits scale the
 * result linearly, so the search never re-analyses a layout.
 */
import { analyseWinding, type WindingAnalysis } from '../analyse-winding';
import { spanLabel } from '../notation';
import { usualSingleLayerSpans, type Layer, type WindingSpec } from '../winding-layout';
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

/** Relative amplitude under which an order is not worth stating. */
const SUB_HARMONIC_FLOOR = 0.005;

/** Orders a fractional-slot layout adds: below the working wave (sub-harmonics) and even or non-integer orders. */
export function subHarmonics(a: Pick<WindingAnalysis, 'mmf'>): { order: number; relativeAmplitude: number }[] {
  return a.mmf.harmonics
    .filter(
      (h) => h.order !== 1 && (h.order < 1 || !Number.isInteger(h.order) || h.order % 2 === 0) && h.relativeAmplitude >= SUB_HARMONIC_FLOOR,
    )
    .map((h) => ({ order: h.order, relativeAmplitude: h.relativeAmplitude }))
    .sort((x, y) => x.order - y.order);
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

/** Pitch of a layout: turn-weighted mean span over the pole pitch τ = S/P. */
export const pitchOf = (slots: number, poles: number, spans: readonly number[], turns: readonly number[]): number =>
  meanSpan(spans, turns) / (slots / poles);

/** A double-layer span longer than the pole pitch (single-layer coils are full-pitch electrically whatever their shape). */
export const isOverPitched = (layers: number, pitch: number): boolean => layers === 2 && pitch > 1 + 1e-9;

const spanName = spanLabel;

interface LayoutTry {
  spec: WindingSpec;
  asFound: boolean;
}

/**
 * The layout specs to try, with one turn per coil, plus notes on requested spans that do not suit the pole
 * count and rejections of over-pitched spans the engineer did not ask for. On a pole change the usual
 * spans of the new pole pitch (about 2/3 to full, 5/6 first) are always offered besides any requested.
 */
function layoutSpecs(
  original: RedesignOriginal,
  target: RedesignTarget,
): { tries: LayoutTry[]; notes: string[]; rejected: RejectedFamily[] } {
  const w = original.winding;
  const base = { slots: w.slots, poles: target.poles, parallelPaths: 1, connection: 'star' as const };
  const polesKept = target.poles === w.poles;
  const keep = target.layers === 'keep' && !w.slotTable;
  const tau = w.slots / target.poles;
  const notes: string[] = [];
  const rejected: RejectedFamily[] = [];
  const asFoundSpec = (): WindingSpec => ({
    ...base,
    layers: w.layers,
    style: w.style,
    ...(w.singleLayerCoiling ? { singleLayerCoiling: w.singleLayerCoiling } : {}),
    spans: [...w.spans],
    turnsPerCoil: w.spans.map(() => 1),
  });
  const lap = (y: number, layers: Layer): WindingSpec => ({
    ...base,
    layers,
    style: 'lap',
    ...(layers === 1 ? { singleLayerCoiling: w.singleLayerCoiling ?? 'half' } : {}),
    spans: [y],
    turnsPerCoil: [1],
  });
  const usual = (): LayoutTry[] => usualLapSpans(w.slots, target.poles).map((y) => ({ spec: lap(y, 2), asFound: false }));
  if (target.spans.length > 0) {
    const layers: Layer = keep ? w.layers : 2;
    let tries: LayoutTry[];
    if (keep && w.style === 'concentric' && w.spans.length > 1) {
      const spans = [...target.spans].sort((a, b) => b - a);
      tries = [
        {
          spec: {
            ...base,
            layers,
            style: 'concentric',
            ...(w.singleLayerCoiling ? { singleLayerCoiling: w.singleLayerCoiling } : {}),
            spans,
            turnsPerCoil: spans.map(() => 1),
          },
          asFound: false,
        },
      ];
    } else tries = target.spans.map((y) => ({ spec: lap(y, layers), asFound: false }));
    for (const t of tries)
      t.asFound = polesKept && keep && sameSpans(t.spec.spans, w.spans) && t.spec.style === w.style && t.spec.layers === w.layers;
    // Requested spans on the new pole pitch: over-pitched ones need an explicit choice; very short ones are flagged.
    const kept: LayoutTry[] = [];
    for (const t of tries) {
      const pitch = pitchOf(w.slots, target.poles, t.spec.spans, t.spec.turnsPerCoil);
      const name = t.spec.spans.map(spanName).join(', ');
      if (isOverPitched(t.spec.layers, pitch) && !t.asFound) {
        notes.push(
          `Span ${name} is longer than the ${fmtSlots(tau)}-slot pole pitch on ${target.poles} poles (over-pitched, ${(pitch * 100).toFixed(0)} % of the pole pitch).`,
        );
        if (!target.allowOverPitch) {
          rejected.push({
            family: describeLayout(t.spec),
            reason: `Over-pitched: the span is ${(pitch * 100).toFixed(0)} % of the ${fmtSlots(tau)}-slot pole pitch on ${target.poles} poles; it is evaluated only when over-pitched spans are explicitly allowed.`,
            binding: 'span',
          });
          continue;
        }
      } else if (t.spec.layers === 2 && pitch < 2 / 3 - 1e-9) {
        notes.push(
          `Span ${name} is only ${(pitch * 100).toFixed(0)} % of the ${fmtSlots(tau)}-slot pole pitch on ${target.poles} poles: the winding factor and the voltage per turn fall.`,
        );
      }
      kept.push(t);
    }
    if (!polesKept) {
      // Spans carried over from another pole count rarely suit: offer the new pole pitch's usual spans too.
      const have = new Set(kept.map((t) => t.spec.spans.join('.')));
      const extra = usual().filter((t) => !have.has(t.spec.spans.join('.')));
      if (extra.length > 0)
        notes.push(
          `On ${target.poles} poles the pole pitch is ${fmtSlots(tau)} slots: the usual spans ${extra.map((t) => spanName(t.spec.spans[0] ?? 0)).join(', ')} are tried as well.`,
        );
      return { tries: [...kept, ...extra], notes, rejected };
    }
    if (kept.length === 0)
      notes.push(
        `No requested span suits ${target.poles} poles; usual spans here: ${usualLapSpans(w.slots, target.poles).map(spanName).join(', ')}.`,
      );
    return { tries: kept, notes, rejected };
  }
  if (keep && polesKept) return { tries: [{ spec: asFoundSpec(), asFound: true }], notes, rejected };
  if (keep && w.layers === 1) {
    const q = w.slots / (3 * target.poles);
    const whole = w.singleLayerCoiling === 'whole';
    const spans = Number.isInteger(q) ? usualSingleLayerSpans(q, whole) : [];
    if (spans.length > 0)
      return {
        tries: [
          {
            spec: {
              ...base,
              layers: 1,
              style: spans.length > 1 ? 'concentric' : 'lap',
              singleLayerCoiling: whole ? 'whole' : 'half',
              spans,
              turnsPerCoil: spans.map(() => 1),
            },
            asFound: false,
          },
        ],
        notes,
        rejected,
      };
  }
  return { tries: usual(), notes, rejected };
}

const sameSpans = (a: readonly number[], b: readonly number[]): boolean =>
  [...a].sort((x, y) => y - x).join(',') === [...b].sort((x, y) => y - x).join(',');
const fmtSlots = (tau: number): string => (Number.isInteger(tau) ? String(tau) : tau.toFixed(2));

/** "double-layer lap 1–8" / "single-layer concentric 1–12, 1–10". */
export function describeLayout(spec: Pick<WindingSpec, 'layers' | 'style' | 'spans'>): string {
  return `${layoutLabel(spec)} ${spansLabel(spec.spans)}`;
}

/** Analyses each layout to try; layouts the core cannot carry come back as rejections with the engine's reason. */
export function layoutFamilies(
  original: RedesignOriginal,
  target: RedesignTarget,
): { families: LayoutFamily[]; rejected: RejectedFamily[]; spanNotes: string[] } {
  const families: LayoutFamily[] = [];
  const { tries, notes: spanNotes, rejected } = layoutSpecs(original, target);
  for (const { spec, asFound } of tries) {
    const r = analyseWinding({ winding: spec, supply: { lineVoltageV: target.lineVoltageV, frequencyHz: target.frequencyHz } });
    if (!r.ok) {
      rejected.push({ family: describeLayout(spec), reason: `${r.error.message} ${r.error.hint}`, binding: 'layout' });
      continue;
    }
    const a = r.value;
    if (a.balance.verdict !== 'balanced' || !(a.windingFactor > 0)) {
      rejected.push({
        family: describeLayout(spec),
        reason: `The layout is not balanced on ${target.poles} poles: ${a.balance.reasons.join(' ')}`,
        binding: 'layout',
      });
      continue;
    }
    const pitch = pitchOf(spec.slots, spec.poles, spec.spans, spec.turnsPerCoil);
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
      pitch,
      overPitched: isOverPitched(spec.layers, pitch),
      asFoundLayout: asFound,
      subHarmonics: a.fractional ? subHarmonics(a) : [],
    });
  }
  return { families, rejected, spanNotes };
}
