import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { formatMoney, sumMinor, timesBasisPoints, timesMilli, type CurrencyCode } from '@/lib/quotes/money';
import { estimateTotals, type PricedLine, type TaxMode } from '@/lib/quotes/estimate-totals';
import { formatScaled, parseScaled, percentToBasisPoints } from '@/lib/quotes/decimal-input';

/** Exact oracle in BigInt: a·b / 10^k rounded half away from zero (the rule roundToCurrency names). */
function roundHalfAway(numerator: bigint, denominator: bigint): bigint {
  const neg = numerator < 0n;
  const n = neg ? -numerator : numerator;
  const q = (2n * n + denominator) / (2n * denominator);
  return neg ? -q : q;
}

describe('money rounding (half away from zero, to the minor unit)', () => {
  it.each([
    // [unit price minor, quantity milli, expected minor] — hand-worked [derived]
    [1, 500, 1], // 0.005 → 0.01
    [1, 499, 0], // 0.00499 → 0.00
    [1450, 3133, 4543], // 14.50 × 3.133 kg = 45.4285 → 45.43
    [9500, 2500, 23750], // 95.00 × 2.5 h
    [-1, 500, -1], // −0.005 → −0.01 (away from zero)
    [333, 1000, 333],
  ])('%i × %i thousandths → %i', (price, qty, expected) => {
    expect(timesMilli(price, qty, 'USD')).toBe(expected);
  });

  it('does not drift like floats: 0.10 + 0.20 is 0.30', () => {
    expect(sumMinor([10, 20], 'USD')).toBe(30);
  });

  it.each([
    [26878, 750, 2016], // 268.78 × 7.5 % = 20.1585 → 20.16
    [28626, 500, 1431], // 5 % discount of 286.26 = 14.313 → 14.31
    [10, 500, 1], // 0.10 × 5 % = 0.005 → 0.01
  ])('%i at %i basis points → %i', (amount, bp, expected) => {
    expect(timesBasisPoints(amount, bp, 'USD')).toBe(expected);
  });

  it('matches the exact BigInt rounding for any price and quantity in range', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000_000 }), fc.integer({ min: 0, max: 10_000_000 }), (price, qty) => {
        expect(BigInt(timesMilli(price, qty, 'USD'))).toBe(roundHalfAway(BigInt(price) * BigInt(qty), 1000n));
      }),
    );
  });

  it('formats with the currency’s own decimals and symbol', () => {
    expect(formatMoney(123456, 'USD')).toBe('$1,234.56');
    expect(formatMoney(1234, 'JPY')).toBe('¥1,234');
    expect(formatMoney(5, 'EUR')).toBe('€0.05');
  });
});

describe('typed decimals', () => {
  it.each([
    ['125.50', 2, 12550],
    ['2,5', 3, 2500],
    ['.5', 2, 50],
    ['7', 2, 700],
    [' 12 ', 0, 12],
  ])('%s with %i places → %i', (t, d, n) => expect(parseScaled(t, d)).toBe(n));
  it.each([
    ['1.234', 2],
    ['abc', 2],
    ['-1', 2],
    ['1e3', 2],
    ['', 2],
    ['1.2.3', 2],
    ['\u00001', 2],
  ])('refuses %j with %i places', (t, d) => {
    expect(parseScaled(t, d)).toBeNull();
  });
  it('reads back what it writes', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e12 }), fc.integer({ min: 0, max: 3 }), (n, d) => {
        expect(parseScaled(formatScaled(n, d), d)).toBe(n);
      }),
    );
  });
  it('reads percent as basis points', () => expect(percentToBasisPoints('7.25 %')).toBe(725));
});

const lineArb = fc.record({
  quantityMilli: fc.integer({ min: 1, max: 10_000_000 }),
  unitPriceMinor: fc.integer({ min: 0, max: 100_000_000 }),
  taxRateBp: fc.constantFrom(0, 500, 750, 2000, 2100),
});
const rulesArb = fc.record({
  taxMode: fc.constantFrom<TaxMode>('ON_TOTAL', 'PER_LINE'),
  discountBp: fc.integer({ min: 0, max: 10_000 }),
  currency: fc.constantFrom<CurrencyCode>('USD', 'JPY', 'EUR'),
});

describe('estimate totals', () => {
  it('worked example: two taxed lines and an untaxed one, 5 % discount, tax on the total', () => {
    // [derived] by hand: nets 237.50 + 45.43 + 3.33 = 286.26; discount 14.31 shared 11.88/2.27/0.16;
    // taxable at 7.5 %: 225.62 + 43.16 = 268.78 → tax 20.16; total 286.26 − 14.31 + 20.16 = 292.11.
    const t = estimateTotals(
      [
        { quantityMilli: 2500, unitPriceMinor: 9500, taxRateBp: 750 },
        { quantityMilli: 3133, unitPriceMinor: 1450, taxRateBp: 750 },
        { quantityMilli: 1000, unitPriceMinor: 333, taxRateBp: 0 },
      ],
      { currency: 'USD', taxMode: 'ON_TOTAL', discountBp: 500 },
    );
    expect(t).toMatchObject({ subtotalMinor: 28626, discountMinor: 1431, taxMinor: 2016, totalMinor: 29211 });
    expect(t.bands).toEqual([
      { rateBp: 0, baseMinor: 317, taxMinor: 0 },
      { rateBp: 750, baseMinor: 26878, taxMinor: 2016 },
    ]);
  });

  it('tax per line rounds every line: three lines of 0.10 at 5 % give 0.03, on the total 0.02', () => {
    // 0.10 × 5 % = 0.005 → 0.01 on each line; on the total 0.30 × 5 % = 0.015 → 0.02 [derived].
    const lines: PricedLine[] = [1, 2, 3].map(() => ({ quantityMilli: 1000, unitPriceMinor: 10, taxRateBp: 500 }));
    expect(estimateTotals(lines, { currency: 'USD', taxMode: 'PER_LINE', discountBp: 0 }).taxMinor).toBe(3);
    expect(estimateTotals(lines, { currency: 'USD', taxMode: 'ON_TOTAL', discountBp: 0 }).taxMinor).toBe(2);
  });

  it('line amounts always add up to the totals, in both tax modes', () => {
    fc.assert(
      fc.property(fc.array(lineArb, { maxLength: 30 }), rulesArb, (lines, rules) => {
        const t = estimateTotals(lines, rules);
        const sum = (f: (l: (typeof t.lines)[number]) => number) => t.lines.reduce((a, l) => a + f(l), 0);
        expect(sum((l) => l.netMinor)).toBe(t.subtotalMinor);
        expect(sum((l) => l.discountMinor)).toBe(t.discountMinor);
        expect(sum((l) => l.taxMinor)).toBe(t.taxMinor);
        expect(sum((l) => l.grossMinor)).toBe(t.totalMinor);
        expect(t.bands.reduce((a, b) => a + b.taxMinor, 0)).toBe(t.taxMinor);
        expect(t.lines.every((l) => l.discountMinor <= l.netMinor && l.discountMinor >= 0)).toBe(true);
      }),
    );
  });

  it('tax on the total is the exact rounded tax of each rate’s base; per line differs by at most half a unit a line', () => {
    fc.assert(
      fc.property(fc.array(lineArb, { minLength: 1, maxLength: 30 }), fc.integer({ min: 0, max: 10_000 }), (lines, discountBp) => {
        const onTotal = estimateTotals(lines, { currency: 'USD', taxMode: 'ON_TOTAL', discountBp });
        const perLine = estimateTotals(lines, { currency: 'USD', taxMode: 'PER_LINE', discountBp });
        for (const b of onTotal.bands) expect(BigInt(b.taxMinor)).toBe(roundHalfAway(BigInt(b.baseMinor) * BigInt(b.rateBp), 10_000n));
        expect(perLine.subtotalMinor - perLine.discountMinor).toBe(onTotal.subtotalMinor - onTotal.discountMinor);
        // Each line's rounding moves it at most 0.5 of a unit; the rate bands' rounding at most 0.5 each.
        expect(Math.abs(perLine.taxMinor - onTotal.taxMinor)).toBeLessThanOrEqual(Math.ceil((lines.length + onTotal.bands.length) / 2));
      }),
    );
  });

  it('shares a discount exactly even when amount × weight passes 2^53 (found by the property above)', () => {
    const lines = [
      { quantityMilli: 2927362, unitPriceMinor: 86924818, taxRateBp: 0 },
      { quantityMilli: 1500131, unitPriceMinor: 22063796, taxRateBp: 0 },
    ];
    const t = estimateTotals(lines, { currency: 'USD', taxMode: 'ON_TOTAL', discountBp: 10_000 });
    expect(t.lines.map((l) => l.grossMinor)).toEqual([0, 0]);
    expect(t.totalMinor).toBe(0);
  });

  it('an empty estimate is all zeros', () => {
    expect(estimateTotals([], { currency: 'USD', taxMode: 'ON_TOTAL', discountBp: 1000 })).toMatchObject({
      subtotalMinor: 0,
      discountMinor: 0,
      taxMinor: 0,
      totalMinor: 0,
      bands: [],
    });
  });
});
