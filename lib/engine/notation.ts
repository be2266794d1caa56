/**
 * The trade's notation for a winding, written one way everywhere (screens, print views, PDFs, CLI):
 * a span of y slot pitches reads "1–(y+1)" (a coil from slot 1 to slot 8 spans 7 pitches), and a layout
 * reads "double-layer lap" or "single-layer concentric".
 */

/** "1–8" for a span of 7 slot pitches. */
export const spanLabel = (spanSlots: number): string => `1–${spanSlots + 1}`;

/** "1–12, 1–10, 1–8" for a concentric group, outside coil first as given. */
export const spansLabel = (spans: readonly number[]): string => spans.map(spanLabel).join(', ');

/** "double-layer lap", "single-layer concentric". */
export const layoutLabel = (w: { layers: 1 | 2; style: string }): string => `${w.layers === 2 ? 'double' : 'single'}-layer ${w.style}`;

/**
 * Reads a span as a winder writes it: "7" (slot pitches), "1–8", "1-8" or "1 to 8" (from slot 1 to slot 8).
 * Returns the pitches, or null when the text is not a span. Linear: no backtracking patterns on user text.
 */
export function parseSpan(text: string): number | null {
  const t = text.trim();
  if (t.length === 0 || t.length > 20) return null;
  const pair = /^(\d{1,4})\s*(?:[-–—]|to)\s*(\d{1,4})$/i.exec(t);
  if (pair) {
    const from = Number(pair[1]);
    const to = Number(pair[2]);
    return to > from ? to - from : null;
  }
  return /^\d{1,4}$/.test(t) && Number(t) > 0 ? Number(t) : null;
}
