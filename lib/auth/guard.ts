/**
 * Session and role checks for screens and server actions. Every server action goes through
 * `guardedAction`, which checks the session and the role BEFORE it parses or writes anything.
 */
import { cookies } from 'next/headers';
import { ensureDisplaySettings } from '@/lib/settings/display-settings';
import { redirect } from 'next/navigation';
import type { z } from 'zod';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { invalid, toActionFailure, type ActionResult } from '@/lib/errors/action-result';
import { NUL_MESSAGE, findNul } from '@/lib/validation/safe-text';
import { can, PERMISSION_WORDS, type Permission } from './permissions';
import { SESSION_COOKIE, findSessionUser, type SessionUser } from './session-store';

export async function currentUser(): Promise<SessionUser | null> {
  const jar = await cookies();
  // Every page, route and action passes here first: keep the shop's date settings fresh (cheap when fresh).
  // After cookies(): that call marks the page dynamic, so nothing here runs while `next build` prerenders.
  await ensureDisplaySettings();
  return findSessionUser(jar.get(SESSION_COOKIE)?.value);
}

/** For screens: the signed-in user, or a redirect to sign-in (and to the refusal page without the role). */
export async function requirePageUser(permission: Permission = 'job.read'): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect('/login');
  // The address says what was refused in words ("/denied?to=change+shop+settings"), not a permission key.
  if (!can(user.role, permission)) redirect(`/denied?to=${encodeURIComponent(PERMISSION_WORDS[permission])}`);
  return user;
}

export async function requireActionUser(permission: Permission, what: string): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) throw new DomainError('unauthenticated', MESSAGES.unauthenticated);
  if (!can(user.role, permission)) throw new DomainError('forbidden', MESSAGES.forbidden(what));
  return user;
}

/**
 * Wraps a server action body: session → role → zod validation → the work. Domain errors and unexpected
 * failures come back as typed results, never as thrown errors at the user.
 */
export function guardedAction<S extends z.ZodType, T>(
  permission: Permission,
  what: string,
  schema: S,
  work: (user: SessionUser, input: z.output<S>) => Promise<ActionResult<T>>,
): (raw: unknown) => Promise<ActionResult<T>> {
  return async (raw: unknown) => {
    try {
      const user = await requireActionUser(permission, what);
      // A NUL anywhere (a record key, a draft value a schema passes through) is refused by path before
      // the schema, so no shape of input can carry one into PostgreSQL.
      const nul = findNul(raw);
      if (nul) return { ok: false, code: 'invalid', message: MESSAGES.invalid, fieldErrors: { [nul.join('.') || '_form']: [NUL_MESSAGE] } };
      const parsed = schema.safeParse(raw);
      if (!parsed.success) return invalid(parsed.error);
      return await work(user, parsed.data);
    } catch (err) {
      return toActionFailure(err);
    }
  };
}
