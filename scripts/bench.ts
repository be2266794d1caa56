/**
 * `npm run bench`: engine timings. Each section is a BenchSection (lib/engine/bench-timer.ts); add a
 * section (e.g. a redesign search) to SECTIONS below; sections may be async (the library search seeds an
 * in-memory database). `--quick` shortens the runs.
 */
import { analyseWinding, type AnalyseWindingInput } from '@/lib/engine/analyse-winding';
import { formatTiming, timeIt, type BenchSection, type TimeItOptions } from '@/lib/engine/bench-timer';
import { closedFormFactors } from '@/lib/engine/closed-form';
import { librarySection } from './bench/library-search';

/** 96 slots, 4 poles, double-layer lap 1–21 (y = 20 of τ = 24), orders to 49, with a core for the flux. */
const BENCH_WINDING: AnalyseWindingInput = {
  winding: { slots: 96, poles: 4, layers: 2, style: 'lap', spans: [20], turnsPerCoil: [6], parallelPaths: 2, connection: 'delta' },
  supply: { lineVoltageV: 400, frequencyHz: 50 },
  core: { boreM: 0.32, coreLengthM: 0.3, outsideDiameterM: 0.52, slots: 96, slotDepthM: 0.045, toothWidthM: 0.0058, stackingFactor: 0.95 },
  options: { maxOrder: 49 },
};

/** Target for one full winding analysis. */
const FULL_ANALYSIS_TARGET_MS = 1;

const windingSection: BenchSection = {
  title: 'Winding analysis: 96 slots, 4 poles, orders 1–49',
  run: (opts) => {
    const { slots, poles, spans } = BENCH_WINDING.winding;
    const full = timeIt('full analysis (analyseWinding)', () => {
      const r = analyseWinding(BENCH_WINDING);
      if (!r.ok) throw new Error(r.error.message);
      return r.value;
    }, opts);
    const closed = timeIt('closed-form k_d, k_p, k_w only (odd orders)', () => {
      let sum = 0;
      for (let nu = 1; nu <= 49; nu += 2) sum += closedFormFactors(slots, poles, spans[0] ?? 0, nu)?.kw ?? 0;
      return sum;
    }, opts);
    const met = full.medianMs < FULL_ANALYSIS_TARGET_MS;
    return [
      formatTiming(full),
      formatTiming(closed),
      `ratio full / closed form: ${(full.medianMs / closed.medianMs).toFixed(0)} × (same run)`,
      `target: full analysis under ${FULL_ANALYSIS_TARGET_MS} ms — ${met ? 'met' : 'NOT met'} (${full.medianMs.toFixed(3)} ms)`,
    ];
  },
};

const SECTIONS: BenchSection[] = [windingSection, librarySection];

async function main(argv: readonly string[]): Promise<void> {
  const options: TimeItOptions = argv.includes('--quick') ? { warmupMs: 50, measureMs: 200, batches: 10 } : {};
  process.stdout.write(`Node ${process.version}, ${process.platform}/${process.arch}\n`);
  for (const section of SECTIONS) {
    process.stdout.write(`\n${section.title}\n`);
    process.stdout.write(`${(await section.run(options)).join('\n')}\n`);
  }
}

await main(process.argv.slice(2));
