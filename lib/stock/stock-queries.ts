/** Reads of the wire stock: rows for the stock page, and the same as engine StockWires for the search. */
import { db } from '@/lib/db/client';
import type { EnamelGrade } from '@/lib/engine/enamel-build';
import { stockWire } from '@/lib/engine/redesign/from-sheet';
import type { StockWire } from '@/lib/engine/redesign/types';

export interface StockRowView {
  id: string;
  standard: 'awg' | 'metric';
  size: string;
  enamelGrade: EnamelGrade;
  quantityKg: number | null;
  note: string | null;
  wire: StockWire | null;
}

const grade = (g: number): EnamelGrade => (g === 1 || g === 3 ? g : 2);

/** Every stock row, thickest first, with its looked-up diameters (null if the tables no longer know it). */
export async function listStock(): Promise<StockRowView[]> {
  const rows = await db().wireStock.findMany({ orderBy: [{ bareMm: 'desc' }, { standard: 'asc' }, { enamelGrade: 'asc' }] });
  return rows.map((r) => {
    const standard = r.standard === 'awg' ? 'awg' : 'metric';
    const w = stockWire({ standard, size: r.size, enamelGrade: grade(r.enamelGrade) });
    return { id: r.id, standard, size: r.size, enamelGrade: grade(r.enamelGrade), quantityKg: r.quantityKg, note: r.note, wire: w.ok ? w.value : null };
  });
}

/** The stock as the redesign search takes it. */
export async function listStockWires(): Promise<StockWire[]> {
  return (await listStock()).flatMap((r) => (r.wire ? [r.wire] : []));
}
