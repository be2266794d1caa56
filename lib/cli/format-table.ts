/** Plain-text tables for the calc CLI: first column left-aligned, the rest right-aligned. */
export function formatTable(headers: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = headers.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: readonly string[]): string =>
    cells
      .map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(headers), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

/** Fixed decimals, or an em dash for a missing value. */
export const fixed = (v: number | undefined | null, digits: number): string => (v === undefined || v === null ? '—' : v.toFixed(digits));

/** An order as the trade writes it: 1, 5, 1/2, 3/2 (mechanical order over pole pairs, reduced). */
export function orderLabel(order: number, mechanicalOrder: number): string {
  if (Number.isInteger(order)) return String(order);
  const p = mechanicalOrder / order;
  let [a, b] = [mechanicalOrder, Math.round(p)];
  while (b) [a, b] = [b, a % b];
  return `${mechanicalOrder / a}/${Math.round(p) / a}`;
}
