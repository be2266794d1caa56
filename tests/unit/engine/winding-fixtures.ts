/** Shared builders for the winding-engine tests (not a test file itself). */
import type { CoreGeometry } from '@/lib/engine/flux';
import type { EngineResult } from '@/lib/engine/result';
import { buildStandardLayout, type SlotTable, type WindingSpec } from '@/lib/engine/winding-layout';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';

export function value<T>(r: EngineResult<T>): T {
  if (!r.ok) throw new Error(`expected ok, got ${r.error.code} at ${r.error.field ?? '-'}: ${r.error.message}`);
  return r.value;
}

export function errorOf<T>(r: EngineResult<T>) {
  if (r.ok) throw new Error('expected an error, got a value');
  return r.error;
}

/** A double-layer lap winding spec, 10 turns per coil, one path, star. */
export const lap = (slots: number, poles: number, span: number, over: Partial<WindingSpec> = {}): WindingSpec => ({
  slots, poles, layers: 2, style: 'lap', spans: [span], turnsPerCoil: [10], parallelPaths: 1, connection: 'star', ...over,
});

/** A single-layer winding spec (lap or concentric), 10 turns per coil. */
export const singleLayer = (slots: number, poles: number, spans: number[], coiling: 'whole' | 'half' = 'half'): WindingSpec => ({
  slots, poles, layers: 1, style: spans.length > 1 ? 'concentric' : 'lap', singleLayerCoiling: coiling, spans,
  turnsPerCoil: spans.map(() => 10), parallelPaths: 1, connection: 'star',
});

export const layoutOf = (spec: WindingSpec): SlotTable => value(buildStandardLayout(spec));

/** Worked example A (reference §2): 36 slots, 4 poles, double-layer lap 1–8, N_c 14, a 1, star, 400 V 50 Hz. */
export const EXAMPLE_A_SPEC: WindingSpec = lap(36, 4, 7, { turnsPerCoil: [14] });
export const EXAMPLE_A_SUPPLY = { lineVoltageV: 400, frequencyHz: 50 };
/** D 150 mm, L 120 mm, k_fe 0.95, tooth 6.5 mm, OD 240 mm, slot depth 20 mm. */
export const EXAMPLE_A_CORE: CoreGeometry = {
  boreM: 0.15, coreLengthM: 0.12, outsideDiameterM: 0.24, slots: 36, slotDepthM: 0.02, toothWidthM: 0.0065, stackingFactor: 0.95,
};

/** Relative difference |a − b|/|b|. */
export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

/**
 * Balanced slot/pole combinations for property tests: S/(3·gcd(S, p)) whole, S ≤ 96, P ≤ 12, q ≥ 1/2
 * (coil span at least one slot short of the slot count stays meaningful).
 */
export const BALANCED_COMBINATIONS: readonly { slots: number; poles: number }[] = (() => {
  const out: { slots: number; poles: number }[] = [];
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  for (let slots = 6; slots <= 96; slots += 3)
    for (let poles = 2; poles <= 12; poles += 2)
      if ((slots / (3 * gcd(slots, poles / 2))) % 1 === 0 && slots / (3 * poles) >= 0.5) out.push({ slots, poles });
  return out;
})();

/** Integral-q combinations (q = S/(3P) whole). */
export const INTEGRAL_COMBINATIONS = BALANCED_COMBINATIONS.filter(({ slots, poles }) => slots % (3 * poles) === 0);

/** Example A as a winding data sheet: MLT 560 mm, 2 × 0.85 mm wire, 5 A rated, readings 2.86/2.85/2.87 Ω at 20 °C. */
export const EXAMPLE_A_SHEET: WindingSheet = {
  core: { boreMm: 150, coreLengthMm: 120, outsideDiameterMm: 240, slots: 36, slotDepthMm: 20, slotWidthTopMm: 7, slotWidthBottomMm: 9, toothWidthMm: 6.5, stackingFactor: 0.95 },
  winding: { layers: 2, style: 'lap', spans: [7], turnsPerCoil: [14], parallelPaths: 1, connection: 'star', meanTurnLengthMm: 560 },
  wires: [{ standard: 'metric', size: '0.85', count: 2, enamelGrade: 2 }],
  insulation: { thermalClass: 'F' },
  supply: { lineVoltageV: 400, frequencyHz: 50, poles: 4, ratedCurrentA: 5 },
  resistance: { readings: [2.86, 2.85, 2.87], temperatureC: 20, between: 'line-to-line' },
};
