import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

/** Every TypeScript file below a folder, recursively, leaving out Prisma's generated client. */
function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    if (p === join('lib', 'db', 'generated')) return [];
    return statSync(p).isDirectory() ? sourceFiles(p) : /\.tsx?$/.test(p) ? [p] : [];
  });
}

/** Module specifiers of value imports (type-only imports carry no code and are allowed across layers). */
function valueImports(file: string): string[] {
  const src = readFileSync(file, 'utf8');
  return [...src.matchAll(/^\s*(?:import|export)\s+(?!type\b)[^'"]*?from\s+['"]([^'"]+)['"]/gm)].map((m) => m[1]!);
}

const appFiles = sourceFiles('app');
const libFiles = sourceFiles('lib');

// The picture in DEVELOPERS.md: app → lib/<domain> → lib/db, lib/engine. Each rule below keeps one arrow true.
describe('the layers', () => {
  it.each(appFiles)('%s reads data only through a domain, never the database client', (file) => {
    expect(valueImports(file).filter((s) => s.startsWith('@/lib/db'))).toEqual([]);
  });

  it.each(libFiles)('%s does not import a screen', (file) => {
    expect(valueImports(file).filter((s) => s.startsWith('@/app') || s.includes('/app/'))).toEqual([]);
  });

  it.each([...appFiles, ...libFiles].filter((f) => !f.startsWith(join('lib', 'setup'))))(
    '%s does not depend on the invented demo shop',
    (file) => {
      expect(valueImports(file).filter((s) => s.includes('setup/demo'))).toEqual([]);
    },
  );

  it.each([...appFiles, ...libFiles].filter((f) => f !== join('lib', 'env.ts')))('%s reads settings through lib/env.ts', (file) => {
    const src = readFileSync(file, 'utf8');
    expect(src.match(/process\.env\.(?!NODE_ENV\b|NEXT_)\w+/g) ?? []).toEqual([]);
  });
});

describe('the tests', () => {
  const testFiles = [
    ...sourceFiles(join('tests', 'integration')),
    ...sourceFiles(join('tests', 'e2e')),
    ...sourceFiles(join('tests', 'support')),
  ];
  it.each(testFiles)('%s shares fixtures through tests/support, not the unit tests', (file) => {
    const src = readFileSync(file, 'utf8');
    expect([...src.matchAll(/from\s+['"]([^'"]*\/unit\/[^'"]*)['"]/g)].map((m) => m[1])).toEqual([]);
  });
});
