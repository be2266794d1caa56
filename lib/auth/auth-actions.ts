'use server';

import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { db } from '@/lib/db/client';
import { verifyPassword } from './password';
import { SESSION_COOKIE, createSession, deleteSession } from './session-store';
import { SIGN_IN_FAILED } from './messages';
import { clearFailedSignIns, heldUntil, recordFailedSignIn, signInHeldMessage } from './sign-in-throttle';
import { env } from '@/lib/env';

const signInSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter your email address.'),
  password: z.string().min(1, 'Enter your password.').max(200),
  next: z.string().regex(/^\/[^/]/).optional().catch(undefined),
});

export interface SignInState {
  message?: string;
  fieldErrors?: Partial<Record<'email' | 'password', string>>;
  email?: string;
}

// A fixed hash to compare against when the email is unknown, so both cases take the same time.
const DUMMY_HASH = '$2b$11$ZDezhSfYMwaTGGae8CZ1heOLylYlRuIar2WWRtz8q9qZB0sxirsoy';

export async function signIn(_prev: SignInState, form: FormData): Promise<SignInState> {
  const parsed = signInSchema.safeParse(Object.fromEntries(form));
  const email = String(form.get('email') ?? '');
  if (!parsed.success) {
    const fe = z.flattenError(parsed.error).fieldErrors;
    return { email, fieldErrors: { email: fe.email?.[0], password: fe.password?.[0] } };
  }
  const user = await db().user.findUnique({ where: { email: parsed.data.email } });
  const held = user ? heldUntil(user) : null;
  if (held) return { email, message: signInHeldMessage(held) };
  const good = await verifyPassword(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
  if (user && !good) await recordFailedSignIn(user.id);
  if (!user || !good || !user.active) return { email, message: SIGN_IN_FAILED };
  await clearFailedSignIns(user.id);
  const { token, expiresAt } = await createSession(user.id);
  const jar = await cookies();
  jar.set(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: env().COILWRIGHT_SECURE_COOKIES === '1',
    path: '/',
    expires: expiresAt,
  });
  redirect(parsed.data.next ?? '/jobs');
}

export async function signOut(): Promise<void> {
  const jar = await cookies();
  const token = jar.get(SESSION_COOKIE)?.value;
  if (token) await deleteSession(token);
  jar.delete(SESSION_COOKIE);
  redirect('/login');
}
