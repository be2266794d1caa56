/**
 * Backups a shop can restore. The embedded database is saved with PGlite's own consistent dump of its
 * data directory (a .tar.gz taken inside the engine, so no half-written file is copied); PostgreSQL with
 * its own pg_dump (custom format) and pg_restore. After a restore the migration check runs: a backup from
 * this version passes it as it is; one from an older version gets the newer migrations applied.
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { applyMigrations } from '@/lib/db/migrate';
import { pgliteRunner, type SqlRunner } from '@/lib/db/sql-runner';

/** Writes a consistent dump of an open embedded database to `file` (.tar.gz). */
export async function backupPglite(pglite: PGlite, file: string): Promise<number> {
  const dump = await pglite.dumpDataDir('gzip');
  const bytes = Buffer.from(await dump.arrayBuffer());
  writeFileSync(file, bytes);
  return bytes.byteLength;
}

/**
 * Restores a dump into `dataDir`, which must not hold a database yet (never overwrite a shop's records by
 * accident: move the old folder aside first). Returns the migrations the check applied (none for a backup
 * from this version).
 */
export async function restorePglite(file: string, dataDir: string): Promise<string[]> {
  if (dataDir !== 'memory://' && existsSync(dataDir) && readdirSync(dataDir).length > 0) {
    throw new Error(`${dataDir} already holds a database; restore into an empty folder (move the old one aside first).`);
  }
  if (dataDir !== 'memory://') mkdirSync(dataDir, { recursive: true });
  const pglite = new PGlite({
    ...(dataDir === 'memory://' ? {} : { dataDir }),
    loadDataDir: new Blob([readFileSync(file)]),
    extensions: { pg_trgm },
  });
  try {
    return await applyMigrations(pgliteRunner(pglite));
  } finally {
    await pglite.close();
  }
}

function run(cmd: string, args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: ['ignore', 'inherit', 'pipe'] });
    let err = '';
    child.stderr.on('data', (d: Buffer) => (err += d.toString()));
    child.on('error', reject);
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`${cmd} exited with ${code}: ${err.trim()}`))));
  });
}

/** pg_dump in its custom format (compressed, restorable table by table with pg_restore). */
export async function backupPostgres(url: string, file: string): Promise<void> {
  await run('pg_dump', ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, `--dbname=${url}`]);
}

/** pg_restore into an EMPTY database, in one transaction, then the migration check. */
export async function restorePostgres(file: string, url: string, runner: () => Promise<SqlRunner>): Promise<string[]> {
  const sql = await runner();
  try {
    const tables = await sql.query<{ n: string }>(`SELECT count(*)::text AS n FROM pg_tables WHERE schemaname = 'public'`);
    if (Number(tables[0]?.n ?? 0) > 0) throw new Error('The target database is not empty; restore into a new, empty database.');
  } finally {
    await sql.close();
  }
  await run('pg_restore', ['--no-owner', '--no-privileges', '--single-transaction', '--exit-on-error', `--dbname=${url}`, file]);
  const check = await runner();
  try {
    return await applyMigrations(check);
  } finally {
    await check.close();
  }
}
