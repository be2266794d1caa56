/**
 * A pass/fail judgement of one test reading against one rule, with the rule spelled out for the sheet.
 */
export interface Verdict {
  pass: boolean;
  /** The value judged (after any correction the rule calls for). */
  value: number;
  /** The limit it was judged against. */
  limit: number;
  /** Human text naming the rule and its source, e.g. "IEEE 43: PI ≥ 2.0 for class F insulation". */
  rule: string;
}
