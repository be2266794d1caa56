import { describe, expect, it } from 'vitest';
import { analyseWinding, type AnalyseWindingInput } from '@/lib/engine/analyse-winding';
import type { WindingSpec } from '@/lib/engine/winding-layout';
import {
  EXAMPLE_A_CORE,
  EXAMPLE_A_SPEC,
  EXAMPLE_A_SUPPLY,
  errorOf,
  lap,
  layoutOf,
  singleLayer,
  value,
} from '../../support/fixtures/winding-fixtures';

const input = (over: Partial<AnalyseWindingInput> = {}): AnalyseWindingInput => ({
  winding: EXAMPLE_A_SPEC,
  supply: EXAMPLE_A_SUPPLY,
  core: EXAMPLE_A_CORE,
  ...over,
});

describe('analyseWinding on worked example A (docs/engineering/winding-factor.md and flux-density.md, [derived])', () => {
  const a = value(analyseWinding(input()));

  // docs/engineering/winding-factor.md notation: α = 180°·P/S electrical; q = S/(3P); τ = S/P.
  it('reports q, pole pitch and slot angle: q = 3, τ = 9, α = 20°', () => {
    expect(a.q).toMatchObject({ z: 3, d: 1 });
    expect(a.polePitchSlots).toBe(9);
    expect(a.slotAngleDeg).toBe(20);
    expect(a.fractional).toBe(false);
  });

  it('gives every whole order 1 … 49 and agrees with the closed form at every odd order', () => {
    expect(a.factors.map((f) => f.order)).toEqual(Array.from({ length: 49 }, (_, i) => i + 1));
    expect(a.closedForm.checks).toHaveLength(25);
    expect(a.closedForm.maxDifference).toBeLessThan(1e-12);
  });

  it('is balanced, allows 1, 2 or 4 paths and has no warnings', () => {
    expect(a.balance.verdict).toBe('balanced');
    expect(a.parallelPaths).toMatchObject({ allowed: [1, 2, 4], requested: 1, requestedAllowed: true });
    expect(a.warnings).toEqual([]);
  });

  it('includes the MMF spectrum to 49 and a waveform of 2S + 1 staircase points', () => {
    expect(a.mmf.harmonics.at(-1)?.order).toBe(49);
    expect(a.waveform).toHaveLength(2 * 36 + 1);
    expect(a.waveform[0]?.angleDeg).toBe(0);
    expect(a.waveform.at(-1)?.angleDeg).toBe(360);
  });
});

describe('analyseWinding findings and errors', () => {
  it('flags fractional windings for engineer review (docs/engineering/winding-factor.md, [derived])', () => {
    const a = value(analyseWinding(input({ winding: lap(27, 4, 6), core: { ...EXAMPLE_A_CORE, slots: 27 } })));
    expect(a.fractional).toBe(true);
    expect(a.warnings.join(' ')).toMatch(/q = 9\/4.*engineer review/);
  });

  it('warns when the recorded parallel paths would circulate current', () => {
    const a = value(analyseWinding(input({ winding: { ...EXAMPLE_A_SPEC, parallelPaths: 3 } })));
    expect(a.parallelPaths.requestedAllowed).toBe(false);
    expect(a.warnings.join(' ')).toMatch(/3 parallel path/);
  });

  it('analyses a slot table from the winder without a closed-form cross-check', () => {
    const sides = layoutOf(lap(36, 4, 7)).sides;
    const a = value(analyseWinding(input({ winding: { ...EXAMPLE_A_SPEC, slotTable: sides } })));
    expect(a.layout.source).toBe('explicit');
    expect(a.closedForm.checks).toEqual([]);
    expect(a.windingFactor).toBeCloseTo(0.9019, 4);
  });

  it('leaves the flux out without a core', () => {
    const { core: _core, ...rest } = input();
    expect(value(analyseWinding(rest)).flux).toBeNull();
  });

  it.each([
    { name: 'highest order 0', over: { options: { maxOrder: 0 } }, field: 'options.maxOrder' },
    { name: 'frequency 0', over: { supply: { lineVoltageV: 400, frequencyHz: 0 } }, field: 'supply.frequencyHz' },
    { name: 'core with another slot count', over: { core: { ...EXAMPLE_A_CORE, slots: 48 } }, field: 'core.slots' },
    { name: 'zero parallel paths', over: { winding: { ...EXAMPLE_A_SPEC, parallelPaths: 0 } }, field: 'winding.parallelPaths' },
    { name: 'span 36 on 36 slots', over: { winding: lap(36, 4, 36) }, field: 'winding.spans.0' },
    { name: 'zero voltage', over: { supply: { lineVoltageV: 0, frequencyHz: 50 } }, field: 'supply.lineVoltageV' },
  ])('returns an error for $name at $field', ({ over, field }) => {
    expect(errorOf(analyseWinding(input(over as Partial<AnalyseWindingInput>))).field).toBe(field);
  });
});

describe('closed-form cross-check by winding style (docs/engineering/winding-factor.md)', () => {
  it.each([
    [
      'double-layer concentric 9, 7, 5 (coils on one centre line) [derived]',
      lap(36, 4, 7, { style: 'concentric', spans: [9, 7, 5], turnsPerCoil: [10, 10, 10] }),
      25,
    ],
    [
      'double-layer concentric 9, 9, 6 (no common centre): no closed form',
      lap(36, 4, 7, { style: 'concentric', spans: [9, 9, 6], turnsPerCoil: [10, 10, 10] }),
      0,
    ],
    ['single-layer concentric, k_w = k_d [derived]', singleLayer(36, 4, [11, 9, 7]), 25],
  ] as [string, WindingSpec, number][])('%s', (_name, winding, count) => {
    const a = value(analyseWinding({ winding, supply: EXAMPLE_A_SUPPLY }));
    expect(a.closedForm.checks).toHaveLength(count);
    expect(a.closedForm.maxDifference).toBeLessThan(1e-12);
  });
});
