// `npm start`: build the production app when the sources are newer than the last build, then serve it.
// The server migrates the database and, on a first embedded start, seeds the demo shop (instrumentation.ts).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

process.env.NEXT_TELEMETRY_DISABLED = '1';
const next = join('node_modules', '.bin', 'next');
const port = process.env.PORT ?? '3000';
const host = process.env.HOST ?? '127.0.0.1';

function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return Math.max(st.mtimeMs, ...readdirSync(path).map((f) => newestMtime(join(path, f))));
}

const buildId = join('.next', 'BUILD_ID');
const sources = ['app', 'lib', 'prisma', 'public', 'instrumentation.ts', 'next.config.js', 'package.json'];
const built = existsSync(buildId) ? statSync(buildId).mtimeMs : 0;
if (built < Math.max(...sources.map(newestMtime))) {
  console.log('Building Coilwright (about half a minute)…');
  const b = spawnSync(next, ['build'], { stdio: 'inherit' });
  if (b.status !== 0) process.exit(b.status ?? 1);
}

console.log(`Starting Coilwright on http://${host}:${port} …`);
console.log(
  process.env.DATABASE_URL
    ? 'Database: PostgreSQL from DATABASE_URL'
    : `Database: embedded, in ${process.env.COILWRIGHT_DATA_DIR ?? './data/pglite'}`,
);
// A heap cap for the server's JavaScript heap: measured use stays well below it (README, "Memory"), and a cap
// makes the collector work before the process grows rather than after. PDF workers have their own cap.
// An explicit NODE_OPTIONS from the environment wins.
const HEAP_CAP_MB = 320;
const nodeOptions = process.env.NODE_OPTIONS ?? `--max-old-space-size=${HEAP_CAP_MB}`;
const server = spawn(process.execPath, [join('scripts', 'serve.mjs')], {
  stdio: 'inherit',
  env: { ...process.env, PORT: port, HOST: host, NODE_OPTIONS: nodeOptions },
});
const stop = (signal) => server.kill(signal);
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
server.on('exit', (code) => process.exit(code ?? 0));
