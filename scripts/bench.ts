/**
 * `npm run bench`: engine timings. Each section is a BenchSection (scripts/bench/timer.ts); add a
 * section (e.g. a redesign search) to SECTIONS below; sections may be async (the library search seeds an
 * in-memory database). `--quick` shortens the runs.
 */
import { analyseWinding, type AnalyseWindingInput } from '@/lib/engine/analyse-winding';
import { formatTiming, timeIt, type BenchSection, type TimeItOptions } from '@/scripts/bench/timer';
import { closedFormFactors } from '@/lib/engine/closed-form';
import { DEFAULT_REDESIGN_LIMITS, stockWire } from '@/lib/engine/redesign/from-sheet';
import { searchRedesign } from '@/lib/engine/redesign/search';
import type { RedesignOriginal, RedesignRequest, StockWire } from '@/lib/engine/redesign/types';
import { listAwgSizes, listMetricSizes } from '@/lib/engine/wire';
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
    const full = timeIt(
      'full analysis (analyseWinding)',
      () => {
        const r = analyseWinding(BENCH_WINDING);
        if (!r.ok) throw new Error(r.error.message);
        return r.value;
      },
      opts,
    );
    const closed = timeIt(
      'closed-form k_d, k_p, k_w only (odd orders)',
      () => {
        let sum = 0;
        for (let nu = 1; nu <= 49; nu += 2) sum += closedFormFactors(slots, poles, spans[0] ?? 0, nu)?.kw ?? 0;
        return sum;
      },
      opts,
    );
    const met = full.medianMs < FULL_ANALYSIS_TARGET_MS;
    return [
      formatTiming(full),
      formatTiming(closed),
      `ratio full / closed form: ${(full.medianMs / closed.medianMs).toFixed(0)} × (same run)`,
      `target: full analysis under ${FULL_ANALYSIS_TARGET_MS} ms — ${met ? 'met' : 'NOT met'} (${full.medianMs.toFixed(3)} ms)`,
    ];
  },
};

/** A 48-slot, 4-pole core wound double-layer lap 1–11, 10 turns, star, 400 V 50 Hz, 2 × 1.12 mm. */
const REDESIGN_ORIGINAL: RedesignOriginal = {
  winding: { slots: 48, poles: 4, layers: 2, style: 'lap', spans: [10], turnsPerCoil: [10], parallelPaths: 1, connection: 'star' },
  supply: { lineVoltageV: 400, frequencyHz: 50 },
  core: { boreM: 0.2, coreLengthM: 0.16, outsideDiameterM: 0.31, slots: 48, slotDepthM: 0.024, toothWidthM: 0.0068, stackingFactor: 0.95 },
  grossSlotAreaMm2: 150,
  wires: [
    {
      label: '1.120 mm',
      standard: 'metric',
      size: '1.12',
      enamelGrade: 2,
      bareMm: 1.12,
      overallMm: 1.18,
      areaMm2: (Math.PI / 4) * 1.12 ** 2,
      count: 2,
    },
  ],
  meanTurnLengthMm: 700,
  ratedCurrentA: 9,
};

/** 40 sizes: metric 0.30–2.00 mm (34) and AWG 15–20 (6), grade 2. */
const REDESIGN_STOCK: StockWire[] = [
  ...listMetricSizes().filter((w) => w.bareMm >= 0.3 && w.bareMm <= 2.0),
  ...listAwgSizes().filter((w) => w.n >= 15 && w.n <= 20),
].map((w) => {
  const r = stockWire({ standard: w.standard, size: w.size, enamelGrade: 2 });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
});

/** 400 V Y 50 Hz → 460 V 60 Hz, either connection, spans 1–10 … 1–13, every allowed circuit count. */
const REDESIGN_REQUEST: RedesignRequest = {
  target: {
    lineVoltageV: 460,
    frequencyHz: 60,
    poles: 4,
    connection: 'either',
    spans: [9, 10, 11, 12],
    layers: 'keep',
    parallelPaths: [],
    allowOverPitch: false,
  },
  limits: DEFAULT_REDESIGN_LIMITS,
};

/** Target for a full candidate search. */
const SEARCH_TARGET_MS = 200;

const redesignSection: BenchSection = {
  title: `Redesign search: 48 slots, ${REDESIGN_STOCK.length}-size wire stock, 4 spans × 2 connections × all circuits`,
  run: (opts) => {
    const first = searchRedesign(REDESIGN_ORIGINAL, REDESIGN_REQUEST, REDESIGN_STOCK);
    if (!first.ok) throw new Error(first.error.message);
    const best = first.value.candidates[0];
    if (!best) throw new Error('the bench search found no candidate');
    const search = timeIt(
      'full candidate search (searchRedesign)',
      () => {
        const r = searchRedesign(REDESIGN_ORIGINAL, REDESIGN_REQUEST, REDESIGN_STOCK);
        if (!r.ok) throw new Error(r.error.message);
        return r.value;
      },
      opts,
    );
    const one = timeIt(
      'analysing one candidate (analyseWinding)',
      () => {
        const r = analyseWinding({ winding: best.winding, supply: { lineVoltageV: 460, frequencyHz: 60 }, core: REDESIGN_ORIGINAL.core });
        if (!r.ok) throw new Error(r.error.message);
        return r.value;
      },
      opts,
    );
    const met = search.medianMs < SEARCH_TARGET_MS;
    return [
      `${first.value.familiesTried} families, ${first.value.wireSetsConsidered} wire sets looked at, ${first.value.candidates.length} candidates, ${first.value.rejected.length} families rejected`,
      formatTiming(search),
      formatTiming(one),
      `ratio full search / one candidate analysis: ${(search.medianMs / one.medianMs).toFixed(1)} × (same run)`,
      `target: full search under ${SEARCH_TARGET_MS} ms — ${met ? 'met' : 'NOT met'} (${search.medianMs.toFixed(2)} ms)`,
    ];
  },
};

const SECTIONS: BenchSection[] = [windingSection, redesignSection, librarySection];

async function main(argv: readonly string[]): Promise<void> {
  const options: TimeItOptions = argv.includes('--quick') ? { warmupMs: 50, measureMs: 200, batches: 10 } : {};
  process.stdout.write(`Node ${process.version}, ${process.platform}/${process.arch}\n`);
  for (const section of SECTIONS) {
    process.stdout.write(`\n${section.title}\n`);
    process.stdout.write(`${(await section.run(options)).join('\n')}\n`);
  }
}

await main(process.argv.slice(2));
