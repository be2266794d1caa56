import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  convertTypedLength,
  lengthToMm,
  mmToLength,
  parseTypedNumber,
  switchTypedLength,
  typedLengthToMm,
  type LengthUnit,
  type TypedLength,
} from '@/lib/as-found/length-entry';
import { parseDecimal } from '@/lib/validation/number-text';

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

describe('the mm/in toggle never changes a stored value (issue 9)', () => {
  /** Switches a field through a sequence of units, then returns what it shows and what it would store. */
  function toggle(text: string, start: LengthUnit, path: LengthUnit[]): { shown: string; storedMm: number | string | undefined } {
    let unit = start;
    let shown = text;
    let memory: TypedLength | undefined;
    for (const to of path) {
      const r = switchTypedLength(shown, unit, to, memory);
      shown = r.text;
      memory = r.memory;
      unit = to;
    }
    return { shown, storedMm: typedLengthToMm(shown, unit, memory) };
  }

  it('mm → in → mm gives back 0.4 and 560, not 0.399 and 559.999', () => {
    expect(toggle('0.4', 'mm', ['in', 'mm'])).toEqual({ shown: '0.4', storedMm: 0.4 });
    expect(toggle('560', 'mm', ['in', 'mm'])).toEqual({ shown: '560', storedMm: 560 });
    expect(toggle('560', 'mm', ['in']).storedMm).toBe(560);
  });

  it('stores what was typed, converted once, after any number of toggles [property]', () => {
    const typed = fc
      .tuple(fc.integer({ min: 1, max: 5_000_000 }), fc.integer({ min: 0, max: 4 }))
      .map(([n, d]) => (n / 10 ** d).toString());
    fc.assert(
      fc.property(
        typed,
        fc.constantFrom<LengthUnit>('mm', 'in'),
        fc.array(fc.constantFrom<LengthUnit>('mm', 'in'), { maxLength: 8 }),
        (text, start, path) => {
          const r = toggle(text, start, path);
          expect(r.storedMm).toBe(lengthToMm(Number(text), start));
          if ((path.at(-1) ?? start) === start) expect(r.shown).toBe(text);
        },
      ),
    );
  });

  it('converts an edited field from its new text, not from the remembered one', () => {
    const first = switchTypedLength('150', 'mm', 'in', undefined);
    expect(typedLengthToMm('6', 'in', first.memory)).toBe(152.4);
  });
});

describe('decimal commas (issue 9)', () => {
  it.each([
    ['15,5', 15.5],
    ['0,4', 0.4],
    [',5', 0.5],
    ['15.5', 15.5],
    ['1500', 1500],
  ] as const)('reads "%s" as %s, never as 155', (text, value) => {
    expect(parseDecimal(text)).toBe(value);
  });
  it.each(['1,500', '1.234,5', '1,2,3', '15,5 mm'])('refuses "%s" as typed instead of guessing', (text) => {
    expect(parseDecimal(text)).toBe(text);
  });
});
