import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { closedFormFactors } from '@/lib/engine/closed-form';
import { makeWindingSheetExport, windingSheetSchema } from '@/lib/as-found/winding-sheet-schema';
import { EXAMPLE_A_SHEET } from '../../support/fixtures/winding-fixtures';

const TSX = join(process.cwd(), 'node_modules/.bin/tsx');
const dir = mkdtempSync(join(tmpdir(), 'calc-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function calc(...args: string[]) {
  const r = spawnSync(TSX, ['scripts/calc.ts', ...args], { encoding: 'utf8', cwd: process.cwd(), timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const file = (name: string, text: string): string => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

describe('calc winding', { timeout: 30_000 }, () => {
  it('prints k_d, k_p and k_w for orders 1 to 25 and the MMF spectrum (36/4, span 7)', () => {
    const r = calc('winding', '--slots', '36', '--poles', '4', '--span', '7');
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    const rows = r.stdout.split('\n').filter((l) => /^\d+\s/.test(l));
    // Factor table rows come first (orders 1 … 25), then the MMF rows (1 … 25).
    const factorRows = rows.slice(0, 25);
    expect(factorRows.map((l) => Number(l.split(/\s+/)[0]))).toEqual(Array.from({ length: 25 }, (_, i) => i + 1));
    const c7 = closedFormFactors(36, 4, 7, 7);
    expect(factorRows[6]).toContain(Math.abs(c7?.kd ?? NaN).toFixed(4));
    expect(factorRows[6]).toContain(Math.abs(c7?.kp ?? NaN).toFixed(4));
    expect(r.stdout).toMatch(/^5\s+0\.0084\s+backward\s+-0\.2000\s+-300\.0$/m);
    expect(r.stdout).toMatch(/^7\s+0\.0215\s+forward\s+0\.1429\s+214\.3$/m);
    expect(r.stdout).toContain('Paths     allowed 1, 2, 4');
  });

  it('writes JSON with --json', () => {
    const r = calc('winding', '--slots', '30', '--poles', '4', '--span', '7', '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { windingFactor: number; fractional: boolean };
    expect(out.windingFactor).toBeCloseTo(0.9514, 4);
    expect(out.fractional).toBe(true);
  });

  it('takes single-layer concentric windings', () => {
    const r = calc('winding', '--slots', '36', '--poles', '4', '--spans', '11,9,7', '--layers', '1', '--json');
    expect(r.code).toBe(0);
    expect((JSON.parse(r.stdout) as { windingFactor: number }).windingFactor).toBeCloseTo(0.9598, 4);
  });

  it.each([
    { name: 'a span as long as the core', args: ['winding', '--slots', '36', '--poles', '4', '--span', '36'], text: /span/i },
    { name: 'an unbalanced slot count', args: ['winding', '--slots', '35', '--poles', '4', '--span', '7'], text: /balanced/ },
    { name: 'a word for a number', args: ['winding', '--slots', 'many', '--poles', '4', '--span', '7'], text: /--slots/ },
    { name: 'a missing span', args: ['winding', '--slots', '36', '--poles', '4'], text: /--span/ },
    { name: 'an unknown option', args: ['winding', '--slots', '36', '--poles', '4', '--span', '7', '--colour', 'red'], text: /colour/ },
    { name: 'an unknown command', args: ['rewind'], text: /Unknown command/ },
    { name: 'no command', args: [], text: /command/ },
  ])('exits 2 with one line on stderr for $name', ({ args, text }) => {
    const r = calc(...args);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(text);
  });
});

describe('calc sheet', { timeout: 30_000 }, () => {
  const exported = JSON.stringify(makeWindingSheetExport(windingSheetSchema.parse(EXAMPLE_A_SHEET)));

  it('analyses an exported sheet and prints flux, resistance, current density and slot fill', () => {
    const r = calc('sheet', file('a.json', exported));
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/yoke\s+1\.20\d\d/);
    expect(r.stdout).toContain('phase 1.4293 Ω');
    expect(r.stdout).toMatch(/J 4\.41 A\/mm²/);
    expect(r.stdout).toMatch(/Slot fill 28 conductors/);
  });

  it('writes the whole analysis as JSON with --json', () => {
    const r = calc('sheet', file('b.json', exported), '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { resistance: { predictedPhaseOhm20: number }; winding: { seriesTurnsPerPhase: number } };
    expect(out.resistance.predictedPhaseOhm20).toBeCloseTo(1.4293, 4);
    expect(out.winding.seriesTurnsPerPhase).toBe(168);
  });

  it.each([
    { name: 'a missing file', path: () => join(dir, 'nope.json'), text: /cannot read/ },
    { name: 'bad JSON', path: () => file('c.json', '{ nope'), text: /not valid JSON/ },
    {
      name: 'a sheet with problems',
      path: () => file('d.json', exported.replace('"boreMm":150', '"boreMm":-150')),
      text: /sheet\.core\.boreMm: Bore must be more than 0 mm/,
    },
    { name: 'another file format', path: () => file('e.json', JSON.stringify({ format: 'x', version: 1 })), text: /format/ },
  ])('exits 2 with one line on stderr for $name', ({ path, text }) => {
    const r = calc('sheet', path());
    expect(r.code).toBe(2);
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(text);
  });
});

describe('calc rescale', { timeout: 30_000 }, () => {
  const exampleA = ['rescale', '--slots', '36', '--poles', '4', '--span', '7', '--turns', '14', '--voltage', '400', '--frequency', '50'];

  // Ratio checks on example A, ±0.001 [derived, docs/engineering/redesign.md].
  it.each([
    {
      name: '400 V Y 50 Hz → 460 V Y 60 Hz, same winding',
      extra: ['--to-voltage', '460', '--to-frequency', '60'],
      ratio: 0.9583,
      verdict: 'ok',
    },
    { name: 'Y → Δ at 400 V, same winding', extra: ['--to-connection', 'delta'], ratio: 1.7321, verdict: 'over-fluxed' },
    { name: 'Y → Δ with N_c 14 → 24', extra: ['--to-connection', 'delta', '--to-turns', '24'], ratio: 1.0104, verdict: 'ok' },
    { name: '50 → 60 Hz at 400 V with N_c 14 → 12', extra: ['--to-frequency', '60', '--to-turns', '12'], ratio: 0.9722, verdict: 'ok' },
    { name: 'span 1–8 → 1–9, same turns', extra: ['--to-span', '8'], ratio: 0.9542, verdict: 'ok' },
  ])('$name: flux ratio $ratio', ({ extra, ratio, verdict }) => {
    const r = calc(...exampleA, ...extra, '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { fluxRatio: number; verdict: string };
    expect(out.fluxRatio).toBeCloseTo(ratio, 3);
    expect(out.verdict).toBe(verdict);
  });

  it('prints the ratios, the verdict and the turns that keep the flux', () => {
    const r = calc(...exampleA, '--to-connection', 'delta');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/flux per pole\s+1\.7321\s+\+73\.2 %/);
    expect(r.stdout).toMatch(/OVER-FLUXED/);
    expect(r.stdout).toMatch(/keep the original flux: 24\.25/);
  });

  it('refuses an impossible pole count with one line', () => {
    const r = calc(...exampleA, '--to-poles', '5');
    expect(r.code).toBe(2);
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
  });
});
