/**
 * Applies prisma/migrations/<name>/migration.sql in name order and records each in Prisma's own
 * `_prisma_migrations` table (same DDL, sha256 checksum of the file's bytes), so that `prisma migrate
 * deploy` / `status` on a machine with Prisma's native engine accept the history as their own.
 * Takes Prisma's advisory lock so two app instances starting together do not race.
 */
import { createHash, randomUUID } from 'node:crypto';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import type { SqlRunner } from './sql-runner';

const PRISMA_MIGRATE_LOCK = 72707369;

const CREATE_TABLE = `CREATE TABLE IF NOT EXISTS "_prisma_migrations" (
  "id" VARCHAR(36) PRIMARY KEY NOT NULL,
  "checksum" VARCHAR(64) NOT NULL,
  "finished_at" TIMESTAMPTZ,
  "migration_name" VARCHAR(255) NOT NULL,
  "logs" TEXT,
  "rolled_back_at" TIMESTAMPTZ,
  "started_at" TIMESTAMPTZ NOT NULL DEFAULT now(),
  "applied_steps_count" INTEGER NOT NULL DEFAULT 0
)`;

export class MigrationError extends Error {
  override name = 'MigrationError';
}

export function migrationsDir(): string {
  return join(process.cwd(), 'prisma', 'migrations');
}

export function listMigrations(dir = migrationsDir()): { name: string; sql: Buffer }[] {
  if (!existsSync(/*turbopackIgnore: true*/ dir)) throw new MigrationError(`No migrations folder at ${dir}.`);
  return readdirSync(/*turbopackIgnore: true*/ dir, { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => d.name)
    .sort()
    .map((name) => ({ name, sql: readFileSync(/*turbopackIgnore: true*/ join(dir, name, 'migration.sql')) }));
}

/** Returns the names of the migrations it applied (empty when the database was up to date). */
export async function applyMigrations(db: SqlRunner, dir = migrationsDir()): Promise<string[]> {
  const migrations = listMigrations(dir);
  await db.query('SELECT pg_advisory_lock($1)', [PRISMA_MIGRATE_LOCK]);
  try {
    await db.exec(CREATE_TABLE);
    const rows = await db.query<{ migration_name: string; checksum: string; finished_at: Date | null; rolled_back_at: Date | null }>(
      'SELECT migration_name, checksum, finished_at, rolled_back_at FROM "_prisma_migrations"',
    );
    const failed = rows.find((r) => r.finished_at === null && r.rolled_back_at === null);
    if (failed) {
      throw new MigrationError(
        `Migration ${failed.migration_name} failed earlier and is not resolved; fix the database, then mark it rolled back.`,
      );
    }
    const applied = new Map(rows.filter((r) => r.finished_at).map((r) => [r.migration_name, r.checksum]));
    const done: string[] = [];
    for (const { name, sql } of migrations) {
      const checksum = createHash('sha256').update(sql).digest('hex');
      const previous = applied.get(name);
      if (previous !== undefined) {
        if (previous !== checksum) throw new MigrationError(`Migration ${name} was edited after it was applied.`);
        continue;
      }
      const id = randomUUID();
      await db.query('INSERT INTO "_prisma_migrations" (id, checksum, migration_name, started_at) VALUES ($1, $2, $3, now())', [
        id,
        checksum,
        name,
      ]);
      try {
        await db.exec(`BEGIN;\n${sql.toString('utf8')}\n;COMMIT;`);
      } catch (err) {
        await db.exec('ROLLBACK').catch(() => {});
        await db.query('UPDATE "_prisma_migrations" SET logs = $2 WHERE id = $1', [id, String(err)]);
        throw new MigrationError(`Migration ${name} failed: ${String(err)}`);
      }
      await db.query('UPDATE "_prisma_migrations" SET finished_at = now(), applied_steps_count = 1 WHERE id = $1', [id]);
      done.push(name);
    }
    return done;
  } finally {
    await db.query('SELECT pg_advisory_unlock($1)', [PRISMA_MIGRATE_LOCK]);
  }
}
