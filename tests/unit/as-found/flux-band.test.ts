import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_FLUX_LIMITS } from '@/lib/engine/flux';
import { fluxBandText } from '@/lib/as-found/flux-band';

// Bands from lib/engine/flux.ts DEFAULT_FLUX_LIMITS (typical ranges, reference §3 [from memory]).
describe('flux density labels show the band the verdict used', () => {
  it('labels back iron at 1.204 T as in the conservative 1.2–1.5 T band, not "in range · 1.4–1.7 T" (issue 9)', () => {
    expect(fluxBandText(1.204, DEFAULT_FLUX_LIMITS.yoke)).toEqual({ verdict: 'in the conservative range', band: '1.2–1.5 T' });
  });
  it('names the band for each verdict', () => {
    expect(fluxBandText(1.6, DEFAULT_FLUX_LIMITS.yoke)).toEqual({
      verdict: 'above conservative',
      band: 'conservative 1.2–1.5 T; typical up to 1.7 T',
    });
    expect(fluxBandText(1.8, DEFAULT_FLUX_LIMITS.yoke).band).toBe('above the typical 1.4–1.7 T');
    expect(fluxBandText(1.0, DEFAULT_FLUX_LIMITS.yoke).band).toBe('below 1.2 T');
    expect(fluxBandText(0.45, DEFAULT_FLUX_LIMITS.gapAverage)).toEqual({ verdict: 'in the typical range', band: '0.3–0.6 T' });
  });
  it('never says a value is in a band it lies outside [property]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 3, noNaN: true }),
        fc.constantFrom('yoke', 'tooth', 'gapAverage', 'gapPeak'),
        (tesla, key) => {
          const r = fluxBandText(tesla, DEFAULT_FLUX_LIMITS[key as keyof typeof DEFAULT_FLUX_LIMITS]);
          const m = /^(\d+(?:\.\d+)?)–(\d+(?:\.\d+)?) T$/.exec(r.band);
          if (r.verdict.startsWith('in ') && m) {
            expect(tesla).toBeGreaterThanOrEqual(Number(m[1]));
            expect(tesla).toBeLessThanOrEqual(Number(m[2]));
          }
        },
      ),
    );
  });
});
