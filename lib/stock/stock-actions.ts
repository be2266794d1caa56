'use server';

/** Wire stock actions ('stock.manage': administrators and engineers). */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { removeWireStockSchema, wireStockSchema } from '@/lib/stock/wire-stock-schema';
import { removeStockWire, upsertStockWire } from './stock-writes';

export async function addStockWire(raw: unknown) {
  return guardedAction('stock.manage', 'manage the wire stock', wireStockSchema, async (_user, input) => {
    const r = await upsertStockWire(input);
    return success(r, r.created ? `${r.label} added to the stock.` : `${r.label} was already in stock: quantity and note updated.`);
  })(raw);
}

export async function deleteStockWire(raw: unknown) {
  return guardedAction('stock.manage', 'manage the wire stock', removeWireStockSchema, async (_user, input) => {
    await removeStockWire(input.id);
    return success(undefined, 'Size removed from the stock.');
  })(raw);
}
