/**
 * Runs the redesign search off the request thread: one long-lived worker thread (Node's worker_threads),
 * jobs queued in order, each with a time limit after which the worker is replaced. The engine's own work
 * budget bounds a search; the time limit only guards against a bug. The machine this serves has few cores,
 * so one worker is enough: a second search waits its turn instead of starving the web requests.
 *
 * In the production build Turbopack bundles the worker from `new URL('./search-worker.ts', import.meta.url)`;
 * under the test runner the URL is the TypeScript source and the worker loads it through tsx's loader API.
 */
import { Worker } from 'node:worker_threads';
import { fail, type EngineResult } from '@/lib/engine/result';
import type { RedesignOriginal, RedesignRequest, RedesignSearch, StockWire } from '@/lib/engine/redesign/types';

/** A search still running after this long is stopped (the work budget keeps real ones far below it). */
const TIME_LIMIT_MS = 60_000;
/** Searches waiting beyond this many are refused with "busy" rather than queued without end. */
const MAX_QUEUE = 16;

type Reply = { id: number; result: EngineResult<RedesignSearch> } | { id: number; crash: string };
interface Pending {
  resolve: (r: EngineResult<RedesignSearch>) => void;
  timer: ReturnType<typeof setTimeout>;
}

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();

function failAll(message: string): void {
  for (const [id, p] of pending) {
    clearTimeout(p.timer);
    p.resolve(fail('not-applicable', message, 'Try again; if it happens again, narrow the request.'));
    pending.delete(id);
  }
}

function start(): Worker {
  // Unbundled (the test runner runs this file as TypeScript): load the worker's source through tsx. The
  // bootstrap is a string, so the bundler never sees it. Bundled: the bundler recognises exactly the form
  // `new Worker(new URL('./file', import.meta.url))` and emits the worker as its own chunk.
  const source = import.meta.url.endsWith('.ts') ? import.meta.url.replace(/search-pool\.ts$/, 'search-worker.ts') : null;
  const w = source
    ? new Worker(`import('tsx/esm/api').then((m) => m.tsImport(${JSON.stringify(source)}, ${JSON.stringify(source)}))`, { eval: true })
    : new Worker(new URL('./search-worker.ts', import.meta.url));
  w.unref();
  w.on('message', (m: Reply) => {
    const p = pending.get(m.id);
    if (!p) return;
    clearTimeout(p.timer);
    pending.delete(m.id);
    p.resolve('crash' in m ? fail('not-applicable', `The search failed: ${m.crash}`, 'Narrow the request and try again.') : m.result);
  });
  w.on('error', (err) => {
    worker = null;
    failAll(`The search stopped: ${err.message}`);
  });
  w.on('exit', () => {
    if (worker === w) worker = null;
    failAll('The search stopped before it finished.');
  });
  return w;
}

/** Searches in the worker thread; resolves with the engine's result (never rejects). */
export function searchOffThread(
  original: RedesignOriginal,
  request: RedesignRequest,
  stock: readonly StockWire[],
): Promise<EngineResult<RedesignSearch>> {
  if (pending.size >= MAX_QUEUE)
    return Promise.resolve(fail('not-applicable', 'The server is busy with other redesign searches.', 'Try again in a minute.'));
  worker ??= start();
  const w = worker;
  const id = nextId++;
  return new Promise((resolve) => {
    const timer = setTimeout(() => {
      pending.delete(id);
      resolve(
        fail(
          'too-wide',
          'The search took too long and was stopped.',
          'Narrow the request: fewer wires in hand, sizes per conductor, spans or circuits.',
        ),
      );
      // The worker is busy with this search: replace it (jobs queued behind it fail and may be retried).
      if (worker === w) worker = null;
      void w.terminate();
    }, TIME_LIMIT_MS);
    timer.unref();
    pending.set(id, { resolve, timer });
    w.postMessage({ id, original, request, stock: [...stock] });
  });
}
