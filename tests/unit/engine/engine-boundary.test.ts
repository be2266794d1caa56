import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Every TypeScript file under lib/engine, recursively. */
function engineFiles(dir = 'lib/engine'): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? engineFiles(p) : p.endsWith('.ts') ? [p] : [];
  });
}

// The engine runs in the browser (live analysis), on the server and on the command line: it must not pull
// in a framework or the database. The winding-sheet schema is plain zod, shared with the CLI on purpose.
const ALLOWED_OUTSIDE = [/^\.{1,2}\//, /^zod$/, /^@\/lib\/schemas\/winding-sheet$/, /^node:util$/];

describe('the calculation engine', () => {
  it.each(engineFiles())('%s imports no React, Next, Prisma or database code', (file) => {
    const specifiers = [...readFileSync(file, 'utf8').matchAll(/(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]/g)].map((m) => m[1]!);
    const outside = specifiers.filter((s) => !ALLOWED_OUTSIDE.some((re) => re.test(s)));
    expect(outside).toEqual([]);
  });
});
