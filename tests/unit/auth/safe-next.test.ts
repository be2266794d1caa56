import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { AFTER_SIGN_IN_DEFAULT, safeNextPath } from '@/lib/auth/safe-next';

describe('safeNextPath: after sign-in only paths on the app itself', () => {
  it.each([
    ['/jobs/1001', '/jobs/1001'],
    ['/jobs?q=smith&page=2', '/jobs?q=smith&page=2'],
    ['/jobs/1001/sheet#wires', '/jobs/1001/sheet#wires'],
    ['/library', '/library'],
    ['/%5Cevil.example/x', '/%5Cevil.example/x'], // stays an (odd) path on this site: %5C is not decoded
  ])('keeps %s', (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });

  it.each([
    '/\\evil.example/x', // the reported bypass: browsers read \ as /
    '/\t/evil.example/x', // the reported bypass: browsers drop tabs
    '/\n/evil.example/x',
    '/\r\n/evil.example/x',
    '\\/evil.example/x',
    '//evil.example/x',
    '///evil.example/x',
    '/\\\\evil.example',
    'https://evil.example/x',
    'http:evil.example',
    'javascript:alert(1)',
    ' /jobs',
    'jobs',
    '',
    '/login',
    'x'.repeat(3000),
  ])('sends %j to the board', (next) => {
    expect(safeNextPath(next)).toBe(AFTER_SIGN_IN_DEFAULT);
  });

  it('sends a non-string to the board', () => {
    expect(safeNextPath(undefined)).toBe(AFTER_SIGN_IN_DEFAULT);
    expect(safeNextPath(['/jobs'])).toBe(AFTER_SIGN_IN_DEFAULT);
  });

  it('whatever it returns, a browser resolves it on the same origin (property)', () => {
    const origin = 'https://shop.example';
    const piece = fc.constantFrom('/', '\\', '\t', '\n', '%2F', '%5C', '%09', 'evil.example', '.', '..', ':', '@', '?', '#', 'x');
    fc.assert(
      fc.property(
        fc.array(piece, { maxLength: 12 }).map((a) => a.join('')),
        fc.string({ maxLength: 30 }),
        (built, random) => {
          for (const next of [built, `/${built}`, random, `/${random}`]) {
            const out = safeNextPath(next);
            expect(out.startsWith('/')).toBe(true);
            expect(new URL(out, origin).origin).toBe(origin);
            // resolving twice changes nothing: the browser and the server read the same path
            expect(safeNextPath(out)).toBe(out);
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
});
