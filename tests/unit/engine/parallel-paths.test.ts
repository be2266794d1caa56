import { describe, expect, it } from 'vitest';
import { allowedParallelPaths, checkParallelPaths, ruleOfThumbParallelPaths } from '@/lib/engine/parallel-paths';
import type { WindingSpec } from '@/lib/engine/winding-layout';
import { errorOf, lap, layoutOf, singleLayer, value } from '../../support/fixtures/winding-fixtures';

// Source for the check values: docs/engineering/redesign.md "Allowed parallel paths", [derived].
describe('allowed parallel paths check values (docs/engineering/redesign.md, [derived])', () => {
  it.each([
    { s: 36, p: 4, y: 7, allowed: [1, 2, 4] },
    { s: 36, p: 6, y: 5, allowed: [1, 2, 3, 6] },
    { s: 30, p: 4, y: 7, allowed: [1, 2] },
    { s: 27, p: 4, y: 6, allowed: [1] },
  ])('$s/$p double-layer → $allowed, from the layout and by the rule of thumb', ({ s, p, y, allowed }) => {
    expect(allowedParallelPaths(layoutOf(lap(s, p, y))).allowed).toEqual(allowed);
    expect(ruleOfThumbParallelPaths(s, p, 2)).toEqual(allowed);
  });
});

describe('the layout search agrees with the rules of thumb (docs/engineering/redesign.md, [derived])', () => {
  it.each([
    ['double-layer integral lap: a divides P', lap(72, 8, 8), [1, 2, 4, 8]],
    ['double-layer integral lap: a divides P', lap(48, 4, 10), [1, 2, 4]],
    ['fractional q = z/d: a divides 2p/d', lap(42, 4, 9), [1, 2]],
    ['fractional q = z/d: a divides 2p/d', lap(60, 8, 7), [1, 2, 4]],
    ['single-layer half-coiled: a divides P/2', singleLayer(36, 4, [11, 9, 7]), [1, 2]],
    ['single-layer half-coiled: a divides P/2', singleLayer(72, 8, [11, 9, 7]), [1, 2, 4]],
    ['single-layer whole-coiled: a divides P', singleLayer(48, 4, [11, 9], 'whole'), [1, 2, 4]],
  ] as [string, WindingSpec, number[]][])('%s (%#)', (_rule, spec, allowed) => {
    expect(allowedParallelPaths(layoutOf(spec)).allowed).toEqual(allowed);
    expect(ruleOfThumbParallelPaths(spec.slots, spec.poles, spec.layers, spec.singleLayerCoiling)).toEqual(allowed);
  });

  it('confirms every allowed count by equal path phasors', () => {
    const r = allowedParallelPaths(layoutOf(lap(36, 6, 5)));
    for (const c of r.checks) expect(c.mismatch).toBeLessThan(1e-9);
    expect(r.basis).toBe('coils');
  });
});

describe('choosing a path count', () => {
  it('accepts an allowed count', () => {
    expect(value(checkParallelPaths(layoutOf(lap(36, 4, 7)), 2)).allowed).toContain(2);
  });

  it('refuses 3 paths on 36/4 and names the allowed counts', () => {
    const e = errorOf(checkParallelPaths(layoutOf(lap(36, 4, 7)), 3));
    expect(e.code).toBe('parallel-paths-not-allowed');
    expect(e.field).toBe('winding.parallelPaths');
    expect(e.hint).toContain('1, 2, 4');
  });

  it('without coil numbers judges by coil sides and says so (half- and whole-coiled look alike)', () => {
    const t = layoutOf(singleLayer(48, 4, [15, 13, 11, 9]));
    const sidesOnly = { ...t, source: 'explicit' as const, sides: t.sides.map(({ coil: _c, ...s }) => s) };
    const r = allowedParallelPaths(sidesOnly);
    expect(r.basis).toBe('coil-sides');
    expect(r.note).toMatch(/whole coils/);
    expect(r.allowed).toEqual([1, 2, 4]);
    expect(allowedParallelPaths(t).allowed).toEqual([1, 2]);
  });

  it('a layout with no repeating section allows one path only', () => {
    const t = layoutOf(lap(36, 4, 7));
    // One coil wound with an extra turn breaks every symmetry of phase A.
    const sides = t.sides.map((s) => (s.coil === 1 ? { ...s, turns: s.turns + 1 } : s));
    expect(allowedParallelPaths({ ...t, sides }).allowed).toEqual([1]);
  });
});
