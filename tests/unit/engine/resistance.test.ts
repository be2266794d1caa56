import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  compareResistance,
  correctResistanceOhm,
  lineToLineFromPhaseOhm,
  phaseFromLineToLineOhm,
  phaseResistance,
  phaseResistanceOhm,
  resistanceUnbalance,
  resistanceUnbalanceVerdict,
  unbalanceLimitFraction,
  type PhaseResistanceInput,
} from '@/lib/engine/resistance';
import { wireBareAreaMm2 } from '@/lib/engine/wire';

/** Example A: 36 slots, 4 poles, double layer → 36 coils, 12 per phase; N_c 14; a 1; 2 × 0.85 mm in hand. */
const strandAreaMm2 = (Math.PI / 4) * 0.85 ** 2;
const exampleA: PhaseResistanceInput = {
  coilsPerPhase: 36 / 3,
  turnsPerCoil: 14,
  meanTurnLengthM: 0.56,
  parallelPaths: 1,
  strands: [{ areaMm2: strandAreaMm2, count: 2 }],
  temperatureC: 20,
};

const relativelyClose = (a: number, b: number, tol = 1e-9): boolean => Math.abs(a - b) <= tol * Math.max(Math.abs(a), Math.abs(b));

describe('phase resistance, worked example A', () => {
  // [derived] — docs/engineering/wire-and-resistance.md, tolerance 0.0001 Ω on four-decimal check values.
  it.each([
    { what: 'R_ph at 20 °C', temperatureC: 20, connection: null, expected: 1.4293 },
    { what: 'R_ph at 25 °C', temperatureC: 25, connection: null, expected: 1.4573 },
    { what: 'star line-to-line at 20 °C', temperatureC: 20, connection: 'star', expected: 2.8585 },
    { what: 'delta line-to-line at 20 °C', temperatureC: 20, connection: 'delta', expected: 0.9528 },
  ] as const)('$what is $expected Ω', ({ temperatureC, connection, expected }) => {
    const rPh = phaseResistanceOhm({ ...exampleA, temperatureC });
    const r = connection === null ? rPh : lineToLineFromPhaseOhm(rPh, connection);
    expect(Math.abs(r - expected)).toBeLessThan(0.0001);
  });

  it('gives the same answer from the metric wire table', () => {
    const area = wireBareAreaMm2({ standard: 'metric', size: '0.85', enamelGrade: 2 });
    expect(area.ok).toBe(true);
    if (area.ok) {
      const r = phaseResistanceOhm({ ...exampleA, strands: [{ areaMm2: area.value, count: 2 }] });
      expect(Math.abs(r - 1.4293)).toBeLessThan(0.0001); // [derived]
    }
  });

  it('uses ρ20 = 1/58 Ω·mm²/m: 58 m of 1 mm² is 1 Ω', () => {
    // IEC 60028
    const r = phaseResistanceOhm({
      coilsPerPhase: 1,
      turnsPerCoil: 1,
      meanTurnLengthM: 58,
      parallelPaths: 1,
      strands: [{ areaMm2: 1, count: 1 }],
      temperatureC: 20,
    });
    expect(r).toBeCloseTo(1, 12);
  });

  it('uses 235 when asked (IEC 60034): example A at 25 °C is 1.4293·260/255', () => {
    expect(phaseResistanceOhm({ ...exampleA, temperatureC: 25, tempConstant: 235 })).toBeCloseTo((1.42926 * 260) / 255, 4);
  });

  it('adds the areas of mixed wires in hand', () => {
    const mixed = phaseResistanceOhm({
      ...exampleA,
      strands: [
        { areaMm2: 0.5, count: 1 },
        { areaMm2: 0.3, count: 2 },
      ],
    });
    const single = phaseResistanceOhm({ ...exampleA, strands: [{ areaMm2: 1.1, count: 1 }] });
    expect(mixed).toBeCloseTo(single, 12);
  });

  it.each([
    ['parallelPaths', { parallelPaths: 0 }],
    ['meanTurnLengthM', { meanTurnLengthM: -1 }],
    ['conductorArea', { strands: [] }],
    ['turnsPerCoil', { turnsPerCoil: Number.NaN }],
    ['temperatureC', { temperatureC: -300 }],
  ] as const)('refuses a bad %s', (field, patch) => {
    const r = phaseResistance({ ...exampleA, ...patch });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe(field);
  });
});

describe('phase resistance properties', () => {
  const positive = fc.double({ min: 0.01, max: 100, noNaN: true });

  it('scales linearly with length and turns and inversely with area and a²', () => {
    fc.assert(
      fc.property(positive, fc.integer({ min: 1, max: 8 }), (k, a) => {
        const base = phaseResistanceOhm(exampleA);
        expect(relativelyClose(phaseResistanceOhm({ ...exampleA, meanTurnLengthM: exampleA.meanTurnLengthM * k }), base * k)).toBe(true);
        expect(relativelyClose(phaseResistanceOhm({ ...exampleA, turnsPerCoil: exampleA.turnsPerCoil * k }), base * k)).toBe(true);
        expect(relativelyClose(phaseResistanceOhm({ ...exampleA, strands: [{ areaMm2: strandAreaMm2 * k, count: 2 }] }), base / k)).toBe(
          true,
        );
        expect(relativelyClose(phaseResistanceOhm({ ...exampleA, parallelPaths: a }), base / (a * a))).toBe(true);
      }),
    );
  });

  it('round-trips a temperature correction', () => {
    fc.assert(
      fc.property(
        positive,
        fc.double({ min: -40, max: 250, noNaN: true }),
        fc.double({ min: -40, max: 250, noNaN: true }),
        fc.constantFrom(234.5, 235),
        (r, t1, t2, k) => {
          expect(relativelyClose(correctResistanceOhm(correctResistanceOhm(r, t1, t2, k), t2, t1, k), r)).toBe(true);
        },
      ),
    );
  });

  it('round-trips star and delta line-to-line conversion', () => {
    fc.assert(
      fc.property(positive, fc.constantFrom('star', 'delta' as const), (r, c) => {
        expect(relativelyClose(phaseFromLineToLineOhm(lineToLineFromPhaseOhm(r, c), c), r)).toBe(true);
      }),
    );
  });
});

describe('resistance unbalance (ANSI/EASA AR100-2020)', () => {
  it.each([
    ['random', 0.02],
    ['form', 0.01],
  ] as const)('limits %s-wound windings to %f', (kind, limit) => {
    expect(unbalanceLimitFraction(kind)).toBe(limit); // ANSI/EASA AR100-2020
  });

  it('computes (max − min)/average', () => {
    const u = resistanceUnbalance([1.0, 1.01, 1.02]);
    expect(u.maxOhm).toBe(1.02);
    expect(u.minOhm).toBe(1.0);
    expect(u.averageOhm).toBeCloseTo(1.01, 12);
    expect(u.unbalanceFraction).toBeCloseTo(0.02 / 1.01, 12);
  });

  it.each([
    { readings: [1.0, 1.01, 1.02], kind: 'random', pass: true },
    { readings: [1.0, 1.01, 1.02], kind: 'form', pass: false },
    { readings: [1.0, 1.0, 1.03], kind: 'random', pass: false },
  ] as const)('judges $readings for $kind-wound as pass=$pass', ({ readings, kind, pass }) => {
    const v = resistanceUnbalanceVerdict(readings, kind);
    expect(v.ok).toBe(true);
    if (v.ok) {
      expect(v.value.pass).toBe(pass);
      expect(v.value.rule).toContain('ANSI/EASA AR100-2020');
    }
  });

  it.each([[[]], [[1.2]], [[1, 0]], [[1, Number.NaN]]])('refuses readings %j', (readings) => {
    expect(resistanceUnbalanceVerdict(readings, 'random').ok).toBe(false);
  });

  it('is zero for equal readings and never negative', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), fc.integer({ min: 1, max: 6 }), (r, n) => {
        expect(resistanceUnbalance(Array.from({ length: n }, () => r)).unbalanceFraction).toBe(0);
      }),
    );
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 12 }), (rs) => {
        expect(resistanceUnbalance(rs).unbalanceFraction).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});

describe('predicted against measured', () => {
  it.each([
    [1.4293, 1.45, ((1.45 - 1.4293) / 1.4293) * 100],
    [2, 1.9, -5],
    [1, 1, 0],
  ])('predicted %f Ω, measured %f Ω differs by %f %', (predicted, measured, percent) => {
    expect(compareResistance(predicted, measured)).toBeCloseTo(percent, 9);
  });
});
