/**
 * Hot spots found during a loop test (by thermal camera or touch probe): a local temperature rise over the
 * surrounding core points to shorted laminations. A rise above the shop's limit is a finding to repair
 * before rewinding. Default limit 10 K above the core's general temperature [common practice, from memory:
 * shops commonly act on 5–10 K; configurable by passing another limit].
 */
export const DEFAULT_HOT_SPOT_RISE_LIMIT_K = 10;

export interface HotSpot {
  slot: number;
  /** Distance from the drive-end face of the core, m. */
  axialPositionM: number;
  /** Temperature rise over the surrounding core, K. */
  riseK: number;
}

export interface HotSpotFinding extends HotSpot {
  overLimit: boolean;
}

/** Each hot spot judged against the limit (strictly above the limit is a finding). */
export const judgeHotSpots = (spots: readonly HotSpot[], limitK = DEFAULT_HOT_SPOT_RISE_LIMIT_K): HotSpotFinding[] =>
  spots.map((s) => ({ ...s, overLimit: s.riseK > limitK }));
