/**
 * Worker-thread entry of the redesign search (search-pool.ts starts it). It only calls the pure engine, so
 * a long search never holds the server's request thread. One message in, one message out.
 */
import { parentPort } from 'node:worker_threads';
import { searchRedesign } from '@/lib/engine/redesign/search';
import type { RedesignOriginal, RedesignRequest, StockWire } from '@/lib/engine/redesign/types';

export interface SearchJob {
  id: number;
  original: RedesignOriginal;
  request: RedesignRequest;
  stock: StockWire[];
}

parentPort?.on('message', (job: SearchJob) => {
  try {
    parentPort?.postMessage({ id: job.id, result: searchRedesign(job.original, job.request, job.stock) });
  } catch (err) {
    // The engine returns errors as values; anything thrown is a bug, reported rather than crashing the worker.
    parentPort?.postMessage({ id: job.id, crash: err instanceof Error ? err.message : String(err) });
  }
});
