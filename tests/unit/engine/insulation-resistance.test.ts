import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  insulationResistanceVerdict,
  irCorrectedTo40C,
  irTestVoltageDc,
  minimumIr1MinMOhm,
  minimumPolarizationIndex,
  polarizationIndex,
  polarizationIndexVerdict,
} from '@/lib/engine/insulation-resistance';

describe('IEEE 43 insulation resistance', () => {
  it.each([
    [1000, 20, 250],
    [100, 30, 50],
    [100, 40, 100],
    [100, 50, 200],
    [80, 25, 80 * 2 ** -1.5],
  ])('%f MΩ at %f °C is %f MΩ at 40 °C', (ir, t, ir40) => {
    expect(irCorrectedTo40C(ir, t)).toBeCloseTo(ir40, 9); // IEEE 43 (approximation: halves per 10 °C)
  });

  it.each([
    ['older', 4160, 5.16],
    ['older', 460, 1.46],
    ['form-wound', 4160, 100],
    ['random-wound', 460, 5],
  ] as const)('minimum IR 1 min at 40 °C for %s windings rated %i V is %f MΩ', (category, v, min) => {
    expect(minimumIr1MinMOhm(category, v)).toBeCloseTo(min, 12); // IEEE 43
  });

  it.each([
    ['A', 1.5],
    ['B', 2.0],
    ['F', 2.0],
    ['H', 2.0],
  ] as const)('minimum PI for class %s is %f', (cls, pi) => {
    expect(minimumPolarizationIndex(cls)).toBe(pi); // IEEE 43
  });

  it.each([
    [230, 500, 500], // IEEE 43
    [460, 500, 500], // IEEE 43
    [999, 500, 500], // IEEE 43
    [2300, 500, 1000], // IEEE 43 [from memory]
    [4160, 1000, 2500], // IEEE 43 [from memory]
    [6600, 2500, 5000], // IEEE 43 [from memory]
    [13800, 5000, 10000], // IEEE 43 [from memory]
  ])('tests a %i V winding at %i–%i V DC', (v, min, max) => {
    const t = irTestVoltageDc(v);
    expect([t.minV, t.maxV]).toEqual([min, max]);
    expect(t.rule).toContain('IEEE 43');
  });

  it.each([
    { ir: 20, t: 20, category: 'random-wound', pass: true, value: 5 },
    { ir: 19, t: 20, category: 'random-wound', pass: false, value: 4.75 },
    { ir: 150, t: 30, category: 'form-wound', pass: false, value: 75 },
  ] as const)('$ir MΩ at $t °C on a $category winding: pass=$pass', ({ ir, t, category, pass, value }) => {
    const v = insulationResistanceVerdict({ ir1MinMOhm: ir, temperatureC: t, category, ratedLineVoltageV: 460 });
    expect(v.ok).toBe(true);
    if (v.ok) {
      expect(v.value.pass).toBe(pass);
      expect(v.value.value).toBeCloseTo(value, 9);
      expect(v.value.rule).toContain('IEEE 43');
    }
  });

  it('refuses a negative or missing reading', () => {
    expect(insulationResistanceVerdict({ ir1MinMOhm: -1, temperatureC: 20, category: 'older', ratedLineVoltageV: 460 }).ok).toBe(false);
    expect(insulationResistanceVerdict({ ir1MinMOhm: Number.NaN, temperatureC: 20, category: 'older', ratedLineVoltageV: 460 }).ok).toBe(
      false,
    );
  });

  it('raises IR towards 40 °C from below and lowers it from above', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1e5, noNaN: true }), fc.double({ min: -20, max: 120, noNaN: true }), (ir, t) => {
        const ir40 = irCorrectedTo40C(ir, t);
        if (t < 40) expect(ir40).toBeLessThan(ir);
        if (t > 40) expect(ir40).toBeGreaterThan(ir);
      }),
    );
  });
});

describe('IEEE 43 polarization index', () => {
  it.each([
    { ir1: 100, ir10: 250, cls: 'F', pass: true },
    { ir1: 100, ir10: 180, cls: 'F', pass: false },
    { ir1: 100, ir10: 180, cls: 'A', pass: true },
    { ir1: 100, ir10: 140, cls: 'A', pass: false },
  ] as const)('PI $ir10/$ir1 for class $cls: pass=$pass', ({ ir1, ir10, cls, pass }) => {
    const v = polarizationIndexVerdict({ ir1MinMOhm: ir1, ir10MinMOhm: ir10, temperatureC: 40, insulationClass: cls });
    expect(v.ok).toBe(true);
    if (v.ok) {
      expect(v.value.value).toBeCloseTo(ir10 / ir1, 12);
      expect(v.value.pass).toBe(pass);
      expect(v.value.rule).toContain('IEEE 43');
    }
  });

  it('does not fail a low PI when IR 1 min at 40 °C is above 5000 MΩ [from memory]', () => {
    const v = polarizationIndexVerdict({ ir1MinMOhm: 8000, ir10MinMOhm: 9000, temperatureC: 40, insulationClass: 'F' });
    expect(v.ok && v.value.pass).toBe(true);
    expect(v.ok && v.value.rule).toContain('5000 MΩ');
  });

  it('refuses a zero one-minute reading', () => {
    expect(polarizationIndexVerdict({ ir1MinMOhm: 0, ir10MinMOhm: 10, temperatureC: 20, insulationClass: 'B' }).ok).toBe(false);
  });

  it('is the plain ratio IR10/IR1', () => {
    expect(polarizationIndex(200, 500)).toBe(2.5);
  });
});
