/**
 * Checks a redesign request before the search: a bad target or limit comes back as an engine error that
 * names the field (`target.lineVoltageV`, `limits.slotFillMax` …), never as a crash or an empty list.
 */
import { fail, ok, type EngineResult } from '../result';
import { checkSlotsAndPoles, LAYOUT_LIMITS } from '../winding-layout';
import type { RedesignOriginal, RedesignRequest } from './types';

const positive = (v: number): boolean => Number.isFinite(v) && v > 0;

/** Validates target and limits against the original core. */
export function checkRedesignInput(original: RedesignOriginal, request: RedesignRequest): EngineResult<null> {
  const { target, limits } = request;
  if (!positive(target.lineVoltageV) || target.lineVoltageV > 15_000)
    return fail(
      'invalid-input',
      'The target line voltage must be above 0 and at most 15 000 V.',
      'Enter the customer’s supply voltage.',
      'target.lineVoltageV',
    );
  if (!positive(target.frequencyHz) || target.frequencyHz > 400)
    return fail('invalid-input', 'The target frequency must be above 0 and at most 400 Hz.', 'Enter 50 or 60 Hz.', 'target.frequencyHz');
  const sp = checkSlotsAndPoles(original.winding.slots, target.poles);
  if (!sp.ok) return fail(sp.error.code, sp.error.message, sp.error.hint, 'target.poles');
  for (const [i, y] of target.spans.entries())
    if (!Number.isInteger(y) || y < 1 || y >= original.winding.slots)
      return fail(
        'invalid-input',
        `Span ${y} must be a whole number of slot pitches from 1 to ${original.winding.slots - 1}.`,
        '"1–8" is a span of 7.',
        `target.spans.${i}`,
      );
  for (const [i, a] of target.parallelPaths.entries())
    if (!Number.isInteger(a) || a < 1 || a > Math.min(64, LAYOUT_LIMITS.maxPoles))
      return fail(
        'invalid-input',
        `Circuits ${a} must be a whole number from 1 to 64.`,
        'Count the parallel circuits per phase.',
        `target.parallelPaths.${i}`,
      );
  for (const key of ['gap', 'tooth', 'yoke'] as const) {
    const l = limits[key];
    if (!(l.over >= 0 && l.over <= 1))
      return fail('invalid-input', `The ${key} rise limit must be from 0 to 100 %.`, 'Typical: 5 %.', `limits.${key}.over`);
    if (!(l.under >= 0 && l.under < 1))
      return fail('invalid-input', `The ${key} fall limit must be from 0 to below 100 %.`, 'Typical: 10 %.', `limits.${key}.under`);
  }
  if (!(limits.currentDensityRise >= 0 && limits.currentDensityRise <= 1))
    return fail('invalid-input', 'The current-density rise limit must be from 0 to 100 %.', 'Typical: 5 %.', 'limits.currentDensityRise');
  if (!positive(limits.currentDensityMaxAPerMm2) || limits.currentDensityMaxAPerMm2 > 30)
    return fail(
      'invalid-input',
      'The current-density limit must be above 0 and at most 30 A/mm².',
      'Typical: 5–7 A/mm².',
      'limits.currentDensityMaxAPerMm2',
    );
  if (!(limits.slotFillMax > 0 && limits.slotFillMax <= 1))
    return fail(
      'invalid-input',
      'The slot-fill limit must be above 0 and at most 100 %.',
      'Typical: 55–65 % of the gross slot area.',
      'limits.slotFillMax',
    );
  if (!(Number.isInteger(limits.maxStrandsInHand) && limits.maxStrandsInHand >= 1 && limits.maxStrandsInHand <= 40))
    return fail('invalid-input', 'Wires in hand must be a whole number from 1 to 40.', 'Typical: up to 10.', 'limits.maxStrandsInHand');
  if (![1, 2, 3].includes(limits.maxWireSizes))
    return fail('invalid-input', 'Sizes per conductor must be 1, 2 or 3.', 'Most shops mix at most 2 or 3 sizes.', 'limits.maxWireSizes');
  if (!(limits.mixedSizeRatioMax >= 1 && limits.mixedSizeRatioMax <= 3))
    return fail('invalid-input', 'The mixed-size diameter ratio must be from 1 to 3.', 'Typical: 1.3.', 'limits.mixedSizeRatioMax');
  if (!(limits.minWireBareMm >= 0 && limits.minWireBareMm <= 5))
    return fail('invalid-input', 'The thinnest wire must be from 0 to 5 mm bare.', 'Typical: 0.5 mm.', 'limits.minWireBareMm');
  if (!(limits.harmonicKwMax > 0 && limits.harmonicKwMax <= 1))
    return fail(
      'invalid-input',
      'The k_w5/k_w7 limit must be above 0 and at most 1.',
      'Typical: 0.26 (a full-pitch winding with q = 2).',
      'limits.harmonicKwMax',
    );
  if (!positive(original.grossSlotAreaMm2))
    return fail(
      'invalid-input',
      'The slot area of the as-found sheet is not usable.',
      'Check the slot depth and widths on the sheet.',
      'core.slotDepthMm',
    );
  if (original.wires.length === 0 || original.wires.some((w) => !positive(w.areaMm2) || !(w.count >= 1)))
    return fail(
      'invalid-input',
      'The as-found sheet has no usable wire sizes.',
      'Record the wire sizes and strands on the sheet.',
      'wires',
    );
  return ok(null);
}
