// `npm test`: every layer, in order. Unit tests; integration tests on the embedded database (and on a real
// PostgreSQL when TEST_DATABASE_URL is set); a production build; end-to-end tests in Chromium on the
// embedded database (and on PostgreSQL when TEST_DATABASE_URL is set). Stops at the first failing step.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

process.env.NEXT_TELEMETRY_DISABLED = '1';
const bin = (name) => join('node_modules', '.bin', name);
const pg = process.env.TEST_DATABASE_URL;
const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

function run(title, cmd, args, env = {}) {
  console.log(`\n=== ${title} ===`);
  const started = Date.now();
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  const secs = ((Date.now() - started) / 1000).toFixed(0);
  if (r.status !== 0) {
    console.error(`\n✗ ${title} failed (${secs} s)`);
    process.exit(r.status ?? 1);
  }
  console.log(`✓ ${title} (${secs} s)`);
}

if (!existsSync(chromium)) {
  if (process.getuid?.() === 0) run('install Chromium from Debian', 'bash', ['scripts/ensure-chromium.sh']);
  else {
    console.error(
      `Chromium is needed for the browser tests: install Debian's package (sudo apt-get install -y chromium) or set CHROMIUM_PATH.`,
    );
    process.exit(1);
  }
}

const vitest = (project, env, title) => run(title, bin('vitest'), ['run', '--project', project], env);
run('typecheck', bin('tsc'), ['--noEmit', '-p', '.']);
run('lint', bin('eslint'), ['.']);
run('format check', bin('prettier'), ['--check', '.']);
vitest('unit', {}, 'unit tests');
vitest('integration', { INTEGRATION_DB: 'pglite' }, 'integration tests, embedded PostgreSQL (PGlite)');
if (pg) vitest('integration', { INTEGRATION_DB: 'postgres' }, 'integration tests, PostgreSQL');
else console.log('\n(TEST_DATABASE_URL not set: integration and browser tests against a real PostgreSQL skipped)');
run('production build', bin('next'), ['build']);
vitest('e2e', { E2E_DB: 'pglite' }, 'browser tests, embedded PostgreSQL (PGlite)');
if (pg) vitest('e2e', { E2E_DB: 'postgres' }, 'browser tests, PostgreSQL');
console.log('\nAll test layers passed.');
