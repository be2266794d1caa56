/** Reads of the shop's people for the administrator's screen. */
import { db } from '@/lib/db/client';

/** Everyone, active people first, then by name. */
export async function listUsers() {
  return db().user.findMany({
    orderBy: [{ active: 'desc' }, { name: 'asc' }],
    select: { id: true, name: true, email: true, role: true, active: true },
  });
}
