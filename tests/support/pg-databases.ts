/** Fresh PostgreSQL databases for tests, created on the server named by TEST_DATABASE_URL and dropped after. */
import { randomBytes } from 'node:crypto';
import pg from 'pg';

function serverUrl(): URL {
  const raw = process.env.TEST_DATABASE_URL;
  if (!raw) throw new Error('TEST_DATABASE_URL is not set');
  return new URL(raw);
}

async function admin<T>(work: (c: pg.Client) => Promise<T>): Promise<T> {
  const url = serverUrl();
  url.pathname = '/postgres';
  const client = new pg.Client({ connectionString: url.toString() });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

export async function createTestDatabase(label: string): Promise<string> {
  const name = `cw_${label}_${randomBytes(5).toString('hex')}`;
  await admin((c) => c.query(`CREATE DATABASE "${name}"`));
  const url = serverUrl();
  url.pathname = `/${name}`;
  return url.toString();
}

export async function dropTestDatabase(url: string): Promise<void> {
  const name = new URL(url).pathname.slice(1);
  if (!/^cw_[a-z0-9_]+$/.test(name)) return;
  await admin((c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
}
