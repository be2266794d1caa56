/**
 * Slows password guessing, counted in the database so it holds across app instances.
 *
 * Per account: after SIGN_IN_LIMIT failed sign-ins in a row the account is held for SIGN_IN_HOLD_MINUTES,
 * during which even the right password is refused; a success, or a new password set by an administrator,
 * clears the count. Per address: ADDRESS_LIMIT failures (any accounts, known or not) within
 * ADDRESS_WINDOW_MINUTES hold that address for the same time, so one machine cannot work through many
 * accounts. The README explains the trade-off.
 *
 * Each attempt RESERVES its place before the password is compared: one UPDATE checks the hold and the
 * count and increments it (PostgreSQL serialises concurrent updates of the row and re-checks the WHERE),
 * so parallel guesses get exactly the allowed number of comparisons. Counting after the comparison let
 * 30 parallel guesses through 8 comparisons and lost increments.
 */
import { db } from '@/lib/db/client';

export const SIGN_IN_LIMIT = 5;
export const SIGN_IN_HOLD_MINUTES = 15;
export const ADDRESS_LIMIT = 20;
export const ADDRESS_WINDOW_MINUTES = 15;

const minutes = (n: number) => n * 60_000;

export const signInHeldMessage = (until: Date): string =>
  `Too many failed sign-ins for this account. Try again after ${until.toISOString().slice(11, 16)} UTC, or ask an administrator to set a new password.`;

export const addressHeldMessage = (until: Date): string =>
  `Too many failed sign-ins from this network address. Try again after ${until.toISOString().slice(11, 16)} UTC.`;

export type Reservation = { ok: true } | { ok: false; until: Date };

/** Claims one password comparison for the account, or says until when it is held. */
export async function reserveAccountAttempt(userId: string, now = new Date()): Promise<Reservation> {
  // A hold that has run out starts a fresh count.
  await db().user.updateMany({ where: { id: userId, signInHeldUntil: { lte: now } }, data: { failedSignIns: 0, signInHeldUntil: null } });
  const claimed = await db().user.updateMany({
    where: { id: userId, signInHeldUntil: null, failedSignIns: { lt: SIGN_IN_LIMIT } },
    data: { failedSignIns: { increment: 1 } },
  });
  if (claimed.count === 1) return { ok: true };
  const user = await db().user.findUnique({ where: { id: userId }, select: { signInHeldUntil: true } });
  return { ok: false, until: user?.signInHeldUntil ?? new Date(now.getTime() + minutes(SIGN_IN_HOLD_MINUTES)) };
}

/** After a wrong password: the reserved attempt stays counted; at the limit the account is held. */
export async function accountAttemptFailed(userId: string, now = new Date()): Promise<void> {
  await db().user.updateMany({
    where: { id: userId, signInHeldUntil: null, failedSignIns: { gte: SIGN_IN_LIMIT } },
    data: { signInHeldUntil: new Date(now.getTime() + minutes(SIGN_IN_HOLD_MINUTES)) },
  });
}

export async function clearFailedSignIns(userId: string): Promise<void> {
  await db().user.updateMany({
    where: { id: userId, OR: [{ failedSignIns: { gt: 0 } }, { signInHeldUntil: { not: null } }] },
    data: { failedSignIns: 0, signInHeldUntil: null },
  });
}

/** Claims one attempt for the network address (counted as a failure until it succeeds). */
export async function reserveAddressAttempt(address: string, now = new Date()): Promise<Reservation> {
  await db().signInAddress.createMany({ data: [{ address, windowStartedAt: now }], skipDuplicates: true });
  const windowStart = new Date(now.getTime() - minutes(ADDRESS_WINDOW_MINUTES));
  await db().signInAddress.updateMany({
    where: { address, OR: [{ heldUntil: { lte: now } }, { heldUntil: null, windowStartedAt: { lt: windowStart } }] },
    data: { failures: 0, heldUntil: null, windowStartedAt: now },
  });
  const claimed = await db().signInAddress.updateMany({
    where: { address, heldUntil: null, failures: { lt: ADDRESS_LIMIT } },
    data: { failures: { increment: 1 } },
  });
  if (claimed.count === 1) return { ok: true };
  const row = await db().signInAddress.findUnique({ where: { address }, select: { heldUntil: true } });
  return { ok: false, until: row?.heldUntil ?? new Date(now.getTime() + minutes(SIGN_IN_HOLD_MINUTES)) };
}

export async function addressAttemptFailed(address: string, now = new Date()): Promise<void> {
  await db().signInAddress.updateMany({
    where: { address, heldUntil: null, failures: { gte: ADDRESS_LIMIT } },
    data: { heldUntil: new Date(now.getTime() + minutes(SIGN_IN_HOLD_MINUTES)) },
  });
}

/** A success gives back the attempt it reserved (not the whole count: a valid account must not reset it). */
export async function addressAttemptSucceeded(address: string): Promise<void> {
  await db().signInAddress.updateMany({ where: { address, failures: { gt: 0 } }, data: { failures: { decrement: 1 } } });
}
