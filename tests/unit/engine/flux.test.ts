import { describe, expect, it } from 'vitest';
import { analyseWinding } from '@/lib/engine/analyse-winding';
import {
  DEFAULT_FLUX_LIMITS,
  EMF_CONSTANT,
  fluxAnalysis,
  fluxDensities,
  judgeFlux,
  phaseVoltage,
  seriesTurnsFromCoils,
  seriesTurnsPerPhase,
  type FluxInput,
} from '@/lib/engine/flux';
import { KILOLINES_PER_IN2_PER_TESLA, teslaToKilolinesPerIn2 } from '@/lib/engine/units';
import {
  EXAMPLE_A_CORE,
  EXAMPLE_A_SPEC,
  EXAMPLE_A_SUPPLY,
  errorOf,
  lap,
  layoutOf,
  rel,
  singleLayer,
  value,
} from '../../support/fixtures/winding-fixtures';

const exampleA = () => value(analyseWinding({ winding: EXAMPLE_A_SPEC, supply: EXAMPLE_A_SUPPLY, core: EXAMPLE_A_CORE }));

describe('worked example A (docs/engineering/flux-density.md, [derived], tolerance ±0.5 %)', () => {
  // 36 slots, 4 poles, double-layer lap 1–8, N_c 14, a 1, star, 400 V 50 Hz, D 150, L 120, k_fe 0.95,
  // tooth 6.5 mm, OD 240 mm, slot depth 20 mm.
  it.each([
    { quantity: 'k_w1', expected: 0.9019, get: (a: ReturnType<typeof exampleA>) => a.windingFactor },
    { quantity: 'N_ph', expected: 168, get: (a: ReturnType<typeof exampleA>) => a.seriesTurnsPerPhase },
    { quantity: 'Φ (Wb)', expected: 6.866e-3, get: (a: ReturnType<typeof exampleA>) => a.flux?.fluxPerPoleWb ?? NaN },
    { quantity: 'gap B_avg (T)', expected: 0.4856, get: (a: ReturnType<typeof exampleA>) => a.flux?.gapAverage.tesla ?? NaN },
    { quantity: 'gap B_peak (T)', expected: 0.7628, get: (a: ReturnType<typeof exampleA>) => a.flux?.gapPeak.tesla ?? NaN },
    { quantity: 'tooth max (T)', expected: 1.617, get: (a: ReturnType<typeof exampleA>) => a.flux?.toothMax.tesla ?? NaN },
    { quantity: 'd_y (m)', expected: 0.025, get: (a: ReturnType<typeof exampleA>) => a.flux?.yokeDepthM ?? NaN },
    { quantity: 'yoke (T)', expected: 1.2045, get: (a: ReturnType<typeof exampleA>) => a.flux?.yoke.tesla ?? NaN },
  ])('$quantity = $expected', ({ expected, get }) => {
    expect(rel(get(exampleA()), expected)).toBeLessThanOrEqual(0.005);
  });

  it('labels gap densities average and peak, with B_peak = (π/2)·B_avg', () => {
    const f = exampleA().flux;
    expect(f?.gapAverage.kind).toBe('average');
    expect(f?.gapPeak.kind).toBe('peak');
    expect((f?.gapPeak.tesla ?? NaN) / (f?.gapAverage.tesla ?? NaN)).toBeCloseTo(Math.PI / 2, 12);
  });

  it('the same core at 2 poles and the same gap density puts the yoke at 2.41 T: reject', () => {
    const a = exampleA().flux;
    if (!a) throw new Error('no flux');
    // Same B_avg = Φ·P/(πDL) at P = 2 needs twice the flux per pole.
    const twoPole = fluxDensities(EXAMPLE_A_CORE, 2, a.fluxPerPoleWb * 2);
    expect(twoPole.gapAverageT).toBeCloseTo(a.gapAverage.tesla, 12);
    expect(rel(twoPole.yokeT, 2.41)).toBeLessThanOrEqual(0.005);
    expect(judgeFlux(twoPole.yokeT, DEFAULT_FLUX_LIMITS.yoke)).toBe('high');
  });

  it('is within the typical ranges [from memory: Pyrhönen et al., Table 6.3; Sawhney]', () => {
    const f = exampleA().flux;
    for (const d of [f?.gapAverage, f?.gapPeak, f?.toothMax, f?.yoke]) expect(d?.verdict).toBe('ok');
  });
});

describe('units and constants', () => {
  it('1 T = 64.516 kilolines/in² [derived]', () => {
    expect(KILOLINES_PER_IN2_PER_TESLA).toBeCloseTo(64.516, 3);
    expect(exampleA().flux?.yoke.kilolinesPerIn2).toBeCloseTo(teslaToKilolinesPerIn2(exampleA().flux?.yoke.tesla ?? NaN), 12);
  });

  it('the 4.44 of E = 4.44 f N k_w Φ is √2·π', () => {
    expect(EMF_CONSTANT).toBeCloseTo(4.44, 2);
  });

  it('V_ph is V_line/√3 in star and V_line in delta (docs/engineering/flux-density.md)', () => {
    expect(phaseVoltage(400, 'star')).toBeCloseTo(230.94, 2);
    expect(phaseVoltage(400, 'delta')).toBe(400);
  });

  it.each([
    { name: 'double layer', spec: lap(36, 4, 7, { turnsPerCoil: [14] }), layers: 2 as const, nc: 14, a: 1 },
    { name: 'double layer, 2 paths', spec: lap(36, 4, 7, { turnsPerCoil: [14], parallelPaths: 2 }), layers: 2 as const, nc: 14, a: 2 },
    { name: 'single layer', spec: { ...singleLayer(36, 4, [9]), turnsPerCoil: [20] }, layers: 1 as const, nc: 20, a: 1 },
  ])('N_ph from the layout equals (S/3 or S/6)·N_c/a: $name (docs/engineering/flux-density.md)', ({ spec, layers, nc, a }) => {
    const fromLayout = seriesTurnsPerPhase(layoutOf(spec), a);
    expect(fromLayout).toBe(seriesTurnsFromCoils(36, layers, nc, a));
    expect(fromLayout).toBe(layers === 2 ? (36 / 3) * (nc / a) : (36 / 6) * (nc / a));
  });
});

describe('flux limits and verdicts', () => {
  // [from memory: Pyrhönen et al., Design of Rotating Electrical Machines, Table 6.3; Sawhney, A Course in
  // Electrical Machine Design]: gap peak 0.7–0.9 T (average 0.3–0.6 T); stator teeth 1.4–2.1 T (≤ 1.7 T
  // conservative); stator yoke 1.4–1.7 T (1.2–1.5 T conservative).
  it('defaults to the typical ranges of the reference', () => {
    expect(DEFAULT_FLUX_LIMITS.gapPeak.typical).toEqual({ low: 0.7, high: 0.9 });
    expect(DEFAULT_FLUX_LIMITS.gapAverage.typical).toEqual({ low: 0.3, high: 0.6 });
    expect(DEFAULT_FLUX_LIMITS.tooth.typical).toEqual({ low: 1.4, high: 2.1 });
    expect(DEFAULT_FLUX_LIMITS.tooth.conservative?.high).toBe(1.7);
    expect(DEFAULT_FLUX_LIMITS.yoke.typical).toEqual({ low: 1.4, high: 1.7 });
    expect(DEFAULT_FLUX_LIMITS.yoke.conservative).toEqual({ low: 1.2, high: 1.5 });
  });

  it.each([
    { t: 1.0, limit: 'yoke' as const, verdict: 'low' },
    { t: 1.3, limit: 'yoke' as const, verdict: 'ok' },
    { t: 1.6, limit: 'yoke' as const, verdict: 'above-conservative' },
    { t: 1.8, limit: 'yoke' as const, verdict: 'high' },
    { t: 1.9, limit: 'tooth' as const, verdict: 'above-conservative' },
    { t: 2.2, limit: 'tooth' as const, verdict: 'high' },
    { t: 0.8, limit: 'gapPeak' as const, verdict: 'ok' },
  ])('$t T in the $limit is $verdict', ({ t, limit, verdict }) => {
    expect(judgeFlux(t, DEFAULT_FLUX_LIMITS[limit])).toBe(verdict);
  });

  it('takes shop limits instead of the defaults', () => {
    const tight = { ...DEFAULT_FLUX_LIMITS, yoke: { typical: { low: 0.5, high: 1.1 } } };
    const r = value(
      analyseWinding({ winding: EXAMPLE_A_SPEC, supply: EXAMPLE_A_SUPPLY, core: EXAMPLE_A_CORE, options: { limits: tight } }),
    );
    expect(r.flux?.yoke.verdict).toBe('high');
    expect(r.warnings.some((w) => w.startsWith('Yoke'))).toBe(true);
  });

  it('scales flux by the air-gap EMF fraction when given (stator drop, [common practice] 0.95–0.98)', () => {
    const base: FluxInput = {
      core: EXAMPLE_A_CORE,
      poles: 4,
      lineVoltageV: 400,
      frequencyHz: 50,
      connection: 'star',
      seriesTurnsPerPhase: 168,
      windingFactor: 0.9019,
    };
    const full = value(fluxAnalysis(base));
    const dropped = value(fluxAnalysis({ ...base, emfFraction: 0.97 }));
    expect(dropped.fluxPerPoleWb / full.fluxPerPoleWb).toBeCloseTo(0.97, 12);
    expect(full.remarks[0]).toMatch(/0\.95–0\.98/);
  });

  it('subtracts vent ducts from the iron length for teeth and yoke', () => {
    const base: FluxInput = {
      core: EXAMPLE_A_CORE,
      poles: 4,
      lineVoltageV: 400,
      frequencyHz: 50,
      connection: 'star',
      seriesTurnsPerPhase: 168,
      windingFactor: 0.9019,
    };
    const ducted = value(fluxAnalysis({ ...base, core: { ...EXAMPLE_A_CORE, ventDucts: 2, ventDuctWidthM: 0.01 } }));
    const plain = value(fluxAnalysis(base));
    expect(ducted.yoke.tesla / plain.yoke.tesla).toBeCloseTo(0.12 / 0.1, 12);
    expect(ducted.gapAverage.tesla).toBeCloseTo(plain.gapAverage.tesla, 12);
  });

  it.each([
    { name: 'zero bore', core: { boreM: 0 }, field: 'core.boreMm' },
    { name: 'stacking factor above 1', core: { stackingFactor: 1.2 }, field: 'core.stackingFactor' },
    { name: 'no back iron', core: { slotDepthM: 0.05 }, field: 'core.slotDepthMm' },
    { name: 'ducts longer than the core', core: { ventDucts: 20, ventDuctWidthM: 0.01 }, field: 'core.ventDucts' },
  ])('rejects $name at $field', ({ core, field }) => {
    const e = errorOf(
      fluxAnalysis({
        core: { ...EXAMPLE_A_CORE, ...core },
        poles: 4,
        lineVoltageV: 400,
        frequencyHz: 50,
        connection: 'star',
        seriesTurnsPerPhase: 168,
        windingFactor: 0.9,
      }),
    );
    expect(e.code).toBe('invalid-input');
    expect(e.field).toBe(field);
  });
});
