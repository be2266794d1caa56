import { beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { signIn } from '@/lib/auth/auth-actions';
import { SIGN_IN_FAILED } from '@/lib/auth/messages';
import { SESSION_COOKIE } from '@/lib/auth/session-store';
import { SIGN_IN_LIMIT } from '@/lib/auth/sign-in-throttle';
import { changeUser } from '@/lib/users/user-actions';
import { useTestDatabase } from '../support/test-db';
import { actAs, cookieJar, signOutTest } from '../support/session';
import { ADMIN, WINDER } from '../support/demo-users';

useTestDatabase();

const form = (email: string, password: string) => {
  const fd = new FormData();
  fd.set('email', email);
  fd.set('password', password);
  return fd;
};

/** signIn redirects on success; the test double of next/navigation turns that into an error. */
async function attempt(email: string, password: string): Promise<string> {
  try {
    const state = await signIn({}, form(email, password));
    return state.message ?? JSON.stringify(state.fieldErrors);
  } catch (err) {
    return (err as Error).message;
  }
}

describe('signing in', () => {
  beforeEach(() => signOutTest());

  it('signs in with the right password and sets the session cookie', async () => {
    expect(await attempt(WINDER.email, WINDER.password)).toBe('NEXT_REDIRECT /jobs');
    expect(cookieJar.get(SESSION_COOKIE)).toBeTruthy();
  });

  it('gives the same answer for an unknown email and a wrong password', async () => {
    expect(await attempt('nobody@example.com', 'whatever-123')).toBe(SIGN_IN_FAILED);
    expect(await attempt(WINDER.email, 'wrong-password')).toBe(SIGN_IN_FAILED);
  });

  it(`holds an account after ${SIGN_IN_LIMIT} failures in a row, even for the right password, until an administrator sets a new one`, async () => {
    const user = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    await db().user.update({ where: { id: user.id }, data: { failedSignIns: 0, signInHeldUntil: null } });
    for (let i = 0; i < SIGN_IN_LIMIT; i++) expect(await attempt(WINDER.email, `wrong-${i}`)).toBe(SIGN_IN_FAILED);
    expect(await attempt(WINDER.email, WINDER.password)).toMatch(/^Too many failed sign-ins/);
    expect(cookieJar.has(SESSION_COOKIE)).toBe(false);
    await actAs(ADMIN.email);
    expect((await changeUser({ userId: user.id, role: 'WINDER', active: true, newPassword: 'a-fresh-password-1' })).ok).toBe(true);
    signOutTest();
    expect(await attempt(WINDER.email, 'a-fresh-password-1')).toBe('NEXT_REDIRECT /jobs');
  });

  it('a hold that has run out lets the right password in and clears the count', async () => {
    const user = await db().user.findUniqueOrThrow({ where: { email: ADMIN.email } });
    await db().user.update({ where: { id: user.id }, data: { failedSignIns: 3, signInHeldUntil: new Date(Date.now() - 1000) } });
    expect(await attempt(ADMIN.email, ADMIN.password)).toBe('NEXT_REDIRECT /jobs');
    expect(await db().user.findUniqueOrThrow({ where: { id: user.id } })).toMatchObject({ failedSignIns: 0, signInHeldUntil: null });
  });
});
