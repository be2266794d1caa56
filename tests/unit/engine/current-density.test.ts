import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { currentDensity, currentDensityChecked, TYPICAL_CURRENT_DENSITY } from '@/lib/engine/current-density';

describe('current density', () => {
  it.each([1, 3, 4, 5, 8])('converts %f A/mm² to 1973.5/J circular mils per ampere', (j) => {
    // [derived]: CM/A = 1973.5 / J[A/mm²]
    const result = currentDensity({ lineCurrentA: j, connection: 'star', parallelPaths: 1, conductorAreaPerTurnMm2: 1 });
    expect(result.ampsPerMm2).toBeCloseTo(j, 12);
    expect(Math.abs(result.circularMilsPerAmp / (1973.5 / j) - 1)).toBeLessThan(2e-5);
  });

  it.each([
    // Example A wire: 2 × 0.85 mm in hand = 1.1349 mm² per turn.
    { lineCurrentA: 10, connection: 'star', parallelPaths: 1, phase: 10, path: 10 },
    { lineCurrentA: 10 * Math.sqrt(3), connection: 'delta', parallelPaths: 1, phase: 10, path: 10 },
    { lineCurrentA: 20, connection: 'star', parallelPaths: 2, phase: 20, path: 10 },
  ] as const)('$lineCurrentA A line, $connection, a = $parallelPaths → $path A per path', (c) => {
    const area = 2 * (Math.PI / 4) * 0.85 ** 2;
    const result = currentDensity({ ...c, conductorAreaPerTurnMm2: area });
    expect(result.phaseCurrentA).toBeCloseTo(c.phase, 9);
    expect(result.pathCurrentA).toBeCloseTo(c.path, 9);
    expect(result.ampsPerMm2).toBeCloseTo(c.path / area, 9);
  });

  it('keeps the textbook ranges: 3–5 A/mm² (Sawhney) and 3–8 A/mm² totally enclosed (Pyrhönen) [from memory]', () => {
    expect([TYPICAL_CURRENT_DENSITY.inductionStator.minAPerMm2, TYPICAL_CURRENT_DENSITY.inductionStator.maxAPerMm2]).toEqual([3, 5]);
    expect([TYPICAL_CURRENT_DENSITY.totallyEnclosed.minAPerMm2, TYPICAL_CURRENT_DENSITY.totallyEnclosed.maxAPerMm2]).toEqual([3, 8]);
    // Issue 9: the source string reaches screens, so it names the book without the provenance marker.
    expect(TYPICAL_CURRENT_DENSITY.inductionStator.source).toContain('Sawhney');
    expect(TYPICAL_CURRENT_DENSITY.inductionStator.source).not.toContain('[from memory]');
  });

  it('leaves density unchanged when paths double and area per turn halves', () => {
    // docs/engineering/redesign.md: parallel paths a1→a2 changes area per turn ×a1/a2 with current density unchanged.
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 1000, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (i, a) => {
        const one = currentDensity({ lineCurrentA: i, connection: 'delta', parallelPaths: 1, conductorAreaPerTurnMm2: a });
        const two = currentDensity({ lineCurrentA: i, connection: 'delta', parallelPaths: 2, conductorAreaPerTurnMm2: a / 2 });
        expect(two.ampsPerMm2).toBeCloseTo(one.ampsPerMm2, 6);
      }),
    );
  });

  it.each([
    ['lineCurrentA', { lineCurrentA: 0 }],
    ['parallelPaths', { parallelPaths: -1 }],
    ['conductorAreaPerTurnMm2', { conductorAreaPerTurnMm2: Number.NaN }],
  ] as const)('refuses a bad %s', (field, patch) => {
    const r = currentDensityChecked({ lineCurrentA: 10, connection: 'star', parallelPaths: 1, conductorAreaPerTurnMm2: 1, ...patch });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe(field);
  });
});
