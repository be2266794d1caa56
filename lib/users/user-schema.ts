import { z } from 'zod';
import { requiredText } from '../validation/fields';
import { Role } from '@/lib/db/generated/enums';

/** The roles come from the database's own enum (prisma/schema/auth.prisma). */
export const ROLES = Object.values(Role);
export const MIN_PASSWORD = 10;

const password = z
  .string({ error: 'Enter a password.' })
  .min(MIN_PASSWORD, `Use at least ${MIN_PASSWORD} characters.`)
  .max(200, 'At most 200 characters.');

/** A new person in the shop, created by an administrator. */
export const userCreateSchema = z.object({
  name: requiredText('Name', 120),
  email: z.preprocess((v) => (typeof v === 'string' ? v.trim().toLowerCase() : v), z.email('Enter an email address like name@example.com.')),
  role: z.enum(ROLES, { error: 'Pick a role.' }),
  password,
});
export type UserCreateInput = z.input<typeof userCreateSchema>;

export const userUpdateSchema = z.object({
  userId: z.uuid(),
  role: z.enum(ROLES, { error: 'Pick a role.' }),
  active: z.boolean(),
  /** Empty keeps the current password. */
  newPassword: z.preprocess((v) => (v === '' ? undefined : v), password.optional()),
});
