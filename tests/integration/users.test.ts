import { describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { verifyPassword } from '@/lib/auth/password';
import { findSessionUser, createSession } from '@/lib/auth/session-store';
import { addUser, changeUser } from '@/lib/users/user-actions';
import { bootstrapAdmin } from '@/lib/users/user-writes';
import { useTestDatabase } from '../support/test-db';
import { actAs } from '../support/session';
import { ADMIN, ENGINEER } from '../support/demo-users';

useTestDatabase();

describe('people who sign in', () => {
  it('only an administrator may add a person', async () => {
    await actAs(ENGINEER.email);
    expect(await addUser({ name: 'X', email: 'x@example.com', role: 'WINDER', password: 'long-enough-1' })).toMatchObject({
      ok: false,
      code: 'forbidden',
    });
  });

  it('stores a bcrypt hash, never the password, and refuses a duplicate email on the field', async () => {
    await actAs(ADMIN.email);
    const added = await addUser({ name: 'New Winder', email: 'New.Winder@Example.com', role: 'WINDER', password: 'correct-horse-9' });
    expect(added.ok).toBe(true);
    const row = await db().user.findUniqueOrThrow({ where: { email: 'new.winder@example.com' } });
    expect(row.passwordHash).not.toContain('correct-horse-9');
    expect(await verifyPassword('correct-horse-9', row.passwordHash)).toBe(true);
    const again = await addUser({ name: 'Twin', email: 'new.winder@example.com', role: 'WINDER', password: 'correct-horse-9' });
    expect(again).toMatchObject({ ok: false, fieldErrors: { email: ['Someone already signs in with that email.'] } });
  });

  it('deactivating a person ends their sessions', async () => {
    await actAs(ADMIN.email);
    const target = await db().user.findUniqueOrThrow({ where: { email: 'new.winder@example.com' } });
    const { token } = await createSession(target.id);
    expect(await findSessionUser(token)).not.toBeNull();
    expect((await changeUser({ userId: target.id, role: 'WINDER', active: false, newPassword: '' })).ok).toBe(true);
    expect(await findSessionUser(token)).toBeNull();
  });

  it('an administrator cannot lock themselves out', async () => {
    await actAs(ADMIN.email);
    const me = await db().user.findUniqueOrThrow({ where: { email: ADMIN.email } });
    expect(await changeUser({ userId: me.id, role: 'WINDER', active: true, newPassword: '' })).toMatchObject({
      ok: false,
      code: 'invalid',
    });
  });

  it('creates the first administrator from the environment only when nobody exists yet', async () => {
    const env = { COILWRIGHT_ADMIN_EMAIL: 'boss@example.com', COILWRIGHT_ADMIN_PASSWORD: 'a-long-password' };
    expect(await bootstrapAdmin(env)).toBe(false);
  });
});
