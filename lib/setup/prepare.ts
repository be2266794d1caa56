/**
 * Start-up preparation, run once per process (instrumentation on server start, and by tests): apply the
 * migrations, then seed the invented demo shop on a first start of the embedded database (or on any
 * empty database when COILWRIGHT_SEED_DEMO=1).
 */
import { db, dbEngine, prepareOnce, withSqlRunner } from '../db/client';
import { applyMigrations } from '../db/migrate';
import { isEmpty, seedDemoShop } from './demo/seed-demo';
import { bootstrapAdmin } from '@/lib/users/user-writes';
import { env } from '@/lib/env';

export function prepareDatabase(): Promise<void> {
  return prepareOnce(async () => {
    const applied = await withSqlRunner((sql) => applyMigrations(sql));
    if (applied.length) console.log(`[coilwright] applied migrations: ${applied.join(', ')}`);
    // The embedded engine runs no autovacuum: refresh planner statistics once per start so the board's
    // queries keep good plans as the shop's data grows.
    if (dbEngine() === 'pglite') await withSqlRunner((sql) => sql.exec('ANALYZE'));
    const seed = env().COILWRIGHT_SEED_DEMO;
    const wantDemo = dbEngine() === 'pglite' ? seed !== '0' : seed === '1';
    if (wantDemo && (await isEmpty(db()))) {
      await seedDemoShop(db());
      console.log('[coilwright] seeded the demo shop (see README for the demo sign-ins)');
    } else if (await bootstrapAdmin()) {
      console.log('[coilwright] created the first administrator from COILWRIGHT_ADMIN_EMAIL');
    }
  });
}
