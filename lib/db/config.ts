/**
 * Which database the process talks to. DATABASE_URL set → a real PostgreSQL through @prisma/adapter-pg;
 * otherwise the embedded PostgreSQL (PGlite) in COILWRIGHT_DATA_DIR (default ./data/pglite), or in memory
 * when that is `memory://`. The variables are checked in lib/env.ts.
 */
import { env, type Env } from '@/lib/env';

export type DbConfig = { engine: 'postgres'; url: string } | { engine: 'pglite'; dataDir: string };

export function readDbConfig(e: Pick<Env, 'DATABASE_URL' | 'COILWRIGHT_DATA_DIR'> = env()): DbConfig {
  return e.DATABASE_URL ? { engine: 'postgres', url: e.DATABASE_URL } : { engine: 'pglite', dataDir: e.COILWRIGHT_DATA_DIR };
}
