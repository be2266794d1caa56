import { z } from 'zod';

/**
 * Which database the process talks to, read once from the environment and checked with zod.
 * DATABASE_URL set → a real PostgreSQL through @prisma/adapter-pg; otherwise the embedded PostgreSQL
 * (PGlite) in COILWRIGHT_DATA_DIR (default ./data/pglite), or in memory when that is `memory://`.
 */
const envSchema = z.object({
  DATABASE_URL: z.string().url('DATABASE_URL must be a postgres:// connection URL').optional(),
  COILWRIGHT_DATA_DIR: z.string().min(1).default('./data/pglite'),
});

export type DbConfig = { engine: 'postgres'; url: string } | { engine: 'pglite'; dataDir: string };

export function readDbConfig(env: NodeJS.ProcessEnv = process.env): DbConfig {
  const parsed = envSchema.parse({
    DATABASE_URL: env.DATABASE_URL || undefined,
    COILWRIGHT_DATA_DIR: env.COILWRIGHT_DATA_DIR || undefined,
  });
  return parsed.DATABASE_URL
    ? { engine: 'postgres', url: parsed.DATABASE_URL }
    : { engine: 'pglite', dataDir: parsed.COILWRIGHT_DATA_DIR };
}
