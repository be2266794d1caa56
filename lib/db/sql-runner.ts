import { PGlite } from '@electric-sql/pglite';
import pg from 'pg';
import type { DbConfig } from './config';

/** The little SQL surface the migration runner and seed need, over either engine. */
export interface SqlRunner {
  query<R extends Record<string, unknown>>(sql: string, params?: unknown[]): Promise<R[]>;
  /** Runs a script of several statements (no parameters). */
  exec(sql: string): Promise<void>;
  close(): Promise<void>;
}

export function pgliteRunner(pglite: PGlite, closeWith?: () => Promise<void>): SqlRunner {
  return {
    async query<R extends Record<string, unknown>>(sql: string, params: unknown[] = []) {
      return (await pglite.query<R>(sql, params)).rows;
    },
    async exec(sql) {
      await pglite.exec(sql);
    },
    close: closeWith ?? (async () => {}),
  };
}

export async function postgresRunner(url: string): Promise<SqlRunner> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  return {
    async query<R extends Record<string, unknown>>(sql: string, params: unknown[] = []) {
      return (await client.query(sql, params)).rows as R[];
    },
    async exec(sql) {
      await client.query(sql);
    },
    close: () => client.end(),
  };
}

export type { DbConfig };
