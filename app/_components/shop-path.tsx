import type { JobStatus } from '@/lib/db/generated/enums';
import { MAIN_PATH, STATUS_LABELS } from '@/lib/jobs/status-flow';
import { shopPathSteps } from '@/lib/jobs/shop-path';

/**
 * The shop path as a segmented track: every step says its state in words (done, current, next, later),
 * and the track's line style differs per state too (solid, heavy, dashed, dotted), so neither colour nor
 * strike-through carries the meaning. A side branch (on hold, returned unrepaired) follows as its own step.
 */
export function ShopPath({ status, heldFrom }: { status: JobStatus; heldFrom: JobStatus | null }) {
  const onPath = MAIN_PATH.includes(status);
  return (
    <ol className="shop-path" aria-label="Shop path">
      {shopPathSteps(status, heldFrom).map(({ status: s, state }) => (
        <li key={s} className={`step ${state.replace(' ', '-')}`} aria-current={state === 'current' ? 'step' : undefined}>
          <span className="step-name">{STATUS_LABELS[s]}</span>
          <span className="sr-only">, </span>
          <span className="step-state">
            {state === 'done' && <span aria-hidden="true">✓ </span>}
            {state}
          </span>
        </li>
      ))}
      {!onPath && (
        <li className="step current branch" aria-current="step">
          <span className="step-name">{STATUS_LABELS[status]}</span>
          <span className="sr-only">, </span>
          <span className="step-state">current{heldFrom ? ` (from ${STATUS_LABELS[heldFrom]})` : ''}</span>
        </li>
      )}
    </ol>
  );
}
