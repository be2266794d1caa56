/**
 * The sheet form's own model: every input holds the text as typed (so a half-typed "12." or a draft
 * restores exactly), lengths in the user's unit. `formToSheetInput` turns it into the shape of
 * windingSheetSchema (metric, numbers) for the ONE schema to validate, on the client and again on the
 * server; `sheetToForm` goes back. Field paths match the schema except spans and turns, which the form
 * keeps as coil rows (`winding.coils.N.span` / `.turns`): `sheetPathToFormPath` maps between them.
 */
import type { CoilSide } from '@/lib/engine/winding-layout';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { parseSpan } from '@/lib/engine/notation';
import { mmToLength, parseTypedNumber, switchTypedLength, typedLengthToMm, type LengthUnit, type TypedLength } from './length-entry';

/** Per length field ("core.boreMm", "winding.meanTurnLengthMm"): what was typed before a unit switch. */
export type LengthMemory = ReadonlyMap<string, TypedLength>;

/** The core fields that are lengths (typed in mm or in). */
export const CORE_LENGTH_FIELDS = [
  'boreMm',
  'coreLengthMm',
  'outsideDiameterMm',
  'slotDepthMm',
  'slotWidthTopMm',
  'slotWidthBottomMm',
  'slotOpeningMm',
  'toothWidthMm',
  'ventDuctWidthMm',
  'airGapMm',
] as const;
/** The winding fields that are lengths. */
export const WINDING_LENGTH_FIELDS = ['meanTurnLengthMm', 'coilExtensionMm'] as const;
const CORE_COUNT_FIELDS = ['slots', 'stackingFactor', 'ventDucts', 'rotorSlots'] as const;

type CoreField = (typeof CORE_LENGTH_FIELDS)[number] | (typeof CORE_COUNT_FIELDS)[number];

export type CoilRow = {
  span: string;
  turns: string;
};
export type WireRowForm = {
  standard: 'awg' | 'metric';
  size: string;
  count: string;
  enamelGrade: '1' | '2' | '3';
};

/** Everything the sheet form holds, as typed. */
export type SheetFormValues = {
  core: Record<CoreField, string>;
  winding: {
    layers: '1' | '2';
    style: 'lap' | 'concentric';
    singleLayerCoiling: '' | 'whole' | 'half';
    coils: CoilRow[];
    coilsPerGroup: string;
    groups: string;
    parallelPaths: string;
    connection: '' | 'star' | 'delta';
    leads: string;
    leadMarkings: string;
    jumperNotes: string;
    meanTurnLengthMm: string;
    coilExtensionMm: string;
    copperWeightKg: string;
  };
  wires: WireRowForm[];
  insulation: { thermalClass: '' | 'A' | 'B' | 'F' | 'H'; slotLiner: string; wedges: string; varnish: string };
  supply: { lineVoltageV: string; frequencyHz: string; poles: string; ratedCurrentA: string; ratedOutputKw: string };
  resistance: { readings: [string, string, string]; temperatureC: string; between: 'line-to-line' | 'phase' };
  notes: string;
};

/** A blank wire row: metric, one wire, grade 2 (the usual build for random-wound stators). */
export const blankWire = (): WireRowForm => ({ standard: 'metric', size: '', count: '1', enamelGrade: '2' });

/** A blank sheet form. */
export function emptySheetForm(): SheetFormValues {
  const core = Object.fromEntries([...CORE_LENGTH_FIELDS, ...CORE_COUNT_FIELDS].map((k) => [k, ''])) as Record<CoreField, string>;
  core.stackingFactor = '0.95';
  return {
    core,
    winding: {
      layers: '2',
      style: 'lap',
      singleLayerCoiling: '',
      coils: [{ span: '', turns: '' }],
      coilsPerGroup: '',
      groups: '',
      parallelPaths: '1',
      connection: '',
      leads: '',
      leadMarkings: '',
      jumperNotes: '',
      meanTurnLengthMm: '',
      coilExtensionMm: '',
      copperWeightKg: '',
    },
    wires: [blankWire()],
    insulation: { thermalClass: '', slotLiner: '', wedges: '', varnish: '' },
    supply: { lineVoltageV: '', frequencyHz: '', poles: '', ratedCurrentA: '', ratedOutputKw: '' },
    resistance: { readings: ['', '', ''], temperatureC: '', between: 'line-to-line' },
    notes: '',
  };
}

const text = (v: string | undefined): string | undefined => {
  const t = (v ?? '').trim();
  return t === '' ? undefined : t;
};

const num = (v: string | undefined): number | string | undefined => parseTypedNumber(v);
/** A span as written: "7" slot pitches, or "1–8" / "1-8" as the label shows it (lib/engine/notation.ts). */
const span = (v: string | undefined): number | string | undefined => {
  const t = (v ?? '').trim();
  if (t === '') return undefined;
  return parseSpan(t) ?? t;
};
/** Drops keys whose value is undefined, so optional fields are simply absent. */
const compact = <T extends Record<string, unknown>>(o: T): Partial<T> =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;

/** The form as the schema's input (metric, numbers); the schema itself judges it. */
export function formToSheetInput(
  f: SheetFormValues,
  unit: LengthUnit,
  slotTable?: CoilSide[],
  memory?: LengthMemory,
): Record<string, unknown> {
  const len = (path: string, v: string | undefined) => typedLengthToMm(v, unit, memory?.get(path));
  const core: Record<string, unknown> = {};
  for (const k of CORE_LENGTH_FIELDS) core[k] = len(`core.${k}`, f.core[k]);
  for (const k of CORE_COUNT_FIELDS) core[k] = num(f.core[k]);
  const w = f.winding;
  const r = f.resistance;
  const resistanceGiven = [...r.readings, r.temperatureC].some((v) => (v ?? '').trim() !== '');
  return compact({
    core: compact(core),
    winding: compact({
      layers: Number(w.layers),
      style: w.style,
      singleLayerCoiling: w.layers === '1' ? w.singleLayerCoiling || undefined : undefined,
      spans: w.coils.map((c) => span(c.span)),
      turnsPerCoil: w.coils.map((c) => num(c.turns)),
      coilsPerGroup: num(w.coilsPerGroup),
      groups: num(w.groups),
      parallelPaths: num(w.parallelPaths),
      connection: w.connection || undefined,
      leads: num(w.leads),
      leadMarkings: text(w.leadMarkings),
      jumperNotes: text(w.jumperNotes),
      slotTable: slotTable && slotTable.length > 0 ? slotTable : undefined,
      meanTurnLengthMm: len('winding.meanTurnLengthMm', w.meanTurnLengthMm),
      coilExtensionMm: len('winding.coilExtensionMm', w.coilExtensionMm),
      copperWeightKg: num(w.copperWeightKg),
    }),
    wires: f.wires.map((x) => ({ standard: x.standard, size: x.size.trim(), count: num(x.count), enamelGrade: Number(x.enamelGrade) })),
    insulation: compact({
      thermalClass: f.insulation.thermalClass || undefined,
      slotLiner: text(f.insulation.slotLiner),
      wedges: text(f.insulation.wedges),
      varnish: text(f.insulation.varnish),
    }),
    supply: compact({
      lineVoltageV: num(f.supply.lineVoltageV),
      frequencyHz: num(f.supply.frequencyHz),
      poles: num(f.supply.poles),
      ratedCurrentA: num(f.supply.ratedCurrentA),
      ratedOutputKw: num(f.supply.ratedOutputKw),
    }),
    resistance: resistanceGiven
      ? { readings: r.readings.map((x) => num(x)), temperatureC: num(r.temperatureC), between: r.between }
      : undefined,
    notes: text(f.notes),
  });
}

const show = (v: number | undefined): string => (v === undefined ? '' : String(v));
const showLen = (v: number | undefined, unit: LengthUnit): string => (v === undefined ? '' : String(mmToLength(v, unit)));

/** A saved sheet as form values in the user's unit. */
export function sheetToForm(s: WindingSheet, unit: LengthUnit): SheetFormValues {
  const f = emptySheetForm();
  for (const k of CORE_LENGTH_FIELDS) f.core[k] = showLen(s.core[k], unit);
  for (const k of CORE_COUNT_FIELDS) f.core[k] = show(s.core[k]);
  const w = s.winding;
  f.winding = {
    layers: w.layers === 1 ? '1' : '2',
    style: w.style,
    singleLayerCoiling: w.singleLayerCoiling ?? '',
    coils: w.spans.map((span, i) => ({ span: String(span), turns: show(w.turnsPerCoil[i]) })),
    coilsPerGroup: show(w.coilsPerGroup),
    groups: show(w.groups),
    parallelPaths: show(w.parallelPaths),
    connection: w.connection,
    leads: show(w.leads),
    leadMarkings: w.leadMarkings ?? '',
    jumperNotes: w.jumperNotes ?? '',
    meanTurnLengthMm: showLen(w.meanTurnLengthMm, unit),
    coilExtensionMm: showLen(w.coilExtensionMm, unit),
    copperWeightKg: show(w.copperWeightKg),
  };
  f.wires = s.wires.map((x) => ({
    standard: x.standard,
    size: x.size,
    count: String(x.count),
    enamelGrade: String(x.enamelGrade) as WireRowForm['enamelGrade'],
  }));
  f.insulation = {
    thermalClass: s.insulation.thermalClass,
    slotLiner: s.insulation.slotLiner ?? '',
    wedges: s.insulation.wedges ?? '',
    varnish: s.insulation.varnish ?? '',
  };
  f.supply = {
    lineVoltageV: show(s.supply.lineVoltageV),
    frequencyHz: show(s.supply.frequencyHz),
    poles: show(s.supply.poles),
    ratedCurrentA: show(s.supply.ratedCurrentA),
    ratedOutputKw: show(s.supply.ratedOutputKw),
  };
  if (s.resistance)
    f.resistance = {
      readings: s.resistance.readings.map(String) as [string, string, string],
      temperatureC: String(s.resistance.temperatureC),
      between: s.resistance.between,
    };
  f.notes = s.notes ?? '';
  return f;
}

/** Re-expresses every typed length of a form in another unit (the unit toggle). */
/**
 * Switches every length field between mm and inches for display, remembering what was typed so that
 * switching back, or saving, uses the typed value (see switchTypedLength).
 */
export function switchFormLengths(
  f: SheetFormValues,
  from: LengthUnit,
  to: LengthUnit,
  memory: LengthMemory,
): { values: SheetFormValues; memory: Map<string, TypedLength> } {
  const next = new Map<string, TypedLength>();
  const one = (path: string, text: string): string => {
    const r = switchTypedLength(text, from, to, memory.get(path));
    if (r.memory) next.set(path, r.memory);
    return r.text;
  };
  const core = { ...f.core };
  for (const k of CORE_LENGTH_FIELDS) core[k] = one(`core.${k}`, core[k]);
  const winding = { ...f.winding };
  for (const k of WINDING_LENGTH_FIELDS) winding[k] = one(`winding.${k}`, winding[k]);
  return { values: { ...f, core, winding }, memory: next };
}

/** A schema path (`winding.spans.2`, `sheet.core.boreMm`) as the form field that shows it. */
export function sheetPathToFormPath(path: string): string {
  const p = path.replace(/^sheet\./, '');
  const m = /^winding\.(spans|turnsPerCoil)(?:\.(\d+))?$/.exec(p);
  if (m) return m[2] === undefined ? 'winding.coils.root' : `winding.coils.${m[2]}.${m[1] === 'spans' ? 'span' : 'turns'}`;
  if (/^winding\.slotTable/.test(p)) return 'winding.coils.root';
  if (p === 'resistance.readings') return 'resistance.readings.0';
  return p;
}

/**
 * For a saved sheet shown in inches: each length field's stored millimetres as the typed value behind the
 * inch text, so saving without touching a field stores exactly what was stored (560 stays 560, not 559.999).
 */
export function savedLengthMemory(sheet: WindingSheet, unit: LengthUnit): [string, TypedLength][] {
  if (unit === 'mm') return [];
  const mm = sheetToForm(sheet, 'mm');
  const shown = sheetToForm(sheet, unit);
  const out: [string, TypedLength][] = [];
  for (const k of CORE_LENGTH_FIELDS)
    if (mm.core[k] !== '') out.push([`core.${k}`, { text: mm.core[k], unit: 'mm', shown: shown.core[k] }]);
  for (const k of WINDING_LENGTH_FIELDS)
    if (mm.winding[k] !== '') out.push([`winding.${k}`, { text: mm.winding[k], unit: 'mm', shown: shown.winding[k] }]);
  return out;
}
