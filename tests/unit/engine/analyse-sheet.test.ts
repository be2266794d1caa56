import { describe, expect, it } from 'vitest';
import { sheetFindings } from '@/lib/engine/sheet-findings';
import { analyseSheet, windingInputFromSheet } from '@/lib/engine/analyse-sheet';
import { EXAMPLE_A_CORE, EXAMPLE_A_SHEET, errorOf, rel, value } from '../../support/fixtures/winding-fixtures';

describe('analyseSheet on example A as a data sheet', () => {
  const a = value(analyseSheet(EXAMPLE_A_SHEET));

  it('converts the sheet millimetres to the engine metres once', () => {
    expect(windingInputFromSheet(EXAMPLE_A_SHEET).core).toMatchObject({ ...EXAMPLE_A_CORE, ventDucts: 0, ventDuctWidthM: 0 });
  });

  it('gives the example A flux results (docs/engineering/flux-density.md worked example A, [derived], ±0.5 %)', () => {
    expect(rel(a.winding.flux?.fluxPerPoleWb ?? NaN, 6.866e-3)).toBeLessThanOrEqual(0.005);
    expect(rel(a.winding.flux?.yoke.tesla ?? NaN, 1.2045)).toBeLessThanOrEqual(0.005);
  });

  // docs/engineering/wire-and-resistance.md check [derived]: example A with MLT 0.56 m, 2 strands × 0.85 mm.
  it('predicts R_ph(20 °C) 1.4293 Ω and star line-to-line 2.8585 Ω', () => {
    expect(a.resistance?.predictedPhaseOhm20).toBeCloseTo(1.4293, 4);
    expect(a.resistance?.predictedLineToLineOhm20).toBeCloseTo(2.8585, 4);
  });

  it('compares the readings with the prediction and judges their unbalance (ANSI/EASA AR100-2020)', () => {
    const m = a.resistance?.measured;
    expect(m?.phaseOhm20).toBeCloseTo(2.86 / 2, 12);
    expect(m?.differencePercent).toBeCloseTo(
      ((1.43 - (a.resistance?.predictedPhaseOhm20 ?? NaN)) / (a.resistance?.predictedPhaseOhm20 ?? NaN)) * 100,
      9,
    );
    expect(m?.unbalance.pass).toBe(true);
  });

  it('reports copper area, current density and slot fill from the wire in hand', () => {
    const area = 2 * (Math.PI / 4) * 0.85 ** 2;
    expect(a.conductorAreaPerTurnMm2).toBeCloseTo(area, 12);
    expect(a.currentDensity?.ampsPerMm2).toBeCloseTo(5 / area, 9);
    expect(a.slotFill.conductorsPerSlot).toBe(28);
    expect(a.slotFill.bareCopperOverGross).toBeCloseTo((28 * area) / ((20 * (7 + 9)) / 2), 9);
    expect(a.synchronousRpm).toBe(1500);
  });

  // docs/engineering/redesign.md: CM/A = 1973.5 / J [derived]; textbook J 3–5 A/mm² (Sawhney) or 3–8 A/mm² for totally
  // enclosed machines (Pyrhönen) [from memory].
  it('gives current density in A/mm² and CM/A = 1973.5/J, beside the textbook ranges', () => {
    const j = a.currentDensity;
    expect((j?.circularMilsPerAmp ?? NaN) * (j?.ampsPerMm2 ?? NaN)).toBeCloseTo(1973.5, 1);
    expect(j?.typical.map((t) => [t.minAPerMm2, t.maxAPerMm2])).toEqual([
      [3, 5],
      [3, 8],
    ]);
    expect(j?.typical.map((t) => t.source).join(' ')).toMatch(/Sawhney.*Pyrhönen/);
  });

  // docs/engineering/redesign.md: hand insertion of round wire typically ≤ 0.65–0.75 insulated fill of net area
  // [common practice, from memory]; say which definition.
  it('names its slot-fill definitions and shows the hand-insertion limit', () => {
    expect(a.slotFill.handInsertionLimit).toEqual({ low: 0.65, high: 0.75 });
    expect(a.slotFill.insulatedOverGross).toBeGreaterThan(a.slotFill.bareCopperOverGross);
  });

  it('finds a resistance unbalance over the limit', () => {
    const sheet = {
      ...EXAMPLE_A_SHEET,
      resistance: { readings: [2.7, 2.86, 2.9] as [number, number, number], temperatureC: 20, between: 'line-to-line' as const },
    };
    expect(sheetFindings(sheet, value(analyseSheet(sheet))).map((f) => f.id)).toContain('resistance-unbalance');
  });

  it('points at the wire row it cannot find', () => {
    const e = errorOf(analyseSheet({ ...EXAMPLE_A_SHEET, wires: [{ standard: 'metric', size: '0.84', count: 2, enamelGrade: 2 }] }));
    expect(e.code).toBe('unknown-wire');
    expect(e.field).toBe('wires.0.size');
  });

  it('leaves resistance out without a mean turn length, current density without a rated current', () => {
    const { meanTurnLengthMm: _m, ...winding } = EXAMPLE_A_SHEET.winding;
    const { ratedCurrentA: _c, ...supply } = EXAMPLE_A_SHEET.supply;
    const r = value(analyseSheet({ ...EXAMPLE_A_SHEET, winding, supply }));
    expect(r.resistance).toBeNull();
    expect(r.currentDensity).toBeNull();
  });
});
