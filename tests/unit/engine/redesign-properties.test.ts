import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compareCandidates, type RankFacts } from '@/lib/engine/redesign/ranking';
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

// Each property runs the full search tens of times: allow for a loaded machine.
describe('redesign search invariants (fast-check)', { timeout: 120_000 }, () => {
  it('every candidate keeps gap, tooth and yoke ratios, current density and slot fill inside the limits', () => {
    fc.assert(
      fc.property(target, limits, (t, l) => {
        const d = { over: l.over, under: l.under };
        const r = value(
          searchRedesign(
            EXAMPLE_A_ORIGINAL,
            requestFor(t, { gap: d, tooth: d, yoke: d, slotFillMax: l.slotFillMax, currentDensityRise: l.currentDensityRise }),
            METRIC_STOCK,
          ),
        );
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
        const r = value(
          searchRedesign(
            EXAMPLE_A_ORIGINAL,
            requestFor(t, { gap: { over: 0.1, under: 0.2 }, tooth: { over: 0.1, under: 0.2 }, yoke: { over: 0.1, under: 0.2 } }),
            METRIC_STOCK,
          ),
        );
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
        const shuffled = METRIC_STOCK.map((w, i) => ({ w, k: keys[i] ?? 0 }))
          .sort((a, b) => a.k - b.k)
          .map((x) => x.w);
        const a = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), METRIC_STOCK));
        const b = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), shuffled));
        expect(b.candidates.map((c) => c.key)).toEqual(a.candidates.map((c) => c.key));
        expect(b.rejected).toEqual(a.rejected);
      }),
      { numRuns: 20 },
    );
  });

  it('when the as-found wires on the as-found layout meet every limit, they rank first', () => {
    fc.assert(
      fc.property(target, limits, (t, l) => {
        const d = { over: l.over, under: l.under };
        const r = value(
          searchRedesign(
            EXAMPLE_A_ORIGINAL,
            requestFor(
              { ...t, poles: 4 },
              { gap: d, tooth: d, yoke: d, slotFillMax: l.slotFillMax, currentDensityRise: l.currentDensityRise },
            ),
            METRIC_STOCK,
          ),
        );
        const keeps = r.candidates.filter((c) => c.keepsAsFoundWire);
        if (keeps.length > 0) {
          expect(r.candidates[0]?.keepsAsFoundWire).toBe(true);
          expect(r.asFound.key).toBe(r.candidates[0]?.key);
        } else expect(r.asFound.reason).toMatch(/\d/);
      }),
      RUNS,
    );
  });

  it('no over-pitched span ranks above a feasible short-pitched one', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(4, 6),
        fc.subarray([4, 5, 6, 7, 8, 9, 10], { minLength: 1 }),
        fc.integer({ min: 300, max: 700 }),
        (poles, spans, v) => {
          const r = value(
            searchRedesign(EXAMPLE_A_ORIGINAL, requestFor({ poles, spans, lineVoltageV: v, allowOverPitch: true }), METRIC_STOCK),
          );
          const tau = 36 / poles;
          const firstOver = r.candidates.find((c) => c.overPitched)?.rank ?? Infinity;
          for (const c of r.candidates) if ((c.winding.spans[0] ?? 0) < tau) expect(c.rank).toBeLessThan(firstOver);
        },
      ),
      { numRuns: 25 },
    );
  });

  it('the ranking is invariant to stock order, including the as-found marks and the rejection reasons', () => {
    fc.assert(
      fc.property(target, fc.array(fc.nat(), { minLength: METRIC_STOCK.length, maxLength: METRIC_STOCK.length }), (t, keys) => {
        const shuffled = METRIC_STOCK.map((w, i) => ({ w, k: keys[i] ?? 0 }))
          .sort((a, b) => a.k - b.k)
          .map((x) => x.w)
          .reverse();
        const a = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), METRIC_STOCK));
        const b = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(t), shuffled));
        expect(b.candidates.map((c) => [c.key, c.rank, c.keepsAsFoundWire])).toEqual(
          a.candidates.map((c) => [c.key, c.rank, c.keepsAsFoundWire]),
        );
        expect(b.asFound).toEqual(a.asFound);
        expect(b.rejected).toEqual(a.rejected);
      }),
      { numRuns: 20 },
    );
  });

  // The comparator itself: a candidate with fewer (or as many) circuits and strands, otherwise equal, never
  // ranks below one with more. Scores come from the same effort points the search counts.
  const facts = fc.record({
    key: fc.string({ maxLength: 6 }),
    closeness: fc.double({ min: 0, max: 0.3, noNaN: true }),
    extraEffort: fc.double({ min: 0, max: 20, noNaN: true }),
    overPitched: fc.boolean(),
    keepsAsFoundWire: fc.boolean(),
    kw5: fc.double({ min: 0, max: 0.3, noNaN: true }),
    kw7: fc.double({ min: 0, max: 0.3, noNaN: true }),
    circuits: fc.integer({ min: 1, max: 8 }),
    strands: fc.integer({ min: 1, max: 20 }),
    originalCircuits: fc.integer({ min: 1, max: 8 }),
  });
  type Facts = typeof facts extends fc.Arbitrary<infer T> ? T : never;
  const toRank = (f: Facts, circuits: number, strands: number): RankFacts => {
    const score = f.closeness / 0.05 + f.extraEffort + 3 * Math.max(0, circuits - f.originalCircuits) + (strands - 1);
    return {
      key: f.key,
      score,
      closeness: f.closeness,
      overPitched: f.overPitched,
      keepsAsFoundWire: f.keepsAsFoundWire,
      harmonics: { kw5: f.kw5, kw7: f.kw7, mmfDistortion: 0 },
      winding: { parallelPaths: circuits },
      wires: { strands },
    };
  };

  it('fewer circuits and strands never rank below an otherwise equal winding with more', () => {
    fc.assert(
      fc.property(facts, fc.integer({ min: 0, max: 4 }), fc.integer({ min: 0, max: 6 }), (f, moreCircuits, moreStrands) => {
        fc.pre(moreCircuits + moreStrands > 0);
        const fewer = toRank(f, f.circuits, f.strands);
        const more = { ...toRank(f, f.circuits + moreCircuits, f.strands + moreStrands), key: `${f.key}~` };
        expect(compareCandidates(fewer, more)).toBeLessThan(0);
      }),
      { numRuns: 300 },
    );
  });
});
