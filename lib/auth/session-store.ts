/**
 * Sessions in the database (the app keeps no state in its process). The cookie holds a random token;
 * the table holds only its SHA-256, so reading the table does not let anyone sign in.
 */
import { createHash, randomBytes } from 'node:crypto';
import { db } from '@/lib/db/client';
import type { Role } from '@/lib/db/generated/enums';

export const SESSION_COOKIE = 'cw_session';
export const SESSION_DAYS = 14;

export interface SessionUser {
  id: string;
  name: string;
  email: string;
  role: Role;
}

const digest = (token: string): string => createHash('sha256').update(token).digest('hex');

export async function createSession(userId: string): Promise<{ token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + SESSION_DAYS * 24 * 3600 * 1000);
  await db().session.create({ data: { id: digest(token), userId, expiresAt } });
  return { token, expiresAt };
}

export async function findSessionUser(token: string | undefined): Promise<SessionUser | null> {
  if (!token) return null;
  const session = await db().session.findUnique({
    where: { id: digest(token) },
    include: { user: { select: { id: true, name: true, email: true, role: true, active: true } } },
  });
  if (!session || session.expiresAt < new Date() || !session.user.active) return null;
  const { id, name, email, role } = session.user;
  return { id, name, email, role };
}

export async function deleteSession(token: string): Promise<void> {
  await db().session.deleteMany({ where: { id: digest(token) } });
}
