import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lineToLineFromPhaseOhm } from '@/lib/engine/resistance';
import { phaseCurrentA, statorCopperLossW } from '@/lib/engine/losses/copper-loss';
import { efficiencyAfterLossChange } from '@/lib/engine/losses/efficiency-change';
import { resistanceAtSpecifiedTemperatureOhm, SPECIFIED_TEMPERATURE_C } from '@/lib/engine/losses/reference-temperature';
import { rewindLosses, type WindingForLoss } from '@/lib/engine/losses/rewind-losses';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
/** Example A winding: R_ph(20 °C) = 1.4293 Ω (docs/engineering/wire-and-resistance.md), star, 5 A rated. */
const EXAMPLE_A: WindingForLoss = { source: 'example A', phaseOhm20: 1.4293, connection: 'star', lineCurrentA: 5 };

describe('reference temperature (IEEE 112 specified temperatures [from memory], 234.5 °C constant)', () => {
  it.each([
    ['A', 75],
    ['B', 95],
    ['F', 115],
    ['H', 130],
  ] as const)('class %s → %i °C', (c, t) => expect(SPECIFIED_TEMPERATURE_C[c]).toBe(t));
  it('brings 1.4293 Ω at 20 °C to 115 °C: ×(234.5 + 115)/(234.5 + 20) = 1.9628 Ω [derived]', () =>
    expect(rel(resistanceAtSpecifiedTemperatureOhm(1.4293, 'F'), 1.96283)).toBeLessThan(1e-6));
});

describe('stator copper loss P = 3·I_ph²·R_ph', () => {
  it('example A at 115 °C and 5 A star: 3·25·1.96283 = 147.21 W [derived]', () =>
    expect(rel(statorCopperLossW(5, 1.96283, 'star'), 147.2123)).toBeLessThan(1e-6));
  it('equals 1.5·I²·R_LL in star and in delta (IEEE 112 / IEC 60034-2-1 form) [derived]', () => {
    for (const c of ['star', 'delta'] as const)
      expect(rel(statorCopperLossW(10, 2, c), 1.5 * 100 * lineToLineFromPhaseOhm(2, c))).toBeLessThan(1e-12);
  });
  it('delta phase current is I/√3', () => expect(phaseCurrentA(Math.sqrt(3), 'delta')).toBeCloseTo(1, 12));
  it('scales with R and with I² (fast-check)', () => {
    const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(pos(0.01, 1e4), pos(1e-4, 100), pos(0.1, 10), fc.constantFrom('star' as const, 'delta' as const), (i, r, k, c) => {
        const p = statorCopperLossW(i, r, c);
        return rel(statorCopperLossW(i, r * k, c), p * k) < 1e-9 && rel(statorCopperLossW(i * k, r, c), p * k * k) < 1e-9;
      }),
    );
  });
});

describe('efficiency after a loss change (other losses unchanged)', () => {
  it('7.5 kW at 90 %: L₀ = 833.33 W; +50 W → 89.463 %, −0.537 points [derived]', () => {
    const e = efficiencyAfterLossChange(7500, 0.9, 50);
    expect(e && rel(e.lossesBeforeW, 833.3333)).toBeLessThan(1e-6);
    expect(e && rel(e.efficiencyAfter, 0.894632)).toBeLessThan(1e-6);
    expect(e?.changePoints).toBeCloseTo(-0.5368, 4);
  });
  it('has no answer for an efficiency of 0 or 100 %, or losses that would go negative', () => {
    expect(efficiencyAfterLossChange(7500, 1, 50)).toBeNull();
    expect(efficiencyAfterLossChange(7500, 0.9, -1000)).toBeNull();
  });
});

describe('rewindLosses', () => {
  it('rewound to the original data: no change and no finding', () => {
    const r = rewindLosses({
      thermalClass: 'F',
      before: EXAMPLE_A,
      after: { ...EXAMPLE_A, source: 'same' },
      outputKw: 2.2,
      efficiency: 0.85,
    });
    expect(r?.copperChangeW).toBe(0);
    expect(r?.finding).toBeNull();
    expect(r?.efficiency?.changePoints).toBeCloseTo(0, 12);
  });
  it('less copper (R +10 %): +14.72 W, +10 %, over the 5 % limit, saying what to check [derived]', () => {
    const r = rewindLosses({ thermalClass: 'F', before: EXAMPLE_A, after: { ...EXAMPLE_A, phaseOhm20: 1.4293 * 1.1 } });
    expect(r && rel(r.copperChangeW, 14.72123)).toBeLessThan(1e-5);
    expect(r?.copperChangeFraction).toBeCloseTo(0.1, 12);
    expect(r?.finding).toMatch(/wire size.*turns per coil.*mean turn length/);
  });
  it('adds the measured core-loss change to the efficiency: 2.2 kW at 85 %, +14.72 W copper + 1.75 W core [derived]', () => {
    const r = rewindLosses({
      thermalClass: 'F',
      before: EXAMPLE_A,
      after: { ...EXAMPLE_A, phaseOhm20: 1.4293 * 1.1 },
      outputKw: 2.2,
      efficiency: 0.85,
      coreLossChangeW: 1.7513,
    });
    // L₀ = 2200·(1/0.85 − 1) = 388.235 W; η₁ = 2200/(2200 + 388.235 + 16.4725) = 0.844624
    expect(r?.efficiency && rel(r.efficiency.efficiencyAfter, 0.844624)).toBeLessThan(1e-5);
  });
  it('returns null without a rated current', () => {
    expect(rewindLosses({ thermalClass: 'F', before: { ...EXAMPLE_A, lineCurrentA: 0 }, after: EXAMPLE_A })).toBeNull();
  });
});
