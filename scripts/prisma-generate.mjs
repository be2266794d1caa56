// Generates the Prisma client on `npm install`. `prisma generate` never runs the native schema engine,
// but the CLI insists that one exists and tries to download it; on machines that cannot reach Prisma's
// download host, point it at a placeholder file. A user's own PRISMA_SCHEMA_ENGINE_BINARY is respected.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { tmpdir } from 'node:os';

const env = { ...process.env, PRISMA_HIDE_UPDATE_MESSAGE: '1', CHECKPOINT_DISABLE: '1' };
if (!env.PRISMA_SCHEMA_ENGINE_BINARY) {
  const dir = join(tmpdir(), 'coilwright-prisma');
  const placeholder = join(dir, 'schema-engine-placeholder');
  if (!existsSync(placeholder)) {
    mkdirSync(dir, { recursive: true });
    writeFileSync(placeholder, '#!/bin/sh\necho "placeholder: generate needs no schema engine" >&2\nexit 1\n', { mode: 0o755 });
  }
  env.PRISMA_SCHEMA_ENGINE_BINARY = placeholder;
}
const result = spawnSync(process.execPath, ['node_modules/prisma/build/index.js', 'generate'], { stdio: 'inherit', env });
process.exit(result.status ?? 1);
