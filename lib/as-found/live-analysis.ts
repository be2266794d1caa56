/**
 * What the sheet screen shows beside the form as the winder types: the form is checked with the sheet
 * schema, then analysed by the engine (analyseSheet) and its findings (lib/engine/sheet-findings.ts). When the sheet is not yet
 * complete, the winding alone (slots, poles, layers, spans, turns) is analysed so the winding factors, MMF
 * and slot diagram appear as soon as those are in. Pure and synchronous; the screen debounces it.
 */
import { analyseSheet, type SheetAnalysis } from '@/lib/engine/analyse-sheet';
import { analyseWinding, type WindingAnalysis } from '@/lib/engine/analyse-winding';
import type { EngineError } from '@/lib/engine/result';
import type { CoilSide } from '@/lib/engine/winding-layout';
import {
  coreSchema,
  supplySchema,
  windingSchema,
  windingSheetSchema,
  type SheetIssue,
  type WindingSheet,
} from '@/lib/as-found/winding-sheet-schema';
import { sheetFindings, type SheetFinding } from '../engine/sheet-findings';
import type { LengthUnit } from './length-entry';
import { formToSheetInput, type LengthMemory, type SheetFormValues } from './as-found-form';

export interface LiveAnalysis {
  /** The checked sheet, when the whole form passes the schema. */
  sheet: WindingSheet | null;
  full: SheetAnalysis | null;
  /** The winding alone, when the full analysis is not available. */
  winding: WindingAnalysis | null;
  findings: SheetFinding[];
  /** Schema problems still open (path and message). */
  issues: SheetIssue[];
  /** The engine's refusal, with the field it points at. */
  engineError: EngineError | null;
}

function windingOnly(input: Record<string, unknown>): { winding: WindingAnalysis | null; engineError: EngineError | null } {
  const core = (input.core ?? {}) as Record<string, unknown>;
  const supply = (input.supply ?? {}) as Record<string, unknown>;
  const w = windingSchema.safeParse({ connection: 'star', ...(input.winding as object) });
  const slots = coreSchema.shape.slots.safeParse(core.slots);
  const poles = supplySchema.shape.poles.safeParse(supply.poles);
  if (!w.success || !slots.success || !poles.success) return { winding: null, engineError: null };
  const v = typeof supply.lineVoltageV === 'number' ? supply.lineVoltageV : 400;
  const f = typeof supply.frequencyHz === 'number' && supply.frequencyHz > 0 ? supply.frequencyHz : 50;
  const r = analyseWinding({
    winding: {
      slots: slots.data,
      poles: poles.data,
      layers: w.data.layers,
      style: w.data.style,
      spans: w.data.spans,
      turnsPerCoil: w.data.turnsPerCoil,
      parallelPaths: w.data.parallelPaths,
      connection: w.data.connection,
      ...(w.data.singleLayerCoiling ? { singleLayerCoiling: w.data.singleLayerCoiling } : {}),
      ...(w.data.slotTable ? { slotTable: w.data.slotTable } : {}),
    },
    supply: { lineVoltageV: v, frequencyHz: f },
  });
  return r.ok ? { winding: r.value, engineError: null } : { winding: null, engineError: r.error };
}

/** Analyses the form as it stands. */
export function liveAnalysis(values: SheetFormValues, unit: LengthUnit, slotTable?: CoilSide[], memory?: LengthMemory): LiveAnalysis {
  const input = formToSheetInput(values, unit, slotTable, memory);
  const parsed = windingSheetSchema.safeParse(input);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
    return { sheet: null, full: null, ...windingOnly(input), findings: [], issues };
  }
  const r = analyseSheet(parsed.data);
  if (!r.ok) return { sheet: parsed.data, full: null, ...windingOnly(input), findings: [], issues: [], engineError: r.error };
  return {
    sheet: parsed.data,
    full: r.value,
    winding: r.value.winding,
    findings: sheetFindings(parsed.data, r.value),
    issues: [],
    engineError: null,
  };
}
