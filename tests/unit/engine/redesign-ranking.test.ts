import { describe, expect, it } from 'vitest';
import { narrowingAdvice, searchRedesign, WORK_BUDGET } from '@/lib/engine/redesign/search';
import { RANKING_POINTS, RANKING_RULE } from '@/lib/engine/redesign/ranking';
import type { StockWire } from '@/lib/engine/redesign/types';
import { EXAMPLE_A_ORIGINAL, METRIC_STOCK, requestFor } from '../../support/fixtures/redesign-fixtures';
import { errorOf, value } from '../../support/fixtures/winding-fixtures';

const search = (...args: Parameters<typeof requestFor>) => value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor(...args), METRIC_STOCK));

// The cases of issue 10, on example A (reference §2: 36 slots, 4 poles, lap 1–8, 14 turns, 2 × 0.85 mm,
// 1 circuit, star, 400 V 50 Hz). Figures [derived] from reference §1 and §3.
describe('issue 10 cases: rank 1 is what an experienced winder would choose', () => {
  it('400 V Y 50 Hz → 460 V 60 Hz: rewinding as found (14 turns, 1 circuit, 2 × 0.85 mm, star) ranks 1, marked as keeping the wire', () => {
    const r = search({ lineVoltageV: 460, frequencyHz: 60 });
    const first = r.candidates[0];
    expect(first).toMatchObject({
      keepsAsFoundWire: true,
      winding: { turnsPerCoil: [14], parallelPaths: 1, connection: 'star', spans: [7] },
      wires: { label: '2 × 0.850 mm' },
    });
    expect(first?.changes).toEqual([]);
    // Φ ratio 0.9583 (reference §3 check value, ±0.001); current density × 1.2·400/460 = 1.0435 (inside +5 %).
    expect(Math.abs((first?.ratios.flux ?? 0) - 0.9583)).toBeLessThanOrEqual(0.001);
    expect(first?.currentDensity.ratio).toBeCloseTo((1.2 * 400) / 460, 9);
    expect(r.asFound).toEqual({ key: first?.key, reason: null });
    // The 28-turn, 2-circuit, 1 × 0.85 mm equivalent is a candidate but ranks below it (an extra circuit).
    const equivalent = r.candidates.find(
      (c) => c.winding.turnsPerCoil[0] === 28 && c.winding.parallelPaths === 2 && c.wires.label === '1 × 0.850 mm',
    );
    if (equivalent) expect(equivalent.rank).toBeGreaterThan(1);
  });

  it('4 → 6 poles: rank 1 is the 5/6-pitch span 1–6, 20 turns, 1 circuit, 1 × 1.00 mm, gap +1.5 %, k_w5 0.067', () => {
    const r = search({ poles: 6 });
    const first = r.candidates[0];
    expect(first).toMatchObject({
      winding: { spans: [5], turnsPerCoil: [20], parallelPaths: 1, connection: 'star' },
      wires: { label: '1 × 1.000 mm' },
      overPitched: false,
    });
    expect(first?.ratios.gap).toBeCloseTo(1.015, 3);
    // 36 slots, 6 poles, 5/6 pitch: k_w5 = k_d5·k_p5 = 0.2588·0.2588 = 0.0670 (reference §1 table, 24/4 row has the same q and pitch).
    expect(first?.harmonics.kw5).toBeCloseTo(0.067, 3);
    // The forced yoke fall (×4/6 at the kept gap density) costs nothing: only the gap move counts.
    expect(first?.ratios.yoke).toBeCloseTo((first?.ratios.gap ?? 0) * (4 / 6), 9);
    expect(first?.closeness).toBeCloseTo(Math.abs((first?.ratios.gap ?? 0) - 1), 9);
  });

  it('4 → 6 poles with the 4-pole spans 6, 7, 8 kept in the request: 1–8 and 1–9 are flagged and refused as over-pitched, the new pole pitch’s spans are tried', () => {
    const r = search({ poles: 6, spans: [6, 7, 8] });
    expect(r.spanNotes.join(' ')).toMatch(/Span 1–8 is longer than the 6-slot pole pitch on 6 poles/);
    expect(r.spanNotes.join(' ')).toMatch(/usual spans 1–6, 1–5 are tried as well/);
    expect(r.rejected.filter((x) => x.binding === 'span').map((x) => x.family)).toEqual(['double-layer lap 1–8', 'double-layer lap 1–9']);
    expect(r.candidates.some((c) => c.overPitched)).toBe(false);
    expect(r.candidates[0]?.winding.spans).toEqual([5]);
  });

  it('over-pitched spans asked for explicitly are evaluated, carry the effort point and rank after every other', () => {
    const r = search({ poles: 6, spans: [6, 7, 8], allowOverPitch: true });
    const over = r.candidates.filter((c) => c.overPitched);
    expect(over.length).toBeGreaterThan(0);
    const firstOver = Math.min(...over.map((c) => c.rank));
    expect(r.candidates.filter((c) => !c.overPitched).every((c) => c.rank < firstOver)).toBe(true);
    expect(over[0]?.effort.some((e) => /over-pitched span/.test(e.what))).toBe(true);
  });

  it('a 4 → 6 pole change states that the as-found layout cannot be kept', () => {
    expect(search({ poles: 6 }).asFound).toEqual({
      key: null,
      reason: 'The pole count changes (4 → 6): the as-found layout cannot be kept.',
    });
  });
});

describe('the rule as written', () => {
  it('is one sentence that names the as-found wire, the forced falls and the effort items', () => {
    expect(RANKING_RULE.split('. ').length).toBe(1);
    for (const w of [
      'as-found wire',
      'back-iron fall',
      'lower current density',
      'extra circuits',
      'thinner than the shop minimum',
      'over-pitched',
    ])
      expect(RANKING_RULE).toContain(w);
    expect(RANKING_RULE).toContain(`${RANKING_POINTS.closenessStep * 100} %`);
  });

  it('penalises wire thinner than the shop minimum: with a 1.0 mm minimum no thin-wire candidate outranks an otherwise similar thick one', () => {
    const r = search({ lineVoltageV: 690 }, { minWireBareMm: 1.0 });
    const thin = r.candidates.filter((c) => c.effort.some((e) => /thinner than the shop minimum/.test(e.what)));
    expect(thin.length).toBeGreaterThan(0);
    for (const c of thin)
      expect(c.effort.find((e) => /thinner/.test(e.what))?.points).toBe(
        RANKING_POINTS.thinWire * c.wires.parts.filter((p) => p.wire.bareMm < 0.85 - 1e-9 && p.wire.bareMm < 1.0).length,
      );
  });

  it('a harmonic limit below the layout’s k_w7 refuses the layout and says so with numbers', () => {
    // Lap 1–8 on 36/4: k_w5 0.0378, k_w7 0.1359 (reference §1 table). The as-found winding sets the floor of
    // the limit, so use the 1–10 full pitch (k_w5 0.2176) against the as-found 0.1359.
    const r = search({ spans: [9] }, { harmonicKwMax: 0.05 });
    const h = r.rejected.find((x) => x.binding === 'harmonics');
    expect(h?.reason).toMatch(/k_w5 0\.218 \/ k_w7 0\.177: the larger, 0\.218, is over the 0\.136 harmonic limit/);
  });
});

describe('rejections say the binding limit, truthfully', () => {
  it('when the stock can make the area but the slot cannot hold it, slot fill binds, with the set and its fill', () => {
    // Only 1.50 mm on hand: three of them carry any current here, but fill the slot past 23 %.
    const only150 = METRIC_STOCK.filter((w) => w.size === '1.5');
    const r = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor({ parallelPaths: [2] }, { slotFillMax: 0.1 }), only150));
    const x = r.rejected.find((f) => /2 circuits/.test(f.family));
    expect(x?.binding).toBe('slot-fill');
    expect(x?.reason).toMatch(
      /the leanest set from stock that carries it \(\d × 1\.500 mm, \d\.\d{3} mm²\) fills \d+ % of the slot \(limit 23 %\)/,
    );
    expect(x?.reason).not.toMatch(/cannot make/);
  });

  it('counts what was really examined: wire combinations looked at are counted even when every family fails', () => {
    const only150 = METRIC_STOCK.filter((w) => w.size === '1.5');
    const r = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor({ parallelPaths: [2] }, { slotFillMax: 0.1 }), only150));
    expect(r.candidates).toHaveLength(0);
    expect(r.familiesTried).toBe(1);
    expect(r.turnsChecked).toBe(3);
    // With only 1.50 mm on hand one to ten strands reach the current's area: 10 sets per turn count, two windows.
    expect(r.wireSetsConsidered).toBeGreaterThan(0);
  });

  it('a flux limit that no whole number of turns meets names the density and its numbers', () => {
    const r = search({ poles: 2 });
    expect(
      r.rejected.every(
        (x) => x.binding === 'flux' && /yoke \(back-iron\) flux density \+\d+\.\d % is over the \+5\.0 % limit/.test(x.reason),
      ),
    ).toBe(true);
  });
});

describe('wire stock quantity', () => {
  const withKg = (kg: number): StockWire[] => METRIC_STOCK.map((w) => ({ ...w, onHandKg: kg }));

  it('marks a candidate that needs more kg of a size than is on hand, and not one that fits', () => {
    const short = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor({ lineVoltageV: 460, frequencyHz: 60 }), withKg(0.5))).candidates[0];
    // 36 coils × 14 turns × 0.56 m × 2 strands × 0.5675 mm² × 8890 kg/m³ = 2.85 kg [derived].
    expect(short?.wireNeeds).toEqual([{ label: '0.850 mm', kg: expect.closeTo(2.845, 2), onHandKg: 0.5, short: true }]);
    const plenty = value(searchRedesign(EXAMPLE_A_ORIGINAL, requestFor({ lineVoltageV: 460, frequencyHz: 60 }), withKg(50))).candidates[0];
    expect(plenty?.wireNeeds[0]?.short).toBe(false);
  });
});

describe('the work budget', () => {
  it('stops a search past its budget with a "narrow the request" message naming what to narrow (the widest request the schema allows, budget 2 000)', () => {
    const d = { over: 1, under: 0.99 };
    const wide = requestFor(
      {
        lineVoltageV: 460,
        frequencyHz: 60,
        connection: 'either',
        spans: [5, 6, 7, 8, 9, 10, 11, 12],
        parallelPaths: [1, 2, 3, 4, 6, 8, 12, 24],
        allowOverPitch: true,
      },
      {
        gap: d,
        tooth: d,
        yoke: d,
        currentDensityRise: 1,
        currentDensityMaxAPerMm2: 30,
        slotFillMax: 1,
        maxStrandsInHand: 40,
        maxWireSizes: 3,
        mixedSizeRatioMax: 3,
      },
    );
    const e = errorOf(searchRedesign(EXAMPLE_A_ORIGINAL, wide, METRIC_STOCK, { budget: 2000 }));
    expect(e.code).toBe('too-wide');
    expect(e.message).toContain('2,000');
    expect(e.hint).toMatch(/^Narrow the request: wires in hand \(now 40; 10 or fewer is usual\); the mixed-size diameter ratio \(now 3/);
    expect(e.field).toBe('limits.maxStrandsInHand');
  }, 30_000);

  it('the widest request the schema allows finishes inside the default budget on example A', () => {
    const d = { over: 1, under: 0.99 };
    const wide = requestFor(
      {
        lineVoltageV: 460,
        frequencyHz: 60,
        connection: 'either',
        spans: [5, 6, 7, 8, 9, 10, 11, 12],
        parallelPaths: [1, 2, 3, 4, 6, 8, 12, 24],
        allowOverPitch: true,
      },
      {
        gap: d,
        tooth: d,
        yoke: d,
        currentDensityRise: 1,
        currentDensityMaxAPerMm2: 30,
        slotFillMax: 1,
        maxStrandsInHand: 40,
        maxWireSizes: 3,
        mixedSizeRatioMax: 3,
      },
    );
    expect(value(searchRedesign(EXAMPLE_A_ORIGINAL, wide, METRIC_STOCK, { budget: WORK_BUDGET })).candidates.length).toBeGreaterThan(0);
  }, 30_000);

  it('names the connection and lists when those are what is wide', () => {
    expect(narrowingAdvice(requestFor({ connection: 'either', spans: [5, 6, 7, 8] }))).toEqual([
      'the spans listed (now 4)',
      'the connection (star or delta instead of either)',
    ]);
  });
});
