/**
 * A small timer for benchmarks: warm up, then run batches of calls and report the time per call. The
 * median over batches is the figure to quote (it shrugs off a garbage-collection pause in one batch).
 */

export interface Timing {
  name: string;
  /** Calls measured (after warm-up). */
  iterations: number;
  /** Median over batches of the time per call, ms. */
  medianMs: number;
  /** Mean time per call over all measured calls, ms. */
  meanMs: number;
  /** Fastest batch's time per call, ms. */
  minMs: number;
}

/** Warm-up and measuring times. */
export interface TimeItOptions {
  /** Time spent warming up before measuring, ms (default 200). */
  warmupMs?: number;
  /** Time spent measuring, ms (default 1000). */
  measureMs?: number;
  /** Batches to split the measurement into (default 20). */
  batches?: number;
}

/** Keeps results alive so the optimiser cannot drop the call being timed. */
let sink: unknown;
/** The last result, for callers that want to check it. */
export const benchSink = (): unknown => sink;

/** Calls in one batch: enough for the batch to take about `targetMs`. */
function batchSize(fn: () => unknown, targetMs: number): number {
  let n = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < n; i++) sink = fn();
    const dt = performance.now() - t0;
    if (dt >= targetMs || n >= 1 << 24) return Math.max(1, Math.round((n * targetMs) / Math.max(dt, 1e-6)));
    n *= 2;
  }
}

/** Times `fn`: warm-up, then `batches` batches filling about `measureMs`. */
export function timeIt(name: string, fn: () => unknown, options: TimeItOptions = {}): Timing {
  const { warmupMs = 200, measureMs = 1000, batches = 20 } = options;
  const warmEnd = performance.now() + warmupMs;
  while (performance.now() < warmEnd) sink = fn();
  const perBatch = batchSize(fn, measureMs / batches);
  const times: number[] = [];
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) sink = fn();
    times.push((performance.now() - t0) / perBatch);
  }
  const sorted = [...times].sort((x, y) => x - y);
  const mid = sorted.length >> 1;
  const medianMs = sorted.length % 2 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
  return {
    name,
    iterations: perBatch * batches,
    medianMs,
    meanMs: times.reduce((a, t) => a + t, 0) / times.length,
    minMs: sorted[0] ?? 0,
  };
}

/** One line: name, median and mean per call in µs, calls measured. */
export const formatTiming = (t: Timing): string =>
  `${t.name.padEnd(44)} median ${(t.medianMs * 1000).toFixed(1).padStart(8)} µs   mean ${(t.meanMs * 1000).toFixed(1).padStart(8)} µs   (${t.iterations} calls)`;

/** Times an async call (e.g. a database query): `runs` calls after `warmup`, one at a time. */
export async function timeItAsync(
  name: string,
  fn: () => Promise<unknown>,
  { warmup = 3, runs = 25 }: { warmup?: number; runs?: number } = {},
): Promise<Timing> {
  for (let i = 0; i < warmup; i++) sink = await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    sink = await fn();
    times.push(performance.now() - t0);
  }
  const sorted = [...times].sort((x, y) => x - y);
  const mid = sorted.length >> 1;
  const medianMs = sorted.length % 2 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
  return { name, iterations: runs, medianMs, meanMs: times.reduce((a, t) => a + t, 0) / times.length, minMs: sorted[0] ?? 0 };
}

/** A section of `npm run bench`: returns the lines it prints. Add new sections to the list in scripts/bench.ts. */
export interface BenchSection {
  title: string;
  run: (options: TimeItOptions) => string[] | Promise<string[]>;
}
