import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { convertTypedLength, lengthToMm, mmToLength, parseTypedNumber } from '@/lib/as-found/length-entry';

describe('lengths typed in mm or inches, stored in mm', () => {
  // 1 in = 25.4 mm exactly (international inch, 1959) [derived from the definition].
  it.each([
    [1, 'in', 25.4],
    [5.906, 'in', 150.0124],
    [0.25, 'in', 6.35],
    [150, 'mm', 150],
    [0.1234567, 'mm', 0.1235],
  ] as const)('%s %s is stored as %s mm', (typed, unit, mm) => {
    expect(lengthToMm(typed, unit)).toBe(mm);
  });

  it.each([
    [25.4, 'in', 1],
    [150, 'in', 5.9055],
    [6.5, 'mm', 6.5],
  ] as const)('%s mm is shown as %s %s', (mm, unit, shown) => {
    expect(mmToLength(mm, unit)).toBe(shown);
  });

  it('switching unit keeps the physical length to within a tenth of a thou', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 5000, noNaN: true }), (mm) => {
        const shownMm = String(mmToLength(mm, 'mm'));
        const back = Number(convertTypedLength(convertTypedLength(shownMm, 'mm', 'in'), 'in', 'mm'));
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(0.0026);
      }),
    );
  });

  it('leaves text that is not a number as typed, so the schema can name the field', () => {
    expect(convertTypedLength('about 6', 'mm', 'in')).toBe('about 6');
    expect(convertTypedLength('', 'mm', 'in')).toBe('');
  });

  it.each([
    ['', undefined],
    ['  ', undefined],
    ['12,5', 12.5],
    [' 7 ', 7],
    ['1e3', 1000],
    ['12..5', '12..5'],
  ] as const)('reads "%s" as %s', (text, expected) => {
    expect(parseTypedNumber(text)).toBe(expected);
  });
});
