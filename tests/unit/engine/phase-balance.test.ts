import { describe, expect, it } from 'vitest';
import { DEFAULT_BALANCE_TOLERANCE, phaseBalance } from '@/lib/engine/phase-balance';
import { SlotStar } from '@/lib/engine/slot-star';
import type { SlotTable, WindingSpec } from '@/lib/engine/winding-layout';
import { lap, layoutOf, singleLayer } from '../../support/fixtures/winding-fixtures';

const balanceOf = (t: SlotTable) => phaseBalance(new SlotStar(t).phasors(t.poles / 2));

// Source: docs/engineering/winding-factor.md, slot-star sums prove balance (B and C at ±120° from A, equal magnitude) [derived].
describe('phase balance from the slot-star sums (docs/engineering/winding-factor.md, [derived])', () => {
  it.each([
    ['36/4 lap', lap(36, 4, 7)],
    ['30/4 lap (q = 5/2)', lap(30, 4, 7)],
    ['27/4 lap (q = 9/4)', lap(27, 4, 6)],
    ['42/4 lap (q = 7/2)', lap(42, 4, 9)],
    ['36/4 single layer', singleLayer(36, 4, [11, 9, 7])],
    ['96/4 lap', lap(96, 4, 20)],
  ] as [string, WindingSpec][])('%s is balanced: equal magnitudes, 120° apart', (_n, spec) => {
    const b = balanceOf(layoutOf(spec));
    expect(b.verdict).toBe('balanced');
    expect(b.magnitudeSpread).toBeLessThan(1e-12);
    expect(b.angleErrorDeg).toBeLessThan(1e-9);
    expect(Math.abs(b.anglesDeg.B)).toBeCloseTo(120, 9);
    expect(Math.abs(b.anglesDeg.C)).toBeCloseTo(120, 9);
    expect(b.tolerance).toEqual(DEFAULT_BALANCE_TOLERANCE);
  });

  it('reports sequence ACB when the winder labels B and C the other way round', () => {
    const t = layoutOf(lap(36, 4, 7));
    const swapped = {
      ...t,
      sides: t.sides.map((s) => ({ ...s, phase: s.phase === 'B' ? ('C' as const) : s.phase === 'C' ? ('B' as const) : s.phase })),
    };
    expect(balanceOf(t).sequence).toBe('ABC');
    expect(balanceOf(swapped).sequence).toBe('ACB');
    expect(balanceOf(swapped).verdict).toBe('balanced');
  });

  it('flags a phase with a coil of the wrong turns as unbalanced, with the reason', () => {
    const t = layoutOf(lap(36, 4, 7));
    const sides = t.sides.map((s) => (s.coil === 1 ? { ...s, turns: 12 } : s));
    const b = balanceOf({ ...t, sides });
    expect(b.verdict).toBe('unbalanced');
    expect(b.magnitudeSpread).toBeGreaterThan(0.001);
    expect(b.reasons[0]).toMatch(/differ/);
  });

  it('flags a coil connected backwards as unbalanced in magnitude and angle', () => {
    const t = layoutOf(lap(36, 4, 7));
    const sides = t.sides.map((s) => (s.coil === 1 ? { ...s, polarity: (s.polarity === 1 ? -1 : 1) as 1 | -1 } : s));
    const b = balanceOf({ ...t, sides });
    expect(b.verdict).toBe('unbalanced');
    expect(b.reasons.length).toBe(2);
  });

  it('says so when the phases carry no EMF', () => {
    const zero = { A: { re: 0, im: 0 }, B: { re: 0, im: 0 }, C: { re: 0, im: 0 } };
    expect(phaseBalance(zero).verdict).toBe('unbalanced');
  });
});
