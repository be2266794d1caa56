/**
 * Every setting Coilwright reads from the environment, checked once with zod. Code reads `env()` (or
 * `readEnv(source)` in tests), never `process.env` directly, so each variable is named, documented and
 * validated in one place. Blank values count as unset.
 */
import { z } from 'zod';

const flag = z.enum(['0', '1']).optional();
const shortText = z.string().trim().max(200).optional();

const envSchema = z.object({
  /** A real PostgreSQL; unset → the embedded database. */
  DATABASE_URL: z.string().url('DATABASE_URL must be a postgres:// connection URL').optional(),
  /** Folder of the embedded database (or `memory://`). */
  COILWRIGHT_DATA_DIR: z.string().min(1).max(1000).default('./data/pglite'),
  /** 1: seed the invented demo shop into an empty database; 0: never. Default: only the embedded one. */
  COILWRIGHT_SEED_DEMO: flag,
  /** First administrator on an empty real database. */
  COILWRIGHT_ADMIN_EMAIL: z.string().trim().toLowerCase().max(254).optional(),
  COILWRIGHT_ADMIN_PASSWORD: z.string().max(200).optional(),
  /** Connections per app instance to PostgreSQL (lib/db/client.ts). */
  COILWRIGHT_DB_POOL_SIZE: z.coerce.number().int().min(1).max(200).default(10),
  /**
   * 1 when a reverse proxy (TLS terminator, load balancer) forwards to the app: X-Forwarded-For (its last
   * entry) names the client for the sign-in limit, and X-Forwarded-Host/-Proto are believed. Unset: the
   * server started by `npm start` drops those headers from clients (scripts/serve.mjs).
   */
  COILWRIGHT_TRUST_PROXY: flag,
  /**
   * Extra origins (host[:port], comma-separated) allowed to post to server actions, for a proxy that
   * rewrites the Host header; the app's own host is always allowed (next.config.js).
   */
  COILWRIGHT_ALLOWED_ORIGINS: z
    .string()
    .trim()
    .max(1000)
    .regex(/^[A-Za-z0-9.:*,\- ]*$/, 'host names and ports, comma-separated')
    .optional(),
  /** 1 when served over HTTPS: session cookies get the Secure flag. */
  COILWRIGHT_SECURE_COOKIES: flag,
  /** The shop's own details at the head of the job sheet. */
  COILWRIGHT_SHOP_NAME: shortText,
  COILWRIGHT_SHOP_ADDRESS: shortText,
  COILWRIGHT_SHOP_PHONE: shortText,
});

export type Env = z.output<typeof envSchema>;

/** Checks an environment record; a bad value stops start-up with the variable's name and the reason. */
export function readEnv(source: Record<string, string | undefined>): Env {
  const present = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v.trim() !== ''));
  const r = envSchema.safeParse(present);
  if (r.success) return r.data;
  const why = r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
  throw new Error(`Coilwright settings in the environment are not valid: ${why}`);
}

let cached: Env | undefined;

/** The process's settings, checked on first use. */
export function env(): Env {
  cached ??= readEnv(process.env);
  return cached;
}
