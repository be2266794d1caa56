/**
 * The SQL floor of a page: the exact statements the app's data functions send (captured at the database
 * driver, with their bound values), replayed straight to the same database without Prisma, Next or React.
 * Works for both drivers: `pg` (PostgreSQL) and PGlite (the embedded engine).
 */
import { PGlite } from '@electric-sql/pglite';
import pg from 'pg';

export interface Statement {
  text: string;
  values: unknown[];
}

let capturing: Statement[] | null = null;

type PgQuery = (this: pg.Pool, config: unknown, values?: unknown) => Promise<unknown>;
type PgliteQuery = (this: PGlite, sql: string, params?: unknown[], options?: unknown) => Promise<unknown>;
const pgPoolQuery = pg.Pool.prototype.query as unknown as PgQuery;
const pgliteQuery = PGlite.prototype.query as unknown as PgliteQuery;

/** Installs the recording hooks (once, before the app's database client is made). */
export function installCapture(): void {
  (pg.Pool.prototype as unknown as { query: PgQuery }).query = function (config, values) {
    if (capturing && config && typeof config === 'object' && 'text' in config) {
      const c = config as { text: string; values?: unknown[] };
      capturing.push({ text: c.text, values: c.values ?? [] });
    }
    return pgPoolQuery.call(this, config, values);
  };
  (PGlite.prototype as unknown as { query: PgliteQuery }).query = function (sql, params, options) {
    if (capturing) capturing.push({ text: sql, values: params ?? [] });
    return pgliteQuery.call(this, sql, params, options);
  };
}

/** The statements `work` sends, in order; each must return rows for the bench to count it. */
export async function capture(work: () => Promise<unknown>): Promise<Statement[]> {
  capturing = [];
  try {
    await work();
    return capturing;
  } finally {
    capturing = null;
  }
}

export type Replayer = (statements: Statement[]) => Promise<number>;

/** Runs the statements one after another on a raw connection; resolves to the rows returned in total. */
export function pgReplayer(client: pg.Client): Replayer {
  return async (statements) => {
    let rows = 0;
    for (const s of statements) rows += (await client.query({ text: s.text, values: s.values })).rowCount ?? 0;
    return rows;
  };
}

export function pgliteReplayer(db: PGlite): Replayer {
  return async (statements) => {
    let rows = 0;
    for (const s of statements) rows += ((await pgliteQuery.call(db, s.text, s.values)) as { rows: unknown[] }).rows.length;
    return rows;
  };
}
