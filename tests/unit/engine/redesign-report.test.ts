import { describe, expect, it } from 'vitest';
import { redesignReport } from '@/lib/engine/redesign/report';
import { searchRedesign } from '@/lib/engine/redesign/search';
import { redesignWarnings } from '@/lib/engine/redesign/warnings';
import { EXAMPLE_A_ORIGINAL, METRIC_STOCK, requestFor } from '../../support/fixtures/redesign-fixtures';
import { value } from '../../support/fixtures/winding-fixtures';

/** Searches with the shop defaults, then reports the best candidate against `judgeLimits` (default: the same). */
function reportFor(target: Parameters<typeof requestFor>[0], judgeLimits: Parameters<typeof requestFor>[1] = {}) {
  const search = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(target), METRIC_STOCK));
  const best = search.candidates[0];
  if (!best) throw new Error('no candidate');
  return value(redesignReport(EXAMPLE_A_ORIGINAL, requestFor(target, judgeLimits), search, best));
}
const within = (actual: number | null, expected: number, tol = 0.005) =>
  expect(Math.abs((actual ?? NaN) / expected - 1)).toBeLessThanOrEqual(tol);
const rowOf = (r: ReturnType<typeof reportFor>, key: string) => {
  const row = r.rows.find((x) => x.key === key);
  if (!row) throw new Error(`no row ${key}`);
  return row;
};

describe('side-by-side report', () => {
  it('shows example A’s own figures in the original column (docs/engineering/flux-density.md worked example, ±0.5 %)', () => {
    const r = reportFor({ lineVoltageV: 460, frequencyHz: 60 });
    expect(rowOf(r, 'kw1').values.original).toBeCloseTo(0.9019, 4);
    expect(rowOf(r, 'seriesTurns').values.original).toBe(168);
    within(rowOf(r, 'flux').values.original, 6.866e-3);
    within(rowOf(r, 'gapAverage').values.original, 0.4856);
    within(rowOf(r, 'gapPeak').values.original, 0.7628);
    within(rowOf(r, 'tooth').values.original, 1.617);
    within(rowOf(r, 'yoke').values.original, 1.2045);
    // Predicted resistance of example A with MLT 560 mm, 2 × 0.85 mm: 1.4293 Ω at 20 °C (docs/engineering/wire-and-resistance.md).
    expect(rowOf(r, 'resistance').values.original).toBeCloseTo(1.4293, 3);
  });

  it('scales densities by the candidate’s ratios and marks nothing out of range for a candidate inside the limits', () => {
    const r = reportFor({ lineVoltageV: 460, frequencyHz: 60 });
    const yoke = rowOf(r, 'yoke');
    expect(yoke.values.candidate! / yoke.values.original!).toBeCloseTo(r.candidate.ratios.yoke, 12);
    expect(r.rows.filter((x) => x.status === 'out')).toEqual([]);
  });

  it('marks a value that leaves its range, for the original and the candidate (example A fills 22.5 %)', () => {
    const r = reportFor({ lineVoltageV: 460, frequencyHz: 60 }, { slotFillMax: 0.2, currentDensityRise: 0 });
    const fill = rowOf(r, 'slotFill');
    expect(fill.originalStatus).toBe('out');
    expect(fill.status).toBe(r.candidate.slotFill > fill.values.original! ? 'out' : 'ok');
    expect(fill.note).toMatch(/shop limit 20\.0 %; the original already fills 22\.5 %/);
    expect(rowOf(r, 'currentDensity').status).toBe(r.candidate.currentDensity.ratio > 1 ? 'out' : 'ok');
  });

  it('proposes nameplate data: 460 V 60 Hz, speed and power ×1.2, current ×1.2·400/460 (same slip)', () => {
    const r = reportFor({ lineVoltageV: 460, frequencyHz: 60 });
    const p = r.nameplate;
    expect(p.lineVoltageV).toBe(460);
    expect(p.synchronousRpm).toBe(1800);
    expect(p.speedRpm).toBeCloseTo(1440 * 1.2, 6);
    expect(p.currentA).toBeCloseTo((5 * 1.2 * 400) / 460, 6);
  });
});

describe('cautions', () => {
  const kinds = (target: Parameters<typeof requestFor>[0]) =>
    redesignWarnings(EXAMPLE_A_ORIGINAL, requestFor(target).target, null).map((w) => w.topic);

  it.each([
    { name: 'fewer poles: back-iron saturation and engineer review', target: { poles: 2 }, expect: ['poles', 'speed'] },
    { name: 'frequency change: speed and power', target: { frequencyHz: 60 }, expect: ['speed', 'frequency'] },
    { name: 'star to delta: the √3', target: { connection: 'delta' as const }, expect: ['connection'] },
    { name: '690 V: the insulation system', target: { lineVoltageV: 690 }, expect: ['voltage'] },
  ])('$name', ({ target, expect: topics }) => {
    expect(kinds(target)).toEqual(expect.arrayContaining([...topics, 'certification', 'review', 'codes']));
  });

  it('always names IEC 60079-19 and defers to local codes', () => {
    const text = redesignWarnings(EXAMPLE_A_ORIGINAL, requestFor({}).target, null)
      .map((w) => w.text)
      .join(' ');
    expect(text).toMatch(/IEC 60079-19/);
    expect(text).toMatch(/local codes/);
  });
});
