import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  CODE_LETTERS,
  codeLetterForKvaPerHp,
  codeLetterRange,
  DUTY_TYPES,
  EFFICIENCY_CLASSES,
  INSULATION_CLASS_TEMP_C,
  lockedRotorCurrentRangeA,
  lockedRotorKvaPerHp,
  type CodeLetter,
} from '@/lib/engine/nameplate';

describe('NEMA locked-rotor code letters', () => {
  // MG 1 10.37.2: kVA/hp, lower bound included, upper bound not.
  it.each([
    ['A', 0, 3.15],
    ['B', 3.15, 3.55],
    ['C', 3.55, 4.0],
    ['D', 4.0, 4.5],
    ['E', 4.5, 5.0],
    ['F', 5.0, 5.6],
    ['G', 5.6, 6.3],
    ['H', 6.3, 7.1],
    ['J', 7.1, 8.0],
    ['K', 8.0, 9.0],
    ['L', 9.0, 10.0],
    ['M', 10.0, 11.2],
    ['N', 11.2, 12.5],
    ['P', 12.5, 14.0],
    ['R', 14.0, 16.0],
    ['S', 16.0, 18.0],
    ['T', 18.0, 20.0],
    ['U', 20.0, 22.4],
    ['V', 22.4, null],
  ] as const)('%s covers %f to %s kVA/hp', (letter, min, max) => {
    expect(codeLetterRange(letter)).toEqual({ minKvaPerHp: min, maxKvaPerHp: max }); // MG 1 10.37.2
    expect(codeLetterForKvaPerHp(min)).toEqual({ ok: true, value: letter }); // MG 1 10.37.2
    if (max !== null) expect(codeLetterForKvaPerHp(max - 1e-9)).toEqual({ ok: true, value: letter });
  });

  it('has no I, O or Q', () => {
    expect(CODE_LETTERS.join('')).toBe('ABCDEFGHJKLMNPRSTUV');
  });

  it('maps any kVA/hp to the letter whose range holds it, both ways', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (kva) => {
        const r = codeLetterForKvaPerHp(kva);
        expect(r.ok).toBe(true);
        if (r.ok) {
          const { minKvaPerHp, maxKvaPerHp } = codeLetterRange(r.value);
          expect(kva).toBeGreaterThanOrEqual(minKvaPerHp);
          if (maxKvaPerHp !== null) expect(kva).toBeLessThan(maxKvaPerHp);
        }
      }),
    );
  });

  it('computes locked-rotor kVA/hp as √3·V·I/(1000·hp)', () => {
    const r = lockedRotorKvaPerHp(72, 460, 10);
    expect(r).toEqual({ ok: true, value: expect.closeTo((1.7320508 * 460 * 72) / 10000, 5) });
    expect(codeLetterForKvaPerHp(r.ok ? r.value : -1)).toEqual({ ok: true, value: 'G' }); // 5.74: G 5.6–6.3
  });

  it('turns a letter back into a locked-rotor current range', () => {
    const range = lockedRotorCurrentRangeA('G' as CodeLetter, 10, 460);
    expect(range.minA).toBeCloseTo((5.6 * 10000) / (Math.sqrt(3) * 460), 9);
    expect(range.maxA).toBeCloseTo((6.3 * 10000) / (Math.sqrt(3) * 460), 9);
    expect(lockedRotorCurrentRangeA('V', 10, 460).maxA).toBeNull();
  });

  it.each([-1, Number.NaN, Number.POSITIVE_INFINITY])('refuses %f kVA/hp', (kva) => {
    expect(codeLetterForKvaPerHp(kva).ok).toBe(false);
  });
});

describe('nameplate tables', () => {
  it('holds thermal classes A 105, B 130, F 155, H 180 °C', () => {
    expect(INSULATION_CLASS_TEMP_C).toEqual({ A: 105, B: 130, F: 155, H: 180 });
  });

  it('labels duty types S1 to S10', () => {
    expect(Object.keys(DUTY_TYPES)).toEqual(Array.from({ length: 10 }, (_, i) => `S${i + 1}`));
    expect(DUTY_TYPES.S1).toBe('Continuous running');
  });

  it('lists efficiency classes IE1 to IE5', () => {
    expect(Object.keys(EFFICIENCY_CLASSES)).toEqual(['IE1', 'IE2', 'IE3', 'IE4', 'IE5']);
  });
});
