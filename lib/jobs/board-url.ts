import type { BoardQuery } from '@/lib/jobs/job-schema';

/** The board's URL for a query with some parts changed (filters, sort and page live in the URL). */
export function boardHref(q: BoardQuery, change: Partial<BoardQuery>): string {
  const next = { ...q, ...change };
  const p = new URLSearchParams();
  for (const s of next.status) p.append('status', s);
  if (next.customerId) p.set('customerId', next.customerId);
  if (next.assigneeId) p.set('assigneeId', next.assigneeId);
  if (next.due !== 'any') p.set('due', next.due);
  if (next.q) p.set('q', next.q);
  if (next.sort !== 'promisedAt') p.set('sort', next.sort);
  if (next.dir !== 'asc') p.set('dir', next.dir);
  if (next.page > 1) p.set('page', String(next.page));
  const s = p.toString();
  return s ? `/jobs?${s}` : '/jobs';
}
