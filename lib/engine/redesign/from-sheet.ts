/**
 * Builds the search inputs from what the shop stores: the as-found data sheet becomes a RedesignOriginal,
 * a stock row becomes a StockWire with its looked-up diameters. Defaults for the limits live here too.
 */
import type { WindingSheetData as WindingSheet } from '../winding-sheet';
import { windingInputFromSheet } from '../analyse-sheet';
import type { EnamelGrade } from '../enamel-build';
import { fail, ok, type EngineResult } from '../result';
import { grossSlotAreaMm2 } from '../slot-fill';
import { findWire, wireOverallDiameterMm, type WireStandard } from '../wire';
import type { RedesignLimits, RedesignOriginal, StockWire } from './types';

/**
 * Default redesign limits. Flux changes +5 %/−10 % follow DEFAULT_RATIO_TOLERANCE (supply-scaling.ts,
 * a cautious shop habit, not a published figure); the yoke may fall by up to half, since a lower back-iron
 * density costs nothing but unused iron (it matters when the pole count rises and the gap density is kept). Current density may rise 5 % over the original and
 * never pass 6 A/mm² [from memory: textbook stator ranges 3–5 A/mm², 3–8 for totally enclosed machines].
 * Insulated wire may fill 60 % of the gross slot area [common practice, from memory: hand insertion of
 * round wire reaches about 0.65–0.75 of the net area once liner and wedge take their share]. Up to 10
 * wires in hand, 3 sizes mixed within a diameter ratio of 1.3 [common practice, from memory]. Wire under
 * 0.50 mm bare is penalised in the ranking (fine wire is slow to wind and easy to nick [common practice, from
 * memory]); k_w5 and k_w7 may reach 0.26, which is what a full-pitch 60°-belt winding with q = 2 has
 * (0.2588 [derived], reference §1): every usual integral-slot layout passes, badly chosen fractional or q = 1
 * layouts do not. All are shop settings: change them on the stock page.
 */
export const DEFAULT_REDESIGN_LIMITS: RedesignLimits = {
  gap: { over: 0.05, under: 0.1 },
  tooth: { over: 0.05, under: 0.1 },
  yoke: { over: 0.05, under: 0.5 },
  currentDensityRise: 0.05,
  currentDensityMaxAPerMm2: 6,
  slotFillMax: 0.6,
  maxStrandsInHand: 10,
  maxWireSizes: 3,
  mixedSizeRatioMax: 1.3,
  minWireBareMm: 0.5,
  harmonicKwMax: 0.26,
};

/** A stock row as stored. */
export interface StockRow {
  standard: WireStandard;
  size: string;
  enamelGrade: EnamelGrade;
}

/** Looks a stock row up in the wire tables. */
export function stockWire(row: StockRow): EngineResult<StockWire> {
  const found = findWire(row);
  if (!found.ok) return found;
  const overall = wireOverallDiameterMm(row);
  if (!overall.ok) return overall;
  return ok({
    standard: row.standard,
    size: found.value.size,
    enamelGrade: row.enamelGrade,
    label: found.value.label,
    bareMm: found.value.bareMm,
    overallMm: overall.value,
    areaMm2: found.value.areaMm2,
  });
}

/** The as-found sheet as the search's original (mm → m for the core through windingInputFromSheet). */
export function originalFromSheet(sheet: WindingSheet, ratedSpeedRpm?: number): EngineResult<RedesignOriginal> {
  const input = windingInputFromSheet(sheet);
  if (!input.core) return fail('invalid-input', 'The sheet has no core dimensions.', 'Complete the core section of the sheet.', 'core');
  const gross = grossSlotAreaMm2({
    depthMm: sheet.core.slotDepthMm,
    topWidthMm: sheet.core.slotWidthTopMm,
    bottomWidthMm: sheet.core.slotWidthBottomMm,
  });
  if (!gross.ok) return fail(gross.error.code, gross.error.message, gross.error.hint, 'core.slotDepthMm');
  const wires: RedesignOriginal['wires'] = [];
  for (const [i, w] of sheet.wires.entries()) {
    const s = stockWire(w);
    if (!s.ok) return fail(s.error.code, s.error.message, s.error.hint, `wires.${i}.size`);
    wires.push({
      label: s.value.label,
      standard: s.value.standard,
      size: s.value.size,
      enamelGrade: w.enamelGrade,
      bareMm: s.value.bareMm,
      overallMm: s.value.overallMm,
      areaMm2: s.value.areaMm2,
      count: w.count,
    });
  }
  return ok({
    winding: input.winding,
    supply: input.supply,
    core: input.core,
    grossSlotAreaMm2: gross.value,
    wires,
    ...(sheet.winding.meanTurnLengthMm !== undefined ? { meanTurnLengthMm: sheet.winding.meanTurnLengthMm } : {}),
    ...(sheet.supply.ratedCurrentA !== undefined ? { ratedCurrentA: sheet.supply.ratedCurrentA } : {}),
    ...(sheet.supply.ratedOutputKw !== undefined ? { ratedOutputKw: sheet.supply.ratedOutputKw } : {}),
    ...(ratedSpeedRpm !== undefined ? { ratedSpeedRpm } : {}),
  });
}
