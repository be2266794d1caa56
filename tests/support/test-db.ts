/**
 * Integration tests run against the embedded PostgreSQL (in memory) and, when TEST_DATABASE_URL is set and
 * the run asks for it (INTEGRATION_DB=postgres), against a fresh database on a real PostgreSQL. One database
 * per test file; the demo shop is seeded so tests have users, customers and jobs to work with.
 */
import { afterAll, beforeAll } from 'vitest';
import { closeDb } from '@/lib/db/client';
import { prepareDatabase } from '@/lib/setup/prepare';
import { createTestDatabase, dropTestDatabase } from './pg-databases';

export const TEST_ENGINE = process.env.INTEGRATION_DB === 'postgres' ? 'postgres' : 'pglite';

export function useTestDatabase(): void {
  let url: string | undefined;
  beforeAll(async () => {
    process.env.COILWRIGHT_SEED_DEMO = '1';
    if (TEST_ENGINE === 'postgres') {
      url = await createTestDatabase('it');
      process.env.DATABASE_URL = url;
    } else {
      delete process.env.DATABASE_URL;
      process.env.COILWRIGHT_DATA_DIR = 'memory://';
    }
    await prepareDatabase();
  });
  afterAll(async () => {
    await closeDb();
    if (url) await dropTestDatabase(url);
  });
}
