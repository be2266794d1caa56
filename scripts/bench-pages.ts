/**
 * `npm run bench` (last section): pages as a user gets them. For PostgreSQL (TEST_DATABASE_URL, or a local
 * server at 127.0.0.1:5432) and for the embedded database, one child process each
 * (scripts/bench/pages-engine.ts) fills 5,000 → 50,000 → 200,000 jobs and 100,000 sheets, starts the
 * production server, and times each page beside its SQL floor (the same statements replayed straight to
 * the database). Prints every figure with the goal beside it. `--quick` uses smaller tables; `--engine
 * postgres|embedded` runs one.
 * Needs a production build (`npm start` builds one when the sources are newer).
 */
import { spawn } from 'node:child_process';
import pg from 'pg';
import { fmt, numberFormat } from '@/lib/presentation/format';

const quick = process.argv.includes('--quick');
const passThrough = process.argv.slice(2).filter((a, i, all) => a !== '--engine' && all[i - 1] !== '--engine');
const t0 = performance.now();

interface Timing {
  p50: number;
  p95: number;
}
interface Row {
  name: string;
  size: number;
  p50: number;
  p95: number;
  floor?: { p50: number; rows: number; statements: number };
}
interface Result {
  engine: string;
  sizes: { small: number; main: number; large: number };
  sheets: number;
  rows: Row[];
  deniedAlone: Timing;
  rssIdleMb: number;
  rssTenClientsMb: number;
  rssAfterMb: number;
  pdfContention: { jobsAlone: Timing; jobsDuringPdf: Timing; deniedDuringPdf: Timing; pdfsDuring: number };
  pdfTenCold: { p50: number; perSecond: number };
  pdfTenCached: { p50: number; perSecond: number };
}

async function postgresAvailable(): Promise<boolean> {
  const c = new pg.Client({
    connectionString: process.env.TEST_DATABASE_URL ?? 'postgresql://postgres@127.0.0.1:5432/postgres',
    connectionTimeoutMillis: 2000,
  });
  try {
    await c.connect();
    await c.end();
    return true;
  } catch {
    return false;
  }
}

function runEngine(engine: string): Promise<Result> {
  return new Promise((ok, fail) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/bench/pages-engine.ts', engine, ...passThrough], {
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let out = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.on('exit', (code) => {
      const line = out.trim().split('\n').pop() ?? '';
      if (code !== 0 || !line.startsWith('{')) return fail(new Error(`${engine} bench failed (exit ${code})`));
      ok(JSON.parse(line) as Result);
    });
  });
}

const ms = (v: number) => `${v.toFixed(v < 10 ? 1 : 0)} ms`;
const pad = (s: string, n: number) => s.padEnd(n);

function report(r: Result): string[] {
  const out: string[] = [
    `\nPages on ${r.engine === 'postgres' ? 'PostgreSQL' : 'the embedded database (PGlite)'} — production server, signed in, p50 of ${quick ? 9 : 15} after 3 warm-up requests`,
  ];
  out.push(`${pad('page', 48)} ${pad('jobs', 8)} ${pad('page p50', 10)} ${pad('p95', 9)} ${pad('SQL p50', 9)} ${pad('÷ SQL', 7)} goal`);
  for (const row of r.rows) {
    const ratio = row.floor ? row.p50 / row.floor.p50 : Number.NaN;
    if (row.name.startsWith('before:')) {
      out.push(
        `${pad(row.name, 48)} ${pad(fmt.int(row.size), 8)} ${pad('(SQL only)', 10)} ${pad('', 9)} ${pad(ms(row.floor?.p50 ?? Number.NaN), 9)}`,
      );
      continue;
    }
    const goal = row.name.startsWith('library: text that matches nothing')
      ? 'SQL < 10 ms, page ≤ 2×'
      : row.name.startsWith('library')
        ? '≤ 2×'
        : '≤ 1.5×, p50 < 20 ms';
    out.push(
      `${pad(row.name, 48)} ${pad(fmt.int(row.size), 8)} ${pad(ms(row.p50), 10)} ${pad(ms(row.p95), 9)} ${pad(row.floor ? ms(row.floor.p50) : '—', 9)} ${pad(Number.isFinite(ratio) ? `${ratio.toFixed(2)}×` : '—', 7)} ${goal}`,
    );
  }
  const growth = (name: string) => {
    const a = r.rows.find((x) => x.name === name && x.size === r.sizes.small);
    const b = r.rows.find((x) => x.name === name && x.size === r.sizes.large);
    return a && b ? `${ms(a.p50)} → ${ms(b.p50)} (SQL ${ms(a.floor?.p50 ?? Number.NaN)} → ${ms(b.floor?.p50 ?? Number.NaN)})` : '—';
  };
  out.push(
    `growth ${fmt.int(r.sizes.small)} → ${fmt.int(r.sizes.large)} jobs, sorted by customer: ${growth('board: sorted by customer')}   goal: flat, < 20 ms`,
  );
  out.push(
    `growth ${fmt.int(r.sizes.small)} → ${fmt.int(r.sizes.large)} jobs, open jobs page 1: ${growth('board: open jobs, page 1')}   goal: flat`,
  );
  const c = r.pdfContention;
  out.push(
    `/jobs p50 alone ${ms(c.jobsAlone.p50)}, while another client downloads PDFs ${ms(c.jobsDuringPdf.p50)} (${(c.jobsDuringPdf.p50 / c.jobsAlone.p50).toFixed(2)}×; ${c.pdfsDuring} PDFs meanwhile)   goal ≤ 1.2×`,
  );
  out.push(
    `/denied p50 alone ${ms(r.deniedAlone.p50)} (at ${fmt.int(r.sizes.main)} jobs), while PDFs download ${ms(c.deniedDuringPdf.p50)}   goal ≤ 1.2×`,
  );
  out.push(
    `job sheet PDF, 10 clients: cold ${ms(r.pdfTenCold.p50)} p50 (${r.pdfTenCold.perSecond.toFixed(1)}/s), cached ${ms(r.pdfTenCached.p50)} p50 (${r.pdfTenCached.perSecond.toFixed(1)}/s)   goal: cached per record issue, cold off the main thread`,
  );
  const rssGoal = r.engine === 'postgres' ? '< 400 MB' : 'stated, < 600 MB';
  out.push(
    `server RSS: idle ${r.rssIdleMb.toFixed(0)} MB, peak under 10 mixed clients ${r.rssTenClientsMb.toFixed(0)} MB, 5 s after ${r.rssAfterMb.toFixed(0)} MB   goal ${rssGoal}`,
  );
  return out;
}

function formattingLine(): string {
  const N = 20_000;
  let t = performance.now();
  for (let i = 0; i < N; i++) (i * 1.37).toLocaleString('en-GB', { maximumFractionDigits: 2, minimumFractionDigits: 0 });
  const built = ((performance.now() - t) / N) * 1000;
  numberFormat(2);
  t = performance.now();
  for (let i = 0; i < N; i++) fmt.num(i * 1.37, 2);
  const cached = ((performance.now() - t) / N) * 1000;
  return `number formatting: ${cached.toFixed(2)} µs a call with the cached formatter, ${built.toFixed(1)} µs building one each time   goal: cached formatters`;
}

process.stdout.write(`\nPage-level bench${quick ? ' (--quick: smaller tables)' : ''}\n`);
process.stdout.write(`${formattingLine()}\n`);
const only = process.argv.includes('--engine') ? process.argv[process.argv.indexOf('--engine') + 1] : undefined;
const pgUp = await postgresAvailable();
const engines = (pgUp ? ['postgres', 'embedded'] : ['embedded']).filter((e) => !only || e === only);
if (!pgUp) process.stdout.write('PostgreSQL not reachable (TEST_DATABASE_URL or 127.0.0.1:5432): embedded database only.\n');
for (const e of engines) process.stdout.write(`${report(await runEngine(e)).join('\n')}\n`);
process.stdout.write(`\npage-level bench took ${((performance.now() - t0) / 60_000).toFixed(1)} min\n`);
