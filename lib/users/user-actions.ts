'use server';

import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { userCreateSchema, userUpdateSchema } from '@/lib/users/user-schema';
import { createUser, updateUser } from './user-writes';

export async function addUser(raw: unknown) {
  return guardedAction('settings.manage', 'manage the people who sign in', userCreateSchema, async (_user, input) =>
    success(await createUser(input), `${input.name} can now sign in.`),
  )(raw);
}

export async function changeUser(raw: unknown) {
  return guardedAction('settings.manage', 'manage the people who sign in', userUpdateSchema, async (user, input) => {
    await updateUser(user.id, input);
    return success(undefined, 'Saved.');
  })(raw);
}
