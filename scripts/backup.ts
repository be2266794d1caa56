/**
 * `npm run backup [-- --out file]`: a consistent backup of the shop's database.
 * Embedded database: stop the app first (the data folder has one user at a time), then this writes a
 * .tar.gz taken by PGlite itself. PostgreSQL (DATABASE_URL set): pg_dump's custom format, safe while the
 * app runs. Default file: ./backups/coilwright-<UTC date and time>.<tar.gz|dump>.
 */
import { mkdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { backupPglite, backupPostgres } from '@/lib/setup/backup';
import { readDbConfig } from '@/lib/db/config';

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const outAt = args.indexOf('--out');
  const config = readDbConfig();
  const stamp = new Date().toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
  const file =
    outAt >= 0 && args[outAt + 1]
      ? args[outAt + 1]!
      : join('backups', `coilwright-${stamp}.${config.engine === 'postgres' ? 'dump' : 'tar.gz'}`);
  mkdirSync(dirname(file), { recursive: true });
  if (config.engine === 'postgres') {
    await backupPostgres(config.url, file);
  } else {
    if (config.dataDir === 'memory://') throw new Error('The in-memory database has nothing to back up.');
    const pglite = new PGlite({ dataDir: config.dataDir, extensions: { pg_trgm } });
    try {
      await backupPglite(pglite, file);
    } finally {
      await pglite.close();
    }
  }
  console.log(`Backed up to ${file} (${Math.round(statSync(file).size / 1024)} kB). Keep a copy off this machine.`);
  return 0;
}

main().then(
  (code) => process.exit(code),
  (e: unknown) => {
    console.error(`Backup failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  },
);
