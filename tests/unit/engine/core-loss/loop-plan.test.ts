import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { backIronSection } from '@/lib/engine/core-loss/back-iron-section';
import { checkCoreRing } from '@/lib/engine/core-loss/core-ring';
import { backIronMassKg, teethMassKg } from '@/lib/engine/core-loss/iron-mass';
import { loopCurrentA } from '@/lib/engine/core-loss/loop-current';
import { loopFluxDensityT, loopTurnsFor, loopVoltageV } from '@/lib/engine/core-loss/loop-emf';
import { loopTestPlan } from '@/lib/engine/core-loss/loop-plan';
import { meanMagneticPathM } from '@/lib/engine/core-loss/magnetic-path';
import { EXAMPLE_A_RING, rel } from './fixtures';

describe('core geometry of the example A core (docs/engineering/flux-density.md core; values [derived] step by step)', () => {
  const s = backIronSection(EXAMPLE_A_RING);
  it('back-iron depth d_y = (240 − 150)/2 − 20 = 25 mm (docs/engineering/flux-density.md, example A)', () =>
    expect(s.depthM).toBeCloseTo(0.025, 12));
  it('net iron length L_fe = 120 mm × 0.95 = 114 mm [derived]', () => expect(s.netIronLengthM).toBeCloseTo(0.114, 12));
  it('cross-section A = 25 × 114 = 2850 mm² [derived]', () => expect(s.areaM2).toBeCloseTo(2.85e-3, 12));
  it('mean path l_m = π·(240 − 25) mm = 675.44 mm [derived]', () => expect(meanMagneticPathM(0.24, s.depthM)).toBeCloseTo(0.675442, 6));
  it('back-iron mass = 7650 kg/m³ · 2.85e-3 m² · 0.675442 m = 14.726 kg [derived; density from memory]', () =>
    expect(rel(backIronMassKg(s.areaM2, 0.6754424), 14.7263)).toBeLessThan(1e-4));
  it('teeth mass = 7650 · 0.114 · (π/4·(0.19² − 0.15²) − 36·0.02·0.008) = 4.292 kg [derived]', () =>
    expect(rel(teethMassKg({ ...EXAMPLE_A_RING, netIronLengthM: 0.114 }), 4.29197)).toBeLessThan(1e-4));
  it('takes the vent ducts out of the iron length: 2 ducts × 10 mm leave (120 − 20)·0.95 = 95 mm [derived]', () =>
    expect(backIronSection({ ...EXAMPLE_A_RING, ventDucts: 2, ventDuctWidthM: 0.01 }).netIronLengthM).toBeCloseTo(0.095, 12));
});

describe('loop EMF E = √2·π·f·N·B·A (transformer EMF equation, docs/engineering/flux-density.md with Φ = B·A)', () => {
  it('gives 0.82304 V per turn at 1.3 T, 50 Hz, 2850 mm² (4.44288·50·1.3·2.85e-3) [derived]', () =>
    expect(rel(loopVoltageV(50, 1, 1.3, 2.85e-3), 0.823044)).toBeLessThan(1e-5));
  it('needs 280 turns on 230 V (230/0.823044 = 279.45, rounded up) and then drives 1.2974 T [derived]', () => {
    expect(loopTurnsFor(230, 50, 1.3, 2.85e-3)).toBe(280);
    expect(rel(loopFluxDensityT(230, 50, 280, 2.85e-3), 1.297448)).toBeLessThan(1e-5);
  });
  it('never rounds down into over-fluxing, and keeps an exact fit: 0.823044·200 V needs 200 turns [derived]', () =>
    expect(loopTurnsFor(loopVoltageV(50, 200, 1.3, 2.85e-3), 50, 1.3, 2.85e-3)).toBe(200));
  it('expects I = H·l_m/N = 300·0.675442/280 = 0.7237 A (Ampère’s law, H assumed) [derived]', () =>
    expect(rel(loopCurrentA(300, 0.6754424, 280), 0.723688)).toBeLessThan(1e-5));
});

describe('loopTestPlan', () => {
  const plan = loopTestPlan({ ring: EXAMPLE_A_RING, testFluxDensityT: 1.3, frequencyHz: 50, supplyVoltageV: 230, fieldStrengthAPerM: 300 });
  it('composes the plan for the example A core on 230 V [derived values above]', () => {
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(plan.value.turns).toBe(280);
    expect(plan.value.turnsSuggested).toBe(true);
    expect(rel(plan.value.voltageAtTargetV, 230.4523)).toBeLessThan(1e-5); // 0.823044 V × 280
    expect(rel(plan.value.apparentPowerVA, 230.4523 * 0.723688)).toBeLessThan(1e-5);
    expect(rel(plan.value.coreMassKg, 14.7263 + 4.29197)).toBeLessThan(1e-4);
  });
  it('uses the shop’s own turns when given: 300 turns on 230 V drive 1.3·230/(0.823044·300) = 1.2110 T [derived]', () => {
    const p = loopTestPlan({
      ring: EXAMPLE_A_RING,
      testFluxDensityT: 1.3,
      frequencyHz: 50,
      supplyVoltageV: 230,
      fieldStrengthAPerM: 300,
      turns: 300,
    });
    expect(p.ok && p.value.turnsSuggested).toBe(false);
    expect(p.ok && rel(p.value.fluxDensityAtSupplyT, 1.210959)).toBeLessThan(1e-5);
  });
  it.each([
    ['no back iron (slot depth 45 mm)', { ...EXAMPLE_A_RING, slotDepthM: 0.045 }, 'core.slotDepthMm'],
    ['stacking factor above 1', { ...EXAMPLE_A_RING, stackingFactor: 1.2 }, 'core.stackingFactor'],
    ['ducts longer than the core', { ...EXAMPLE_A_RING, ventDucts: 13, ventDuctWidthM: 0.01 }, 'core.ventDucts'],
    ['zero bore', { ...EXAMPLE_A_RING, boreM: 0 }, 'core.boreMm'],
  ])('refuses a core with %s, naming the field', (_what, ring, field) => {
    const r = checkCoreRing(ring);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe(field);
  });
  it('refuses fractional loop turns and a zero supply', () => {
    const base = { ring: EXAMPLE_A_RING, testFluxDensityT: 1.3, frequencyHz: 50, supplyVoltageV: 230, fieldStrengthAPerM: 300 };
    expect(loopTestPlan({ ...base, turns: 2.5 }).ok).toBe(false);
    expect(loopTestPlan({ ...base, supplyVoltageV: 0 }).ok).toBe(false);
  });
});

describe('loop properties (fast-check)', () => {
  const pos = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
  it('more turns at the same voltage lower the loop’s flux density', () => {
    fc.assert(
      fc.property(
        pos(10, 1000),
        pos(40, 70),
        fc.integer({ min: 1, max: 5000 }),
        fc.integer({ min: 1, max: 100 }),
        pos(1e-4, 0.5),
        (v, f, n, extra, a) => loopFluxDensityT(v, f, n + extra, a) < loopFluxDensityT(v, f, n, a),
      ),
    );
  });
  it('the suggested turns never exceed the target density, and one turn fewer would (when more than one)', () => {
    fc.assert(
      fc.property(pos(10, 1000), pos(40, 70), pos(0.5, 1.8), pos(1e-4, 0.5), (v, f, b, a) => {
        const n = loopTurnsFor(v, f, b, a);
        expect(loopFluxDensityT(v, f, n, a)).toBeLessThanOrEqual(b * (1 + 1e-9));
        if (n > 1) expect(loopFluxDensityT(v, f, n - 1, a)).toBeGreaterThan(b * (1 - 1e-9));
      }),
    );
  });
  it('voltage and density invert each other: B(E(B)) = B', () => {
    fc.assert(
      fc.property(
        pos(40, 70),
        fc.integer({ min: 1, max: 5000 }),
        pos(0.1, 2),
        pos(1e-4, 0.5),
        (f, n, b, a) => Math.abs(loopFluxDensityT(loopVoltageV(f, n, b, a), f, n, a) - b) < 1e-9 * b,
      ),
    );
  });
});
