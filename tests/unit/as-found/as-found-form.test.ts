import { describe, expect, it } from 'vitest';
import { windingSheetSchema } from '@/lib/as-found/winding-sheet-schema';
import {
  emptySheetForm,
  savedLengthMemory,
  switchFormLengths,
  formToSheetInput,
  sheetPathToFormPath,
  sheetToForm,
} from '@/lib/as-found/as-found-form';
import { restoreDraftValues } from '@/lib/as-found/draft-values';
import { prefillFromNameplate } from '@/lib/as-found/prefill';
import { EXAMPLE_A_SHEET } from '../../support/fixtures/winding-fixtures';

describe('the sheet form model', () => {
  it('round-trips a saved sheet through the form in mm unchanged', () => {
    const back = windingSheetSchema.parse(formToSheetInput(sheetToForm(EXAMPLE_A_SHEET, 'mm'), 'mm'));
    expect(back).toEqual(windingSheetSchema.parse(EXAMPLE_A_SHEET));
  });

  it('round-trips through inches to within 0.0026 mm (4 decimals of an inch)', () => {
    const back = windingSheetSchema.parse(formToSheetInput(sheetToForm(EXAMPLE_A_SHEET, 'in'), 'in'));
    expect(back.core.boreMm).toBeCloseTo(150, 2);
    expect(back.core.toothWidthMm).toBeCloseTo(6.5, 2);
    expect(back.winding.meanTurnLengthMm).toBeCloseTo(560, 2);
    expect(back.core.slots).toBe(36);
  });

  // Issue 9: a saved sheet shown in inches and saved untouched keeps its stored millimetres exactly.
  it('saves a sheet shown in inches without changing a stored length', () => {
    const memory = new Map(savedLengthMemory(EXAMPLE_A_SHEET, 'in'));
    const back = windingSheetSchema.parse(formToSheetInput(sheetToForm(EXAMPLE_A_SHEET, 'in'), 'in', undefined, memory));
    expect(back).toEqual(windingSheetSchema.parse(EXAMPLE_A_SHEET));
  });

  it('shows lengths in the chosen unit beside counts that never convert', () => {
    const f = sheetToForm(EXAMPLE_A_SHEET, 'in');
    expect(f.core.boreMm).toBe('5.9055');
    expect(f.core.slots).toBe('36');
    const mm = switchFormLengths(f, 'in', 'mm', new Map()).values;
    expect(Number(mm.core.boreMm)).toBeCloseTo(150, 2);
    expect(mm.core.slots).toBe('36');
  });

  it('turns coil rows into spans and turns, and blanks into missing optional fields', () => {
    const f = sheetToForm(EXAMPLE_A_SHEET, 'mm');
    f.winding.style = 'concentric';
    f.winding.coils = [
      { span: '11', turns: '20' },
      { span: '9', turns: '21' },
    ];
    f.core.ventDucts = '';
    f.resistance = { readings: ['', '', ''], temperatureC: '', between: 'line-to-line' };
    const input = formToSheetInput(f, 'mm') as {
      winding: { spans: unknown; turnsPerCoil: unknown };
      core: Record<string, unknown>;
      resistance?: unknown;
    };
    expect(input.winding.spans).toEqual([11, 9]);
    expect(input.winding.turnsPerCoil).toEqual([20, 21]);
    expect('ventDucts' in input.core).toBe(false);
    expect(input.resistance).toBeUndefined();
  });

  // Issue 9: a span written the way the label shows it is accepted as well as the number of pitches.
  it.each([
    ['1–8', 7],
    ['1-8', 7],
    ['7', 7],
  ])('reads the span "%s" as %i slot pitches', (text, pitches) => {
    const f = sheetToForm(EXAMPLE_A_SHEET, 'mm');
    f.winding.coils = [{ span: text as string, turns: '14' }];
    expect((formToSheetInput(f, 'mm') as { winding: { spans: unknown } }).winding.spans).toEqual([pitches]);
  });

  it('lets the schema name a field typed with words instead of a number', () => {
    const f = sheetToForm(EXAMPLE_A_SHEET, 'mm');
    f.core.boreMm = 'about 150';
    const r = windingSheetSchema.safeParse(formToSheetInput(f, 'mm'));
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toContain('core.boreMm');
  });

  it.each([
    ['sheet.core.boreMm', 'core.boreMm'],
    ['winding.spans.1', 'winding.coils.1.span'],
    ['winding.turnsPerCoil.0', 'winding.coils.0.turns'],
    ['winding.turnsPerCoil', 'winding.coils.root'],
    ['wires.0.size', 'wires.0.size'],
    ['resistance.readings', 'resistance.readings.0'],
  ])('shows schema path %s on form field %s', (from, to) => {
    expect(sheetPathToFormPath(from)).toBe(to);
  });

  it('restores a draft, filling anything missing or misshapen from the blank form', () => {
    const v = restoreDraftValues({
      core: { boreMm: '150', slots: 36 },
      winding: { coils: [{ span: '7', turns: 'x' }] },
      wires: 'nonsense',
      notes: 'n',
    });
    expect(v.core.boreMm).toBe('150');
    expect(v.core.slots).toBe('');
    expect(v.winding.coils).toEqual([{ span: '7', turns: 'x' }]);
    expect(v.wires).toEqual(emptySheetForm().wires);
    expect(v.notes).toBe('n');
    expect(restoreDraftValues(null)).toEqual(emptySheetForm());
  });
});

describe('prefill from the nameplate', () => {
  // docs/engineering/nameplate-and-speed.md: poles from speed, 60 Hz 1750 rpm → 4 poles [derived].
  it('takes voltage, frequency, poles from speed, current, output, connection and class', () => {
    const f = prefillFromNameplate({
      ratedVoltageV: 460,
      frequencyHz: 60,
      speedRpm: 1750,
      currentA: 18.5,
      outputKw: 11.1855,
      connection: 'delta',
      insulationClass: 'f',
    });
    expect(f.supply).toEqual({ lineVoltageV: '460', frequencyHz: '60', poles: '4', ratedCurrentA: '18.5', ratedOutputKw: '11.186' });
    expect(f.winding.connection).toBe('delta');
    expect(f.insulation.thermalClass).toBe('F');
  });

  it('leaves what the plate does not say blank', () => {
    const f = prefillFromNameplate({
      ratedVoltageV: null,
      frequencyHz: 50,
      speedRpm: null,
      currentA: null,
      outputKw: null,
      connection: 'star-delta',
      insulationClass: null,
    });
    expect(f.supply.poles).toBe('');
    expect(f.winding.connection).toBe('');
  });
});
