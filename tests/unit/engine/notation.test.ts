import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutLabel, parseSpan, spanLabel, spansLabel } from '@/lib/engine/notation';

// The trade writes a coil from slot 1 to slot 8 as "1–8": it spans 7 slot pitches [common practice].
describe('winding notation', () => {
  it('writes spans as the winder does', () => {
    expect(spanLabel(7)).toBe('1–8');
    expect(spansLabel([11, 9, 7])).toBe('1–12, 1–10, 1–8');
    expect(layoutLabel({ layers: 2, style: 'lap' })).toBe('double-layer lap');
    expect(layoutLabel({ layers: 1, style: 'concentric' })).toBe('single-layer concentric');
  });

  it.each([
    ['7', 7],
    ['1–8', 7],
    ['1-8', 7],
    [' 1 - 8 ', 7],
    ['1 to 8', 7],
    ['3–10', 7],
    ['1—9', 8],
  ])('reads "%s" as %i slot pitches', (text, pitches) => {
    expect(parseSpan(text)).toBe(pitches);
  });

  it.each(['', '0', '8–1', 'one', '1–', '–8', '1–8–9', '12345678901234567890123'])('refuses "%s"', (text) => {
    expect(parseSpan(text)).toBeNull();
  });

  it('reads back every label it writes', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 599 }), (y) => parseSpan(spanLabel(y)) === y && parseSpan(String(y)) === y));
  });
});
