import type { Role } from '@/lib/db/generated/enums';

/**
 * What each role may do. Every server action names one permission and is checked against this table
 * before it validates or writes anything; screens use the same table to decide what to offer.
 */
export const PERMISSIONS = {
  'job.read': ['FRONT_DESK', 'WINDER', 'ENGINEER', 'ADMIN'],
  'job.intake': ['FRONT_DESK', 'ADMIN'],
  'job.edit': ['FRONT_DESK', 'ADMIN'],
  'job.move': ['FRONT_DESK', 'WINDER', 'ENGINEER', 'ADMIN'],
  'job.attach': ['FRONT_DESK', 'WINDER', 'ENGINEER', 'ADMIN'],
  'sheet.edit': ['WINDER', 'ENGINEER', 'ADMIN'],
  'redesign.edit': ['ENGINEER', 'ADMIN'],
  'redesign.approve': ['ENGINEER'],
  'tests.record': ['WINDER', 'ENGINEER', 'ADMIN'],
  'stock.manage': ['ADMIN', 'ENGINEER'],
  'settings.manage': ['ADMIN'],
  'quote.edit': ['FRONT_DESK', 'ENGINEER', 'ADMIN'],
  'quote.send': ['FRONT_DESK', 'ADMIN'],
  'labour.book': ['FRONT_DESK', 'WINDER', 'ENGINEER', 'ADMIN'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export const ROLE_LABELS: Record<Role, string> = {
  FRONT_DESK: 'Front desk',
  WINDER: 'Winder',
  ENGINEER: 'Engineer',
  ADMIN: 'Administrator',
};
