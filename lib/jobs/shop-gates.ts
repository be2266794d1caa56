/**
 * Gates on the shop path: moves the path allows but the records must support. Pure: the server checks
 * them inside the status-move transaction (lib/jobs/job-writes.ts) and the job page explains them beside
 * the buttons, from the same facts, so the screen never offers what the server will refuse without saying why.
 *
 * - Testing → Ready: the newest final-test record's overall verdict is PASS, or an engineer has released
 *   that very record (or the lack of one) with a written reason.
 * - Customer approved → Winding: when another supply was asked for (a redesign request exists), a redesign
 *   revision must be approved first, or an engineer must record why the original winding is kept.
 * - Ready → Shipped: a job with no winding record at all (no as-found sheet, no approved redesign) cannot
 *   ship as repaired; it can still be returned unrepaired.
 */
import type { JobStatus } from '@/lib/db/generated/enums';
import { STATUS_LABELS } from './status-flow';

/** Decisions an engineer records to release a gate. */
export const GATE_DECISIONS = ['ready-override', 'keep-original-winding'] as const;
export type GateDecisionKind = (typeof GATE_DECISIONS)[number];

export interface GateDecision {
  kind: GateDecisionKind;
  reason: string;
  by: string;
  at: Date;
  /** For a Ready override: the test record it was given against (null: no record at all). */
  recordSequence: number | null;
}

export interface GateFacts {
  latestTest: { sequence: number; verdict: 'PASS' | 'FAIL' | 'INCOMPLETE' } | null;
  /** The newest decision of each kind. */
  readyOverride: GateDecision | null;
  keepOriginal: GateDecision | null;
  /** Why another supply is on record (e.g. "a redesign request, revision 2"), or null. */
  otherSupplyAsked: string | null;
  approvedRedesign: { revision: number } | null;
  hasAsFoundSheet: boolean;
}

export const GATE_MESSAGES = {
  ready: (latest: GateFacts['latestTest']) =>
    `Testing → Ready needs a final-test record whose overall verdict is PASS${latest ? ` (the newest, #${latest.sequence}, is ${latest.verdict === 'FAIL' ? 'FAIL' : 'not a full pass'})` : ' (none is recorded yet)'}, or an engineer's override with a written reason.`,
  winding: (why: string) =>
    `Winding cannot start: another supply was asked for (${why}). An engineer must approve a redesign revision, or record why the original winding is kept.`,
  shipped:
    'This job has no winding record (no as-found winding data and no approved redesign), so it cannot ship as repaired. Record the winding data, or return it unrepaired.',
} as const;

/** The override that releases Ready must name the newest record; a later retest needs its own verdict or release. */
export function readyReleased(f: GateFacts): boolean {
  if (f.latestTest?.verdict === 'PASS') return true;
  return f.readyOverride !== null && f.readyOverride.recordSequence === (f.latestTest?.sequence ?? null);
}

/** Why the move from → to is refused by the records, or null when the records allow it. */
export function gateRefusal(from: JobStatus, to: JobStatus, f: GateFacts): string | null {
  if (from === 'TESTING' && to === 'READY' && !readyReleased(f)) return GATE_MESSAGES.ready(f.latestTest);
  if (from === 'CUSTOMER_APPROVED' && to === 'WINDING' && f.otherSupplyAsked && !f.approvedRedesign && !f.keepOriginal) {
    return GATE_MESSAGES.winding(f.otherSupplyAsked);
  }
  if (from === 'READY' && to === 'SHIPPED' && !f.hasAsFoundSheet && !f.approvedRedesign) return GATE_MESSAGES.shipped;
  return null;
}

/** Which decision an engineer can record to release a refused move, if any. */
export function releasingDecision(from: JobStatus, to: JobStatus): GateDecisionKind | null {
  if (from === 'TESTING' && to === 'READY') return 'ready-override';
  if (from === 'CUSTOMER_APPROVED' && to === 'WINDING') return 'keep-original-winding';
  return null;
}

/** The timeline line of a decision, in words. */
export function decisionMessage(kind: GateDecisionKind, reason: string, latest: GateFacts['latestTest']): string {
  return kind === 'ready-override'
    ? `Engineer's override: ${STATUS_LABELS.TESTING} → ${STATUS_LABELS.READY} released without a passing final test (${latest ? `record #${latest.sequence}, ${latest.verdict}` : 'no test record'}). Reason: ${reason}`
    : `Engineer's decision: the original winding is kept although another supply was asked for. Reason: ${reason}`;
}
