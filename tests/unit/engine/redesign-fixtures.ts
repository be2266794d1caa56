/** Shared inputs for the redesign tests (not a test file itself). */
import { DEFAULT_REDESIGN_LIMITS, originalFromSheet, stockWire } from '@/lib/engine/redesign/from-sheet';
import type { RedesignOriginal, RedesignRequest, RedesignTarget, StockWire } from '@/lib/engine/redesign/types';
import { listMetricSizes } from '@/lib/engine/wire';
import { EXAMPLE_A_SHEET, value } from './winding-fixtures';

/** Every metric nominal size from 0.40 to 1.60 mm, grade 2 (25 sizes): a generous invented stock. */
export const METRIC_STOCK: StockWire[] = listMetricSizes()
  .filter((s) => s.bareMm >= 0.4 && s.bareMm <= 1.6)
  .map((s) => value(stockWire({ standard: 'metric', size: s.size, enamelGrade: 2 })));

/** Example A (docs/engineering/flux-density.md) as the search's original: 36 slots, 4 poles, lap 1–8, N_c 14, star, 400 V 50 Hz. */
export const EXAMPLE_A_ORIGINAL: RedesignOriginal = value(originalFromSheet(EXAMPLE_A_SHEET, 1440));

/** A request on example A: same poles, span and layers unless overridden, shop default limits. */
export function requestFor(target: Partial<RedesignTarget>, limits: Partial<RedesignRequest['limits']> = {}): RedesignRequest {
  return {
    target: { lineVoltageV: 400, frequencyHz: 50, poles: 4, connection: 'star', spans: [], layers: 'keep', parallelPaths: [], ...target },
    limits: { ...DEFAULT_REDESIGN_LIMITS, ...limits },
  };
}
