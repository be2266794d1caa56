/**
 * A winding moved to a new supply, or rewound differently, on the same core: how the flux and the flux
 * densities change (docs/engineering/redesign.md). The ratio is the primary redesign check: shop limits differ, ratios do not.
 */
import { seriesTurnsPerPhase, phaseVoltage } from './flux';
import { fail, ok, type EngineResult } from './result';
import { SlotStar } from './slot-star';
import { windingLayout, type WindingSpec } from './winding-layout';

/** What sets the flux of one winding on one supply. */
export interface FluxBasis {
  lineVoltageV: number;
  frequencyHz: number;
  connection: 'star' | 'delta';
  seriesTurnsPerPhase: number;
  windingFactor: number;
  poles: number;
}

/** How far the densities may move before the verdict changes. */
export interface RatioTolerance {
  /** Largest allowed rise of any density, as a fraction (0.05 = +5 %). */
  over: number;
  /** Largest allowed fall of any density (0.10 = −10 %). */
  under: number;
}

/**
 * Defaults chosen as a cautious shop habit, not taken from a published source: keep them configurable.
 * A rise of a few percent already shows as magnetising current and iron heating.
 */
export const DEFAULT_RATIO_TOLERANCE: RatioTolerance = { over: 0.05, under: 0.1 };

/** Old-to-new ratios and the verdict. */
export interface FluxRatio {
  /** Φ_new/Φ_old. */
  fluxRatio: number;
  /** Gap and tooth densities scale with Φ·P_new/P_old. */
  gapToothRatio: number;
  /** Yoke density scales with Φ. */
  yokeRatio: number;
  verdict: 'ok' | 'over-fluxed' | 'under-fluxed';
  polesChanged: boolean;
  notes: string[];
  tolerance: RatioTolerance;
}

/**
 * Φ_new/Φ_old = (V_ph,new/V_ph,old)·(f_old/f_new)·(N_ph,old·k_w,old)/(N_ph,new·k_w,new) [derived, docs/engineering/redesign.md].
 * Inputs validated and positive.
 */
export function fluxRatio(old: FluxBasis, next: FluxBasis, tolerance: RatioTolerance = DEFAULT_RATIO_TOLERANCE): FluxRatio {
  const ratio =
    (phaseVoltage(next.lineVoltageV, next.connection) / phaseVoltage(old.lineVoltageV, old.connection)) *
    (old.frequencyHz / next.frequencyHz) *
    ((old.seriesTurnsPerPhase * old.windingFactor) / (next.seriesTurnsPerPhase * next.windingFactor));
  const gapToothRatio = (ratio * next.poles) / old.poles;
  const worst = Math.max(gapToothRatio, ratio);
  const least = Math.min(gapToothRatio, ratio);
  const verdict = worst > 1 + tolerance.over ? 'over-fluxed' : least < 1 - tolerance.under ? 'under-fluxed' : 'ok';
  const polesChanged = next.poles !== old.poles;
  const notes: string[] = [];
  if (polesChanged)
    notes.push('Pole change: speed, torque, power and power factor change, fewer poles load the yoke harder; an engineer must review it.');
  if (next.frequencyHz > old.frequencyHz)
    notes.push('Higher frequency raises the speed: check the fan, bearings, balance and the driven load.');
  return { fluxRatio: ratio, gapToothRatio, yokeRatio: ratio, verdict, polesChanged, notes, tolerance };
}

/** One winding on one supply. */
export interface ScalingCase {
  winding: WindingSpec;
  supply: { lineVoltageV: number; frequencyHz: number };
}

/** The ratios with both bases they came from. */
export interface SupplyScaling extends FluxRatio {
  old: FluxBasis;
  next: FluxBasis;
}

function basisOf(c: ScalingCase, which: 'old' | 'new'): EngineResult<FluxBasis> {
  const { lineVoltageV, frequencyHz } = c.supply;
  if (!(Number.isFinite(lineVoltageV) && lineVoltageV > 0))
    return fail(
      'invalid-input',
      `The ${which} line voltage must be more than zero.`,
      'Enter the supply voltage.',
      `${which}.supply.lineVoltageV`,
    );
  if (!(Number.isFinite(frequencyHz) && frequencyHz > 0))
    return fail('invalid-input', `The ${which} frequency must be more than zero.`, 'Enter 50 or 60 Hz.', `${which}.supply.frequencyHz`);
  const layout = windingLayout(c.winding);
  if (!layout.ok) return fail(layout.error.code, layout.error.message, layout.error.hint, `${which}.${layout.error.field ?? 'winding'}`);
  const a = c.winding.parallelPaths;
  if (!(Number.isInteger(a) && a >= 1 && a <= layout.value.sides.length / 6))
    return fail(
      'invalid-input',
      `The ${which} parallel path count must be a whole number from 1 to the coils per phase.`,
      'Count the circuits per phase.',
      `${which}.winding.parallelPaths`,
    );
  const star = new SlotStar(layout.value);
  const p = layout.value.poles / 2;
  const windingFactor = (star.factor('A', p) + star.factor('B', p) + star.factor('C', p)) / 3;
  if (!(windingFactor > 0))
    return fail(
      'unbalanced-layout',
      `The ${which} winding has no EMF at the working order.`,
      'Check the spans and the slot table.',
      `${which}.winding.spans`,
    );
  return ok({
    lineVoltageV,
    frequencyHz,
    connection: c.winding.connection,
    seriesTurnsPerPhase: seriesTurnsPerPhase(layout.value, a),
    windingFactor,
    poles: c.winding.poles,
  });
}

/**
 * Flux ratio for a winding moved to a new supply on the same core: voltage, frequency, connection, parallel
 * paths, span and poles may all change; the slot count may not. Winding factors come from the slot star.
 */
export function supplyScaling(old: ScalingCase, next: ScalingCase, tolerance?: RatioTolerance): EngineResult<SupplyScaling> {
  if (old.winding.slots !== next.winding.slots)
    return fail(
      'not-applicable',
      'The new winding has a different slot count: that is a different core.',
      'Compare windings on the same core.',
      'new.core.slots',
    );
  const a = basisOf(old, 'old');
  if (!a.ok) return a;
  const b = basisOf(next, 'new');
  if (!b.ok) return b;
  const r = fluxRatio(a.value, b.value, tolerance);
  if (!Number.isFinite(r.fluxRatio))
    return fail('non-finite-result', 'The flux ratio came out infinite.', 'Check voltages, frequencies and turns.');
  return ok({ ...r, old: a.value, next: b.value });
}
