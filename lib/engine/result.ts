/**
 * Engine results never throw at the caller: every public calculation returns either a value or a typed
 * error that says what is wrong and how to fix it, so the UI, the server and the CLI can all show it.
 */
export type EngineErrorCode =
  | 'invalid-input'
  | 'span-too-large'
  | 'unbalanced-layout'
  | 'parallel-paths-not-allowed'
  | 'non-finite-result'
  | 'unknown-wire'
  | 'not-applicable'
  /** A search would take more work than its budget: the request must be narrowed. */
  | 'too-wide';

export interface EngineError {
  code: EngineErrorCode;
  /** Which input is wrong, as a dotted path into the input object (e.g. `winding.span`). */
  field?: string;
  /** What is wrong, in trade language. */
  message: string;
  /** What to change to fix it. */
  hint: string;
}

export type EngineResult<T> = { ok: true; value: T } | { ok: false; error: EngineError };

export const ok = <T>(value: T): EngineResult<T> => ({ ok: true, value });

export const fail = (code: EngineErrorCode, message: string, hint: string, field?: string): EngineResult<never> => ({
  ok: false,
  error: { code, message, hint, ...(field ? { field } : {}) },
});

/** Guards the engine's promise that no NaN or Infinity leaves it. */
export function finiteOr<T>(value: number, make: (v: number) => T, what: string): EngineResult<T> {
  return Number.isFinite(value)
    ? ok(make(value))
    : fail('non-finite-result', `${what} came out as ${value}.`, 'Check the inputs for zero or missing values.');
}
