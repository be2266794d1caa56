/**
 * Job sheet PDFs cached per issue of the record: the key is a hash of everything the sheet prints (the
 * JobSheetData, which carries the revision and every value) plus the shop's date settings, so any change
 * to the job, its sheet, redesign or tests gives a new key and the old PDF is never served again. Renders
 * of the same issue that arrive together share one render. Bounded by bytes (least recently used out).
 */
import { createHash } from 'node:crypto';
import { displaySettings } from '@/lib/presentation/format';
import type { JobSheetData } from './job-sheet-data';
import { renderInPool } from './pdf-pool';

/** About 100 typical sheets (150–250 kB each). */
const MAX_BYTES = 24 * 1024 * 1024;

const cache = new Map<string, Uint8Array>();
const inFlight = new Map<string, Promise<Uint8Array>>();
let bytes = 0;

export function jobSheetKey(data: JobSheetData): string {
  return createHash('sha256')
    .update(JSON.stringify([data, displaySettings()]))
    .digest('hex');
}

function remember(key: string, pdf: Uint8Array): void {
  cache.set(key, pdf);
  bytes += pdf.byteLength;
  for (const [k, v] of cache) {
    if (bytes <= MAX_BYTES) break;
    cache.delete(k);
    bytes -= v.byteLength;
  }
}

/** The PDF for this issue of the sheet: from the cache, or rendered once on a worker thread. */
export async function cachedJobSheetPdf(data: JobSheetData): Promise<{ pdf: Uint8Array; cached: boolean }> {
  const key = jobSheetKey(data);
  const hit = cache.get(key);
  if (hit) {
    // Most recently used moves to the end of the Map's order.
    cache.delete(key);
    cache.set(key, hit);
    return { pdf: hit, cached: true };
  }
  let render = inFlight.get(key);
  if (!render) {
    render = renderInPool(data).finally(() => inFlight.delete(key));
    inFlight.set(key, render);
    const pdf = await render;
    remember(key, pdf);
    return { pdf, cached: false };
  }
  return { pdf: await render, cached: false };
}

/** Empties the cache (tests). */
export function clearPdfCache(): void {
  cache.clear();
  bytes = 0;
}
