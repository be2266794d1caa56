/**
 * Starts the built app (`next start`) on a free port against a fresh database for end-to-end tests:
 * a new embedded database in a temp folder, or a new PostgreSQL database when TEST_DATABASE_URL is set
 * and E2E_DB=postgres. The demo shop is seeded in both, so tests sign in as demo users.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createTestDatabase, dropTestDatabase } from './pg-databases';

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      srv.close(() => (typeof addr === 'object' && addr ? resolve(addr.port) : reject(new Error('no port'))));
    });
  });
}

export interface AppServer {
  baseUrl: string;
  /** The PostgreSQL database the app uses (E2E_DB=postgres), for tests that check what was stored. */
  databaseUrl?: string;
  stop(): Promise<void>;
}

export async function startApp(): Promise<AppServer> {
  const port = await freePort();
  const env: NodeJS.ProcessEnv = { ...process.env, NEXT_TELEMETRY_DISABLED: '1', COILWRIGHT_SEED_DEMO: '1', PORT: String(port) };
  let cleanup: () => Promise<void>;
  if (process.env.E2E_DB === 'postgres') {
    const url = await createTestDatabase('e2e');
    env.DATABASE_URL = url;
    cleanup = () => dropTestDatabase(url);
  } else {
    delete env.DATABASE_URL;
    const dir = mkdtempSync(join(tmpdir(), 'cw-e2e-db-'));
    env.COILWRIGHT_DATA_DIR = dir;
    cleanup = async () => rmSync(dir, { recursive: true, force: true });
  }
  const child: ChildProcess = spawn(process.execPath, [join('scripts', 'serve.mjs')], {
    env: { ...env, HOST: '127.0.0.1' },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let log = '';
  child.stdout?.on('data', (d: Buffer) => (log += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (log += d.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 120_000;
  // Ready means the database is migrated and seeded: the sign-in page renders.
  for (;;) {
    if (child.exitCode !== null) throw new Error(`app exited early:\n${log}`);
    try {
      const res = await fetch(`${baseUrl}/login`);
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error(`app did not start in time:\n${log}`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return {
    baseUrl,
    databaseUrl: env.DATABASE_URL,
    async stop() {
      if (child.pid && child.exitCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        process.kill(-child.pid, 'SIGTERM');
        await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
        if (child.exitCode === null) process.kill(-child.pid, 'SIGKILL');
      }
      await cleanup();
    },
  };
}
