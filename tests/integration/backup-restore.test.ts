/**
 * Issue 12: backup → wipe → restore gives back every record. On the embedded database through PGlite's
 * dump; on PostgreSQL (INTEGRATION_DB=postgres) through pg_dump / pg_restore against the local server.
 * The restored database passes the migration check with nothing to apply.
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { db, embeddedDatabase, withSqlRunner } from '@/lib/db/client';
import { pgliteRunner, postgresRunner, type SqlRunner } from '@/lib/db/sql-runner';
import { backupPglite, backupPostgres, restorePglite, restorePostgres } from '@/lib/setup/backup';
import { applyMigrations } from '@/lib/db/migrate';
import { useTestDatabase, TEST_ENGINE } from '../support/test-db';
import { createTestDatabase, dropTestDatabase } from '../support/pg-databases';

useTestDatabase();

/** Every row of every table, as sorted JSON per table: two databases are equal when these are. */
async function snapshot(sql: SqlRunner): Promise<Record<string, string[]>> {
  const tables = await sql.query<{ tablename: string }>(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`);
  const out: Record<string, string[]> = {};
  for (const { tablename } of tables) {
    const rows = await sql.query<{ r: string }>(`SELECT to_jsonb(t)::text AS r FROM "${tablename}" t`);
    out[tablename] = rows.map((x) => x.r).sort();
  }
  return out;
}

async function fillSomeMore(): Promise<void> {
  // Records beyond the demo seed, including a photo's bytes and JSON, so every column type is covered.
  const job = await db().job.findFirstOrThrow({ where: { number: 1003 } });
  await db().attachment.create({
    data: {
      jobId: job.id,
      kind: 'OTHER',
      filename: 'plate.png',
      mimeType: 'image/png',
      sizeBytes: 4,
      data: Buffer.from([0x89, 0x50, 0x4e, 0x47]),
    },
  });
  await db().jobEvent.create({ data: { jobId: job.id, kind: 'EDIT', message: "Backup test: ünïcödé, Ω, ⚠, 'quotes'" } });
}

describe('backup and restore', () => {
  it('fill → back up → wipe → restore gives back every table, row for row', async () => {
    await fillSomeMore();
    const before = await withSqlRunner(snapshot);
    expect(Object.keys(before).length).toBeGreaterThan(15);
    expect(before.Job?.length).toBeGreaterThanOrEqual(40);
    const dir = mkdtempSync(join(tmpdir(), 'cw-i12-backup-'));
    try {
      if (TEST_ENGINE === 'pglite') {
        const pglite = embeddedDatabase();
        if (!pglite) throw new Error('embedded database expected');
        const file = join(dir, 'shop.tar.gz');
        expect(await backupPglite(pglite, file)).toBeGreaterThan(1000);
        const target = join(dir, 'restored');
        expect(await restorePglite(file, target)).toEqual([]); // migration check: nothing to apply
        const restored = new PGlite({ dataDir: target, extensions: { pg_trgm } });
        try {
          expect(await snapshot(pgliteRunner(restored))).toEqual(before);
          expect(await applyMigrations(pgliteRunner(restored))).toEqual([]);
        } finally {
          await restored.close();
        }
        await expect(restorePglite(file, target)).rejects.toThrow(/already holds a database/);
      } else {
        const source = process.env.DATABASE_URL;
        if (!source) throw new Error('DATABASE_URL expected');
        const file = join(dir, 'shop.dump');
        await backupPostgres(source, file);
        const target = await createTestDatabase('rs');
        try {
          expect(await restorePostgres(file, target, () => postgresRunner(target))).toEqual([]);
          const sql = await postgresRunner(target);
          try {
            expect(await snapshot(sql)).toEqual(before);
          } finally {
            await sql.close();
          }
          await expect(restorePostgres(file, target, () => postgresRunner(target))).rejects.toThrow(/not empty/);
        } finally {
          await dropTestDatabase(target);
        }
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 300_000);

  it('a damaged backup file is refused and leaves the target empty', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cw-i12-bad-'));
    try {
      const file = join(dir, 'bad.tar.gz');
      writeFileSync(file, 'not a backup');
      if (TEST_ENGINE === 'pglite') await expect(restorePglite(file, 'memory://')).rejects.toThrow();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
