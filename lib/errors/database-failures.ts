/**
 * Recognises failures of the database itself (as opposed to a bug): every connection busy or the
 * transaction could not start in time, or the database gone (restart, network). Both roll back whatever
 * the action was doing, so the user is told "nothing was saved, try again" instead of "something went
 * wrong". Matched on Prisma's and node-postgres's codes and messages, which are stable across versions.
 */
const BUSY_CODES = new Set(['P2024', 'P2028', 'P2034']); // pool timeout, transaction API (start timeout, expired), write conflict
const DOWN_CODES = new Set([
  'P1001',
  'P1002',
  'P1017',
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  '57P01',
  '57P02',
  '57P03',
  '08006',
  '08003',
  '08001',
]);
const BUSY_TEXT = [
  'unable to start a transaction in the given time',
  'transaction already closed',
  'expired transaction',
  'timed out fetching a new connection',
  'timeout exceeded when trying to connect',
  'could not serialize access',
];
const DOWN_TEXT = [
  'connection terminated',
  'terminating connection due to administrator command',
  'the database system is starting up',
  'the database system is shutting down',
  "can't reach database server",
  'connection refused',
  'server closed the connection',
  'client has encountered a connection error',
  'econnrefused',
  'econnreset',
];

function codesAndText(err: unknown, depth = 0): { codes: string[]; text: string } {
  if (!err || typeof err !== 'object' || depth > 4) return { codes: [], text: typeof err === 'string' ? err.toLowerCase() : '' };
  const codes: string[] = [];
  let text = err instanceof Error ? err.message.toLowerCase() : '';
  for (const key of ['code', 'errno', 'originalCode'] as const) {
    const v: unknown = Reflect.get(err, key);
    if (typeof v === 'string') codes.push(v);
  }
  for (const key of ['cause', 'meta'] as const) {
    const inner = codesAndText(Reflect.get(err, key), depth + 1);
    codes.push(...inner.codes);
    text += ` ${inner.text}`;
  }
  return { codes, text };
}

export function classifyDatabaseFailure(err: unknown): 'busy' | 'down' | null {
  const { codes, text } = codesAndText(err);
  if (codes.some((c) => DOWN_CODES.has(c)) || DOWN_TEXT.some((t) => text.includes(t))) return 'down';
  if (codes.some((c) => BUSY_CODES.has(c)) || BUSY_TEXT.some((t) => text.includes(t))) return 'busy';
  return null;
}
