import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { analyseWinding } from '@/lib/engine/analyse-winding';
import { closedFormFactors, distributionFactor, slotsPerPolePerPhase } from '@/lib/engine/closed-form';
import { fluxAnalysis } from '@/lib/engine/flux';
import { mmfSpectrum } from '@/lib/engine/mmf-spectrum';
import type { EngineResult } from '@/lib/engine/result';
import { harmonicWindingFactors, PHASES } from '@/lib/engine/slot-star';
import { supplyScaling } from '@/lib/engine/supply-scaling';
import { buildStandardLayout, type CoilSide, type WindingSpec } from '@/lib/engine/winding-layout';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import {
  BALANCED_COMBINATIONS,
  EXAMPLE_A_CORE,
  INTEGRAL_COMBINATIONS,
  lap,
  layoutOf,
  singleLayer,
  value,
} from '../../support/fixtures/winding-fixtures';

/** A balanced double-layer lap winding with any span from 1 to S − 1. */
const anyLap = (combos: readonly { slots: number; poles: number }[]) =>
  fc.constantFrom(...combos).chain(({ slots, poles }) => fc.integer({ min: 1, max: slots - 1 }).map((y) => lap(slots, poles, y)));

describe('winding-factor invariants', () => {
  it('the slot-star sum equals the closed form k_d·k_p for integral double-layer lap windings, odd orders to 49', () => {
    fc.assert(
      fc.property(anyLap(INTEGRAL_COMBINATIONS), (spec) => {
        for (const f of harmonicWindingFactors(layoutOf(spec), 49)) {
          const c = closedFormFactors(spec.slots, spec.poles, spec.spans[0] ?? 0, f.order);
          if (c) expect(Math.abs(Math.abs(c.kw) - f.kw)).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('0 ≤ k_w ≤ 1 for every phase and order of every balanced layout, fractional included', () => {
    fc.assert(
      fc.property(anyLap(BALANCED_COMBINATIONS), (spec) => {
        for (const f of harmonicWindingFactors(layoutOf(spec), 49))
          for (const ph of PHASES) {
            expect(f.phases[ph].kw).toBeGreaterThanOrEqual(0);
            expect(f.phases[ph].kw).toBeLessThanOrEqual(1);
          }
      }),
      { numRuns: 150 },
    );
  });

  it('a single-layer 60°-belt winding has k_w = k_d whatever the spans (any pairing of going and return sides)', () => {
    const combos = INTEGRAL_COMBINATIONS.filter(({ slots, poles }) => slots >= 3 * poles);
    fc.assert(
      fc.property(fc.constantFrom(...combos), fc.integer(), ({ slots, poles }, seed) => {
        const q = slots / (3 * poles);
        const base = layoutOf(
          singleLayer(
            slots,
            poles,
            Array.from({ length: q }, (_, i) => 3 * q + q - 1 - 2 * i),
          ),
        );
        // Re-pair each group's going sides with its return sides at random: the spans change, the slots do not.
        const rand =
          fc.sample(
            fc.shuffledSubarray(
              Array.from({ length: q }, (_, i) => i),
              { minLength: q, maxLength: q },
            ),
            { seed, numRuns: 1 },
          )[0] ?? [];
        const sides: CoilSide[] = [];
        for (const side of base.sides) {
          const coil = side.coil ?? 0;
          const group = Math.floor((coil - 1) / q);
          const index = (coil - 1) % q;
          // Going sides keep their coil; return sides move to the coil the permutation names.
          sides.push(side.polarity === 1 ? side : { ...side, coil: group * q + (rand[index] ?? index) + 1 });
        }
        const table = { ...base, source: 'explicit' as const, sides };
        const { z } = slotsPerPolePerPhase(slots, poles);
        for (const f of harmonicWindingFactors(table, 25))
          if (Number.isInteger(f.order) && f.order % 2 === 1) expect(f.kw).toBeCloseTo(Math.abs(distributionFactor(z, f.order)), 12);
      }),
      { numRuns: 100 },
    );
  });
});

describe('MMF invariants for every balanced layout', () => {
  it('relative amplitude = (k_wν/ν)/k_w1; whole orders 3k+1 forward, 3k−1 backward, triplens cancelled', () => {
    fc.assert(
      fc.property(anyLap(BALANCED_COMBINATIONS), (spec) => {
        const layout = layoutOf(spec);
        const factors = harmonicWindingFactors(layout, 49);
        const kw1 = factors.find((f) => f.order === 1)?.kw ?? 0;
        fc.pre(kw1 > 0.05);
        const kw = new Map(factors.map((f) => [f.order, f.kw]));
        for (const h of mmfSpectrum(layout, { frequencyHz: 50 }, 49).harmonics) {
          expect(h.direction).not.toBe('both');
          const expected = (kw.get(h.order) ?? NaN) / h.order / kw1;
          if (h.direction !== 'cancelled') expect(h.relativeAmplitude).toBeCloseTo(expected, 9);
          if (Number.isInteger(h.order) && expected > 1e-9) {
            const want = h.order % 3 === 0 ? 'cancelled' : h.order % 3 === 1 ? 'forward' : 'backward';
            expect(h.direction).toBe(want);
          }
          if (Number.isInteger(h.order) && h.order % 3 === 0) expect(h.relativeAmplitude).toBe(0);
        }
      }),
      { numRuns: 120 },
    );
  });
});

describe('flux invariants', () => {
  const fluxCase = fc.record({
    turns: fc.integer({ min: 1, max: 60 }),
    span: fc.integer({ min: 5, max: 9 }),
    paths: fc.constantFrom(1, 2, 4),
    volts: fc.double({ min: 100, max: 7000, noNaN: true }),
    hz: fc.double({ min: 10, max: 400, noNaN: true }),
  });
  const phi = (spec: WindingSpec, volts: number, hz: number) =>
    value(analyseWinding({ winding: spec, supply: { lineVoltageV: volts, frequencyHz: hz }, core: EXAMPLE_A_CORE })).flux?.fluxPerPoleWb ??
    NaN;

  it('doubling the turns halves the flux', () => {
    fc.assert(
      fc.property(fluxCase, ({ turns, span, paths, volts, hz }) => {
        const spec = lap(36, 4, span, { turnsPerCoil: [turns], parallelPaths: paths });
        expect(phi({ ...spec, turnsPerCoil: [2 * turns] }, volts, hz) / phi(spec, volts, hz)).toBeCloseTo(0.5, 12);
      }),
      { numRuns: 60 },
    );
  });

  it('star and delta at the same line voltage differ by √3', () => {
    fc.assert(
      fc.property(fluxCase, ({ turns, span, paths, volts, hz }) => {
        const spec = lap(36, 4, span, { turnsPerCoil: [turns], parallelPaths: paths });
        expect(phi({ ...spec, connection: 'delta' }, volts, hz) / phi(spec, volts, hz)).toBeCloseTo(Math.sqrt(3), 12);
      }),
      { numRuns: 60 },
    );
  });
});

/** Every number anywhere in a value is finite. */
function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v !== null && typeof v === 'object') return Object.values(v).every(allFinite);
  return true;
}

function expectWellFormed(r: EngineResult<unknown>): void {
  if (r.ok) expect(allFinite(r.value)).toBe(true);
  else {
    expect(typeof r.error.code).toBe('string');
    expect(r.error.message.length).toBeGreaterThan(0);
    expect(r.error.hint.length).toBeGreaterThan(0);
  }
}

describe('the engine never throws and never returns NaN or Infinity', () => {
  // Any number at all: 0, negatives, NaN, ±Infinity, huge; plus small integers so real windings turn up too.
  const num = fc.oneof(fc.double(), fc.integer({ min: -10, max: 120 }), fc.constantFrom(0, -1, NaN, Infinity, -Infinity, 1e308));
  const spec = fc.record({
    slots: num,
    poles: num,
    layers: fc.constantFrom(1, 2) as fc.Arbitrary<1 | 2>,
    style: fc.constantFrom('lap', 'concentric') as fc.Arbitrary<'lap' | 'concentric'>,
    singleLayerCoiling: fc.constantFrom('whole', 'half') as fc.Arbitrary<'whole' | 'half'>,
    spans: fc.array(num, { maxLength: 4 }),
    turnsPerCoil: fc.array(num, { maxLength: 4 }),
    parallelPaths: num,
    connection: fc.constantFrom('star', 'delta') as fc.Arbitrary<'star' | 'delta'>,
  });
  const core = fc.record({
    boreM: num,
    coreLengthM: num,
    outsideDiameterM: num,
    slots: num,
    slotDepthM: num,
    toothWidthM: num,
    stackingFactor: num,
    ventDucts: num,
    ventDuctWidthM: num,
  });
  const supply = fc.record({ lineVoltageV: num, frequencyHz: num });

  it('analyseWinding, the layout builder, flux and supply scaling on arbitrary numbers', () => {
    fc.assert(
      fc.property(spec, core, supply, supply, (w, c, s, s2) => {
        expectWellFormed(buildStandardLayout(w));
        expectWellFormed(analyseWinding({ winding: w, core: c, supply: s }));
        expectWellFormed(analyseWinding({ winding: w, supply: s }));
        expectWellFormed(
          fluxAnalysis({
            core: c,
            poles: w.poles,
            lineVoltageV: s.lineVoltageV,
            frequencyHz: s.frequencyHz,
            connection: w.connection,
            seriesTurnsPerPhase: w.parallelPaths,
            windingFactor: w.slots,
          }),
        );
        expectWellFormed(supplyScaling({ winding: w, supply: s }, { winding: { ...w, connection: 'delta' }, supply: s2 }));
      }),
      { numRuns: 400 },
    );
  });

  it('on real slot and pole counts with arbitrary everything else', () => {
    const real = fc.constantFrom(...BALANCED_COMBINATIONS).chain(({ slots, poles }) =>
      fc.record({
        slots: fc.constant(slots),
        poles: fc.constant(poles),
        span: fc.oneof(fc.integer({ min: -2, max: slots + 2 }), num),
        turns: num,
        paths: num,
      }),
    );
    fc.assert(
      fc.property(real, core, supply, ({ slots, poles, span, turns, paths }, c, s) => {
        const w = lap(slots, poles, span, { turnsPerCoil: [turns], parallelPaths: paths });
        expectWellFormed(analyseWinding({ winding: w, core: { ...c, slots }, supply: s }));
      }),
      { numRuns: 300 },
    );
  });

  it('on slot tables drawn by hand, sensible or not', () => {
    const side = (n: fc.Arbitrary<number>, coil: fc.Arbitrary<number | undefined>) =>
      fc.record({
        slot: n,
        layer: fc.constantFrom(1, 2) as fc.Arbitrary<1 | 2>,
        phase: fc.constantFrom('A', 'B', 'C') as fc.Arbitrary<'A' | 'B' | 'C'>,
        polarity: fc.constantFrom(1, -1) as fc.Arbitrary<1 | -1>,
        turns: n,
        coil,
      });
    // Wild tables (anything at all) and tidy ones (valid slots and turns, no coil numbers) that reach the analysis.
    const tidy = fc.integer({ min: 1, max: 36 });
    const table = fc.oneof(
      fc.array(side(num, fc.option(num, { nil: undefined })), { maxLength: 30 }),
      fc.uniqueArray(side(tidy, fc.constant(undefined)), { minLength: 3, maxLength: 72, selector: (x) => `${x.slot}/${x.layer}` }),
    );
    fc.assert(
      fc.property(table, supply, (sides, s) => {
        const w = { ...lap(36, 4, 7), slotTable: sides.map(({ coil, ...rest }) => (coil === undefined ? rest : { ...rest, coil })) };
        expectWellFormed(analyseWinding({ winding: w, core: EXAMPLE_A_CORE, supply: s }));
      }),
      { numRuns: 300 },
    );
  });

  it('analyseSheet on sheets with arbitrary numbers', () => {
    const sheet = fc.record({
      bore: num,
      len: num,
      od: num,
      depth: num,
      tooth: num,
      kfe: num,
      turns: num,
      span: num,
      volts: num,
      hz: num,
      mlt: num,
      amps: num,
      r: num,
      t: num,
    });
    fc.assert(
      fc.property(sheet, (x) => {
        const s: WindingSheet = {
          core: {
            boreMm: x.bore,
            coreLengthMm: x.len,
            outsideDiameterMm: x.od,
            slots: 36,
            slotDepthMm: x.depth,
            slotWidthTopMm: x.tooth,
            slotWidthBottomMm: x.depth,
            toothWidthMm: x.tooth,
            stackingFactor: x.kfe,
          },
          winding: {
            layers: 2,
            style: 'lap',
            spans: [x.span],
            turnsPerCoil: [x.turns],
            parallelPaths: 1,
            connection: 'star',
            meanTurnLengthMm: x.mlt,
          },
          wires: [{ standard: 'awg', size: '18', count: 2, enamelGrade: 2 }],
          insulation: { thermalClass: 'F' },
          supply: { lineVoltageV: x.volts, frequencyHz: x.hz, poles: 4, ratedCurrentA: x.amps },
          resistance: { readings: [x.r, x.r, x.r], temperatureC: x.t, between: 'line-to-line' },
        };
        expectWellFormed(analyseSheet(s));
      }),
      { numRuns: 300 },
    );
  });
});
