/**
 * Every conductor the shop can make from its stock: one to three sizes, strands in hand up to the shop's
 * limit, sizes mixed only when their diameters are close (mixed strands of very different size do not lie
 * evenly in the slot [common practice]). The size groups are built once per search; each query ("about this
 * many mm², fitting this slot") then generates only the count combinations whose area lies in its window.
 */
import type { RedesignLimits, StockWire, WireSet } from './types';

const circle = (d: number): number => (Math.PI / 4) * d * d;

/** Stock sorted thickest first, duplicates (same standard, size and grade) removed. */
export function normaliseStock(stock: readonly StockWire[]): StockWire[] {
  const seen = new Map<string, StockWire>();
  for (const w of stock) seen.set(`${w.standard}|${w.size}|${w.enamelGrade}`, w);
  return [...seen.values()].sort((a, b) => b.bareMm - a.bareMm || a.label.localeCompare(b.label) || a.enamelGrade - b.enamelGrade);
}

/** Stock in search order and the size groups (1–3 sizes, close diameters) a conductor may be made of. */
export interface WireGroups {
  wires: StockWire[];
  groups: number[][];
  maxStrands: number;
}

/** The size groups allowed by the limits: every size alone, and pairs and triples of close sizes. */
export function wireGroups(
  stock: readonly StockWire[],
  limits: Pick<RedesignLimits, 'maxStrandsInHand' | 'maxWireSizes' | 'mixedSizeRatioMax'>,
): WireGroups {
  const wires = normaliseStock(stock);
  const maxStrands = Math.max(1, Math.floor(limits.maxStrandsInHand));
  const maxSizes = Math.min(3, Math.max(1, Math.floor(limits.maxWireSizes)), maxStrands);
  const close = (a: number, b: number): boolean => {
    const wa = wires[a] as StockWire;
    const wb = wires[b] as StockWire;
    // Two grades of one size are never mixed: the winder could not tell them apart.
    if (wa.standard === wb.standard && wa.size === wb.size) return false;
    return Math.max(wa.bareMm, wb.bareMm) / Math.min(wa.bareMm, wb.bareMm) <= limits.mixedSizeRatioMax;
  };
  const groups: number[][] = [];
  for (let i = 0; i < wires.length; i++) {
    groups.push([i]);
    for (let j = i + 1; j < wires.length && maxSizes >= 2; j++) {
      if (!close(i, j)) continue;
      groups.push([i, j]);
      for (let k = j + 1; k < wires.length && maxSizes >= 3; k++) if (close(i, k) && close(j, k)) groups.push([i, j, k]);
    }
  }
  return { wires, groups, maxStrands };
}

/** Builds the WireSet of a group with its counts (thickest size first). */
export function makeWireSet(wires: readonly StockWire[], group: readonly number[], counts: readonly number[]): WireSet {
  let area = 0;
  let ins = 0;
  let strands = 0;
  const parts = group.map((i, j) => {
    const wire = wires[i] as StockWire;
    const count = counts[j] ?? 1;
    area += count * wire.areaMm2;
    ins += count * circle(wire.overallMm);
    strands += count;
    return { wire, count };
  });
  return { parts, label: partsLabel(parts), areaMm2: area, insulatedAreaMm2: ins, strands };
}

/** A wire set as the enumeration sees it, before it is built (cheap to compare). */
export interface WireSetView {
  group: number[];
  counts: number[];
  areaMm2: number;
  insulatedAreaMm2: number;
  strands: number;
}

/**
 * Calls `visit` for every wire set whose copper area lies in [minArea, maxArea]: for each group the last
 * size's count is solved from the window, so only sets inside it are generated, and partial counts that
 * cannot reach the window are skipped. Returns how many sets were visited (`n`), the work spent (`steps`:
 * visits plus partial counts tried) and whether it stopped at `budget` steps (the caller reports a request
 * too wide). The view's arrays are reused between calls: copy what you keep.
 */
export function forEachWireSet(
  g: WireGroups,
  minArea: number,
  maxArea: number,
  visit: (v: WireSetView) => void,
  budget = Number.POSITIVE_INFINITY,
): { n: number; steps: number; exhausted: boolean } {
  let n = 0;
  let steps = 0;
  const view: WireSetView = { group: [], counts: [], areaMm2: 0, insulatedAreaMm2: 0, strands: 0 };
  const area = g.wires.map((w) => w.areaMm2);
  const ins = g.wires.map((w) => circle(w.overallMm));
  for (const group of g.groups) {
    const k = group.length;
    view.group = group;
    const last = group[k - 1] as number;
    const aLast = area[last] as number;
    const rec = (pos: number, usedA: number, usedI: number, usedN: number, counts: number[]): void => {
      if (pos === k - 1) {
        const left = g.maxStrands - usedN;
        const lo = Math.max(1, Math.ceil((minArea - usedA) / aLast - 1e-9));
        const hi = Math.min(left, Math.floor((maxArea - usedA) / aLast + 1e-9));
        for (let c = lo; c <= hi; c++) {
          if (steps >= budget) return;
          counts[pos] = c;
          view.counts = counts;
          view.areaMm2 = usedA + c * aLast;
          view.insulatedAreaMm2 = usedI + c * (ins[last] as number);
          view.strands = usedN + c;
          n++;
          steps++;
          visit(view);
        }
        return;
      }
      const idx = group[pos] as number;
      // Sizes are thickest first: the rest of the strands of the next size bound what the remaining sizes add.
      const nextArea = area[group[pos + 1] as number] as number;
      // Leave at least one strand for each remaining size.
      for (let c = 1; usedN + c <= g.maxStrands - (k - 1 - pos) && steps < budget; c++) {
        const a = usedA + c * (area[idx] as number);
        if (a >= maxArea) break;
        steps++;
        if (a + (g.maxStrands - usedN - c) * nextArea < minArea) continue;
        counts[pos] = c;
        rec(pos + 1, a, usedI + c * (ins[idx] as number), usedN + c, counts);
      }
    };
    rec(0, 0, 0, 0, new Array<number>(k).fill(1));
    if (steps >= budget) return { n, steps, exhausted: true };
  }
  return { n, steps, exhausted: false };
}

/** The largest copper area the stock can make with the wires in hand allowed: the thickest size, every strand. */
export const largestArea = (g: WireGroups): number => g.maxStrands * Math.max(0, ...g.wires.map((w) => w.areaMm2));

/** "2 × 0.850 mm + 1 × 0.800 mm (grade 3)": grade shown when it is not the usual grade 2. */
export function partsLabel(parts: readonly { wire: Pick<StockWire, 'label' | 'enamelGrade'>; count: number }[]): string {
  return parts.map((p) => `${p.count} × ${p.wire.label}${p.wire.enamelGrade !== 2 ? ` (grade ${p.wire.enamelGrade})` : ''}`).join(' + ');
}
