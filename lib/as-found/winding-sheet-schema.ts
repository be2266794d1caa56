/**
 * The as-found winding data sheet: what the winder records before stripping a stator. One schema for the
 * form (react-hook-form through zodResolver: `useForm<WindingSheetInput, unknown, WindingSheet>`), the
 * server, the JSON export/import and the CLI. Stored units are metric with the unit in the name; numbers
 * are numbers (the form converts its strings). Messages are in trade language.
 */
import { z } from 'zod';
import { parseAwg } from '@/lib/engine/awg';
import { parseMetricSize } from '@/lib/engine/metric-wire';
import type { WindingSheetData } from '@/lib/engine/winding-sheet';
import { noNul } from '@/lib/validation/safe-text';
import { THERMAL_CLASSES, WIRE_STANDARDS } from '@/lib/engine/winding-sheet';

interface MeasureRule {
  unit?: string;
  int?: boolean;
  /** Smallest allowed value; exclusive when `above` is set. */
  min?: number;
  above?: boolean;
  max: number;
}

/** A number with its limits and messages naming the field, e.g. "Bore must be more than 0 mm.". */
function measure(label: string, { unit, int, min = 0, above = true, max }: MeasureRule) {
  const u = unit ? ` ${unit}` : '';
  let s = z.number({ error: `${label}: enter a number${unit ? ` in ${unit}` : ''}.` });
  if (int) s = s.int(`${label} must be a whole number.`);
  s = above ? s.gt(min, `${label} must be more than ${min}${u}.`) : s.gte(min, `${label} must be at least ${min}${u}.`);
  return s.max(max, `${label} must be at most ${max}${u}.`);
}

const text = (label: string, max: number) =>
  noNul(z.string({ error: `${label} must be text.` }).max(max, `${label}: at most ${max} characters.`));

export { THERMAL_CLASSES, WIRE_STANDARDS };

/** Stator core as measured, mm. */
export const coreSchema = z.object({
  boreMm: measure('Bore', { unit: 'mm', max: 5000 }),
  coreLengthMm: measure('Core length', { unit: 'mm', max: 5000 }),
  outsideDiameterMm: measure('Core outside diameter', { unit: 'mm', max: 6000 }),
  slots: measure('Slots', { int: true, min: 3, above: false, max: 600 }),
  slotDepthMm: measure('Slot depth', { unit: 'mm', max: 500 }),
  slotWidthTopMm: measure('Slot width at the top', { unit: 'mm', max: 200 }),
  slotWidthBottomMm: measure('Slot width at the bottom', { unit: 'mm', max: 200 }),
  slotOpeningMm: measure('Slot opening', { unit: 'mm', max: 100 }).optional(),
  toothWidthMm: measure('Tooth width', { unit: 'mm', max: 200 }),
  stackingFactor: measure('Stacking factor', { max: 1 }).default(0.95),
  ventDucts: measure('Vent ducts', { int: true, above: false, max: 100 }).optional(),
  ventDuctWidthMm: measure('Vent duct width', { unit: 'mm', max: 50 }).optional(),
  rotorSlots: measure('Rotor slots', { int: true, min: 1, above: false, max: 1000 }).optional(),
  airGapMm: measure('Air gap', { unit: 'mm', max: 50 }).optional(),
});

/** One coil side of a slot table drawn by the winder. */
export const coilSideSchema = z.object({
  slot: measure('Slot number', { int: true, min: 1, above: false, max: 600 }),
  layer: z.union([z.literal(1), z.literal(2)], { error: 'Layer is 1 (top) or 2 (bottom).' }),
  phase: z.enum(['A', 'B', 'C'], { error: 'Phase is A, B or C.' }),
  polarity: z.union([z.literal(1), z.literal(-1)], { error: 'Polarity is +1 (going) or −1 (returning).' }),
  turns: measure('Turns', { int: true, min: 1, above: false, max: 10_000 }),
  coil: measure('Coil number', { int: true, min: 1, above: false, max: 10_000 }).optional(),
});

/** The winding as found: layers, style, spans ("1–8" is 7), turns, paths, connection. */
export const windingSchema = z.object({
  layers: z.union([z.literal(1), z.literal(2)], { error: 'Layers: 1 (single) or 2 (double).' }),
  style: z.enum(['lap', 'concentric'], { error: 'Style is lap or concentric.' }),
  singleLayerCoiling: z.enum(['whole', 'half'], { error: 'Coiling is whole or half.' }).optional(),
  spans: z
    .array(measure('Span', { int: true, min: 1, above: false, max: 599 }), { error: 'Give the coil spans.' })
    .min(1, 'Give at least one span (slot pitches: "1–8" is 7).')
    .max(12, 'At most 12 spans per group.'),
  turnsPerCoil: z
    .array(measure('Turns per coil', { int: true, min: 1, above: false, max: 10_000 }), { error: 'Give the turns per coil.' })
    .min(1, 'Give the turns per coil.')
    .max(12, 'At most 12 coils per group.'),
  coilsPerGroup: measure('Coils per group', { int: true, min: 1, above: false, max: 100 }).optional(),
  groups: measure('Groups', { int: true, min: 1, above: false, max: 1000 }).optional(),
  parallelPaths: measure('Parallel paths', { int: true, min: 1, above: false, max: 64 }).default(1),
  connection: z.enum(['star', 'delta'], { error: 'Connection is star or delta.' }),
  leads: measure('Leads', { int: true, min: 1, above: false, max: 24 }).optional(),
  leadMarkings: text('Lead markings', 200).optional(),
  jumperNotes: text('Jumper notes', 2000).optional(),
  slotTable: z.array(coilSideSchema).max(2400, 'At most 2400 coil sides.').optional(),
  meanTurnLengthMm: measure('Mean turn length', { unit: 'mm', max: 20_000 }).optional(),
  coilExtensionMm: measure('Coil extension', { unit: 'mm', max: 2000 }).optional(),
  copperWeightKg: measure('Copper weight', { unit: 'kg', max: 20_000 }).optional(),
});

/** One wire size in hand; 1 to 4 rows per sheet. */
export const wireSchema = z
  .object({
    standard: z.enum(WIRE_STANDARDS, { error: 'Wire standard is AWG or metric.' }),
    /** AWG gauge as written ("18", "4/0"), or the metric nominal bare diameter in mm ("0.85"). */
    size: noNul(
      z.string({ error: 'Enter the wire size.' }).trim().min(1, 'Enter the wire size.').max(20, 'Wire size: at most 20 characters.'),
    ),
    count: measure('Wires in hand', { int: true, min: 1, above: false, max: 100 }),
    enamelGrade: z.union([z.literal(1), z.literal(2), z.literal(3)], { error: 'Enamel grade is 1, 2 or 3.' }),
  })
  .superRefine((w, ctx) => {
    if (w.standard === 'awg' && parseAwg(w.size) === null)
      ctx.addIssue({ code: 'custom', path: ['size'], message: `AWG ${w.size} is not a gauge from 4/0 to 44.` });
    if (w.standard === 'metric' && parseMetricSize(w.size) === null)
      ctx.addIssue({ code: 'custom', path: ['size'], message: `${w.size} mm is not a nominal metric wire diameter (e.g. 0.85, 1.06).` });
  });

/** Insulation system. */
export const insulationSchema = z.object({
  thermalClass: z.enum(THERMAL_CLASSES, { error: 'Thermal class is A, B, F or H.' }),
  slotLiner: text('Slot liner', 200).optional(),
  wedges: text('Wedges', 200).optional(),
  varnish: text('Varnish', 200).optional(),
});

/** Supply and rating. */
export const supplySchema = z.object({
  lineVoltageV: measure('Line voltage', { unit: 'V', max: 15_000 }),
  frequencyHz: measure('Frequency', { unit: 'Hz', max: 400 }),
  poles: measure('Poles', { int: true, min: 2, above: false, max: 200 }).refine((p) => p % 2 === 0, 'Poles come in pairs: 2, 4, 6, 8 …'),
  ratedCurrentA: measure('Rated current', { unit: 'A', max: 20_000 }).optional(),
  ratedOutputKw: measure('Rated output', { unit: 'kW', max: 100_000 }).optional(),
});

/** Three resistance readings and the winding temperature they were taken at. */
export const resistanceSchema = z.object({
  readings: z.tuple(
    [
      measure('Reading 1', { unit: 'Ω', max: 1e6 }),
      measure('Reading 2', { unit: 'Ω', max: 1e6 }),
      measure('Reading 3', { unit: 'Ω', max: 1e6 }),
    ],
    { error: 'Give three resistance readings.' },
  ),
  temperatureC: measure('Winding temperature', { unit: '°C', min: -40, above: false, max: 250 }),
  between: z.enum(['line-to-line', 'phase'], { error: 'Readings are line-to-line or per phase.' }),
});

/** Cross-field rules, run even when other fields fail so the winder sees every problem at once. */
function sheetRules(value: unknown, ctx: z.RefinementCtx): void {
  const sheet = value as {
    core?: {
      slots?: unknown;
      boreMm?: unknown;
      outsideDiameterMm?: unknown;
      slotDepthMm?: unknown;
      ventDucts?: unknown;
      ventDuctWidthMm?: unknown;
    };
    winding?: {
      layers?: unknown;
      style?: unknown;
      singleLayerCoiling?: unknown;
      spans?: unknown;
      turnsPerCoil?: unknown;
      slotTable?: unknown;
    };
  };
  const core = sheet.core ?? {};
  const w = sheet.winding ?? {};
  const num = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
  const slots = num(core.slots);
  const add = (path: (string | number)[], message: string): void => ctx.addIssue({ code: 'custom', path, message });
  const [bore, od, depth] = [num(core.boreMm), num(core.outsideDiameterMm), num(core.slotDepthMm)];
  if (bore !== undefined && od !== undefined && depth !== undefined && od <= bore + 2 * depth)
    add(['core', 'outsideDiameterMm'], 'No back iron left: the outside diameter must exceed the bore plus twice the slot depth.');
  if ((num(core.ventDucts) ?? 0) > 0 && core.ventDuctWidthMm === undefined) add(['core', 'ventDuctWidthMm'], 'Give the vent duct width.');
  const spans = Array.isArray(w.spans) ? w.spans : [];
  const turns = Array.isArray(w.turnsPerCoil) ? w.turnsPerCoil : [];
  if (Array.isArray(w.spans) && Array.isArray(w.turnsPerCoil) && spans.length !== turns.length)
    add(['winding', 'turnsPerCoil'], `Give one turns figure per span (${spans.length} span(s), ${turns.length} turns figure(s)).`);
  if (w.style === 'lap' && spans.length > 1) add(['winding', 'spans'], 'A lap winding has one span; choose concentric for several.');
  if (w.layers === 2 && w.singleLayerCoiling !== undefined)
    add(['winding', 'singleLayerCoiling'], 'Whole or half coiling applies to single-layer windings only.');
  if (slots !== undefined)
    spans.forEach((y, i) => {
      if (typeof y === 'number' && y >= slots) add(['winding', 'spans', i], `Span ${y} is not less than the ${slots} slots ("1–8" is 7).`);
    });
  if (Array.isArray(w.slotTable))
    w.slotTable.forEach((s: unknown, i) => {
      const side = s as { slot?: unknown; layer?: unknown };
      if (slots !== undefined && typeof side.slot === 'number' && side.slot > slots)
        add(['winding', 'slotTable', i, 'slot'], `Slot ${side.slot} is beyond the ${slots} slots of the core.`);
      if (w.layers === 1 && side.layer === 2) add(['winding', 'slotTable', i, 'layer'], 'A single-layer winding has no layer 2.');
    });
}

/** The whole as-found winding data sheet. */
export const windingSheetSchema = z
  .object({
    core: coreSchema,
    winding: windingSchema,
    wires: z
      .array(wireSchema, { error: 'Give the wire sizes.' })
      .min(1, 'Give at least one wire size.')
      .max(4, 'At most 4 wire sizes in hand.'),
    insulation: insulationSchema,
    supply: supplySchema,
    resistance: resistanceSchema.optional(),
    notes: text('Notes', 5000).optional(),
  })
  .superRefine(sheetRules, { when: (payload) => typeof payload.value === 'object' && payload.value !== null });

/** What a form holds (defaults may be missing). */
export type WindingSheetInput = z.input<typeof windingSheetSchema>;
/** A checked sheet. */
export type WindingSheet = z.output<typeof windingSheetSchema>;

// A checked sheet is exactly what the engine analyses: the engine owns the shape (lib/engine/winding-sheet.ts)
// and this schema maps user input onto it. The type check fails here if the two drift apart.
type Assert<T extends true> = T;
export type SheetFitsEngine = Assert<
  WindingSheet extends WindingSheetData ? (WindingSheetData extends WindingSheet ? true : false) : false
>;

/** Format tag of an export file. */
export const WINDING_SHEET_FORMAT = 'coilwright.winding-sheet';
/** Version of the export format this program writes and reads. */
export const WINDING_SHEET_VERSION = 1;

/** An export file: format tag, version, time of export and the sheet. */
export const windingSheetExportSchema = z.object({
  format: z.literal(WINDING_SHEET_FORMAT, { error: `Not a winding data sheet (format must be "${WINDING_SHEET_FORMAT}").` }),
  version: z.literal(WINDING_SHEET_VERSION, { error: `Unsupported sheet version (this program reads version ${WINDING_SHEET_VERSION}).` }),
  exportedAt: z.iso.datetime({ error: 'exportedAt must be an ISO date-time such as 2025-03-01T10:00:00Z.' }),
  sheet: windingSheetSchema,
});

/** A checked export file. */
export type WindingSheetExport = z.output<typeof windingSheetExportSchema>;

/** Wraps a sheet for download. */
export const makeWindingSheetExport = (sheet: WindingSheet, now: Date = new Date()): WindingSheetExport => ({
  format: WINDING_SHEET_FORMAT,
  version: WINDING_SHEET_VERSION,
  exportedAt: now.toISOString(),
  sheet,
});

/** One problem found in a sheet or file. */
export interface SheetIssue {
  /** Dotted path, e.g. "sheet.core.boreMm" or "sheet.wires.0.size"; "" for the file as a whole. */
  path: string;
  message: string;
}

/** A checked export, or every problem found. */
export type SheetParseResult = { ok: true; value: WindingSheetExport } | { ok: false; issues: SheetIssue[] };

/** Parses an export (already JSON-decoded), reporting every problem with its path. */
export function parseWindingSheetExport(data: unknown): SheetParseResult {
  const r = windingSheetExportSchema.safeParse(data);
  if (r.success) return { ok: true, value: r.data };
  return { ok: false, issues: r.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message })) };
}

/** Parses the text of an export file; bad JSON is one issue at the file level. */
export function parseWindingSheetJson(text: string): SheetParseResult {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, issues: [{ path: '', message: `The file is not valid JSON (${e instanceof Error ? e.message : String(e)}).` }] };
  }
  return parseWindingSheetExport(data);
}
