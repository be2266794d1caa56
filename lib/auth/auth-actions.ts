'use server';

import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { db } from '@/lib/db/client';
import { verifyPassword } from './password';
import { SESSION_COOKIE, createSession, deleteSession } from './session-store';
import { SIGN_IN_FAILED } from './messages';
import { safeNextPath } from './safe-next';
import { clientAddress } from './client-address';
import {
  accountAttemptFailed,
  addressAttemptFailed,
  addressAttemptSucceeded,
  addressHeldMessage,
  clearFailedSignIns,
  reserveAccountAttempt,
  reserveAddressAttempt,
  signInHeldMessage,
} from './sign-in-throttle';
import { env } from '@/lib/env';

const signInSchema = z.object({
  email: z.string().trim().toLowerCase().max(254, 'Enter your email address.').pipe(z.email('Enter your email address.')),
  password: z.string().min(1, 'Enter your password.').max(200),
  next: z.unknown().optional().transform(safeNextPath),
});

export interface SignInState {
  message?: string;
  fieldErrors?: Partial<Record<'email' | 'password', string>>;
  email?: string;
}

// A fixed hash to compare against when the email is unknown, so both cases take the same time.
const DUMMY_HASH = '$2b$11$ZDezhSfYMwaTGGae8CZ1heOLylYlRuIar2WWRtz8q9qZB0sxirsoy';

export async function signIn(_prev: SignInState, form: FormData): Promise<SignInState> {
  // A public endpoint: anything but the form's FormData is refused plainly, never a 500.
  if (!(form instanceof FormData)) return { message: SIGN_IN_FAILED };
  const parsed = signInSchema.safeParse(Object.fromEntries(form));
  const email = String(form.get('email') ?? '');
  if (!parsed.success) {
    const fe = z.flattenError(parsed.error).fieldErrors;
    return { email, fieldErrors: { email: fe.email?.[0], password: fe.password?.[0] } };
  }
  const address = await clientAddress();
  const fromAddress = await reserveAddressAttempt(address);
  if (!fromAddress.ok) return { email, message: addressHeldMessage(fromAddress.until) };
  const user = await db().user.findUnique({ where: { email: parsed.data.email } });
  if (user) {
    const forAccount = await reserveAccountAttempt(user.id);
    if (!forAccount.ok) {
      await addressAttemptFailed(address);
      return { email, message: signInHeldMessage(forAccount.until) };
    }
  }
  const good = await verifyPassword(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !good || !user.active) {
    if (user) await accountAttemptFailed(user.id);
    await addressAttemptFailed(address);
    return { email, message: SIGN_IN_FAILED };
  }
  await clearFailedSignIns(user.id);
  await addressAttemptSucceeded(address);
  const { token, expiresAt } = await createSession(user.id);
  const jar = await cookies();
  jar.set(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: env().COILWRIGHT_SECURE_COOKIES === '1',
    path: '/',
    expires: expiresAt,
  });
  redirect(parsed.data.next);
}

export async function signOut(): Promise<void> {
  const jar = await cookies();
  const token = jar.get(SESSION_COOKIE)?.value;
  if (token) await deleteSession(token);
  jar.delete(SESSION_COOKIE);
  redirect('/login');
}
