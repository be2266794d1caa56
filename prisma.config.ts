import { defineConfig } from 'prisma/config';

// Prisma 7 reads no .env here; DATABASE_URL comes from the environment when a real PostgreSQL is used.
// The app itself applies migrations at start-up (lib/db/migrate.ts), so the CLI's migrate commands are
// optional on machines that have Prisma's native engine.
export default defineConfig({
  schema: 'prisma/schema',
  migrations: { path: 'prisma/migrations' },
  ...(process.env.DATABASE_URL ? { datasource: { url: process.env.DATABASE_URL } } : {}),
});
