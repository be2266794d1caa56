import { describe, expect, it } from 'vitest';
import { fluxRatio, supplyScaling, type ScalingCase } from '@/lib/engine/supply-scaling';
import type { WindingSpec } from '@/lib/engine/winding-layout';
import { EXAMPLE_A_SPEC, errorOf, value } from '../../support/fixtures/winding-fixtures';

const baseline: ScalingCase = { winding: EXAMPLE_A_SPEC, supply: { lineVoltageV: 400, frequencyHz: 50 } };
const moved = (winding: Partial<WindingSpec>, supply: Partial<ScalingCase['supply']> = {}): ScalingCase => ({
  winding: { ...EXAMPLE_A_SPEC, ...winding },
  supply: { ...baseline.supply, ...supply },
});

describe('flux ratio check values, baseline example A (docs/engineering/redesign.md, [derived], ±0.001)', () => {
  it.each([
    {
      name: '400 V Y 50 Hz → 460 V Y 60 Hz, same winding',
      next: moved({}, { lineVoltageV: 460, frequencyHz: 60 }),
      ratio: 0.9583,
      verdict: 'ok',
    },
    { name: '400 V Y → 400 V Δ, same winding (reject)', next: moved({ connection: 'delta' }), ratio: 1.7321, verdict: 'over-fluxed' },
    { name: 'Y → Δ with N_c 14 → 24', next: moved({ connection: 'delta', turnsPerCoil: [24] }), ratio: 1.0104, verdict: 'ok' },
    {
      name: '50 → 60 Hz at 400 V with N_c 14 → 12',
      next: moved({ turnsPerCoil: [12] }, { frequencyHz: 60 }),
      ratio: 0.9722,
      verdict: 'ok',
    },
    { name: 'span 1–8 → 1–9, same turns', next: moved({ spans: [8] }), ratio: 0.9542, verdict: 'ok' },
  ])('$name: Φ_new/Φ_old = $ratio', ({ next, ratio, verdict }) => {
    const r = value(supplyScaling(baseline, next));
    expect(Math.abs(r.fluxRatio - ratio)).toBeLessThanOrEqual(0.001);
    expect(r.yokeRatio).toBe(r.fluxRatio);
    expect(r.gapToothRatio).toBe(r.fluxRatio);
    expect(r.verdict).toBe(verdict);
  });
});

describe('redesign rules keep the flux (docs/engineering/redesign.md table, [derived])', () => {
  it.each([
    { change: 'voltage 400 → 460 V, turns ×460/400', next: moved({ turnsPerCoil: [(14 * 460) / 400] }, { lineVoltageV: 460 }) },
    { change: 'star → delta at the same line voltage, turns ×√3', next: moved({ connection: 'delta', turnsPerCoil: [14 * Math.sqrt(3)] }) },
    { change: '50 → 60 Hz at the same voltage, turns ×5/6', next: moved({ turnsPerCoil: [(14 * 5) / 6] }, { frequencyHz: 60 }) },
    { change: '60 → 50 Hz at the same voltage, turns ×6/5', next: moved({ turnsPerCoil: [(14 * 6) / 5] }, { frequencyHz: 50 }), oldHz: 60 },
    { change: 'parallel paths 1 → 2, turns ×2', next: moved({ parallelPaths: 2, turnsPerCoil: [28] }) },
  ])('$change', ({ next, oldHz }) => {
    // Turns counts are whole in a real winding: compare the formula with the fractional turns it asks for.
    const old = {
      lineVoltageV: 400,
      frequencyHz: oldHz ?? 50,
      connection: 'star' as const,
      seriesTurnsPerPhase: 168,
      windingFactor: 0.9019,
      poles: 4,
    };
    const w = next.winding;
    const r = fluxRatio(old, {
      lineVoltageV: next.supply.lineVoltageV,
      frequencyHz: next.supply.frequencyHz,
      connection: w.connection,
      seriesTurnsPerPhase: (12 * (w.turnsPerCoil[0] ?? NaN)) / w.parallelPaths,
      windingFactor: 0.9019,
      poles: 4,
    });
    expect(r.fluxRatio).toBeCloseTo(1, 12);
  });

  it('span y1 → y2: turns ×k_w(y1)/k_w(y2) keeps the flux', () => {
    const kw7 = 0.9019123546349622;
    const r = value(supplyScaling(baseline, moved({ spans: [8] })));
    expect(r.fluxRatio).toBeCloseTo(r.old.windingFactor / r.next.windingFactor, 12);
    expect(r.old.windingFactor).toBeCloseTo(kw7, 12);
  });

  it('a 60 Hz winding on 50 Hz at equal voltage is 20 % over-fluxed', () => {
    const r = value(supplyScaling(moved({}, { frequencyHz: 60 }), baseline));
    expect(r.fluxRatio).toBeCloseTo(1.2, 12);
    expect(r.verdict).toBe('over-fluxed');
  });

  it('pole changes: gap and tooth scale with Φ·P_new/P_old, yoke with Φ, and call for engineer review', () => {
    const r = value(supplyScaling(baseline, moved({ poles: 2, spans: [14] })));
    expect(r.gapToothRatio).toBeCloseTo((r.fluxRatio * 2) / 4, 12);
    expect(r.yokeRatio).toBe(r.fluxRatio);
    expect(r.polesChanged).toBe(true);
    expect(r.notes.join(' ')).toMatch(/engineer/);
  });

  it('refuses a different slot count (another core)', () => {
    expect(errorOf(supplyScaling(baseline, moved({ slots: 48, spans: [10] }))).code).toBe('not-applicable');
  });

  it('names the side and field of a bad input', () => {
    expect(errorOf(supplyScaling(baseline, moved({ spans: [40] }))).field).toBe('new.winding.spans.0');
    expect(errorOf(supplyScaling(baseline, moved({}, { frequencyHz: 0 }))).field).toBe('new.supply.frequencyHz');
  });
});
