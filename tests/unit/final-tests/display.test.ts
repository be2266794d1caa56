import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fahrenheitToCelsius } from '@/lib/engine/units';
import {
  leakageText,
  megohmText,
  mmPerSecondToInchesPerSecond,
  overallText,
  percentText,
  statusText,
  temperatureText,
  velocityText,
} from '@/lib/final-tests/display';

describe('units shown beside the metric values', () => {
  it.each([
    [0, '0 °C (32 °F)'], // °F = °C × 9/5 + 32 (definition of the Fahrenheit scale)
    [40, '40 °C (104 °F)'],
    [100, '100 °C (212 °F)'],
    [-40, '-40 °C (-40 °F)'],
    [37.5, '37.5 °C (99.5 °F)'],
  ])('%f °C is written %s', (c, text) => {
    expect(temperatureText(c)).toBe(text);
  });

  it.each([
    [25.4, 1], // 1 in = 25.4 mm exactly (international inch, 1959)
    [3.8, 0.1496],
    [2.8, 0.1102],
  ])('%f mm/s is %f in/s', (mm, inches) => {
    expect(mmPerSecondToInchesPerSecond(mm)).toBeCloseTo(inches, 4);
  });

  it('writes vibration in mm/s with in/s to three decimals', () => {
    expect(velocityText(3.8)).toBe('3.8 mm/s (0.150 in/s)'); // NEMA MG 1 Part 7's 0.15 in/s [from memory]
  });

  it('round-trips °F and °C for any temperature a winding sees', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 250, noNaN: true }), (c) => {
        const f = Number(
          temperatureText(c)
            .match(/\((-?[\d,.]+) °F\)/)![1]!
            .replace(/,/g, ''),
        );
        expect(Math.abs(fahrenheitToCelsius(f) - c)).toBeLessThan(0.06); // °F shown to 0.1
      }),
    );
  });

  it.each([
    [0.85, '0.85 MΩ'],
    [12.44, '12.4 MΩ'],
    [2400, '2,400 MΩ'],
  ])('megohms %f → %s', (v, text) => expect(megohmText(v)).toBe(text));

  it('shows leakage below 1 mA in µA too', () => {
    expect(leakageText(0.004)).toBe('0.004 mA (4 µA)');
    expect(leakageText(2.5)).toBe('2.5 mA');
  });

  it('writes missing values as a dash, never NaN', () => {
    for (const f of [temperatureText, velocityText, megohmText, leakageText, percentText]) {
      expect(f(undefined)).toBe('—');
      expect(f(Number.NaN)).toBe('—');
    }
  });
});

describe('verdict words carry a symbol, not colour alone', () => {
  it.each([
    ['pass', '✓'],
    ['fail', '⚠'],
    ['missing', '…'],
    ['incomplete', '…'],
  ] as const)('%s has the symbol %s', (s, sym) => expect(statusText(s).startsWith(sym)).toBe(true));

  it('says FAIL in capitals on a failed record', () => expect(overallText('FAIL')).toBe('⚠ FAIL'));
});
