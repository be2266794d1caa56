import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compareFinalResistance, type ExpectedResistance } from '@/lib/final-tests/expected-resistance';

// Worked example A (docs/engineering/wire-and-resistance.md) [derived]: R_ph(20 °C) = 1.4293 Ω, star line-to-line 2.8585 Ω,
// delta 0.9528 Ω; at 25 °C R_ph = 1.4573 Ω (copper, 234.5 + t, IEEE).
const EXAMPLE_A: ExpectedResistance = { source: 'example A', phaseOhm20: 1.4293, connection: 'star' };

describe('final resistance against the prediction', () => {
  it.each([
    ['star, line-to-line at 20 °C', EXAMPLE_A, 20, 'line-to-line', 2.8585],
    ['delta, line-to-line at 20 °C', { ...EXAMPLE_A, connection: 'delta' }, 20, 'line-to-line', 0.9528],
    ['phase at 25 °C', EXAMPLE_A, 25, 'phase', 1.4573],
  ] as const)('puts the prediction on the readings’ basis: %s', (_name, expected, temperatureC, between, value) => {
    const r = compareFinalResistance(expected, { readings: [value, value, value], temperatureC, between });
    expect(r?.expectedOhm).toBeCloseTo(value, 3);
    expect(Math.abs(r?.differencePercent ?? 99)).toBeLessThan(0.05);
  });

  it('reports a winding 10 % over the prediction as +10 %', () => {
    const r = compareFinalResistance(EXAMPLE_A, { readings: [3.1443, 3.1443, 3.1443], temperatureC: 20, between: 'line-to-line' });
    expect(r?.differencePercent).toBeCloseTo(10, 1);
  });

  it('says nothing until all three readings and the temperature are in', () => {
    expect(compareFinalResistance(EXAMPLE_A, { readings: [2.86, undefined, 2.86], temperatureC: 20, between: 'line-to-line' })).toBeNull();
    expect(
      compareFinalResistance(EXAMPLE_A, { readings: [2.86, 2.86, 2.86], temperatureC: undefined, between: 'line-to-line' }),
    ).toBeNull();
  });

  it('the difference is the same whatever temperature the readings were taken at (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 150, noNaN: true }), fc.double({ min: 0.8, max: 1.2, noNaN: true }), (t, factor) => {
        const atT = 2.8585 * ((234.5 + t) / (234.5 + 20)) * factor;
        const r = compareFinalResistance(EXAMPLE_A, { readings: [atT, atT, atT], temperatureC: t, between: 'line-to-line' });
        expect(r?.differencePercent).toBeCloseTo((factor - 1) * 100, 1);
      }),
    );
  });
});
