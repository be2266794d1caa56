import { encodeBoardCursor, type BoardCursor, type BoardQuery } from '@/lib/jobs/job-schema';

type BoardLink = Omit<Partial<BoardQuery>, 'after' | 'before'> & { after?: BoardCursor | string; before?: BoardCursor | string };

/**
 * The board's URL for a query with some parts changed (filters, sort and position live in the URL). Any
 * change other than the position itself starts again from the first page.
 */
export function boardHref(q: BoardQuery, change: BoardLink): string {
  const moving = 'after' in change || 'before' in change || 'from' in change;
  const next = { ...q, after: undefined, before: undefined, from: undefined, ...change };
  if (!moving) Object.assign(next, { after: undefined, before: undefined, from: undefined });
  const p = new URLSearchParams();
  for (const s of next.status) p.append('status', s);
  if (next.customerId) p.set('customerId', next.customerId);
  if (next.assigneeId) p.set('assigneeId', next.assigneeId);
  if (next.due !== 'any') p.set('due', next.due);
  if (next.q) p.set('q', next.q);
  if (next.sort !== 'promisedAt') p.set('sort', next.sort);
  if (next.dir !== 'asc') p.set('dir', next.dir);
  const pos = (c: BoardCursor | string) => (typeof c === 'string' ? c : encodeBoardCursor(c));
  if (next.after) p.set('after', pos(next.after));
  else if (next.before) p.set('before', pos(next.before));
  else if (next.from) p.set('from', next.from);
  const s = p.toString();
  return s ? `/jobs?${s}` : '/jobs';
}

const SORT_WORDS: Record<BoardQuery['sort'], [string, string, string]> = {
  number: ['job number', 'lowest first', 'highest first'],
  promisedAt: ['promised date', 'earliest first', 'latest first'],
  receivedAt: ['date received', 'oldest first', 'newest first'],
  status: ['status', 'in shop order', 'in reverse shop order'],
  customer: ['customer', 'A to Z', 'Z to A'],
  priority: ['priority', 'most urgent first', 'least urgent first'],
};

/** "sorted by promised date, earliest first": the board's order in words. */
export function sortInWords(q: Pick<BoardQuery, 'sort' | 'dir'>): string {
  const [what, up, down] = SORT_WORDS[q.sort];
  return `sorted by ${what}, ${q.dir === 'asc' ? up : down}`;
}
