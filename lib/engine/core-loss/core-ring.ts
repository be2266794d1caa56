/**
 * The stator core seen as a ring of laminated iron for the core-loss (loop) test: the dimensions on the
 * as-found sheet, in metres. A test loop threaded through the bore and round the outside drives flux
 * round the back iron (yoke), so the back iron is the part of the core the test measures.
 */
import { fail, ok, type EngineResult } from '../result';

export interface CoreRing {
  outsideDiameterM: number;
  boreM: number;
  slotDepthM: number;
  coreLengthM: number;
  /** Stacking factor k_fe, 0 < k_fe ≤ 1. */
  stackingFactor: number;
  ventDucts?: number;
  ventDuctWidthM?: number;
  slots: number;
  slotWidthTopM: number;
  slotWidthBottomM: number;
}

const positive = (v: number): boolean => Number.isFinite(v) && v > 0;

/** Checks a core ring: every dimension positive, stacking factor in (0, 1], back iron and iron length left. */
export function checkCoreRing(c: CoreRing): EngineResult<CoreRing> {
  const need: [number, string, string][] = [
    [c.outsideDiameterM, 'core.outsideDiameterMm', 'core outside diameter'],
    [c.boreM, 'core.boreMm', 'bore'],
    [c.slotDepthM, 'core.slotDepthMm', 'slot depth'],
    [c.coreLengthM, 'core.coreLengthMm', 'core length'],
    [c.slots, 'core.slots', 'slot count'],
    [c.slotWidthTopM, 'core.slotWidthTopMm', 'slot width at the top'],
    [c.slotWidthBottomM, 'core.slotWidthBottomMm', 'slot width at the bottom'],
  ];
  for (const [v, field, what] of need)
    if (!positive(v))
      return fail('invalid-input', `The ${what} must be more than zero (got ${v}).`, `Enter the ${what} on the as-found sheet.`, field);
  if (!(c.stackingFactor > 0 && c.stackingFactor <= 1))
    return fail(
      'invalid-input',
      `Stacking factor must be above 0 and at most 1 (got ${c.stackingFactor}).`,
      'Typical laminations stack at 0.93–0.97.',
      'core.stackingFactor',
    );
  if (!((c.outsideDiameterM - c.boreM) / 2 - c.slotDepthM > 0))
    return fail(
      'invalid-input',
      'No back iron is left: (outside diameter − bore)/2 − slot depth is not above zero.',
      'Check the bore, outside diameter and slot depth.',
      'core.slotDepthMm',
    );
  const ducts = (c.ventDucts ?? 0) * (c.ventDuctWidthM ?? 0);
  if (!(ducts >= 0 && c.coreLengthM - ducts > 0))
    return fail(
      'invalid-input',
      'The vent ducts take up the whole core length.',
      'Check the number and width of the vent ducts.',
      'core.ventDucts',
    );
  return ok(c);
}
