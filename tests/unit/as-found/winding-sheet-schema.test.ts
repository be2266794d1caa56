import { describe, expect, it } from 'vitest';
import {
  makeWindingSheetExport,
  parseWindingSheetExport,
  parseWindingSheetJson,
  windingSheetSchema,
  type WindingSheetInput,
} from '@/lib/as-found/winding-sheet-schema';
import { EXAMPLE_A_SHEET } from '../../support/fixtures/winding-fixtures';

const wrap = (sheet: unknown) => ({ format: 'coilwright.winding-sheet', version: 1, exportedAt: '2025-03-01T10:00:00Z', sheet });
const issuesOf = (data: unknown) => {
  const r = parseWindingSheetExport(data);
  if (r.ok) throw new Error('expected problems');
  return r.issues;
};

describe('winding data sheet schema', () => {
  it('accepts example A and fills the defaults a form may leave out', () => {
    // Type-level: the form's input type lets stacking factor and parallel paths be left out.
    const minimal: WindingSheetInput = {
      ...EXAMPLE_A_SHEET,
      core: { ...EXAMPLE_A_SHEET.core, stackingFactor: undefined },
      winding: { ...EXAMPLE_A_SHEET.winding, parallelPaths: undefined },
    };
    const r = windingSheetSchema.parse(minimal);
    expect(r.core.stackingFactor).toBe(0.95);
    expect(r.winding.parallelPaths).toBe(1);
  });

  it('reports every problem at once, each with its path, cross-field rules included', () => {
    const bad = structuredClone(EXAMPLE_A_SHEET) as unknown as Record<string, Record<string, unknown>>;
    (bad.core as Record<string, unknown>).boreMm = -150;
    (bad.winding as Record<string, unknown>).spans = [40];
    (bad.winding as Record<string, unknown>).turnsPerCoil = [14, 12];
    (bad.supply as Record<string, unknown>).poles = 5;
    const paths = issuesOf(wrap(bad)).map((i) => i.path);
    expect(paths).toEqual(
      expect.arrayContaining(['sheet.core.boreMm', 'sheet.supply.poles', 'sheet.winding.spans.0', 'sheet.winding.turnsPerCoil']),
    );
  });

  it.each([
    {
      path: 'sheet.core.boreMm',
      change: (s: WindingSheetInput) => ({ ...s, core: { ...s.core, boreMm: 0 } }),
      message: 'Bore must be more than 0 mm.',
    },
    {
      path: 'sheet.core.slots',
      change: (s: WindingSheetInput) => ({ ...s, core: { ...s.core, slots: 36.5 } }),
      message: 'Slots must be a whole number.',
    },
    {
      path: 'sheet.winding.spans.0',
      change: (s: WindingSheetInput) => ({ ...s, winding: { ...s.winding, spans: [36] } }),
      message: 'Span 36 is not less than the 36 slots ("1–8" is 7).',
    },
    {
      path: 'sheet.winding.spans',
      change: (s: WindingSheetInput) => ({ ...s, winding: { ...s.winding, spans: [7, 9], turnsPerCoil: [1, 1] } }),
      message: 'A lap winding has one span; choose concentric for several.',
    },
    {
      path: 'sheet.winding.singleLayerCoiling',
      change: (s: WindingSheetInput) => ({ ...s, winding: { ...s.winding, singleLayerCoiling: 'half' as const } }),
      message: 'Whole or half coiling applies to single-layer windings only.',
    },
    {
      path: 'sheet.core.outsideDiameterMm',
      change: (s: WindingSheetInput) => ({ ...s, core: { ...s.core, outsideDiameterMm: 180 } }),
      message: 'No back iron left: the outside diameter must exceed the bore plus twice the slot depth.',
    },
    {
      path: 'sheet.wires.0.size',
      change: (s: WindingSheetInput) => ({ ...s, wires: [{ standard: 'awg' as const, size: '19.5', count: 1, enamelGrade: 2 as const }] }),
      message: 'AWG 19.5 is not a gauge from 4/0 to 44.',
    },
    {
      path: 'sheet.wires.0.size',
      change: (s: WindingSheetInput) => ({
        ...s,
        wires: [{ standard: 'metric' as const, size: '0.84', count: 1, enamelGrade: 2 as const }],
      }),
      message: '0.84 mm is not a nominal metric wire diameter (e.g. 0.85, 1.06).',
    },
    { path: 'sheet.wires', change: (s: WindingSheetInput) => ({ ...s, wires: [] }), message: 'Give at least one wire size.' },
    {
      path: 'sheet.supply.poles',
      change: (s: WindingSheetInput) => ({ ...s, supply: { ...s.supply, poles: 5 } }),
      message: 'Poles come in pairs: 2, 4, 6, 8 …',
    },
    {
      path: 'sheet.winding.slotTable.0.slot',
      change: (s: WindingSheetInput) => ({
        ...s,
        winding: { ...s.winding, slotTable: [{ slot: 40, layer: 1 as const, phase: 'A' as const, polarity: 1 as const, turns: 14 }] },
      }),
      message: 'Slot 40 is beyond the 36 slots of the core.',
    },
  ])('says "$message" at $path', ({ path, change, message }) => {
    expect(issuesOf(wrap(change(EXAMPLE_A_SHEET)))).toContainEqual({ path, message });
  });

  it.each(['18', '4/0', '1/0', '44'])('accepts AWG %s', (size) => {
    expect(parseWindingSheetExport(wrap({ ...EXAMPLE_A_SHEET, wires: [{ standard: 'awg', size, count: 1, enamelGrade: 2 }] })).ok).toBe(
      true,
    );
  });

  it('takes up to four wire sizes in hand, not five', () => {
    const w = EXAMPLE_A_SHEET.wires[0];
    expect(parseWindingSheetExport(wrap({ ...EXAMPLE_A_SHEET, wires: [w, w, w, w] })).ok).toBe(true);
    expect(issuesOf(wrap({ ...EXAMPLE_A_SHEET, wires: [w, w, w, w, w] }))).toContainEqual({
      path: 'sheet.wires',
      message: 'At most 4 wire sizes in hand.',
    });
  });
});

describe('export wrapper', () => {
  it('round-trips through JSON', () => {
    const exported = makeWindingSheetExport(windingSheetSchema.parse(EXAMPLE_A_SHEET), new Date('2025-03-01T10:00:00Z'));
    const back = parseWindingSheetJson(JSON.stringify(exported));
    expect(back).toEqual({ ok: true, value: exported });
  });

  it.each([
    { name: 'another format', data: { ...wrap(EXAMPLE_A_SHEET), format: 'other' }, path: 'format' },
    { name: 'a newer version', data: { ...wrap(EXAMPLE_A_SHEET), version: 2 }, path: 'version' },
    { name: 'a bad export date', data: { ...wrap(EXAMPLE_A_SHEET), exportedAt: 'yesterday' }, path: 'exportedAt' },
    { name: 'no sheet', data: { ...wrap(EXAMPLE_A_SHEET), sheet: undefined }, path: 'sheet' },
  ])('rejects $name at $path', ({ data, path }) => {
    expect(issuesOf(data).map((i) => i.path)).toContain(path);
  });

  it('reports bad JSON as one file-level problem', () => {
    const r = parseWindingSheetJson('{ not json');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.issues).toHaveLength(1);
      expect(r.issues[0]?.path).toBe('');
      expect(r.issues[0]?.message).toMatch(/not valid JSON/);
    }
  });
});
