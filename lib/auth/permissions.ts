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
  /** An engineer's written release of a shop-path gate (lib/jobs/shop-gates.ts). */
  'job.override': ['ENGINEER'],
  'tests.record': ['WINDER', 'ENGINEER', 'ADMIN'],
  'stock.manage': ['ADMIN', 'ENGINEER'],
  'settings.manage': ['ADMIN'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

/** What each permission lets a person do, in words (the refusal page says this, never the key). */
export const PERMISSION_WORDS: Record<Permission, string> = {
  'job.read': 'read jobs',
  'job.intake': 'log motors at intake',
  'job.edit': 'edit job details',
  'job.move': 'move jobs along the shop path',
  'job.attach': 'add photos to jobs',
  'job.override': 'release a shop-path gate',
  'sheet.edit': 'edit as-found data sheets',
  'redesign.edit': 'redesign windings',
  'redesign.approve': 'approve redesigns',
  'tests.record': 'record final tests',
  'stock.manage': 'manage wire stock',
  'settings.manage': 'change shop settings',
};

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export const ROLE_LABELS: Record<Role, string> = {
  FRONT_DESK: 'Front desk',
  WINDER: 'Winder',
  ENGINEER: 'Engineer',
  ADMIN: 'Administrator',
};
