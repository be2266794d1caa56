import { createHash } from 'node:crypto';
import { mkdtempSync, mkdirSync, readFileSync, writeFileSync, cpSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { describe, expect, it } from 'vitest';
import { applyMigrations, listMigrations, migrationsDir, MigrationError } from '@/lib/db/migrate';
import { pgliteRunner } from '@/lib/db/sql-runner';
import { diffToSchema, migrationsTarget } from '@/lib/db/tooling/schema-diff';

describe('migrations', () => {
  // Replaying every migration in the WebAssembly schema engine takes ~20 s alone and much longer on a busy machine.
  it('applied to an empty database give exactly the schema the schema files declare (no drift)', { timeout: 240_000 }, async () => {
    expect(await diffToSchema(migrationsTarget())).toBe('');
  });

  it('are recorded in Prisma’s own table with the sha256 of each file, and a second run applies nothing', async () => {
    const pglite = new PGlite({ extensions: { pg_trgm } });
    const sql = pgliteRunner(pglite);
    const first = await applyMigrations(sql);
    expect(first).toEqual(listMigrations().map((m) => m.name));
    const rows = await sql.query<{ migration_name: string; checksum: string; finished_at: Date | null; applied_steps_count: number }>(
      'SELECT migration_name, checksum, finished_at, applied_steps_count FROM "_prisma_migrations" ORDER BY migration_name',
    );
    for (const row of rows) {
      const bytes = readFileSync(join(migrationsDir(), row.migration_name, 'migration.sql'));
      expect(row.checksum).toBe(createHash('sha256').update(bytes).digest('hex'));
      expect(row.finished_at).not.toBeNull();
      expect(row.applied_steps_count).toBe(1);
    }
    expect(await applyMigrations(sql)).toEqual([]);
    await pglite.close();
  });

  it('leave a failed migration unfinished with its log, and refuse to go on until it is resolved', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-migrations-'));
    cpSync(migrationsDir(), dir, { recursive: true });
    mkdirSync(join(dir, '99990101000000_broken'));
    writeFileSync(join(dir, '99990101000000_broken', 'migration.sql'), 'ALTER TABLE "NoSuchTable" ADD COLUMN x int;');
    const pglite = new PGlite({ extensions: { pg_trgm } });
    const sql = pgliteRunner(pglite);
    await expect(applyMigrations(sql, dir)).rejects.toBeInstanceOf(MigrationError);
    const [row] = await sql.query<{ finished_at: Date | null; logs: string | null }>(
      `SELECT finished_at, logs FROM "_prisma_migrations" WHERE migration_name = '99990101000000_broken'`,
    );
    expect(row?.finished_at).toBeNull();
    expect(row?.logs).toContain('NoSuchTable');
    await expect(applyMigrations(sql, dir)).rejects.toThrow(/failed earlier/);
    await pglite.close();
  });
});
