/**
 * Runs once when the server starts: migrate the database and seed the demo shop on a first embedded
 * start (lib/setup/server-start.ts). Skipped while `next build` collects pages and in the edge runtime.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === 'nodejs' && process.env.NEXT_PHASE !== 'phase-production-build') {
    const { startDatabase } = await import('./lib/setup/server-start');
    await startDatabase();
  }
}
