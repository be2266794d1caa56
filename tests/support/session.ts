/**
 * Server actions read the session cookie through next/headers. Integration tests replace next/headers with
 * this in-memory cookie jar (vi.mock in tests/support/next-mocks.ts) and sign in by creating a real
 * session row, so the actions' own session and role checks run unchanged.
 */
import { db } from '@/lib/db/client';
import { SESSION_COOKIE, createSession } from '@/lib/auth/session-store';

export const cookieJar = new Map<string, string>();
/** The request headers next/headers' `headers()` returns in integration tests (e.g. X-Forwarded-For). */
export const requestHeaders = new Headers();

export async function actAs(email: string): Promise<void> {
  const user = await db().user.findUniqueOrThrow({ where: { email } });
  const { token } = await createSession(user.id);
  cookieJar.set(SESSION_COOKIE, token);
}

export function signOutTest(): void {
  cookieJar.clear();
}
