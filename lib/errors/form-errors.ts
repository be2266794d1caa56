import { MESSAGES } from './domain-errors';

/**
 * Puts a server action's field errors back on a react-hook-form form (keys are dotted paths), so the
 * messages appear beside the fields and what the user typed stays in place.
 */
export function applyFieldErrors(
  fieldErrors: Record<string, string[]> | undefined,
  setError: (name: never, error: { type: string; message: string }, options?: { shouldFocus: boolean }) => void,
): void {
  if (!fieldErrors) return;
  let first = true;
  for (const [path, messages] of Object.entries(fieldErrors)) {
    if (!messages.length || path === '_form') continue;
    setError(path as never, { type: 'server', message: messages.join(' ') }, { shouldFocus: first });
    first = false;
  }
}

/** The summary a form shows when client-side validation stops a save. */
export const FIX_FIELDS_SUMMARY = MESSAGES.invalid;

/**
 * Shows a refused save on a form: field errors beside their fields, the message in the summary, and on a
 * stale refusal `onStale` (typically: mark the conflict and refresh to show the newer values).
 */
export function showActionFailure(
  failure: { code: string; message: string; fieldErrors?: Record<string, string[]> },
  form: {
    setError: Parameters<typeof applyFieldErrors>[1];
    setSummary: (s: { tone: 'bad'; text: string }) => void;
    onStale?: () => void;
  },
): void {
  if (failure.code === 'stale') form.onStale?.();
  applyFieldErrors(failure.fieldErrors, form.setError);
  form.setSummary({ tone: 'bad', text: failure.message });
}
