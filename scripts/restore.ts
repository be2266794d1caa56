/**
 * `npm run restore -- <backup file>`: puts a backup back into an EMPTY database, then runs the migration
 * check. Embedded: into COILWRIGHT_DATA_DIR (default ./data/pglite), which must be empty or absent: stop
 * the app and move the old folder aside first. PostgreSQL: into the (empty) database named by DATABASE_URL
 * (create it with `createdb` first).
 */
import { restorePglite, restorePostgres } from '@/lib/setup/backup';
import { readDbConfig } from '@/lib/db/config';
import { postgresRunner } from '@/lib/db/sql-runner';

async function main(): Promise<number> {
  const file = process.argv[2];
  if (!file) {
    console.error('Usage: npm run restore -- <backup file>');
    return 2;
  }
  const config = readDbConfig();
  const applied =
    config.engine === 'postgres'
      ? await restorePostgres(file, config.url, () => postgresRunner(config.url))
      : await restorePglite(file, config.dataDir);
  console.log(`Restored ${file}. Migration check passed${applied.length ? `; applied newer migrations: ${applied.join(', ')}` : ''}.`);
  return 0;
}

main().then(
  (code) => process.exit(code),
  (e: unknown) => {
    console.error(`Restore failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  },
);
