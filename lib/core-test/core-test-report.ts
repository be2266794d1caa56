/**
 * A job's core-loss figures, composed from the as-found core, the stored tests and the shop settings:
 * the loop plan's geometry (section, path, masses), each stage's specific loss at the planned density,
 * the verdict in words, and the core-loss change at the motor's own back-iron density for the efficiency
 * statement. Pure: the page and the job sheet call it with data they loaded.
 */
import { coreVerdict, type CoreStage, type CoreVerdict, type StageResult } from '@/lib/engine/core-loss/core-verdict';
import { judgeHotSpots } from '@/lib/engine/core-loss/hot-spots';
import { coreLossChangeAtRatingW } from '@/lib/engine/core-loss/loss-at-rating';
import { loopTestPlan, type LoopPlan } from '@/lib/engine/core-loss/loop-plan';
import { specificLoss } from '@/lib/engine/core-loss/specific-loss';
import type { EngineError } from '@/lib/engine/result';
import type { CoreTestStageValue } from '@/lib/core-test/core-test-schema';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import type { CoreLossSettings } from './core-loss-settings';
import { coreRingFromSheet } from './core-ring-from-sheet';
import { latestByStage, type StoredCoreTest } from './core-test-queries';

export const STAGE_KEYS: Record<CoreTestStageValue, CoreStage> = {
  BEFORE_STRIPPING: 'before-stripping',
  AFTER_STRIPPING: 'after-stripping',
  AFTER_REPAIRS: 'after-repairs',
};

/** The supply a plan starts from until the shop types its own: a common single-phase shop supply [common practice]. */
export const DEFAULT_PLANNING_SUPPLY_V = 230;

export interface TestFigures {
  test: StoredCoreTest;
  /** Null when the reading cannot be judged (the message says why). */
  result: StageResult | null;
  problem: string | null;
}

export interface CoreTestReport {
  plan: LoopPlan | null;
  planError: EngineError | null;
  figures: TestFigures[];
  verdict: CoreVerdict;
  /** ΔP_fe at the rated back-iron density, W; null when not measured or not comparable. */
  lossChangeAtRatingW: number | null;
  lossChangeNote: string;
}

/**
 * @param ratedBackIronT back-iron density at rated voltage from the as-found analysis (docs/engineering/flux-density.md), if known
 */
export function coreTestReport(
  sheet: WindingSheet | null,
  tests: readonly StoredCoreTest[],
  settings: CoreLossSettings,
  ratedBackIronT: number | null,
): CoreTestReport {
  const planned = sheet
    ? loopTestPlan({
        ring: coreRingFromSheet(sheet.core),
        testFluxDensityT: settings.testFluxDensityT,
        frequencyHz: sheet.supply.frequencyHz,
        supplyVoltageV: DEFAULT_PLANNING_SUPPLY_V,
        fieldStrengthAPerM: settings.fieldStrengthAPerM,
      })
    : null;
  const plan = planned?.ok ? planned.value : null;
  const planError = planned && !planned.ok ? planned.error : null;
  const figures: TestFigures[] = tests.map((test) => {
    if (!plan) return { test, result: null, problem: 'Save the as-found sheet’s core to work out W/kg.' };
    const d = test.data;
    const loss = specificLoss(
      { voltageV: d.voltageV, currentA: d.currentA, watts: d.watts, frequencyHz: d.frequencyHz, turns: d.loopTurns },
      plan.section.areaM2,
      plan.backIronMassKg,
      settings.testFluxDensityT,
    );
    if (!loss.ok) return { test, result: null, problem: loss.error.message };
    const hotSpots = judgeHotSpots(
      d.hotSpots.map((h) => ({ slot: h.slot, axialPositionM: h.axialPositionMm / 1000, riseK: h.riseK })),
      settings.hotSpotRiseLimitK,
    );
    return { test, result: { stage: STAGE_KEYS[test.stage], frequencyHz: d.frequencyHz, loss: loss.value, hotSpots }, problem: null };
  });
  const latest = latestByStage(tests);
  const stages: Partial<Record<CoreStage, StageResult>> = {};
  for (const [stage, test] of Object.entries(latest) as [CoreTestStageValue, StoredCoreTest][]) {
    const r = figures.find((f) => f.test.id === test.id)?.result;
    if (r) stages[STAGE_KEYS[stage]] = r;
  }
  const verdict = coreVerdict(stages, settings.coreLossRiseLimit);
  let lossChangeAtRatingW: number | null = null;
  let lossChangeNote = 'No core-loss change is included: the loop tests before and after stripping are not both recorded.';
  const before = stages['before-stripping'];
  const after = verdict.judgedStage ? stages[verdict.judgedStage] : undefined;
  if (before && after && plan && verdict.changeFraction !== null) {
    if (sheet && after.frequencyHz !== sheet.supply.frequencyHz) {
      lossChangeNote = `No core-loss change is included: the loop tests ran at ${after.frequencyHz} Hz, the winding is rated ${sheet.supply.frequencyHz} Hz.`;
    } else if (ratedBackIronT === null) {
      lossChangeNote = 'No core-loss change is included: the back-iron flux density at rated voltage is not known from the sheet.';
    } else {
      lossChangeAtRatingW = coreLossChangeAtRatingW(
        before.loss.wattsPerKgAtReference,
        after.loss.wattsPerKgAtReference,
        plan.backIronMassKg,
        ratedBackIronT,
        settings.testFluxDensityT,
      );
      lossChangeNote = `Core-loss change from the loop tests (back iron only), brought from ${settings.testFluxDensityT.toFixed(2)} T to the rated back-iron density ${ratedBackIronT.toFixed(3)} T by the square of the density ratio.`;
    }
  }
  return { plan, planError, figures, verdict, lossChangeAtRatingW, lossChangeNote };
}
