import { describe, expect, it } from 'vitest';
import {
  canBalance,
  closedFormFactors,
  concentricPitchFactor,
  distributionFactor,
  pitchFactor,
  slotsPerPolePerPhase,
} from '@/lib/engine/closed-form';
import { harmonicWindingFactors, SlotStar } from '@/lib/engine/slot-star';
import { lap, layoutOf, singleLayer } from '../../support/fixtures/winding-fixtures';

/** docs/engineering/winding-factor.md check values: double-layer 60°-belt lap, tolerance ±0.0005. */
const TOL = 0.0005;
const CRC = 'CRC Power Electronics and Motor Drives handbook, ch. "AC Machine Windings", Example 2.1';

describe('double-layer 60°-belt lap check values (docs/engineering/winding-factor.md)', () => {
  // source beside each row; "—" in the reference (fractional rows) is null here.
  it.each([
    { s: 36, p: 4, y: 9, kd1: 0.9598, kp1: 1.0, kw1: 0.9598, kw5: 0.2176, kw7: 0.1774, source: '[derived]' },
    { s: 36, p: 4, y: 8, kd1: 0.9598, kp1: 0.9848, kw1: 0.9452, kw5: 0.1398, kw7: 0.0607, source: '[derived]' },
    { s: 36, p: 4, y: 7, kd1: 0.9598, kp1: 0.9397, kw1: 0.9019, kw5: 0.0378, kw7: 0.1359, source: '[derived]' },
    { s: 48, p: 4, y: 10, kd1: 0.9577, kp1: 0.9659, kw1: 0.925, kw5: 0.0531, kw7: 0.0408, source: `[derived]; 0.925 also ${CRC}` },
    { s: 24, p: 2, y: 10, kd1: 0.9577, kp1: 0.9659, kw1: 0.925, kw5: 0.0531, kw7: 0.0408, source: `[derived]; 0.925 also ${CRC}` },
    { s: 24, p: 4, y: 5, kd1: 0.9659, kp1: 0.9659, kw1: 0.933, kw5: 0.067, kw7: 0.067, source: `[derived]; 0.933 also ${CRC}` },
    { s: 30, p: 4, y: 7, kd1: null, kp1: null, kw1: 0.9514, kw5: 0.1732, kw7: 0.1111, source: '[derived]' },
    { s: 42, p: 4, y: 9, kd1: null, kp1: null, kw1: 0.9319, kw5: 0.0848, kw7: 0.0, source: '[derived]' },
  ])('$s/$p span $y: k_w1 $kw1, k_w5 $kw5, k_w7 $kw7 ($source)', ({ s, p, y, kd1, kp1, kw1, kw5, kw7 }) => {
    const factors = harmonicWindingFactors(layoutOf(lap(s, p, y)), 7);
    const at = (nu: number) => factors.find((f) => f.order === nu);
    // Slot-star sum over the actual coil sides [derived], every phase.
    for (const [nu, expected] of [
      [1, kw1],
      [5, kw5],
      [7, kw7],
    ] as const) {
      for (const ph of ['A', 'B', 'C'] as const) expect(at(nu)?.phases[ph].kw).toBeCloseTo(expected, 3);
      expect(Math.abs((at(nu)?.kw ?? NaN) - expected)).toBeLessThanOrEqual(TOL);
      // Closed form k_d·k_p (Say, Alternating Current Machines; Fitzgerald & Kingsley; fractional q = z/d [derived]).
      expect(Math.abs(Math.abs(closedFormFactors(s, p, y, nu)?.kw ?? NaN) - expected)).toBeLessThanOrEqual(TOL);
    }
    const c1 = closedFormFactors(s, p, y, 1);
    if (kd1 !== null) expect(Math.abs((c1?.kd ?? NaN) - kd1)).toBeLessThanOrEqual(TOL);
    if (kp1 !== null) expect(Math.abs((c1?.kp ?? NaN) - kp1)).toBeLessThanOrEqual(TOL);
  });
});

describe('slot harmonics ν = k·S/p ± 1 keep the working |k_w| (docs/engineering/winding-factor.md, [derived])', () => {
  it.each([
    { s: 36, p: 4, y: 7 },
    { s: 48, p: 4, y: 10 },
    { s: 24, p: 4, y: 5 },
    { s: 54, p: 6, y: 8 },
  ])('$s slots, $p poles, span $y', ({ s, p, y }) => {
    const factors = harmonicWindingFactors(layoutOf(lap(s, p, y)), 49);
    const kw1 = factors.find((f) => f.order === 1)?.kw ?? NaN;
    const pp = p / 2;
    for (let k = 1; (k * s) / pp + 1 <= 49; k++)
      for (const nu of [(k * s) / pp - 1, (k * s) / pp + 1]) expect(factors.find((f) => f.order === nu)?.kw).toBeCloseTo(kw1, 12);
    // Chording cannot reduce them: the same orders at full pitch carry the full-pitch k_w1.
    const full = harmonicWindingFactors(layoutOf(lap(s, p, s / p)), 49);
    const kw1Full = full.find((f) => f.order === 1)?.kw ?? NaN;
    expect(full.find((f) => f.order === s / pp - 1)?.kw).toBeCloseTo(kw1Full, 12);
  });
});

describe('single-layer 60°-belt windings have k_w = k_d whatever the end-turn shape (docs/engineering/winding-factor.md, [derived])', () => {
  it.each([
    { s: 36, p: 4, spans: [11, 9, 7], coiling: 'half' as const },
    { s: 36, p: 4, spans: [9], coiling: 'half' as const },
    { s: 48, p: 4, spans: [15, 13, 11, 9], coiling: 'half' as const },
    { s: 48, p: 4, spans: [11, 9], coiling: 'whole' as const },
    { s: 48, p: 4, spans: [10], coiling: 'whole' as const },
    { s: 24, p: 4, spans: [5], coiling: 'whole' as const },
    { s: 24, p: 2, spans: [15, 13, 11, 9], coiling: 'half' as const },
  ])('$s/$p $coiling-coiled spans $spans', ({ s, p, spans, coiling }) => {
    const { z } = slotsPerPolePerPhase(s, p);
    for (const f of harmonicWindingFactors(layoutOf(singleLayer(s, p, spans, coiling)), 25))
      if (f.order % 2 === 1) expect(f.kw).toBeCloseTo(Math.abs(distributionFactor(z, f.order)), 12);
  });

  it('the concentric group formula Σ N_i sin(ν y_i/τ 90°)/Σ N_i gives k_d for the nested group 11, 9, 7 of 36/4 [derived]', () => {
    expect(concentricPitchFactor([11, 9, 7], [1, 1, 1], 9, 1)).toBeCloseTo(distributionFactor(3, 1), 12);
    expect(distributionFactor(3, 1)).toBeCloseTo(0.9598, 4);
  });
});

describe('closed forms (docs/engineering/winding-factor.md)', () => {
  it('k_d for integral q matches sin(ν q α/2)/(q sin(ν α/2)) with α = 180°·P/S (Say; Fitzgerald & Kingsley)', () => {
    for (const [s, p] of [
      [36, 4],
      [48, 4],
      [72, 4],
      [54, 6],
    ] as const) {
      const q = s / (3 * p);
      const alpha = ((180 * p) / s) * (Math.PI / 180);
      for (const nu of [1, 5, 7, 11, 13]) {
        const textbook = Math.sin((nu * q * alpha) / 2) / (q * Math.sin((nu * alpha) / 2));
        expect(distributionFactor(q, nu)).toBeCloseTo(textbook, 12);
      }
    }
  });

  it('k_p = sin(ν·(y/τ)·90°) (Say; Fitzgerald & Kingsley)', () => {
    expect(pitchFactor(7, 9, 1)).toBeCloseTo(Math.sin((7 / 9) * (Math.PI / 2)), 12);
    expect(pitchFactor(9, 9, 1)).toBe(1);
  });

  it('q = z/d is reduced: 30/4 → 5/2, 27/4 → 9/4, 42/4 → 7/2, 36/4 → 3/1', () => {
    expect(slotsPerPolePerPhase(30, 4)).toMatchObject({ z: 5, d: 2 });
    expect(slotsPerPolePerPhase(27, 4)).toMatchObject({ z: 9, d: 4 });
    expect(slotsPerPolePerPhase(42, 4)).toMatchObject({ z: 7, d: 2 });
    expect(slotsPerPolePerPhase(36, 4)).toMatchObject({ z: 3, d: 1 });
  });

  it('returns null for even and non-whole orders, which the closed form does not describe [derived]', () => {
    expect(closedFormFactors(30, 4, 7, 2)).toBeNull();
    expect(closedFormFactors(27, 4, 6, 0.5)).toBeNull();
  });

  it.each([
    { s: 36, p: 4, ok: true },
    { s: 30, p: 4, ok: true },
    { s: 27, p: 4, ok: true },
    { s: 36, p: 8, ok: true },
    { s: 35, p: 4, ok: false },
    { s: 32, p: 4, ok: false },
    { s: 24, p: 6, ok: false },
  ])('balanced only when S/(3·gcd(S, p)) is whole: $s/$p → $ok [derived]', ({ s, p, ok }) => {
    expect(canBalance(s, p)).toBe(ok);
    // Equivalent statement: d (denominator of q) is not a multiple of 3.
    expect(slotsPerPolePerPhase(s, p).d % 3 !== 0).toBe(ok);
  });
});

describe('fractional windings carry even or sub-harmonic orders (docs/engineering/winding-factor.md, [derived])', () => {
  it('d = 2 (30/4, q = 5/2): even orders appear, no sub-harmonics', () => {
    const f = harmonicWindingFactors(layoutOf(lap(30, 4, 7)), 8);
    expect(f.every((h) => Number.isInteger(h.order))).toBe(true);
    expect(f.find((h) => h.order === 2)?.kw).toBeGreaterThan(0.01);
  });

  it('d = 4 (27/4, q = 9/4): ν = 1/2, 3/2 … appear on the mechanical order basis', () => {
    const f = harmonicWindingFactors(layoutOf(lap(27, 4, 6)), 4);
    expect(f.map((h) => h.order)).toEqual([0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4]);
    expect(f.find((h) => h.order === 0.5)?.kw).toBeGreaterThan(0.01);
    expect(f.find((h) => h.order === 0.5)?.mechanicalOrder).toBe(1);
  });

  it('integral windings carry no even orders', () => {
    const star = new SlotStar(layoutOf(lap(36, 4, 7)));
    for (const nu of [2, 4, 6, 8]) expect(star.factor('A', nu * 2)).toBe(0);
  });
});
