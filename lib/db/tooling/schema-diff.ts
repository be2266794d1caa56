/**
 * Offline migration tooling: Prisma's schema engine compiled to WebAssembly, driven through an in-memory
 * PGlite. Used by `npm run db:migration` (to write a new migration without Prisma's native engine) and by
 * the drift test (migrations folder replayed vs. the schema files). Never imported by the running app.
 */
import { readFileSync, readdirSync, existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { PrismaPGlite } from 'pglite-prisma-adapter';
import { bindMigrationAwareSqlAdapterFactory } from '@prisma/driver-adapter-utils';
import type { DiffTarget, SchemaEngine } from '@prisma/schema-engine-wasm';

const require = createRequire(import.meta.url);
export const SCHEMA_DIR = resolve('prisma/schema');
export const MIGRATIONS_DIR = resolve('prisma/migrations');

export function schemaFiles(dir = SCHEMA_DIR): { path: string; content: string }[] {
  return readdirSync(dir)
    .filter((f) => f.endsWith('.prisma'))
    .sort()
    .map((f) => ({ path: join(dir, f), content: readFileSync(join(dir, f), 'utf8') }));
}

export function migrationsTarget(dir = MIGRATIONS_DIR): DiffTarget {
  const names = existsSync(dir)
    ? readdirSync(dir, { withFileTypes: true })
        .filter((d) => d.isDirectory())
        .map((d) => d.name)
        .sort()
    : [];
  if (names.length === 0) return { tag: 'empty' };
  const lockPath = join(dir, 'migration_lock.toml');
  return {
    tag: 'migrations',
    baseDir: dir,
    lockfile: { path: 'migration_lock.toml', content: existsSync(lockPath) ? readFileSync(lockPath, 'utf8') : null },
    shadowDbInitScript: '',
    migrationDirectories: names.map((name) => ({
      path: name,
      migrationFile: {
        path: 'migration.sql',
        content: { tag: 'ok', value: readFileSync(join(dir, name, 'migration.sql'), 'utf8') },
      },
    })),
  };
}

/** The adapter's shadow database is a bare PGlite; ours loads the extensions the migrations create. */
class PGliteWithExtensions extends PrismaPGlite {
  override connectToShadowDb() {
    return new PrismaPGlite(new PGlite({ extensions: { pg_trgm } })).connect();
  }
}

async function loadEngine(pglite: PGlite): Promise<SchemaEngine> {
  const pkgDir = dirname(require.resolve('@prisma/schema-engine-wasm'));
  const bg = (await import(
    pathToFileURL(join(pkgDir, 'schema_engine_bg.js')).href
  )) as typeof import('@prisma/schema-engine-wasm/schema_engine_bg') & {
    __wbg_set_wasm: (exports: WebAssembly.Exports) => void;
  };
  const bytes = readFileSync(join(pkgDir, 'schema_engine_bg.wasm'));
  const { instance } = await WebAssembly.instantiate(bytes, { './schema_engine_bg.js': bg as unknown as WebAssembly.ModuleImports });
  bg.__wbg_set_wasm(instance.exports);
  const start = instance.exports.__wbindgen_start;
  if (typeof start === 'function') start();
  const datamodels = schemaFiles().map((f): [string, string] => [f.path, f.content]);
  return bg.SchemaEngine.new({ datamodels }, () => {}, bindMigrationAwareSqlAdapterFactory(new PGliteWithExtensions(pglite)));
}

/** SQL that takes the database from `from` to the current schema files (empty string when none). */
export async function diffToSchema(from: DiffTarget): Promise<string> {
  const pglite = new PGlite({ extensions: { pg_trgm } });
  try {
    const engine = await loadEngine(pglite);
    const result = await engine.diff({
      from,
      to: { tag: 'schemaDatamodel', files: schemaFiles() },
      script: true,
      exitCode: null,
      filters: { externalTables: [], externalEnums: [] },
    });
    const sql = result.stdout ?? '';
    return /^\s*(-- This is an empty migration\.)?\s*$/.test(sql) ? '' : sql;
  } finally {
    await pglite.close();
  }
}
