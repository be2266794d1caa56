/**
 * Slows password guessing: after SIGN_IN_LIMIT failed sign-ins in a row an account is held for
 * SIGN_IN_HOLD_MINUTES, during which even the right password is refused. A successful sign-in, or a new
 * password set by an administrator, clears the count. Counted in the database, so it holds across
 * app instances.
 */
import { db } from '@/lib/db/client';

export const SIGN_IN_LIMIT = 5;
export const SIGN_IN_HOLD_MINUTES = 15;

export const signInHeldMessage = (until: Date): string =>
  `Too many failed sign-ins for this account. Try again after ${until.toISOString().slice(11, 16)} UTC, or ask an administrator to set a new password.`;

/** The time the account is held until, or null when it may try. */
export function heldUntil(user: { signInHeldUntil: Date | null }, now = new Date()): Date | null {
  return user.signInHeldUntil && user.signInHeldUntil > now ? user.signInHeldUntil : null;
}

/** Counts a failure (atomically) and holds the account when the limit is reached. */
export async function recordFailedSignIn(userId: string, now = new Date()): Promise<void> {
  const { failedSignIns } = await db().user.update({ where: { id: userId }, data: { failedSignIns: { increment: 1 } }, select: { failedSignIns: true } });
  if (failedSignIns >= SIGN_IN_LIMIT) {
    await db().user.update({ where: { id: userId }, data: { failedSignIns: 0, signInHeldUntil: new Date(now.getTime() + SIGN_IN_HOLD_MINUTES * 60_000) } });
  }
}

export async function clearFailedSignIns(userId: string): Promise<void> {
  await db().user.updateMany({ where: { id: userId, OR: [{ failedSignIns: { gt: 0 } }, { signInHeldUntil: { not: null } }] }, data: { failedSignIns: 0, signInHeldUntil: null } });
}
