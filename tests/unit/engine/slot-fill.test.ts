import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { grossSlotAreaMm2, HAND_INSERTION_FILL_LIMIT, netSlotAreaMm2, slotFill, type SlotShape } from '@/lib/engine/slot-fill';
import type { EngineResult } from '@/lib/engine/result';

function value<T>(r: EngineResult<T>): T {
  if (!r.ok) throw new Error(`expected ok, got ${r.error.code}: ${r.error.message}`);
  return r.value;
}

describe('slot area [derived: plane geometry]', () => {
  it.each([
    { shape: { depthMm: 20, topWidthMm: 6, bottomWidthMm: 6 }, area: 120 },
    { shape: { depthMm: 20, topWidthMm: 6, bottomWidthMm: 8 }, area: 140 },
    { shape: { depthMm: 20, topWidthMm: 6, bottomWidthMm: 8, roundBottom: true }, area: 16 * 7 + (Math.PI * 16) / 2 },
    { shape: { depthMm: 4, topWidthMm: 8, bottomWidthMm: 8, roundBottom: true }, area: (Math.PI * 16) / 2 },
  ])('gross area of $shape is $area mm²', ({ shape, area }) => {
    expect(value(grossSlotAreaMm2(shape))).toBeCloseTo(area, 9);
  });

  it('takes the wedge, the liner and the separator off a rectangular slot', () => {
    // 6 × 20 mm: wedge 2 mm × 6 = 12; liner 0.25 × (18 + 18 + 6) = 10.5; separator 0.3 × 6 = 1.8.
    const shape: SlotShape = { depthMm: 20, topWidthMm: 6, bottomWidthMm: 6 };
    expect(value(netSlotAreaMm2(shape, { linerThicknessMm: 0.25, wedgeDepthMm: 2 }))).toBeCloseTo(120 - 12 - 10.5, 9);
    expect(value(netSlotAreaMm2(shape, { linerThicknessMm: 0.25, wedgeDepthMm: 2, separatorThicknessMm: 0.3 }))).toBeCloseTo(
      120 - 12 - 10.5 - 1.8,
      9,
    );
  });

  it('lines a round bottom along its half circumference', () => {
    // depth 20, width 6, round: straight 17 mm; wedge 2 → sides 15 each; arc π·3.
    const shape: SlotShape = { depthMm: 20, topWidthMm: 6, bottomWidthMm: 6, roundBottom: true };
    const gross = 17 * 6 + (Math.PI * 9) / 2;
    expect(value(netSlotAreaMm2(shape, { linerThicknessMm: 0.2, wedgeDepthMm: 2 }))).toBeCloseTo(gross - 12 - 0.2 * (30 + 3 * Math.PI), 9);
  });

  it.each([
    ['depthMm', { depthMm: 0, topWidthMm: 6, bottomWidthMm: 8 }, { linerThicknessMm: 0.2, wedgeDepthMm: 2 }],
    ['depthMm', { depthMm: 3, topWidthMm: 6, bottomWidthMm: 8, roundBottom: true }, { linerThicknessMm: 0.2, wedgeDepthMm: 0 }],
    ['wedgeDepthMm', { depthMm: 20, topWidthMm: 6, bottomWidthMm: 8 }, { linerThicknessMm: 0.2, wedgeDepthMm: 20 }],
    ['linerThicknessMm', { depthMm: 20, topWidthMm: 6, bottomWidthMm: 8 }, { linerThicknessMm: -0.1, wedgeDepthMm: 2 }],
    ['linerThicknessMm', { depthMm: 20, topWidthMm: 6, bottomWidthMm: 8 }, { linerThicknessMm: 5, wedgeDepthMm: 2 }],
  ] as const)('refuses a bad %s', (field, shape, ins) => {
    const r = netSlotAreaMm2(shape, ins);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe(field);
  });

  it('never gives more net than gross area', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 60, noNaN: true }),
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 2, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (depthMm, topWidthMm, bottomWidthMm, linerThicknessMm, wedgeDepthMm) => {
          const shape = { depthMm, topWidthMm, bottomWidthMm };
          const net = netSlotAreaMm2(shape, { linerThicknessMm, wedgeDepthMm });
          if (net.ok) expect(net.value).toBeLessThanOrEqual(value(grossSlotAreaMm2(shape)) + 1e-9);
        },
      ),
    );
  });
});

describe('slot fill', () => {
  it('computes both definitions for 28 conductors of 2 × 0.85 mm', () => {
    // Double layer N_c 14 → 28 conductors; grade-2 overall taken as 0.905 mm for this check.
    const fill = slotFill({
      conductorsPerSlot: 28,
      strands: [{ bareDiameterMm: 0.85, overallDiameterMm: 0.905, count: 2 }],
      grossSlotAreaMm2: 140,
      netSlotAreaMm2: 100,
    });
    expect(fill.bareCopperOverGross).toBeCloseTo((56 * Math.PI * 0.85 ** 2) / 4 / 140, 12);
    expect(fill.insulatedOverNet).toBeCloseTo((56 * Math.PI * 0.905 ** 2) / 4 / 100, 12);
  });

  it('adds mixed wires in hand', () => {
    const fill = slotFill({
      conductorsPerSlot: 10,
      strands: [
        { bareDiameterMm: 1, overallDiameterMm: 1.05, count: 1 },
        { bareDiameterMm: 0.5, overallDiameterMm: 0.54, count: 2 },
      ],
      grossSlotAreaMm2: 50,
      netSlotAreaMm2: 40,
    });
    expect(fill.bareCopperOverGross).toBeCloseTo((10 * (Math.PI / 4) * (1 + 2 * 0.25)) / 50, 12);
    expect(fill.insulatedOverNet).toBeCloseTo((10 * (Math.PI / 4) * (1.05 ** 2 + 2 * 0.54 ** 2)) / 40, 12);
  });

  it('keeps the hand-insertion limit at 0.65–0.75 insulated over net [common practice, from memory]', () => {
    expect(HAND_INSERTION_FILL_LIMIT).toEqual({ low: 0.65, high: 0.75 });
  });
});
