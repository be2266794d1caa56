/**
 * Issue 12: the hold was checked before the password comparison and the failure counted after, so 30
 * parallel wrong guesses got 8 comparisons (the rule says 5) and the counter was left at 2. Each attempt
 * now reserves its comparison in one UPDATE. Runs on PGlite and (INTEGRATION_DB=postgres) on PostgreSQL,
 * where the 30 attempts really run in parallel on the pool's connections.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { signIn } from '@/lib/auth/auth-actions';
import { SIGN_IN_FAILED } from '@/lib/auth/messages';
import { ADDRESS_LIMIT, SIGN_IN_LIMIT } from '@/lib/auth/sign-in-throttle';
import { addressFromForwardedFor } from '@/lib/auth/client-address';
import { useTestDatabase } from '../support/test-db';
import { requestHeaders, signOutTest } from '../support/session';
import { ENGINEER } from '../support/demo-users';

useTestDatabase();

const form = (email: string, password: string) => {
  const fd = new FormData();
  fd.set('email', email);
  fd.set('password', password);
  return fd;
};

async function attempt(email: string, password: string): Promise<string> {
  try {
    const state = await signIn({}, form(email, password));
    return state.message ?? JSON.stringify(state.fieldErrors);
  } catch (err) {
    return (err as Error).message;
  }
}

let n = 0;
beforeEach(() => {
  signOutTest();
  requestHeaders.set('x-forwarded-for', `10.12.0.${++n}`);
});

describe('sign-in throttle under concurrency', () => {
  it(`30 parallel wrong guesses on one account get exactly ${SIGN_IN_LIMIT} password checks, and the account is held`, async () => {
    const user = await db().user.findUniqueOrThrow({ where: { email: ENGINEER.email } });
    await db().user.update({ where: { id: user.id }, data: { failedSignIns: 0, signInHeldUntil: null } });
    const answers = await Promise.all(Array.from({ length: 30 }, (_, i) => attempt(ENGINEER.email, `wrong-guess-${i}`)));
    // Only the first SIGN_IN_LIMIT reached the password comparison; every other one was refused unchecked
    // (by the account hold, or by the address limit where that one's reservation came first).
    expect(answers.filter((a) => a === SIGN_IN_FAILED)).toHaveLength(SIGN_IN_LIMIT);
    expect(answers.filter((a) => a.startsWith('Too many failed sign-ins'))).toHaveLength(30 - SIGN_IN_LIMIT);
    expect(answers.filter((a) => a.startsWith('Too many failed sign-ins for this account')).length).toBeGreaterThan(0);
    const after = await db().user.findUniqueOrThrow({ where: { id: user.id } });
    expect(after.failedSignIns).toBe(SIGN_IN_LIMIT);
    expect(after.signInHeldUntil?.getTime()).toBeGreaterThan(Date.now() + 14 * 60_000);
    requestHeaders.set('x-forwarded-for', '10.14.0.1');
    expect(await attempt(ENGINEER.email, ENGINEER.password)).toMatch(/^Too many failed sign-ins for this account/);
    await db().user.update({ where: { id: user.id }, data: { failedSignIns: 0, signInHeldUntil: null } });
  }, 300_000);

  it(`one address gets ${ADDRESS_LIMIT} failed attempts across any accounts, then is held; other addresses are not`, async () => {
    requestHeaders.set('x-forwarded-for', '10.15.0.1');
    const answers = await Promise.all(Array.from({ length: 30 }, (_, i) => attempt(`nobody-${i}@example.com`, 'guess-guess-1')));
    expect(answers.filter((a) => a === SIGN_IN_FAILED)).toHaveLength(ADDRESS_LIMIT);
    expect(answers.filter((a) => a.startsWith('Too many failed sign-ins from this network address'))).toHaveLength(30 - ADDRESS_LIMIT);
    expect(await attempt(ENGINEER.email, ENGINEER.password)).toMatch(/from this network address/);
    requestHeaders.set('x-forwarded-for', '10.15.0.2');
    expect(await attempt(ENGINEER.email, ENGINEER.password)).toBe('NEXT_REDIRECT /jobs');
  }, 300_000);

  it('a correct sign-in gives back only its own reserved attempt on the address', async () => {
    requestHeaders.set('x-forwarded-for', '10.16.0.1');
    for (let i = 0; i < 3; i++) expect(await attempt('nobody@example.com', 'guess-guess-1')).toBe(SIGN_IN_FAILED);
    expect(await attempt(ENGINEER.email, ENGINEER.password)).toBe('NEXT_REDIRECT /jobs');
    expect((await db().signInAddress.findUniqueOrThrow({ where: { address: '10.16.0.1' } })).failures).toBe(3);
  }, 300_000);

  it('reads the proxy’s entry (the last) from X-Forwarded-For and refuses junk', () => {
    expect(addressFromForwardedFor('203.0.113.9, 10.0.0.2')).toBe('10.0.0.2');
    expect(addressFromForwardedFor('::ffff:127.0.0.1')).toBe('::ffff:127.0.0.1');
    expect(addressFromForwardedFor(null)).toBe('unknown');
    expect(addressFromForwardedFor(`1.2.3.4, ${'x'.repeat(500)}`)).toBe('unknown');
    expect(addressFromForwardedFor('1.2.3.4, <script>')).toBe('unknown');
  });
});
