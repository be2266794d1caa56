import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AWG_PUBLISHED_MILS, awgFormulaDiameterMils, awgNumberForDiameterMm, parseAwg } from '@/lib/engine/awg';
import { enamelIncreaseMm, type EnamelGrade } from '@/lib/engine/enamel-build';
import {
  awgResistanceOhmPer1000ft,
  listAwgSizes,
  listMetricSizes,
  nearestAwgForAreaMm2,
  nearestMetricForDiameterMm,
  wireBareAreaMm2,
  wireBareDiameterMm,
  wireOverallDiameterMm,
  type WireSize,
} from '@/lib/engine/wire';
import type { EngineResult } from '@/lib/engine/result';

function value<T>(r: EngineResult<T>): T {
  if (!r.ok) throw new Error(`expected ok, got ${r.error.code}: ${r.error.message}`);
  return r.value;
}

const awg = (size: string, enamelGrade: EnamelGrade = 2): WireSize => ({ standard: 'awg', size, enamelGrade });
const metric = (size: string, enamelGrade: EnamelGrade = 2): WireSize => ({ standard: 'metric', size, enamelGrade });
const row = (size: string) => {
  const found = listAwgSizes().find((r) => r.size === size);
  if (!found) throw new Error(`no AWG ${size}`);
  return found;
};
/** Rounds to n significant figures, as tables print. */
const sig = (x: number, n: number): number => Number(x.toPrecision(n));

describe('AWG check values', () => {
  // Source for every row: ASTM B258 formula, published magnet-wire tables.
  it.each([
    { size: '18', inches: 0.0403, mm: 1.024, cm: 1624, ohmPer1000ft: 6.385 },
    { size: '14', inches: 0.0641, mm: null, cm: 4109, ohmPer1000ft: null },
    { size: '10', inches: 0.1019, mm: null, cm: 10380, ohmPer1000ft: null },
  ])('AWG $size is $inches in bare and about $cm CM', ({ size, inches, mm, cm, ohmPer1000ft }) => {
    const r = row(size);
    expect(r.bareInPublished).toBeCloseTo(inches, 6); // ASTM B258 formula, published magnet-wire tables
    expect(Number(r.bareIn.toFixed(4))).toBe(inches); // ASTM B258 formula
    // Published tables square the rounded diameter; the formula CM lies within 0.1 % of it.
    expect(sig(Math.round((inches * 1000) ** 2), 4)).toBe(sig(cm, 4)); // published magnet-wire tables
    expect(Math.abs(r.circularMils / cm - 1)).toBeLessThan(0.001); // ASTM B258 formula
    if (mm !== null) expect(Number(value(wireBareDiameterMm(awg(size))).toFixed(3))).toBe(mm);
    if (ohmPer1000ft !== null) expect(Number(value(awgResistanceOhmPer1000ft(size)).toFixed(3))).toBe(ohmPer1000ft);
  });

  it('gives the exact formula end points: 4/0 is 0.4600 in and AWG 36 is 0.0050 in', () => {
    // ASTM B258 formula: n = −3 gives 0.005·92, n = 36 gives 0.005.
    expect(row('4/0').bareIn).toBeCloseTo(0.46, 12);
    expect(row('36').bareIn).toBeCloseTo(0.005, 12);
  });

  it('agrees with every published diameter to within the 0.1 mil rounding', () => {
    // ASTM B258 formula, published magnet-wire tables: the table is the formula rounded to 0.1 mil.
    expect(AWG_PUBLISHED_MILS).toHaveLength(48);
    AWG_PUBLISHED_MILS.forEach((mils, i) => {
      expect(Math.abs(awgFormulaDiameterMils(i - 3) - mils)).toBeLessThanOrEqual(0.05 + 1e-9);
    });
  });

  it('computes area in mm² as CM/1973.53', () => {
    // ASTM B258 formula: mm² = CM/1973.53.
    for (const r of listAwgSizes()) expect(Math.abs(r.areaMm2 / (r.circularMils / 1973.53) - 1)).toBeLessThan(5e-6);
  });

  it.each([
    ['4/0', -3],
    ['0000', -3],
    ['3/0', -2],
    ['000', -2],
    ['2/0', -1],
    ['00', -1],
    ['1/0', 0],
    ['0', 0],
    ['1', 1],
    ['AWG 10', 10],
    ['#12', 12],
    ['44', 44],
  ])('reads "%s" as gauge number %i', (label, n) => {
    expect(parseAwg(label)).toBe(n);
  });

  it.each(['45', '5/0', '-1', '18.5', 'abc', ''])('rejects "%s" with unknown-wire', (size) => {
    const r = wireBareDiameterMm(awg(size));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe('unknown-wire');
  });

  it('lists 48 gauges from 4/0 to 44 with strictly decreasing diameters', () => {
    const rows = listAwgSizes();
    expect(rows.map((r) => r.size).slice(0, 5)).toEqual(['4/0', '3/0', '2/0', '1/0', '1']);
    expect(rows.at(-1)?.size).toBe('44');
    rows.slice(1).forEach((r, i) => expect(r.bareMm).toBeLessThan(rows[i]!.bareMm));
  });

  it('has an area ratio of exactly 92^(6/39) (≈ 2) every three gauges', () => {
    // ASTM B258 formula fact.
    fc.assert(
      fc.property(fc.integer({ min: -3, max: 41 }), (n) => {
        const ratio = (awgFormulaDiameterMils(n) / awgFormulaDiameterMils(n + 3)) ** 2;
        expect(ratio).toBeCloseTo(92 ** (6 / 39), 12);
        expect(Math.abs(ratio - 2)).toBeLessThan(0.006);
      }),
    );
  });

  it('inverts the formula: the continuous gauge of a formula diameter is its gauge number', () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 44, noNaN: true }), (n) => {
        expect(awgNumberForDiameterMm((awgFormulaDiameterMils(n) * 25.4) / 1000)).toBeCloseTo(n, 9);
      }),
    );
  });

  it('finds the gauge back from any area within ±5 % of it', () => {
    fc.assert(
      fc.property(fc.constantFrom(...listAwgSizes()), fc.double({ min: 0.95, max: 1.05, noNaN: true }), (r, f) => {
        expect(value(nearestAwgForAreaMm2(r.areaMm2 * f)).row.size).toBe(r.size);
      }),
    );
  });

  it('reports the relative area difference of the nearest gauge', () => {
    const found = value(nearestAwgForAreaMm2(0.8));
    expect(found.row.size).toBe('18');
    expect(found.difference).toBeCloseTo(((Math.PI / 4) * (0.0403027 * 25.4) ** 2) / 0.8 - 1, 4);
  });
});

describe('metric nominal diameters [from memory]', () => {
  const sizes = listMetricSizes();

  it('runs from 0.050 to 5.000 mm, 81 sizes on R40', () => {
    expect(sizes[0]?.bareMm).toBe(0.05);
    expect(sizes.at(-1)?.bareMm).toBe(5);
    expect(sizes).toHaveLength(81);
  });

  it('contains the reference excerpt 0.500 … 1.250 mm in order', () => {
    // IEC 60317-0-1 R20/R40 nominal diameters [from memory].
    const excerpt = [0.5, 0.53, 0.56, 0.6, 0.63, 0.67, 0.71, 0.75, 0.8, 0.85, 0.9, 0.95, 1.0, 1.06, 1.12, 1.18, 1.25];
    const start = sizes.findIndex((s) => s.bareMm === 0.5);
    expect(sizes.slice(start, start + excerpt.length).map((s) => s.bareMm)).toEqual(excerpt);
  });

  it('marks every second size as R20', () => {
    expect(sizes.filter((s) => s.bareMm >= 0.5 && s.bareMm <= 1).map((s) => s.series)).toEqual([
      'R20',
      'R40',
      'R20',
      'R40',
      'R20',
      'R40',
      'R20',
      'R40',
      'R20',
      'R40',
      'R20',
      'R40',
      'R20',
    ]);
  });

  it('steps by about 10^(1/40) from one size to the next', () => {
    sizes.slice(1).forEach((s, i) => {
      expect(Math.abs(Math.log10(s.bareMm / sizes[i]!.bareMm) - 1 / 40)).toBeLessThan(0.006);
    });
  });

  it.each(['0.85', '0.850', '0,85', '0.85 mm'])('reads "%s" as 0.850 mm', (size) => {
    expect(value(wireBareDiameterMm(metric(size)))).toBe(0.85);
    expect(value(wireBareAreaMm2(metric(size)))).toBeCloseTo((Math.PI / 4) * 0.85 ** 2, 12);
  });

  it.each(['0.65', '0.049', '5.3', 'x', ''])('rejects "%s" with unknown-wire', (size) => {
    const r = wireBareAreaMm2(metric(size));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe('unknown-wire');
  });

  it.each([
    [0.86, 0.85],
    [0.84, 0.85],
    [0.01, 0.05],
    [7, 5],
  ])('finds %f mm nearest to %f mm', (asked, expected) => {
    expect(value(nearestMetricForDiameterMm(asked)).row.bareMm).toBe(expected);
  });

  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])('refuses a diameter of %f', (d) => {
    expect(nearestMetricForDiameterMm(d).ok).toBe(false);
    expect(nearestAwgForAreaMm2(d).ok).toBe(false);
  });
});

describe('enamel build (approximation)', () => {
  it.each([
    [0.5, 0.08],
    [1.6, 0.05],
  ])('grade 2 on %f mm adds %f of the bare diameter', (d, fraction) => {
    // [derived from IS 13730-0-1]: heavy/grade-2 build is about 5–8 % over bare for 0.5–1.6 mm.
    expect(enamelIncreaseMm(d, 2) / d).toBeCloseTo(fraction, 9);
  });

  it('keeps grade 2 within 5–8 % over bare for every listed size from 0.5 to 1.6 mm', () => {
    // [derived from IS 13730-0-1]
    for (const s of listMetricSizes().filter((m) => m.bareMm >= 0.5 && m.bareMm <= 1.6)) {
      const over = value(wireOverallDiameterMm(metric(String(s.bareMm)))) / s.bareMm - 1;
      expect(over).toBeGreaterThanOrEqual(0.05 - 1e-12);
      expect(over).toBeLessThanOrEqual(0.08 + 1e-12);
    }
  });

  it('orders grades 1 < 2 < 3 and keeps every overall diameter above bare', () => {
    fc.assert(
      fc.property(fc.constantFrom(...listMetricSizes(), ...listAwgSizes()), (r) => {
        const w = (g: EnamelGrade): WireSize => ({ standard: r.standard, size: r.size, enamelGrade: g });
        const [d1, d2, d3] = ([1, 2, 3] as const).map((g) => value(wireOverallDiameterMm(w(g))));
        expect(r.bareMm).toBeLessThan(d1!);
        expect(d1).toBeLessThan(d2!);
        expect(d2).toBeLessThan(d3!);
      }),
    );
  });
});
