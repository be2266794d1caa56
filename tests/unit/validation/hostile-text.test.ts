/**
 * Issue 12: a long wire size froze the server (quadratic `/\s*awg$/` and `/\s*mm$/`), and a NUL byte in a
 * text field reached PostgreSQL (22021) as a 500. Both are refused at the schema now, quickly and by field.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseAwg } from '@/lib/engine/awg';
import { parseMetricSize } from '@/lib/engine/metric-wire';
import { wireSchema } from '@/lib/as-found/winding-sheet-schema';
import { customerSchema } from '@/lib/jobs/customer-schema';
import { boardQuerySchema } from '@/lib/jobs/job-schema';
import { NUL_MESSAGE, findNul } from '@/lib/validation/safe-text';
import { zodFieldErrors } from '@/lib/errors/action-result';

const spaced = (n: number, suffix: string) => `1${' '.repeat(n)}x${suffix}`;

describe('wire size parsers are linear', () => {
  it('refuses an 80,000-character size in the schema fast, naming the field', () => {
    for (const standard of ['awg', 'metric'] as const) {
      const t0 = performance.now();
      const r = wireSchema.safeParse({ standard, size: spaced(80_000, standard === 'awg' ? 'awg' : 'mm'), count: 1, enamelGrade: 2 });
      const ms = performance.now() - t0;
      expect(r.success).toBe(false);
      if (!r.success) expect(Object.keys(zodFieldErrors(r.error))).toContain('size');
      expect(ms).toBeLessThan(500); // before: ~12 s for 80,000 characters (margin for a busy machine)
    }
  });

  it('the parsers themselves take linear time on inner spaces (no schema in front)', () => {
    // Quadratic behaviour shows as a 4x time for 2x length; linear code does 200k spaces in well under 50 ms.
    for (const n of [100_000, 200_000]) {
      const t0 = performance.now();
      expect(parseAwg(spaced(n, 'awg'))).toBeNull();
      expect(parseMetricSize(spaced(n, 'mm'))).toBeNull();
      expect(parseMetricSize(`${'1'.repeat(n)}x`)).toBeNull();
      // quadratic code took seconds here; linear code takes milliseconds (margin for a busy machine)
      expect(performance.now() - t0).toBeLessThan(500);
    }
  });

  it.each([
    ['18', 18],
    ['AWG 18', 18],
    ['awg18', 18],
    ['18 AWG', 18],
    ['18awg', 18],
    ['#18', 18],
    ['# 18', 18],
    ['4/0', -3],
  ])('still reads AWG "%s"', (label, n) => expect(parseAwg(label)).toBe(n));

  it.each([
    ['0.85', 0.85],
    ['0,85', 0.85],
    ['0.85 mm', 0.85],
    ['0.85mm', 0.85],
    ['.85', 0.85],
    ['1.06', 1.06],
  ])('still reads metric "%s"', (label, d) => expect(parseMetricSize(label)?.diameterMm).toBeCloseTo(d, 6));

  it.each(['0.85.1', '1.', '.', '', 'mm', '0.85 m m', '-0.85'])('refuses metric "%s"', (label) =>
    expect(parseMetricSize(label)).toBeNull(),
  );

  it('accepts exactly what the old patterns accepted on short labels (property)', () => {
    const oldAwg = (size: string) =>
      size
        .trim()
        .toLowerCase()
        .replace(/^awg\s*/, '')
        .replace(/^#\s*/, '')
        .replace(/\s*awg$/, '');
    const oldMetric = (size: string) => {
      const s = size
        .trim()
        .toLowerCase()
        .replace(/\s*mm$/, '')
        .replace(',', '.');
      return /^\d*\.?\d+$/.test(s) ? Number(s) : null;
    };
    const piece = fc.constantFrom('1', '8', '0', '.', ',', ' ', 'awg', 'AWG', '#', 'mm', '/', '4', '5');
    fc.assert(
      fc.property(
        fc.array(piece, { maxLength: 8 }).map((a) => a.join('')),
        (label) => {
          const o = oldAwg(label);
          // the rest of parseAwg is unchanged: what is left after the old stripping must be a bare gauge
          const expectedAwg = /awg|#|\s/.test(o) ? null : parseAwg(o);
          expect(parseAwg(label)).toBe(expectedAwg);
          const m = oldMetric(label);
          const got = parseMetricSize(label);
          if (m === null) expect(got).toBeNull();
          else expect(got?.diameterMm ?? null).toBe(parseMetricSize(String(m))?.diameterMm ?? null);
        },
      ),
      { numRuns: 3000 },
    );
  });
});

describe('NUL bytes are refused with a field error', () => {
  it('a company name with NUL is a field error on that field', () => {
    const r = customerSchema.safeParse({ company: 'Acme\u0000 Pumps' });
    expect(r.success).toBe(false);
    if (!r.success) expect(zodFieldErrors(r.error).company).toEqual([NUL_MESSAGE]);
  });

  it('a board search with NUL is dropped, not sent to the database', () => {
    expect(boardQuerySchema.parse({ q: '\u0000' }).q).toBeUndefined();
    expect(boardQuerySchema.parse({ q: 'ab\u0000cd' }).q).toBeUndefined();
    expect(boardQuerySchema.parse({ q: 'smith' }).q).toBe('smith');
  });

  it('findNul names the path of a NUL in values and keys, and stops on a budget', () => {
    expect(findNul({ a: [1, { b: 'x\u0000' }] })).toEqual(['a', 1, 'b']);
    expect(findNul({ core: { 'bo\u0000re': '1' } })).toEqual(['core', 'bo\u0000re']);
    expect(findNul({ a: 'clean', b: [1, 2, 'x'] })).toBeNull();
    const deep: unknown[] = [];
    let cur = deep;
    for (let i = 0; i < 100_000; i++) {
      const next: unknown[] = [];
      cur.push(next);
      cur = next;
    }
    const wide = Array.from({ length: 1_000_000 }, () => 'x');
    const t0 = performance.now();
    expect(findNul(deep)).toBeNull();
    expect(findNul(wide)).toBeNull();
    expect(performance.now() - t0).toBeLessThan(1000);
  });
});
