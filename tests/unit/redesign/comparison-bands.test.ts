import { describe, expect, it } from 'vitest';
import { searchRedesign } from '@/lib/engine/redesign/search';
import { comparisonBands } from '@/lib/redesign/comparison-bands';
import { EXAMPLE_A_ORIGINAL, METRIC_STOCK, requestFor } from '../../support/fixtures/redesign-fixtures';
import { value } from '../../support/fixtures/winding-fixtures';

// Example A's own densities (reference §2 worked example, [derived]): gap peak 0.7628 T, tooth 1.617 T, yoke 1.2045 T.
const FLUX = { gapPeakT: 0.7628, toothT: 1.617, yokeT: 1.2045 };

describe('comparison bands', () => {
  const req = requestFor({ poles: 6 });
  const r = value(searchRedesign(EXAMPLE_A_ORIGINAL, req, METRIC_STOCK));
  const pinned = r.candidates.slice(0, 2);
  const bands = comparisonBands(pinned, r, req.limits, FLUX, 0.1359, 6 / 4);

  it('gives the six quantities, each with the allowed range, the as-found mark and one mark per pinned candidate inside its scale', () => {
    expect(bands.map((b) => b.key)).toEqual(['gap', 'tooth', 'yoke', 'currentDensity', 'slotFill', 'harmonics']);
    for (const b of bands) {
      expect(b.values).toHaveLength(2);
      for (const v of [b.original, ...b.values, ...b.allowed]) {
        expect(v).toBeGreaterThanOrEqual(b.domain[0]);
        expect(v).toBeLessThanOrEqual(b.domain[1]);
      }
    }
  });

  it('writes flux densities in T with kilolines per square inch beside (1 T = 64.516 kl/in², reference §2)', () => {
    const gap = bands.find((b) => b.key === 'gap');
    expect(gap?.originalText).toBe('0.763 T (49.2 kl/in²) · +0.0 %');
    expect(gap?.allowed).toEqual([0.7628 * 0.9, 0.7628 * 1.05]);
  });

  it('explains the forced back-iron fall on a pole increase', () => {
    expect(bands.find((b) => b.key === 'yoke')?.note).toMatch(/about 67 % of the original .* forced and costs nothing/);
  });
});
