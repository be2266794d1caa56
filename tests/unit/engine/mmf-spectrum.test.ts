import { describe, expect, it } from 'vitest';
import { mmfSpectrum, mmfWaveform, type MmfPoint } from '@/lib/engine/mmf-spectrum';
import { harmonicWindingFactors } from '@/lib/engine/slot-star';
import type { SlotTable, WindingSpec } from '@/lib/engine/winding-layout';
import { fft } from './fft';
import { lap, layoutOf, singleLayer } from '../../support/fixtures/winding-fixtures';

// Source for this file: docs/engineering/winding-factor.md "MMF space harmonics", [derived], verified numerically by FFT of the
// slot-current staircase (the FFT checks below).

const LAYOUTS: [string, WindingSpec][] = [
  ['36/4 lap 1–8', lap(36, 4, 7)],
  ['36/4 lap full pitch', lap(36, 4, 9)],
  ['48/4 lap 1–11', lap(48, 4, 10)],
  ['30/4 lap (q = 5/2)', lap(30, 4, 7)],
  ['27/4 lap (q = 9/4)', lap(27, 4, 6)],
  ['36/4 single-layer concentric', singleLayer(36, 4, [11, 9, 7])],
];

describe('balanced three-phase MMF (docs/engineering/winding-factor.md, [derived])', () => {
  it.each(LAYOUTS)('%s: triplens cancel, 3k+1 orders run forward and 3k−1 backward', (_n, spec) => {
    const layout = layoutOf(spec);
    const kw = new Map(harmonicWindingFactors(layout, 25).map((f) => [f.order, f.kw]));
    for (const h of mmfSpectrum(layout, { frequencyHz: 50 }, 25).harmonics) {
      if (!Number.isInteger(h.order)) continue;
      if ((kw.get(h.order) ?? 0) === 0 || h.order % 3 === 0) expect(h.direction).toBe('cancelled');
      else expect(h.direction).toBe(h.order % 3 === 1 ? 'forward' : 'backward');
    }
  });

  it.each(LAYOUTS)('%s: amplitude of order ν relative to the working wave is (k_wν/ν)/k_w1', (_n, spec) => {
    const layout = layoutOf(spec);
    const kw = new Map(harmonicWindingFactors(layout, 25).map((f) => [f.order, f.kw]));
    const kw1 = kw.get(1) ?? NaN;
    for (const h of mmfSpectrum(layout, { frequencyHz: 50 }, 25).harmonics) {
      const expected = (kw.get(h.order) ?? NaN) / h.order / kw1;
      if (h.direction === 'cancelled') expect(h.relativeAmplitude).toBe(0);
      else expect(h.relativeAmplitude).toBeCloseTo(expected, 12);
      expect(h.singlePhaseRelative).toBeCloseTo(expected, 12);
    }
  });

  it('each phase alone has the triplens the three together cancel (36/4 full pitch, 3rd and 9th)', () => {
    const s = mmfSpectrum(layoutOf(lap(36, 4, 9)), { frequencyHz: 50 }, 9).harmonics;
    for (const nu of [3, 9]) {
      const h = s.find((x) => x.order === nu);
      expect(h?.direction).toBe('cancelled');
      expect(h?.singlePhaseRelative).toBeGreaterThan(0.01);
    }
  });

  // Reference example: 4 poles 50 Hz: 5th at −300 rpm, 7th at +214.3 rpm, 11th −136.4, 13th +115.4.
  it.each([
    { order: 5, rpm: -300 },
    { order: 7, rpm: 214.3 },
    { order: 11, rpm: -136.4 },
    { order: 13, rpm: 115.4 },
  ])('4 poles 50 Hz: order $order turns at $rpm rpm (n_s/ν, sign by direction)', ({ order, rpm }) => {
    const s = mmfSpectrum(layoutOf(lap(36, 4, 8)), { frequencyHz: 50 }, 13);
    expect(s.synchronousRpm).toBe(1500);
    const h = s.harmonics.find((x) => x.order === order);
    expect(h?.speedRpm).toBeCloseTo(rpm, 1);
    expect(h?.speedFraction).toBeCloseTo(Math.sign(rpm) / order, 12);
  });

  it('gives the working-wave amplitude (3/2)(4/π)·k_w1·N_ph/P per ampere (36/4 1–8, N_ph 120)', () => {
    const layout = layoutOf(lap(36, 4, 7));
    const kw1 = harmonicWindingFactors(layout, 1)[0]?.kw ?? NaN;
    expect(mmfSpectrum(layout, { frequencyHz: 50 }, 1).fundamentalAmpereTurnsPerAmp).toBeCloseTo((1.5 * (4 / Math.PI) * kw1 * 120) / 4, 9);
  });
});

/** Samples the staircase at `perSlot` points per slot pitch, midway in each sub-interval. */
function sample(points: MmfPoint[], slots: number, perSlot: number): number[] {
  const plateaus = points.filter((_, i) => i % 2 === 1).map((p) => p.value);
  return Array.from({ length: slots * perSlot }, (_, i) => plateaus[Math.floor(i / perSlot)] ?? NaN);
}

/** FFT of the staircase at ωt = timeDeg: complex coefficient per mechanical order. */
function staircaseSpectrum(layout: SlotTable, timeDeg: number, perSlot = 256) {
  const x = sample(mmfWaveform(layout, timeDeg), layout.slots, perSlot);
  return { X: fft(x.map((re) => ({ re, im: 0 }))), n: x.length };
}

describe('numerical cross-check: FFT of the slot-current staircase', () => {
  it.each(LAYOUTS)('%s: FFT amplitudes match the spectrum to 0.1 % (orders to 25)', (_n, spec) => {
    const layout = layoutOf(spec);
    const p = layout.poles / 2;
    const spectrum = mmfSpectrum(layout, { frequencyHz: 50 }, 25);
    const { X, n } = staircaseSpectrum(layout, 0);
    // Peak amplitude of order k from the FFT: 2|X[k]|/N. The staircase is exact; sampling it shrinks
    // order k by sin(πk/N)/(πk/N) against the continuous series, under 3e-4 here.
    const amp = (k: number) => (2 * Math.hypot(X[k]?.re ?? NaN, X[k]?.im ?? NaN)) / n;
    const a1 = amp(p);
    expect(Math.abs(a1 - spectrum.fundamentalAmpereTurnsPerAmp) / spectrum.fundamentalAmpereTurnsPerAmp).toBeLessThan(1e-3);
    for (const h of spectrum.harmonics) {
      const measured = amp(h.mechanicalOrder) / a1;
      expect(Math.abs(measured - h.relativeAmplitude)).toBeLessThanOrEqual(1e-3 * h.relativeAmplitude + 1e-9);
    }
  });

  it.each(LAYOUTS)('%s: between two instants each wave moves the way the spectrum says', (_n, spec) => {
    const layout = layoutOf(spec);
    const spectrum = mmfSpectrum(layout, { frequencyHz: 50 }, 25);
    const dt = 10;
    const a = staircaseSpectrum(layout, 0, 16).X;
    const b = staircaseSpectrum(layout, dt, 16).X;
    for (const h of spectrum.harmonics) {
      if (h.direction === 'cancelled' || h.direction === 'both') continue;
      const k = h.mechanicalOrder;
      const za = a[k] ?? { re: NaN, im: NaN };
      const zb = b[k] ?? { re: NaN, im: NaN };
      // Phase change of e^{−jkθ} coefficient: −ωΔt for a forward wave cos(kθ − ωt), +ωΔt backward.
      const dPhase = (Math.atan2(za.re * zb.im - za.im * zb.re, za.re * zb.re + za.im * zb.im) * 180) / Math.PI;
      expect(dPhase).toBeCloseTo(h.direction === 'forward' ? -dt : dt, 6);
    }
  });
});
