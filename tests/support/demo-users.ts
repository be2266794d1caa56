import { DEMO_USERS } from '@/lib/setup/demo/demo-data';

const byRole = (role: (typeof DEMO_USERS)[number]['role']) => {
  const u = DEMO_USERS.find((x) => x.role === role);
  if (!u) throw new Error(`no demo ${role}`);
  return { email: u.email, password: u.password, name: u.name };
};

export const FRONT_DESK = byRole('FRONT_DESK');
export const WINDER = byRole('WINDER');
export const ENGINEER = byRole('ENGINEER');
export const ADMIN = byRole('ADMIN');
