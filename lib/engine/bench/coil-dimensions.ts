/**
 * Coil dimensions for setting up the former, estimated from the core and the span. Two ways, the first
 * preferred:
 *
 * 1. Scaled from the old coils. When the as-found sheet holds the old mean turn length (MLT), the part of a
 *    turn outside the core, e_old = (MLT_old − 2·L)/2 per end, is scaled with the span: a coil of span y has
 *    MLT = 2·L + 2·e_old·y/ȳ_old, ȳ_old being the old turn-weighted mean span. The winding's turn-weighted
 *    mean MLT is then the one the redesign report uses for its resistance. The old end extension, when
 *    recorded, scales the same way beyond the straight part. [derived approximation]
 * 2. From the core alone. The coil pitch at mid-slot is w = π·(D + h)·y/S (bore D, slot depth h, S slots);
 *    each end is a straight part e_s beyond the core and a loop taken as a half circle of diameter w, so
 *    MLT = 2·(L + 2·e_s) + π·w and the end extension is e_s + w/2. [derived approximation; the straight
 *    part is shop practice]
 *
 * Either way it is an estimate: the winder checks it against the old coils before winding a set.
 */
import { fail, ok, type EngineResult } from '../result';

/** Straight part of a coil side outside the core at each end (slot-liner cuff and clearance), mm [common practice, from memory]. */
export const DEFAULT_STRAIGHT_EXTENSION_MM = 12;

/** The core as the estimate needs it, mm. */
export interface CoreForCoils {
  boreMm: number;
  coreLengthMm: number;
  slotDepthMm: number;
  slots: number;
}

/** What the old coils measured (as-found sheet), with the old spans and turns. */
export interface OldCoils {
  meanTurnLengthMm?: number;
  coilExtensionMm?: number;
  spans: number[];
  turnsPerCoil: number[];
}

/** Former settings for one coil span. */
export interface CoilDimension {
  span: number;
  turns: number;
  /** Coil pitch measured round the bore at mid-slot depth, mm. */
  pitchMm: number;
  /** Straight (slot) length: core length plus the straight part at both ends, mm. */
  straightLengthMm: number;
  /** How far the coil stands out beyond the core at each end, mm. */
  endExtensionMm: number;
  meanTurnLengthMm: number;
}

/** The estimate for a whole coil group. */
export interface CoilDimensions {
  basis: 'scaled-from-old-coils' | 'from-core';
  straightExtensionMm: number;
  coils: CoilDimension[];
  /** Turn-weighted mean MLT of the group, mm. */
  meanTurnLengthMm: number;
}

const weightedSpan = (spans: readonly number[], turns: readonly number[]): number => {
  const total = turns.reduce((a, b) => a + b, 0);
  return total > 0 ? spans.reduce((s, y, i) => s + y * (turns[i] ?? 0), 0) / total : (spans[0] ?? 0);
};

const positive = (v: number | undefined): v is number => v !== undefined && Number.isFinite(v) && v > 0;

/**
 * Former settings for each coil of a group (spans and turns as the winding lists them). Fails only on
 * impossible inputs; an old MLT shorter than twice the core is ignored (the core estimate is used).
 */
export function coilDimensions(
  core: CoreForCoils,
  spans: number[],
  turnsPerCoil: number[],
  old?: OldCoils,
  straightExtensionMm = DEFAULT_STRAIGHT_EXTENSION_MM,
): EngineResult<CoilDimensions> {
  if (
    ![core.boreMm, core.coreLengthMm, core.slotDepthMm, core.slots].every(positive) ||
    !Number.isFinite(straightExtensionMm) ||
    straightExtensionMm < 0
  )
    return fail(
      'invalid-input',
      'Bore, core length, slot depth and slots must all be positive to estimate the coils.',
      'Complete the core section of the as-found sheet.',
      'core',
    );
  if (spans.length === 0 || spans.length !== turnsPerCoil.length || !spans.every(positive))
    return fail(
      'invalid-input',
      'Give one positive span per coil with its turns.',
      'Check the spans and turns of the winding.',
      'winding.spans',
    );
  const L = core.coreLengthMm;
  const pitch = (y: number): number => (Math.PI * (core.boreMm + core.slotDepthMm) * y) / core.slots;
  const oldSpan = old ? weightedSpan(old.spans, old.turnsPerCoil) : 0;
  const endOld = old && positive(old.meanTurnLengthMm) ? (old.meanTurnLengthMm - 2 * L) / 2 : 0;
  const scaled = endOld > 0 && oldSpan > 0;
  const e = straightExtensionMm;
  const coils = spans.map((y, i) => {
    const w = pitch(y);
    const k = scaled ? y / oldSpan : 1;
    const mlt = scaled ? 2 * L + 2 * endOld * k : 2 * (L + 2 * e) + Math.PI * w;
    const oldExt = old?.coilExtensionMm;
    const ext = scaled && positive(oldExt) && oldExt > e ? e + (oldExt - e) * k : e + w / 2;
    return { span: y, turns: turnsPerCoil[i] ?? 0, pitchMm: w, straightLengthMm: L + 2 * e, endExtensionMm: ext, meanTurnLengthMm: mlt };
  });
  const turns = coils.reduce((t, c) => t + c.turns, 0);
  const mean = turns > 0 ? coils.reduce((t, c) => t + c.turns * c.meanTurnLengthMm, 0) / turns : (coils[0]?.meanTurnLengthMm ?? 0);
  return ok({ basis: scaled ? 'scaled-from-old-coils' : 'from-core', straightExtensionMm: e, coils, meanTurnLengthMm: mean });
}
