/**
 * Everything a redesign search needs for one job, read from the database: the as-found sheet (through
 * getAsFoundSheet), the motor's rated speed, the shop's limits and the wire stock (kilograms free for this
 * job). Saving a request and approving search through here, off the request thread; pages read the stored result.
 */
import { db } from '@/lib/db/client';
import { originalFromSheet } from '@/lib/engine/redesign/from-sheet';
import type { RedesignLimits, RedesignOriginal, RedesignRequest, RedesignSearch, StockWire } from '@/lib/engine/redesign/types';
import type { EngineResult } from '@/lib/engine/result';
import { getShopLimits } from '@/lib/settings/settings-queries';
import { getAsFoundSheet, type StoredSheet } from '@/lib/as-found/as-found-queries';
import { listStockWires } from '@/lib/stock/stock-queries';
import { searchOffThread } from './search-pool';

export interface RedesignContext {
  sheet: StoredSheet;
  original: RedesignOriginal;
  shopLimits: RedesignLimits;
  stock: StockWire[];
}

/** The context, or why there is none (no sheet yet, or a sheet the engine cannot use). */
export async function loadRedesignContext(jobId: string): Promise<{ ok: true; value: RedesignContext } | { ok: false; reason: string }> {
  const [sheet, job, limits, stock] = await Promise.all([
    getAsFoundSheet(jobId),
    db().job.findUnique({ where: { id: jobId }, select: { motor: { select: { speedRpm: true, frequencyHz: true } } } }),
    getShopLimits(),
    listStockWires(jobId),
  ]);
  if (!sheet)
    return {
      ok: false,
      reason: 'This job has no saved as-found data sheet yet. The redesign starts from the sheet: record the winding first.',
    };
  const m = job?.motor;
  // The plate speed describes the sheet's winding only when the plate frequency is the sheet's.
  const speed = m?.speedRpm && m.frequencyHz === sheet.sheet.supply.frequencyHz ? m.speedRpm : undefined;
  const original = originalFromSheet(sheet.sheet, speed);
  if (!original.ok)
    return { ok: false, reason: `The as-found sheet cannot be used for a redesign: ${original.error.message} ${original.error.hint}` };
  return { ok: true, value: { sheet, original: original.value, shopLimits: limits.limits, stock } };
}

/** Runs the search for a request off the request thread (search-pool.ts). */
export const runSearch = (ctx: RedesignContext, request: RedesignRequest): Promise<EngineResult<RedesignSearch>> =>
  searchOffThread(ctx.original, request, ctx.stock);
