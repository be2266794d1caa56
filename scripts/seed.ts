/**
 * `npm run db:seed`: seed the invented demo shop into an EMPTY database (the embedded one, or DATABASE_URL).
 * Refuses a database that already holds people or jobs, so it never mixes demo data with a shop's records.
 */
import { closeDb, db, withSqlRunner } from '@/lib/db/client';
import { applyMigrations } from '@/lib/db/migrate';
import { isEmpty, seedDemoShop } from '@/lib/setup/demo/seed-demo';

async function main(): Promise<number> {
  await withSqlRunner((sql) => applyMigrations(sql));
  if (!(await isEmpty(db()))) {
    console.error('The database already holds records: the demo shop is seeded only into an empty database.');
    return 2;
  }
  await seedDemoShop(db());
  console.log('Seeded the demo shop (see README for the demo sign-ins).');
  return 0;
}

main()
  .then(async (code) => {
    await closeDb();
    process.exit(code);
  })
  .catch(async (e: unknown) => {
    console.error(e instanceof Error ? e.message : String(e));
    await closeDb();
    process.exit(1);
  });
