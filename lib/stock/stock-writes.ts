/** Writes of the wire stock: add a size (or update its quantity and note), remove a size. */
import { db } from '@/lib/db/client';
import { stockWire } from '@/lib/engine/redesign/from-sheet';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import type { WireStockEntry } from '@/lib/stock/wire-stock-schema';

/** Adds a size on hand; the same size and grade again updates its quantity and note. */
export async function upsertStockWire(entry: WireStockEntry): Promise<{ id: string; label: string; created: boolean }> {
  const w = stockWire(entry);
  if (!w.ok) throw new DomainError('invalid', MESSAGES.invalid, { size: [w.error.message] });
  const key = { standard: entry.standard, size: w.value.size, enamelGrade: entry.enamelGrade };
  const before = await db().wireStock.findUnique({ where: { standard_size_enamelGrade: key }, select: { id: true } });
  const row = await db().wireStock.upsert({
    where: { standard_size_enamelGrade: key },
    create: { ...key, bareMm: w.value.bareMm, quantityKg: entry.quantityKg ?? null, note: entry.note ?? null },
    update: { quantityKg: entry.quantityKg ?? null, note: entry.note ?? null },
  });
  return { id: row.id, label: `${w.value.label} grade ${entry.enamelGrade}`, created: !before };
}

export async function removeStockWire(id: string): Promise<void> {
  const r = await db().wireStock.deleteMany({ where: { id } });
  if (r.count === 0) throw new DomainError('not-found', MESSAGES.notFound('stock row'));
}
