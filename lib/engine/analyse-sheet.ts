/**
 * Everything the engine can say about a whole as-found winding data sheet: the winding analysis
 * (analyse-winding.ts) plus wire areas, predicted and measured resistance, current density, slot fill and
 * synchronous speed from the wire, resistance, current-density, slot-fill and speed modules. Millimetres
 * from the sheet become metres here, once.
 */
import type { WindingSheetData as WindingSheet } from './winding-sheet';
import { analyseWinding, isAllFinite, type AnalyseWindingInput, type WindingAnalysis } from './analyse-winding';
import { currentDensityChecked, TYPICAL_CURRENT_DENSITY, type CurrentDensity, type CurrentDensityRange } from './current-density';
import type { FluxLimits } from './flux';
import {
  compareResistance,
  correctResistanceOhm,
  lineToLineFromPhaseOhm,
  phaseFromLineToLineOhm,
  phaseResistance,
  resistanceUnbalanceVerdict,
} from './resistance';
import { fail, ok, type EngineResult } from './result';
import { grossSlotAreaMm2, HAND_INSERTION_FILL_LIMIT, slotFill } from './slot-fill';
import { synchronousSpeedRpm } from './speed';
import { mm2ToCircularMils, mmToM } from './units';
import type { Verdict } from './verdict';
import { findWire, wireOverallDiameterMm } from './wire';

/** The engine inputs a sheet describes (mm → m). */
export function windingInputFromSheet(sheet: WindingSheet): AnalyseWindingInput {
  const { core, winding, supply } = sheet;
  return {
    winding: {
      slots: core.slots,
      poles: supply.poles,
      layers: winding.layers,
      style: winding.style,
      ...(winding.singleLayerCoiling ? { singleLayerCoiling: winding.singleLayerCoiling } : {}),
      spans: winding.spans,
      turnsPerCoil: winding.turnsPerCoil,
      parallelPaths: winding.parallelPaths,
      connection: winding.connection,
      ...(winding.slotTable ? { slotTable: winding.slotTable } : {}),
    },
    supply: { lineVoltageV: supply.lineVoltageV, frequencyHz: supply.frequencyHz },
    core: {
      boreM: mmToM(core.boreMm),
      coreLengthM: mmToM(core.coreLengthMm),
      outsideDiameterM: mmToM(core.outsideDiameterMm),
      slots: core.slots,
      slotDepthM: mmToM(core.slotDepthMm),
      toothWidthM: mmToM(core.toothWidthMm),
      stackingFactor: core.stackingFactor,
      ventDucts: core.ventDucts ?? 0,
      ventDuctWidthM: mmToM(core.ventDuctWidthMm ?? 0),
    },
  };
}

/** One wire size in hand with its looked-up diameters and area. */
export interface WireRow {
  standard: 'awg' | 'metric';
  size: string;
  count: number;
  bareMm: number;
  overallMm: number;
  areaMm2: number;
}

/** Predicted resistance, and the readings against it when the sheet has them. */
export interface SheetResistance {
  /** Predicted phase resistance at 20 °C from MLT, turns, paths and wire: R_ph = ρ·(C·N_c·MLT)/(a²·A). */
  predictedPhaseOhm20: number;
  predictedLineToLineOhm20: number;
  measured: {
    /** Mean phase resistance from the readings, corrected to 20 °C (234.5 + t, IEEE). */
    phaseOhm20: number;
    /** (measured − predicted)/predicted, percent. */
    differencePercent: number;
    unbalance: Verdict;
  } | null;
}

/** Everything analyseSheet finds. */
export interface SheetAnalysis {
  winding: WindingAnalysis;
  synchronousRpm: number;
  wires: WireRow[];
  /** Bare copper area of one turn: Σ count·area. */
  conductorAreaPerTurnMm2: number;
  circularMilsPerTurn: number;
  resistance: SheetResistance | null;
  currentDensity: (CurrentDensity & { typical: CurrentDensityRange[] }) | null;
  slotFill: {
    /** Largest Σ turns in one slot from the layout (conductors per slot, Z_s). */
    conductorsPerSlot: number;
    grossSlotAreaMm2: number;
    bareCopperOverGross: number;
    /** Insulated wire area over the gross slot area: the sheet has no liner or wedge thickness for a net area. */
    insulatedOverGross: number;
    handInsertionLimit: { low: number; high: number };
  };
}

function wireRows(sheet: WindingSheet): EngineResult<WireRow[]> {
  const rows: WireRow[] = [];
  for (const [i, w] of sheet.wires.entries()) {
    const found = findWire(w);
    const overall = wireOverallDiameterMm({ standard: w.standard, size: w.size, enamelGrade: w.enamelGrade });
    if (!found.ok) return fail(found.error.code, found.error.message, found.error.hint, `wires.${i}.size`);
    if (!overall.ok) return fail(overall.error.code, overall.error.message, overall.error.hint, `wires.${i}.size`);
    rows.push({
      standard: w.standard,
      size: found.value.size,
      count: w.count,
      bareMm: found.value.bareMm,
      overallMm: overall.value,
      areaMm2: found.value.areaMm2,
    });
  }
  return ok(rows);
}

function resistanceOf(sheet: WindingSheet, w: WindingAnalysis, areaMm2: number): EngineResult<SheetResistance | null> {
  const mlt = sheet.winding.meanTurnLengthMm;
  if (mlt === undefined) return ok(null);
  const coils = w.layout.sides.length / 2 / 3;
  const turnsPerPhase = w.seriesTurnsPerPhase * sheet.winding.parallelPaths;
  const predicted = phaseResistance({
    coilsPerPhase: coils,
    turnsPerCoil: turnsPerPhase / coils,
    meanTurnLengthM: mmToM(mlt),
    parallelPaths: sheet.winding.parallelPaths,
    strands: [{ areaMm2, count: 1 }],
    temperatureC: 20,
  });
  if (!predicted.ok) return fail(predicted.error.code, predicted.error.message, predicted.error.hint, 'winding.meanTurnLengthMm');
  const r = sheet.resistance;
  let measured: SheetResistance['measured'] = null;
  if (r) {
    const unbalance = resistanceUnbalanceVerdict(r.readings, 'random');
    if (!unbalance.ok) return fail(unbalance.error.code, unbalance.error.message, unbalance.error.hint, 'resistance.readings');
    const mean = (r.readings[0] + r.readings[1] + r.readings[2]) / 3;
    const phase = r.between === 'line-to-line' ? phaseFromLineToLineOhm(mean, sheet.winding.connection) : mean;
    const phaseOhm20 = correctResistanceOhm(phase, r.temperatureC, 20);
    measured = { phaseOhm20, differencePercent: compareResistance(predicted.value, phaseOhm20), unbalance: unbalance.value };
  }
  return ok({
    predictedPhaseOhm20: predicted.value,
    predictedLineToLineOhm20: lineToLineFromPhaseOhm(predicted.value, sheet.winding.connection),
    measured,
  });
}

/** Analyses a parsed sheet. Errors carry field paths into the sheet (e.g. `wires.0.size`). */
export function analyseSheet(sheet: WindingSheet, options?: { limits?: FluxLimits; maxOrder?: number }): EngineResult<SheetAnalysis> {
  const input = windingInputFromSheet(sheet);
  const analysed = analyseWinding({
    ...input,
    options: { ...(options?.limits ? { limits: options.limits } : {}), ...(options?.maxOrder ? { maxOrder: options.maxOrder } : {}) },
  });
  if (!analysed.ok) return analysed;
  const w = analysed.value;
  const wires = wireRows(sheet);
  if (!wires.ok) return wires;
  const areaMm2 = wires.value.reduce((sum, r) => sum + r.count * r.areaMm2, 0);

  const resistance = resistanceOf(sheet, w, areaMm2);
  if (!resistance.ok) return resistance;

  let currentDensity: SheetAnalysis['currentDensity'] = null;
  if (sheet.supply.ratedCurrentA !== undefined) {
    const j = currentDensityChecked({
      lineCurrentA: sheet.supply.ratedCurrentA,
      connection: sheet.winding.connection,
      parallelPaths: sheet.winding.parallelPaths,
      conductorAreaPerTurnMm2: areaMm2,
    });
    if (!j.ok) return fail(j.error.code, j.error.message, j.error.hint, 'supply.ratedCurrentA');
    currentDensity = { ...j.value, typical: [TYPICAL_CURRENT_DENSITY.inductionStator, TYPICAL_CURRENT_DENSITY.totallyEnclosed] };
  }

  const perSlot = new Map<number, number>();
  for (const s of w.layout.sides) perSlot.set(s.slot, (perSlot.get(s.slot) ?? 0) + s.turns);
  const conductorsPerSlot = Math.max(0, ...perSlot.values());
  const gross = grossSlotAreaMm2({
    depthMm: sheet.core.slotDepthMm,
    topWidthMm: sheet.core.slotWidthTopMm,
    bottomWidthMm: sheet.core.slotWidthBottomMm,
  });
  if (!gross.ok) return fail(gross.error.code, gross.error.message, gross.error.hint, 'core.slotDepthMm');
  const fill = slotFill({
    conductorsPerSlot,
    strands: wires.value.map((r) => ({ bareDiameterMm: r.bareMm, overallDiameterMm: r.overallMm, count: r.count })),
    grossSlotAreaMm2: gross.value,
    netSlotAreaMm2: gross.value,
  });

  const analysis: SheetAnalysis = {
    winding: w,
    synchronousRpm: synchronousSpeedRpm(sheet.supply.frequencyHz, sheet.supply.poles),
    wires: wires.value,
    conductorAreaPerTurnMm2: areaMm2,
    circularMilsPerTurn: mm2ToCircularMils(areaMm2),
    resistance: resistance.value,
    currentDensity,
    slotFill: {
      conductorsPerSlot,
      grossSlotAreaMm2: gross.value,
      bareCopperOverGross: fill.bareCopperOverGross,
      insulatedOverGross: fill.insulatedOverNet,
      handInsertionLimit: { ...HAND_INSERTION_FILL_LIMIT },
    },
  };
  return isAllFinite(analysis)
    ? ok(analysis)
    : fail(
        'non-finite-result',
        'Part of the sheet analysis did not come out as a finite number.',
        'Check the slot, wire and resistance data for zero or missing values.',
      );
}
