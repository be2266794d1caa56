/**
 * A small pool of worker threads for PDF rendering (Node's worker_threads; the worker is pdf-worker.ts).
 * Renders queue in order; at most POOL_SIZE run at once, each on its own thread, so a burst of downloads
 * costs the other pages a share of the CPU rather than a stalled request thread. Idle workers exit after
 * IDLE_MS to give their memory back; a worker that crashes is replaced on the next render.
 *
 * `new Worker(new URL('./pdf-worker.ts', import.meta.url))` is the form the Next.js bundler recognises:
 * the production build compiles the worker into its own chunk. Run from TypeScript sources (tests, tsx),
 * the worker loads through tsx.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { displaySettings } from '@/lib/presentation/format';
import type { JobSheetData } from './job-sheet-data';
import type { PdfJob, PdfReply } from './pdf-worker';

/** One thread on a 2-core machine (the other core serves pages), at most 2. */
export const POOL_SIZE = Math.max(1, Math.min(2, availableParallelism() - 1));
/** Renders waiting beyond this are refused (the route answers "busy, try again") rather than piling up. */
export const MAX_QUEUE = 32;
const IDLE_MS = 60_000;
/** Heap cap per worker: a job sheet needs a few tens of MB. */
const WORKER_HEAP_MB = 192;

export class PdfBusyError extends Error {
  constructor() {
    super('The server is busy rendering other job sheets. Try again in a moment.');
  }
}

interface Slot {
  worker: Worker;
  busy: boolean;
  idleTimer?: ReturnType<typeof setTimeout>;
}
interface Waiting {
  job: Omit<PdfJob, 'id'>;
  resolve: (pdf: Uint8Array) => void;
  reject: (err: Error) => void;
}

const slots: Slot[] = [];
const queue: Waiting[] = [];
const pending = new Map<number, Waiting & { slot: Slot }>();
let nextId = 1;
let rendered = 0;

/** Workers alive and renders finished so far (for tests and the bench). */
export const poolStats = () => ({ workers: slots.length, rendered, queued: queue.length });

function startWorker(): Worker {
  const resourceLimits = { maxOldGenerationSizeMb: WORKER_HEAP_MB };
  if (import.meta.url.endsWith('.ts')) {
    // Running from the TypeScript sources (tests, scripts): load the worker through tsx's loader.
    // (A plain string, not `new URL(…)`: the bundler would take a second `new URL` of the worker for an asset.)
    const entry = import.meta.url.replace(/pdf-pool\.ts$/, 'pdf-worker.ts');
    const boot = `import('tsx/esm/api').then((tsx) => { tsx.register(); return import(${JSON.stringify(entry)}); });`;
    return new Worker(boot, { eval: true, resourceLimits });
  }
  return new Worker(new URL('./pdf-worker.ts', import.meta.url), { resourceLimits });
}

function spawn(): Slot {
  const slot: Slot = { worker: startWorker(), busy: false };
  slot.worker.on('message', (reply: PdfReply) => {
    const p = pending.get(reply.id);
    if (!p) return;
    pending.delete(reply.id);
    if ('error' in reply) p.reject(new Error(reply.error));
    else {
      rendered++;
      p.resolve(reply.pdf);
    }
    release(slot);
  });
  const fail = (err: Error) => {
    for (const [id, p] of pending) {
      if (p.slot !== slot) continue;
      pending.delete(id);
      p.reject(err);
    }
    const i = slots.indexOf(slot);
    if (i >= 0) slots.splice(i, 1);
    pump();
  };
  slot.worker.on('error', fail);
  slot.worker.on('exit', (code) => fail(new Error(`PDF worker stopped (exit code ${code}).`)));
  slot.worker.unref();
  slots.push(slot);
  return slot;
}

function release(slot: Slot): void {
  slot.busy = false;
  clearTimeout(slot.idleTimer);
  slot.idleTimer = setTimeout(() => {
    if (!slot.busy) void slot.worker.terminate();
  }, IDLE_MS);
  slot.idleTimer.unref();
  pump();
}

function pump(): void {
  while (queue.length > 0) {
    const slot = slots.find((s) => !s.busy) ?? (slots.length < POOL_SIZE ? spawn() : undefined);
    if (!slot) return;
    const w = queue.shift()!;
    slot.busy = true;
    clearTimeout(slot.idleTimer);
    const id = nextId++;
    pending.set(id, { ...w, slot });
    slot.worker.postMessage({ id, ...w.job } satisfies PdfJob);
  }
}

/** Renders a job sheet on a worker thread; refuses with PdfBusyError when MAX_QUEUE renders are waiting. */
export function renderInPool(data: JobSheetData): Promise<Uint8Array> {
  if (queue.length >= MAX_QUEUE) return Promise.reject(new PdfBusyError());
  return new Promise((resolve, reject) => {
    queue.push({ job: { data, display: displaySettings() }, resolve, reject });
    pump();
  });
}

/** Stops every worker (tests, shutdown). */
export async function closePdfPool(): Promise<void> {
  await Promise.all(slots.splice(0).map((s) => s.worker.terminate()));
}
