import type { JobStatus } from '@/lib/db/generated/enums';
import { MAIN_PATH } from './status-flow';

export type StepState = 'done' | 'current' | 'next' | 'later' | 'paused' | 'not reached';

/**
 * Each main-path step's state for a job: done before the current step, the one after it next. A job on
 * hold keeps the step it left as "paused"; a job returned unrepaired did not reach the remaining steps.
 */
export function shopPathSteps(status: JobStatus, heldFrom: JobStatus | null): { status: JobStatus; state: StepState }[] {
  const at = MAIN_PATH.indexOf(status);
  const held = at < 0 && heldFrom ? MAIN_PATH.indexOf(heldFrom) : -1;
  return MAIN_PATH.map((s, i) => {
    let state: StepState;
    if (at >= 0) state = i < at ? 'done' : i === at ? 'current' : i === at + 1 ? 'next' : 'later';
    else if (held >= 0) state = i < held ? 'done' : i === held ? 'paused' : 'later';
    else state = 'not reached';
    return { status: s, state };
  });
}
