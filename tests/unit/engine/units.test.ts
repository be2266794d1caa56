import { describe, expect, it } from 'vitest';
import { kgToLb, lbToKg, mm2ToCircularMils, nmToLbfFt, teslaToKilolinesPerIn2 } from '@/lib/engine/units';

// Exact definitions: 1 lb = 0.45359237 kg; 1 lbf = 4.4482216152605 N; 1 ft = 0.3048 m; 1 in = 25.4 mm.
describe('unit conversions', () => {
  it('use the exact definitions', () => {
    expect(kgToLb(1)).toBeCloseTo(2.2046226, 6);
    expect(lbToKg(kgToLb(12.5))).toBeCloseTo(12.5, 12);
    expect(nmToLbfFt(1)).toBeCloseTo(0.7375621, 6);
    // docs/engineering/wire-and-resistance.md: 1 mm² = 1973.525 CM [derived]; 1 T = 64.516 kl/in² [derived].
    expect(mm2ToCircularMils(1)).toBeCloseTo(1973.525, 3);
    expect(teslaToKilolinesPerIn2(1)).toBeCloseTo(64.516, 3);
  });
});
