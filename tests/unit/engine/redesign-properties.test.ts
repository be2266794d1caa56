import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { searchRedesign } from '@/lib/engine/redesign/search';
import { EXAMPLE_A_ORIGINAL, METRIC_STOCK, requestFor } from '../../support/fixtures/redesign-fixtures';
import { value } from '../../support/fixtures/winding-fixtures';

const target = fc.record({
  lineVoltageV: fc.integer({ min: 200, max: 1000 }),
  frequencyHz: fc.constantFrom(50, 60),
  poles: fc.constantFrom(4, 6),
  connection: fc.constantFrom('star' as const, 'delta' as const, 'either' as const),
});
const limits = fc.record({
  over: fc.double({ min: 0.01, max: 0.1, noNaN: true }),
  under: fc.double({ min: 0.01, max: 0.2, noNaN: true }),
  slotFillMax: fc.double({ min: 0.2, max: 0.7, noNaN: true }),
  currentDensityRise: fc.double({ min: 0, max: 0.15, noNaN: true }),
});

const RUNS = { numRuns: 40 };

describe('redesign search invariants (fast-check)', () => {
  it('every candidate keeps gap, tooth and yoke ratios, current density and slot fill inside the limits', () => {
    fc.assert(
      fc.property(target, limits, (t, l) => {
        const d = { over: l.over, under: l.under };
        const r = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t, { gap: d, tooth: d, yoke: d, slotFillMax: l.slotFillMax, currentDensityRise: l.currentDensityRise }), METRIC_STOCK));
        for (const c of r.candidates) {
          for (const k of ['gap', 'tooth', 'yoke'] as const) {
            expect(c.ratios[k]).toBeLessThanOrEqual(1 + l.over + 1e-9);
            expect(c.ratios[k]).toBeGreaterThanOrEqual(1 - l.under - 1e-9);
          }
          expect(c.currentDensity.ratio).toBeLessThanOrEqual(1 + l.currentDensityRise + 1e-9);
          expect(c.slotFill).toBeLessThanOrEqual(Math.max(l.slotFillMax, r.originalBasis.slotFill) + 1e-9);
          if (c.currentDensity.aPerMm2 !== null) expect(c.currentDensity.aPerMm2).toBeLessThanOrEqual(6 + 1e-9);
        }
      }),
      RUNS,
    );
  });

  it('more turns never raise the flux: within one family the flux ratio falls as turns rise', () => {
    fc.assert(
      fc.property(target, (t) => {
        const r = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t, { gap: { over: 0.1, under: 0.2 }, tooth: { over: 0.1, under: 0.2 }, yoke: { over: 0.1, under: 0.2 } }), METRIC_STOCK));
        const byFamily = new Map<string, { turns: number; flux: number }[]>();
        for (const c of r.candidates) {
          const w = c.winding;
          const k = `${w.spans.join('.')}|${w.connection}|${w.parallelPaths}`;
          byFamily.set(k, [...(byFamily.get(k) ?? []), { turns: w.turnsPerCoil[0] ?? 0, flux: c.ratios.flux }]);
        }
        for (const list of byFamily.values()) {
          list.sort((a, b) => a.turns - b.turns);
          for (let i = 1; i < list.length; i++) {
            const [prev, cur] = [list[i - 1]!, list[i]!];
            if (cur.turns > prev.turns) expect(cur.flux).toBeLessThan(prev.flux);
            else expect(cur.flux).toBe(prev.flux);
          }
        }
      }),
      RUNS,
    );
  });

  it('ranking is deterministic: the same request in any stock order gives the same candidates in the same order', () => {
    fc.assert(
      fc.property(target, fc.array(fc.nat(), { minLength: METRIC_STOCK.length, maxLength: METRIC_STOCK.length }), (t, keys) => {
        const shuffled = METRIC_STOCK.map((w, i) => ({ w, k: keys[i] ?? 0 })).sort((a, b) => a.k - b.k).map((x) => x.w);
        const a = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), METRIC_STOCK));
        const b = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), shuffled));
        expect(b.candidates.map((c) => c.key)).toEqual(a.candidates.map((c) => c.key));
        expect(b.rejected).toEqual(a.rejected);
      }),
      { numRuns: 20 },
    );
  });
});
