/**
 * The one database client of the app. Nothing else constructs a PrismaClient (seed and tooling scripts
 * aside). The instance is cached on globalThis because Next.js bundles instrumentation, pages and route
 * handlers separately: a module-level cache would open the embedded database twice.
 */
import { mkdirSync } from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { PrismaPg } from '@prisma/adapter-pg';
import { PrismaPGlite } from 'pglite-prisma-adapter';
import { PrismaClient } from './generated/client';
import { readDbConfig, type DbConfig } from './config';
import { env } from '@/lib/env';
import { pgliteRunner, postgresRunner, type SqlRunner } from './sql-runner';

interface DbHandle {
  config: DbConfig;
  prisma: PrismaClient;
  /** A raw SQL connection for migrations and seeding (the same PGlite instance when embedded). */
  openRunner(): Promise<SqlRunner>;
  close(): Promise<void>;
  prepared?: Promise<void>;
  /** The embedded engine itself, for its consistent dump (lib/setup/backup.ts); absent on PostgreSQL. */
  pglite?: PGlite;
}

/**
 * Pool and transaction waits, chosen rather than left at the defaults (10 connections, 2 s to start a
 * transaction, 5 s to finish). Under CPU pressure 2 of 1,016 writes failed on the 2 s start wait; a
 * request queued longer than a person would wait is still refused, and the form says "busy, nothing
 * saved, try again" (lib/errors/database-failures.ts).
 * - pool: COILWRIGHT_DB_POOL_SIZE (default 10) per app instance; keep instances × pool below the
 *   server's max_connections (PostgreSQL's default is 100).
 * - maxWait 8 s to get a connection and start a transaction; timeout 20 s for a transaction to finish
 *   (the largest, a sheet save with its history and timeline rows, takes well under a second).
 * - connectionTimeoutMillis 8 s for a new TCP connection, so a database that is down is reported quickly.
 */
const TRANSACTION_OPTIONS = { maxWait: 8_000, timeout: 20_000 };

const holder = globalThis as typeof globalThis & { __coilwrightDb?: DbHandle };

function open(config: DbConfig): DbHandle {
  if (config.engine === 'postgres') {
    const prisma = new PrismaClient({
      adapter: new PrismaPg({
        connectionString: config.url,
        max: env().COILWRIGHT_DB_POOL_SIZE,
        connectionTimeoutMillis: 8_000,
        idleTimeoutMillis: 30_000,
      }),
      transactionOptions: TRANSACTION_OPTIONS,
    });
    return { config, prisma, openRunner: () => postgresRunner(config.url), close: () => prisma.$disconnect() };
  }
  const inMemory = config.dataDir === 'memory://';
  if (!inMemory) mkdirSync(config.dataDir, { recursive: true });
  // Extensions the migrations create must be loaded into the embedded engine up front.
  const pglite = new PGlite({ ...(inMemory ? {} : { dataDir: config.dataDir }), extensions: { pg_trgm } });
  const prisma = new PrismaClient({ adapter: new PrismaPGlite(pglite), transactionOptions: TRANSACTION_OPTIONS });
  return {
    config,
    prisma,
    pglite,
    openRunner: async () => pgliteRunner(pglite),
    close: async () => {
      await prisma.$disconnect();
      await pglite.close();
    },
  };
}

function handle(): DbHandle {
  holder.__coilwrightDb ??= open(readDbConfig());
  return holder.__coilwrightDb;
}

/** The Prisma client for the configured database. */
export function db(): PrismaClient {
  return handle().prisma;
}

/** The open embedded database, or null on PostgreSQL. */
export function embeddedDatabase(): PGlite | null {
  return handle().pglite ?? null;
}

export function dbEngine(): DbConfig['engine'] {
  return handle().config.engine;
}

export async function withSqlRunner<T>(work: (sql: SqlRunner) => Promise<T>): Promise<T> {
  const runner = await handle().openRunner();
  try {
    return await work(runner);
  } finally {
    await runner.close();
  }
}

/** Remembers the one-time preparation (migrate, seed) so it runs once per process. */
export function prepareOnce(prepare: () => Promise<void>): Promise<void> {
  const h = handle();
  h.prepared ??= prepare().catch((err: unknown) => {
    h.prepared = undefined;
    throw err;
  });
  return h.prepared;
}

/** Closes the database (the embedded one must be closed, or the process will not exit). */
export async function closeDb(): Promise<void> {
  const h = holder.__coilwrightDb;
  holder.__coilwrightDb = undefined;
  if (h) await h.close();
}

export type { PrismaClient };
export { Prisma } from './generated/client';
