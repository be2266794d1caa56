/**
 * Named domain errors. Data-layer functions throw these; `toActionFailure` maps them to what the user sees
 * in one place, and anything else becomes a neutral message with the cause logged on the server.
 */
export type DomainErrorCode = 'unauthenticated' | 'forbidden' | 'not-found' | 'stale' | 'invalid' | 'conflict' | 'frozen' | 'busy';

export class DomainError extends Error {
  constructor(
    readonly code: DomainErrorCode,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export const MESSAGES = {
  unauthenticated: 'Your session has ended. Sign in again; what you typed is still in the form.',
  forbidden: (what: string) => `Your role does not allow you to ${what}.`,
  stale:
    'Someone else changed this job while you were editing. Your changes are kept in the form: review the current values below, then save again.',
  invalid: 'Some fields need attention. Each one is marked below.',
  unexpected: 'Something went wrong on the server and nothing was saved. Try again; if it keeps happening, tell your administrator.',
  busy: 'The shop system is busy; nothing was saved. Try again.',
  databaseDown: 'The shop database is not answering; nothing was saved. Try again in a moment.',
  noAnswer:
    'The server did not answer, so this may or may not have been saved. What you typed is kept: save again (a repeated save is not stored twice), or reload the page to check.',
  notFound: (what: string) => `That ${what} does not exist (it may have been removed).`,
} as const;
