import { closeDb } from '../db/client';
import { prepareDatabase } from './prepare';

/** Prepares the database at server start and closes it on shutdown (an open PGlite keeps the process alive). */
export async function startDatabase(): Promise<void> {
  await prepareDatabase();
  const shutdown = () => {
    void closeDb().finally(() => process.exit(0));
  };
  process.once('SIGTERM', shutdown);
  process.once('SIGINT', shutdown);
}
