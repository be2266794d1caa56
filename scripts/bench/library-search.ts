/**
 * Bench section: the winding library with 100,000 data sheets in an in-memory PGlite. Seeds jobs and sheets
 * with SQL (generate_series; the sheet JSON is one realistic sheet for every row, the searched columns
 * vary), then times typical searches through the app's own searchLibrary (Prisma, indexed columns).
 */
import type { BenchSection } from '@/scripts/bench/timer';
import { formatTiming, timeItAsync } from '@/scripts/bench/timer';

export const LIBRARY_SHEETS = 100_000;
/** Target for a typical library search on 100,000 sheets. */
const SEARCH_TARGET_MS = 100;

const SAMPLE_SHEET = {
  core: {
    boreMm: 150,
    coreLengthMm: 120,
    outsideDiameterMm: 240,
    slots: 36,
    slotDepthMm: 20,
    slotWidthTopMm: 7,
    slotWidthBottomMm: 9,
    toothWidthMm: 6.5,
    stackingFactor: 0.95,
  },
  winding: {
    layers: 2,
    style: 'lap',
    spans: [7],
    turnsPerCoil: [14],
    parallelPaths: 1,
    connection: 'star',
    meanTurnLengthMm: 560,
    leads: 6,
  },
  wires: [{ standard: 'metric', size: '0.85', count: 2, enamelGrade: 2 }],
  insulation: { thermalClass: 'F', slotLiner: 'NMN 0.25 mm', wedges: 'Fibreglass', varnish: 'Polyester' },
  supply: { lineVoltageV: 400, frequencyHz: 50, poles: 4, ratedCurrentA: 5, ratedOutputKw: 2.2 },
  resistance: { readings: [2.86, 2.85, 2.87], temperatureC: 20, between: 'line-to-line' },
  notes: 'Bench sheet.',
};

export const librarySection: BenchSection = {
  title: `Winding library search: ${LIBRARY_SHEETS.toLocaleString('en-GB')} sheets, in-memory PGlite (Prisma, indexed columns)`,
  run: async () => {
    delete process.env.DATABASE_URL;
    process.env.COILWRIGHT_DATA_DIR = 'memory://';
    process.env.COILWRIGHT_SEED_DEMO = '0';
    const { prepareDatabase } = await import('@/lib/setup/prepare');
    const { closeDb, withSqlRunner } = await import('@/lib/db/client');
    const { searchLibrary } = await import('@/lib/library/library-queries');
    const lines: string[] = [];
    try {
      const t0 = performance.now();
      await prepareDatabase();
      await withSqlRunner(async (sql) => {
        await sql.exec(`
          INSERT INTO "Customer" (id, company, "updatedAt") VALUES ('bench-customer', 'Bench Co', now());
          INSERT INTO "Motor" (id, "customerId", manufacturer, "updatedAt") VALUES ('bench-motor', 'bench-customer', 'Bench', now());
          INSERT INTO "Job" (id, number, "customerId", "motorId", "updatedAt")
            SELECT 'bench-job-' || g, 100000 + g, 'bench-customer', 'bench-motor', now() FROM generate_series(1, ${LIBRARY_SHEETS}) g;`);
        // Slot/pole pairs, bores and lengths spread like a busy shop's: 24–96 slots, 2–8 poles, bores 60–400 mm.
        await sql.query(
          `INSERT INTO "WindingSheet" (id, "jobId", data, slots, poles, "boreMm", "coreLengthMm", "lineVoltageV", "frequencyHz", "outputKw", manufacturer, model, "updatedAt")
           SELECT 'bench-sheet-' || g, 'bench-job-' || g, $1::jsonb,
             (ARRAY[24,36,36,48,48,54,60,72,72,96])[1 + g % 10], (ARRAY[2,4,4,4,6,6,8])[1 + (g / 10) % 7],
             round((60 + random() * 340)::numeric, 1), round((50 + random() * 450)::numeric, 1),
             (ARRAY[230,400,415,460,575,690])[1 + g % 6], (ARRAY[50,60])[1 + g % 2], round((0.37 + random() * 200)::numeric, 2),
             (ARRAY['Aldermoor','Brightwell','Corrick','Dunstable Electric','Everholt','Farrow & Lane'])[1 + g % 6], 'M-' || (g % 997),
             now() - (g || ' minutes')::interval
           FROM generate_series(1, ${LIBRARY_SHEETS}) g`,
          [JSON.stringify(SAMPLE_SHEET)],
        );
        await sql.exec('ANALYZE "WindingSheet"');
      });
      lines.push(
        `seeded ${LIBRARY_SHEETS.toLocaleString('en-GB')} jobs and sheets in ${((performance.now() - t0) / 1000).toFixed(1)} s (migrations included)`,
      );
      const searches: [string, Parameters<typeof searchLibrary>[0]][] = [
        ['slots + poles + bore ±1 mm', { slots: 36, poles: 4, boreMm: { min: 149, max: 151 }, target: { boreMm: 150 } }],
        [
          'slots + poles + bore ±1 + length ±5 mm',
          {
            slots: 48,
            poles: 4,
            boreMm: { min: 199, max: 201 },
            coreLengthMm: { min: 195, max: 205 },
            target: { boreMm: 200, coreLengthMm: 200 },
          },
        ],
        ['bore ±1 + length ±5 mm (no slots)', { boreMm: { min: 149, max: 151 }, coreLengthMm: { min: 115, max: 125 } }],
        ['slots + poles only (broad)', { slots: 36, poles: 4 }],
        ['output ±10 % + voltage ±5 %', { outputKw: { min: 9.9, max: 12.1 }, lineVoltageV: { min: 437, max: 483 } }],
        ['manufacturer text "corr"', { text: 'corr' }],
        ['manufacturer text + slots + poles', { text: 'everholt', slots: 36, poles: 4 }],
      ];
      let worst = 0;
      for (const [name, search] of searches) {
        let count = 0;
        const t = await timeItAsync(name, async () => {
          const r = await searchLibrary(search);
          count = r.rows.length;
          return r;
        });
        worst = Math.max(worst, t.medianMs);
        lines.push(`${formatTiming(t)}   → ${count} rows`);
      }
      lines.push(
        `target: every typical search under ${SEARCH_TARGET_MS} ms — ${worst < SEARCH_TARGET_MS ? 'met' : 'NOT met'} (slowest median ${worst.toFixed(1)} ms)`,
      );
    } finally {
      await closeDb();
    }
    return lines;
  },
};
