/**
 * Provenance notes ("[from memory]", "[derived]", "[common practice]", "(from memory, configurable)"...) belong
 * in code comments and the engineering notes, never in text a customer or user reads. This test parses every
 * source file whose strings can reach a screen or a PDF (app/ and lib/, except the command-line calculator
 * and the seed) with the TypeScript compiler and checks every string literal, template text and JSX text;
 * comments are not strings, so they keep their notes.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = process.cwd();
const SCANNED = ['app', 'lib'];
/** Terminal output and generated code never reach a page or the PDF. */
const SKIPPED = ['lib/cli', 'lib/db/generated', 'lib/db/tooling'];
export const PROVENANCE_MARKER = /\[(?:from memory|derived|common practice|our choice|our rule)[^\]]*\]|from memory|\[derived from/i;

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    const rel = relative(ROOT, path);
    if (SKIPPED.some((s) => rel === s || rel.startsWith(`${s}/`))) return [];
    if (statSync(path).isDirectory()) return files(path);
    return /\.(ts|tsx)$/.test(name) && !name.endsWith('.d.ts') ? [path] : [];
  });
}

function strings(path: string): { text: string; line: number }[] {
  const source = ts.createSourceFile(
    path,
    readFileSync(path, 'utf8'),
    ts.ScriptTarget.Latest,
    true,
    path.endsWith('x') ? ts.ScriptKind.TSX : ts.ScriptKind.TS,
  );
  const out: { text: string; line: number }[] = [];
  const visit = (node: ts.Node) => {
    if (
      ts.isStringLiteral(node) ||
      ts.isNoSubstitutionTemplateLiteral(node) ||
      ts.isTemplateHead(node) ||
      ts.isTemplateMiddle(node) ||
      ts.isTemplateTail(node) ||
      ts.isJsxText(node)
    ) {
      out.push({ text: node.text, line: source.getLineAndCharacterOfPosition(node.getStart()).line + 1 });
    }
    // Import paths are not text anyone reads.
    if (ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) return;
    ts.forEachChild(node, visit);
  };
  visit(source);
  return out;
}

describe('customer-facing text carries no provenance markers', () => {
  it('knows a marker when it sees one (the scan can fail)', () => {
    expect(PROVENANCE_MARKER.test('typical 1.4–1.7 T [from memory]')).toBe(true);
    expect(PROVENANCE_MARKER.test('Ranges (from memory, configurable).')).toBe(true);
    expect(PROVENANCE_MARKER.test('keeps torque [derived].')).toBe(true);
    expect(PROVENANCE_MARKER.test('IEEE 43: PI ≥ 2.0 for class F')).toBe(false);
    expect(strings(join(ROOT, 'tests/unit/presentation/provenance-scan.test.ts')).some((s) => PROVENANCE_MARKER.test(s.text))).toBe(true);
  });

  it('finds none in any string of app/ or lib/', () => {
    const all = SCANNED.flatMap((d) => files(join(ROOT, d)));
    expect(all.length).toBeGreaterThan(50);
    const hits = all.flatMap((f) =>
      strings(f)
        .filter((s) => PROVENANCE_MARKER.test(s.text))
        .map((s) => `${relative(ROOT, f)}:${s.line}: ${s.text.trim().slice(0, 100)}`),
    );
    expect(hits).toEqual([]);
  }, 120_000);
});
