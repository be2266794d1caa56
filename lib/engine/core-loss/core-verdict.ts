/**
 * The verdict on a core from its loop tests: the specific loss after stripping (or after repairs, when the
 * core was repaired) against the loss before stripping, both brought to the planned density, judged
 * against the shop's acceptance limit on the rise, together with the hot spots of the latest test.
 *
 *   change = p_ref,after/p_ref,before − 1
 *   acceptable ⇔ change ≤ limit and no hot spot of the latest test above its limit
 *
 * Default limit: a rise of at most 20 % [common practice, from memory: shops commonly accept a core whose
 * loss rose by no more than about 20 % over the burn-off; configurable (shop setting)].
 */
import type { HotSpotFinding } from './hot-spots';
import type { SpecificLoss } from './specific-loss';

export const DEFAULT_CORE_LOSS_RISE_LIMIT = 0.2;

export type CoreStage = 'before-stripping' | 'after-stripping' | 'after-repairs';

export const CORE_STAGE_LABELS: Record<CoreStage, string> = {
  'before-stripping': 'before stripping',
  'after-stripping': 'after stripping',
  'after-repairs': 'after core repairs',
};

export interface StageResult {
  stage: CoreStage;
  frequencyHz: number;
  loss: SpecificLoss;
  hotSpots: HotSpotFinding[];
}

export type CoreVerdictStatus = 'acceptable' | 'not-acceptable' | 'incomplete';

export interface CoreVerdict {
  status: CoreVerdictStatus;
  /** The stage judged against "before stripping" (the latest of after repairs / after stripping). */
  judgedStage: CoreStage | null;
  /** p_ref,after/p_ref,before − 1, or null when there is nothing to compare. */
  changeFraction: number | null;
  limitFraction: number;
  /** The verdict in words, first sentence first. */
  words: string[];
}

const pct = (f: number): string => `${f >= 0 ? '+' : '−'}${Math.abs(f * 100).toFixed(1)} %`;
const wkg = (v: number): string => `${v.toFixed(3)} W/kg`;

/** Judges the latest after-work test against the before-stripping test. */
export function coreVerdict(stages: Partial<Record<CoreStage, StageResult>>, limitFraction = DEFAULT_CORE_LOSS_RISE_LIMIT): CoreVerdict {
  const before = stages['before-stripping'];
  const after = stages['after-repairs'] ?? stages['after-stripping'];
  const base = { limitFraction, judgedStage: after?.stage ?? null, changeFraction: null };
  if (!before || !after) {
    const missing = !before ? 'before stripping' : 'after stripping';
    return { ...base, status: 'incomplete', words: [`No verdict yet: record the loop test ${missing} to compare the core's loss.`] };
  }
  if (before.frequencyHz !== after.frequencyHz) {
    return {
      ...base,
      status: 'incomplete',
      words: [
        `No verdict: the test ${CORE_STAGE_LABELS[after.stage]} ran at ${after.frequencyHz} Hz and the test before stripping at ${before.frequencyHz} Hz. Iron loss depends on frequency; repeat the test at ${before.frequencyHz} Hz to compare.`,
      ],
    };
  }
  const change = after.loss.wattsPerKgAtReference / before.loss.wattsPerKgAtReference - 1;
  const hot = after.hotSpots.filter((h) => h.overLimit);
  const within = change <= limitFraction;
  const words: string[] = [];
  const at = `at ${after.loss.referenceFluxDensityT.toFixed(2)} T`;
  words.push(
    `Core loss ${CORE_STAGE_LABELS[after.stage]} ${wkg(after.loss.wattsPerKgAtReference)} against ${wkg(before.loss.wattsPerKgAtReference)} before stripping (${at}): ${pct(change)}, ` +
      (within ? `within the shop's limit of ${pct(limitFraction)}.` : `more than the shop's limit of ${pct(limitFraction)}.`),
  );
  for (const h of hot)
    words.push(
      `Hot spot at slot ${h.slot}, ${(h.axialPositionM * 1000).toFixed(0)} mm from the drive-end face: ${h.riseK.toFixed(1)} K above the core.`,
    );
  if (within && hot.length === 0) {
    words.push('The core is fit to rewind.');
    return { ...base, status: 'acceptable', changeFraction: change, words };
  }
  words.push(
    'The core is not fit to rewind as it is: the lamination insulation is likely damaged. Repair the hot spots (or restack or replace the core) and test again before rewinding.',
  );
  return { ...base, status: 'not-acceptable', changeFraction: change, words };
}
