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
