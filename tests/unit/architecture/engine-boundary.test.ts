import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Every TypeScript file under lib/engine, recursively. */
function engineFiles(dir = 'lib/engine'): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? engineFiles(p) : /\.tsx?$/.test(p) ? [p] : [];
  });
}

// The engine runs in the browser (live analysis), on the server and on the command line: it must not pull
// in a framework, the database or any other part of the project. It owns its input types; the schemas map
// user input onto them. Relative imports must stay inside lib/engine.
const ALLOWED_OUTSIDE = [/^\.{1,2}\//, /^node:util$/];

describe('the calculation engine', () => {
  it.each(engineFiles())('%s imports no React, Next, Prisma or database code', (file) => {
    const specifiers = [...readFileSync(file, 'utf8').matchAll(/(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]/g)].map((m) => m[1]!);
    const outside = specifiers.filter((s) => !ALLOWED_OUTSIDE.some((re) => re.test(s)));
    const escapes = specifiers.filter((s) => s.startsWith('.') && !resolve(dirname(file), s).startsWith(resolve('lib/engine')));
    expect(outside).toEqual([]);
    expect(escapes).toEqual([]);
  });
});
