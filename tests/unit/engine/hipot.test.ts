import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hipotTestVoltage, type HipotCase, type HipotPractice } from '@/lib/engine/hipot';

const levels = (ratedVoltageV: number, practice: HipotPractice, testCase: HipotCase, ratedOutputHp?: number) => {
  const r = hipotTestVoltage({ ratedVoltageV, practice, case: testCase, ...(ratedOutputHp === undefined ? {} : { ratedOutputHp }) });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

describe('hipot test voltages', () => {
  // Check values [derived from those rules], docs/engineering/electrical-tests.md.
  it.each([
    { v: 460, practice: 'nema', testCase: 'new', ac: 1920, dc: 3264, source: 'NEMA MG 1' }, // NEMA MG 1; ANSI/EASA AR100-2020
    { v: 460, practice: 'nema', testCase: 'repeat', ac: 1536, dc: Math.round(1536 * 1.7), source: 'NEMA MG 1' }, // NEMA MG 1; ANSI/EASA AR100-2020
    { v: 400, practice: 'nema', testCase: 'new', ac: 1800, dc: 3060, source: 'ANSI/EASA AR100-2020' }, // NEMA MG 1; ANSI/EASA AR100-2020
    { v: 400, practice: 'iec', testCase: 'new', ac: 1800, dc: 3060, source: 'IEC 60034-1' }, // IEC 60034-1 [from memory]
    { v: 230, practice: 'nema', testCase: 'new', ac: 1460, dc: Math.round(1460 * 1.7), source: 'NEMA MG 1' }, // NEMA MG 1; ANSI/EASA AR100-2020
    { v: 230, practice: 'iec', testCase: 'new', ac: 1500, dc: 2550, source: 'IEC 60034-1' }, // IEC 60034-1 [from memory]: minimum 1500 V
    { v: 460, practice: 'nema', testCase: 'reconditioned', ac: 1248, dc: 2122, source: 'AR100' }, // ANSI/EASA AR100-2020 [from memory]
    { v: 400, practice: 'iec', testCase: 'reconditioned', ac: 1350, dc: 2295, source: '[from memory]' }, // IEC 60034-1 [from memory]
    { v: 400, practice: 'iec', testCase: 'repeat', ac: 1440, dc: 2448, source: 'IEC 60034-1' }, // IEC 60034-1 [from memory]
  ] as const)('$v V, $practice, $testCase: $ac V AC and $dc V DC', ({ v, practice, testCase, ac, dc, source }) => {
    const l = levels(v, practice, testCase);
    expect(l.acV).toBe(ac);
    expect(l.dcV).toBe(dc);
    expect(l.rule).toContain(source);
  });

  it('uses 1000 V for NEMA motors of 0.5 hp and less at 250 V and less [from memory]', () => {
    expect(levels(230, 'nema', 'new', 0.5).acV).toBe(1000);
    expect(levels(230, 'nema', 'new', 0.75).acV).toBe(1460);
    expect(levels(460, 'nema', 'new', 0.5).acV).toBe(1920);
  });

  it('names the rule with the arithmetic', () => {
    expect(levels(460, 'nema', 'new').rule).toContain('1000 V + 2 × 460 V = 1920 V');
    expect(levels(230, 'iec', 'new').rule).toContain('1500 V minimum');
  });

  it.each([0, -460, Number.NaN])('refuses a rated voltage of %f', (v) => {
    expect(hipotTestVoltage({ ratedVoltageV: v, practice: 'nema', case: 'new' }).ok).toBe(false);
  });

  it('keeps repeat below new and DC at 1.7 × AC for any voltage', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 15000, noNaN: true }),
        fc.constantFrom<HipotPractice>('nema', 'iec'),
        fc.constantFrom<HipotCase>('repeat', 'reconditioned'),
        (v, practice, testCase) => {
          const fresh = levels(v, practice, 'new');
          const lower = levels(v, practice, testCase);
          expect(lower.acV).toBeLessThan(fresh.acV);
          expect(Math.abs(fresh.dcV - 1.7 * fresh.acV)).toBeLessThanOrEqual(1.7);
          expect(fresh.acV).toBeGreaterThanOrEqual(practice === 'iec' ? 1500 : 1000);
        },
      ),
    );
  });
});
