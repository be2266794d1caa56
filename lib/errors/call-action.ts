/**
 * How every client form calls a server action. A call can fail without an answer: the network drops, the
 * reply is lost after a commit, the server restarts, a proxy answers 5xx or 413. Awaited bare, that
 * rejection reached React's error boundary and replaced the page, losing what the user typed. Through
 * `callAction` it becomes an ordinary failed result the form shows in its summary, keeping every field;
 * creates carry an idempotency key (lib/errors/idempotency.ts) so saving again is safe.
 */
import { unstable_rethrow } from 'next/navigation';
import { MESSAGES } from './domain-errors';
import type { ActionResult } from './action-result';

const NO_ANSWER: ActionResult<never> = { ok: false, code: 'unreachable', message: MESSAGES.noAnswer };

export async function callAction<T>(run: () => Promise<ActionResult<T>>): Promise<ActionResult<T>> {
  try {
    const result = await run();
    // A proxy's error page or an empty reply decodes to something that is not a result.
    return result && typeof result === 'object' && 'ok' in result ? result : NO_ANSWER;
  } catch (err) {
    unstable_rethrow(err); // Next's own redirect/not-found signals keep working
    return NO_ANSWER;
  }
}
