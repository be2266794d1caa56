import { z } from 'zod';
import { DomainError, MESSAGES, type DomainErrorCode } from './domain-errors';
import { classifyDatabaseFailure } from './database-failures';

/** What every server action returns: it never throws at the user. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T; message?: string }
  | { ok: false; code: DomainErrorCode | 'unexpected' | 'unreachable'; message: string; fieldErrors?: Record<string, string[]> };

export const success = <T>(data: T, message?: string): ActionResult<T> => ({ ok: true, data, ...(message ? { message } : {}) });

/** Field errors keyed by dotted path (`motor.speedRpm`), which react-hook-form's setError understands. */
export function zodFieldErrors(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function invalid(error: z.ZodError): ActionResult<never> {
  return { ok: false, code: 'invalid', message: MESSAGES.invalid, fieldErrors: zodFieldErrors(error) };
}

export function toActionFailure(err: unknown): ActionResult<never> {
  if (err instanceof DomainError) {
    return { ok: false, code: err.code, message: err.message, ...(err.fieldErrors ? { fieldErrors: err.fieldErrors } : {}) };
  }
  const infra = classifyDatabaseFailure(err);
  if (infra) {
    console.warn(`[coilwright] database ${infra} in a server action:`, err instanceof Error ? err.message : err);
    return { ok: false, code: 'busy', message: infra === 'busy' ? MESSAGES.busy : MESSAGES.databaseDown };
  }
  console.error('[coilwright] unexpected error in a server action', err);
  return { ok: false, code: 'unexpected', message: MESSAGES.unexpected };
}
