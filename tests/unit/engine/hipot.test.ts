import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HIPOT_DURATION_S, hipotTestVoltage, judgeHipotApplication, type HipotCase, type HipotPractice } from '@/lib/engine/hipot';

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
    { v: 400, practice: 'iec', testCase: 'reconditioned', ac: 1350, dc: 2295, source: 'IEC 60034-1' }, // IEC 60034-1 [from memory]
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

describe('hipot verdict: level, time and breakdown', () => {
  // Reference §5: "A hipot passes only if the required level was applied for the required time with no
  // breakdown: 1 min at full level" (NEMA MG 1 12.3; IEC 60034-1, 1 min withstand test).
  it('uses 1 minute as the test time (NEMA MG 1; IEC 60034-1)', () => {
    expect(HIPOT_DURATION_S).toBe(60);
  });

  it('fails 500 V DC for 5 s against a proposed 3060 V DC (400 V NEMA new, reference §5 check value)', () => {
    const j = judgeHipotApplication({ proposedV: 3060, appliedV: 500, durationS: 5, held: true });
    expect(j.outcome).toBe('fail');
    expect(j.reasons.join('; ')).toContain('below the proposed 3060 V');
    expect(j.reasons.join('; ')).toContain('less than the 60 s');
  });

  it('passes the proposed level for 60 s with no breakdown (tolerance −0 %)', () => {
    expect(judgeHipotApplication({ proposedV: 3264, appliedV: 3264, durationS: 60, held: true }).outcome).toBe('pass');
    expect(judgeHipotApplication({ proposedV: 3264, appliedV: 3263, durationS: 60, held: true }).outcome).toBe('fail');
    expect(judgeHipotApplication({ proposedV: 3264, appliedV: 3264, durationS: 59, held: true }).outcome).toBe('fail');
  });

  it('fails a breakdown whatever the level (NEMA MG 1: no breakdown)', () => {
    expect(judgeHipotApplication({ proposedV: 1920, appliedV: 1920, durationS: 60, held: false }).outcome).toBe('fail');
  });

  it('records a deliberately reduced level with its reason as a reduced-level test, never a pass (reference §5)', () => {
    const j = judgeHipotApplication({ proposedV: 1920, appliedV: 1536, durationS: 60, held: true, reducedReason: 'customer instruction' });
    expect(j.outcome).toBe('reduced');
    expect(judgeHipotApplication({ proposedV: 1920, appliedV: 1536, durationS: 60, held: true, reducedReason: '  ' }).outcome).toBe('fail');
  });

  it('leaves the verdict open until level, time and result are all recorded', () => {
    expect(judgeHipotApplication({ proposedV: 1920, appliedV: 1920, held: true }).outcome).toBe('missing');
    expect(judgeHipotApplication({ proposedV: 1920, durationS: 60, held: true }).outcome).toBe('missing');
  });

  it('never passes below the proposed level or short of a minute, for any reading [property of the rule]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 30_000, noNaN: true }),
        fc.double({ min: 1, max: 40_000, noNaN: true }),
        fc.integer({ min: 1, max: 600 }),
        (proposedV, appliedV, durationS) => {
          const j = judgeHipotApplication({ proposedV, appliedV, durationS, held: true });
          expect(j.outcome === 'pass').toBe(appliedV >= proposedV && durationS >= 60);
        },
      ),
    );
  });
});
