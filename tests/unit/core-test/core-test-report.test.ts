import { describe, expect, it } from 'vitest';
import { DEFAULT_CORE_LOSS_SETTINGS } from '@/lib/core-test/core-loss-settings';
import type { StoredCoreTest } from '@/lib/core-test/core-test-queries';
import { coreTestReport } from '@/lib/core-test/core-test-report';
import type { CoreTestData } from '@/lib/core-test/core-test-schema';
import { EXAMPLE_A_SHEET } from '../../support/fixtures/winding-fixtures';

/** 280 turns on the example A core at 50 Hz need 0.823044·280 = 230.452 V for 1.3 T [derived, docs/engineering/core-loss.md §3]. */
const V_13 = 230.4523;

function stored(id: string, stage: StoredCoreTest['stage'], watts: number, over: Partial<CoreTestData> = {}): StoredCoreTest {
  return {
    id,
    jobId: 'j',
    stage,
    version: 1,
    testedAt: new Date(`2026-11-30T0${id}:00:00Z`),
    testedBy: null,
    updatedAt: new Date(),
    data: {
      loopTurns: 280,
      voltageV: V_13,
      currentA: 0.8,
      watts,
      frequencyHz: 50,
      hotSpots: [],
      instrument: undefined,
      notes: undefined,
      ...over,
    },
  };
}

describe('coreTestReport on the example A core', () => {
  it('plans 280 turns on the 230 V planning supply [derived]', () => {
    const r = coreTestReport(EXAMPLE_A_SHEET, [], DEFAULT_CORE_LOSS_SETTINGS, 1.2045);
    expect(r.plan?.turns).toBe(280);
    expect(r.verdict.status).toBe('incomplete');
    expect(r.lossChangeAtRatingW).toBeNull();
  });

  it('judges 27 W after stripping against 25 W before: +8 %, and ΔP_fe = 2 W·(1.2045/1.3)² = 1.7169 W at the rated density [derived]', () => {
    const r = coreTestReport(
      EXAMPLE_A_SHEET,
      [stored('2', 'AFTER_STRIPPING', 27), stored('1', 'BEFORE_STRIPPING', 25)],
      DEFAULT_CORE_LOSS_SETTINGS,
      1.2045,
    );
    expect(r.verdict.status).toBe('acceptable');
    expect(r.verdict.changeFraction).toBeCloseTo(0.08, 5);
    expect(r.lossChangeAtRatingW).toBeCloseTo(1.71692, 4);
    expect(r.figures.map((f) => f.result?.loss.fluxDensityT.toFixed(4))).toEqual(['1.3000', '1.3000']);
  });

  it('judges the newest test of each stage: a repeat after stripping replaces the first', () => {
    const tests = [stored('3', 'AFTER_STRIPPING', 26), stored('2', 'AFTER_STRIPPING', 40), stored('1', 'BEFORE_STRIPPING', 25)];
    expect(coreTestReport(EXAMPLE_A_SHEET, tests, DEFAULT_CORE_LOSS_SETTINGS, 1.2045).verdict.changeFraction).toBeCloseTo(0.04, 5);
  });

  it('leaves the core-loss change out when the tests ran at another frequency than the rating, and says so', () => {
    const sixty = (id: string, stage: StoredCoreTest['stage'], w: number) =>
      stored(id, stage, w, { frequencyHz: 60, voltageV: V_13 * 1.2 });
    const r = coreTestReport(
      EXAMPLE_A_SHEET,
      [sixty('2', 'AFTER_STRIPPING', 27), sixty('1', 'BEFORE_STRIPPING', 25)],
      DEFAULT_CORE_LOSS_SETTINGS,
      1.2045,
    );
    expect(r.verdict.status).toBe('acceptable');
    expect(r.lossChangeAtRatingW).toBeNull();
    expect(r.lossChangeNote).toContain('ran at 60 Hz, the winding is rated 50 Hz');
  });

  it('without a sheet: no plan, and each test says what it needs', () => {
    const r = coreTestReport(null, [stored('1', 'BEFORE_STRIPPING', 25)], DEFAULT_CORE_LOSS_SETTINGS, null);
    expect(r.plan).toBeNull();
    expect(r.figures[0]?.problem).toContain('as-found sheet');
  });

  it('applies the shop’s hot-spot limit: 9 K passes at the default 10 K and fails at 8 K', () => {
    const tests = [
      stored('2', 'AFTER_STRIPPING', 25, { hotSpots: [{ slot: 4, axialPositionMm: 60, riseK: 9 }] }),
      stored('1', 'BEFORE_STRIPPING', 25),
    ];
    expect(coreTestReport(EXAMPLE_A_SHEET, tests, DEFAULT_CORE_LOSS_SETTINGS, 1.2045).verdict.status).toBe('acceptable');
    expect(coreTestReport(EXAMPLE_A_SHEET, tests, { ...DEFAULT_CORE_LOSS_SETTINGS, hotSpotRiseLimitK: 8 }, 1.2045).verdict.status).toBe(
      'not-acceptable',
    );
  });
});
