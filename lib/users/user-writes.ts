/** People in the shop: created, re-roled, deactivated and given new passwords by an administrator. */
import type { z } from 'zod';
import { db, Prisma } from '@/lib/db/client';
import { env, type Env } from '@/lib/env';
import { hashPassword } from '@/lib/auth/password';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import type { userCreateSchema, userUpdateSchema } from '@/lib/users/user-schema';

export async function createUser(input: z.output<typeof userCreateSchema>): Promise<{ id: string }> {
  try {
    const user = await db().user.create({
      data: { name: input.name, email: input.email, role: input.role, passwordHash: await hashPassword(input.password) },
      select: { id: true },
    });
    return user;
  } catch (err) {
    // The unique index decides, not a check-then-write race.
    if (err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002') {
      throw new DomainError('conflict', MESSAGES.invalid, { email: ['Someone already signs in with that email.'] });
    }
    throw err;
  }
}

export async function updateUser(actorId: string, input: z.output<typeof userUpdateSchema>): Promise<void> {
  if (actorId === input.userId && (!input.active || input.role !== 'ADMIN')) {
    throw new DomainError('invalid', 'You cannot remove your own administrator role or deactivate yourself; ask another administrator.');
  }
  await db().$transaction(async (tx) => {
    const updated = await tx.user.updateMany({
      where: { id: input.userId },
      data: {
        role: input.role,
        active: input.active,
        // A new password also lifts a sign-in hold (lib/auth/sign-in-throttle.ts).
        ...(input.newPassword ? { passwordHash: await hashPassword(input.newPassword), failedSignIns: 0, signInHeldUntil: null } : {}),
      },
    });
    if (updated.count === 0) throw new DomainError('not-found', MESSAGES.notFound('person'));
    // A deactivated person or a new password ends every open session of that person.
    if (!input.active || input.newPassword) await tx.session.deleteMany({ where: { userId: input.userId } });
  });
}

/**
 * First start on a real PostgreSQL: no demo people, so an administrator is created from
 * COILWRIGHT_ADMIN_EMAIL / COILWRIGHT_ADMIN_PASSWORD when the user table is empty.
 */
export async function bootstrapAdmin(e: Pick<Env, 'COILWRIGHT_ADMIN_EMAIL' | 'COILWRIGHT_ADMIN_PASSWORD'> = env()): Promise<boolean> {
  const email = e.COILWRIGHT_ADMIN_EMAIL;
  const password = e.COILWRIGHT_ADMIN_PASSWORD;
  if (!email || !password || (await db().user.count()) > 0) return false;
  await createUser({ name: 'Administrator', email, role: 'ADMIN', password });
  return true;
}
