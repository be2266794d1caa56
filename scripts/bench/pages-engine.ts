/**
 * Page-level bench on ONE database engine (run by scripts/bench-pages.ts, one process per engine):
 * fills the database with SQL, starts the production server (`npm start`'s script), times pages over
 * HTTP as a signed-in user and, for each page, replays the statements the page's data functions send
 * straight to the database (the SQL floor). Prints one JSON line with every figure.
 *
 * Usage: tsx scripts/bench/pages-engine.ts postgres|embedded [--quick] [--app-dir <checkout>]
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import pg from 'pg';
import { PGlite } from '@electric-sql/pglite';
import { pg_trgm } from '@electric-sql/pglite/contrib/pg_trgm';
import { capture, installCapture, pgliteReplayer, pgReplayer, type Replayer, type Statement } from './statement-capture';

const engine = process.argv[2] === 'postgres' ? 'postgres' : 'embedded';
const quick = process.argv.includes('--quick');
const appDirArg = process.argv.indexOf('--app-dir');
const appDir = resolve(appDirArg > 0 ? process.argv[appDirArg + 1]! : '.');
const SIZES = { small: 5_000, main: quick ? 20_000 : 50_000, large: quick ? 50_000 : 200_000 };
const SHEETS = quick ? 20_000 : 100_000;
const RUNS = quick ? 9 : 15;

installCapture();

let dataDir = '';
let dbName = '';
const adminUrl = process.env.TEST_DATABASE_URL ?? 'postgresql://postgres@127.0.0.1:5432/postgres';
if (engine === 'postgres') {
  dbName = `coilwright_bench_${process.pid}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${dbName}`);
  await admin.end();
  const u = new URL(adminUrl);
  u.pathname = `/${dbName}`;
  process.env.DATABASE_URL = u.toString();
} else {
  delete process.env.DATABASE_URL;
  dataDir = mkdtempSync(join(tmpdir(), 'cw-bench-pages-'));
  process.env.COILWRIGHT_DATA_DIR = dataDir;
}
process.env.COILWRIGHT_SEED_DEMO = '0';

const { prepareDatabase } = await import('@/lib/setup/prepare');
const { closeDb, db, withSqlRunner } = await import('@/lib/db/client');
const { createSession, findSessionUser } = await import('@/lib/auth/session-store');
const { listBoard, listStaff } = await import('@/lib/jobs/job-queries');
const { boardQuerySchema } = await import('@/lib/jobs/job-schema');
const { searchLibrary } = await import('@/lib/library/library-queries');

const log = (s: string) => process.stderr.write(`[bench ${engine}] ${s}\n`);

// ---- data -------------------------------------------------------------------------------------------
await prepareDatabase();
const user = await db().user.create({
  data: { name: 'Bench Desk', email: `bench-${process.pid}@bench.invalid`, role: 'FRONT_DESK', passwordHash: 'x' },
});
const { token } = await createSession(user.id);
const cookie = `cw_session=${token}`;

async function sql(text: string, values: unknown[] = []): Promise<void> {
  await withSqlRunner(async (r) => {
    await r.query(text, values);
  });
}

await sql(`INSERT INTO "Customer" (id, company, "updatedAt")
  SELECT 'bench-c-' || g, (ARRAY['Aldermoor','Brightwell','Corrick','Dunmore','Everholt','Farrow','Glenmoor','Hartwell'])[1 + g % 8] || ' ' ||
    (ARRAY['Pumping','Quarries','Mills','Water','Foods','Paper','Steel','Timber'])[1 + (g / 8) % 8] || ' ' || g, now()
  FROM generate_series(1, 400) g`);

let filled = 0;
/** Adds jobs (with their motors) up to `total`: statuses cycle (8 of 10 open), dates spread over a year. */
async function fillJobs(total: number): Promise<void> {
  const t0 = performance.now();
  for (let from = filled + 1; from <= total; from += 50_000) {
    const to = Math.min(total, from + 49_999);
    await sql(`INSERT INTO "Motor" (id, "customerId", manufacturer, model, serial, "ratedVoltageV", "frequencyHz", "speedRpm", "outputKw", "updatedAt")
      SELECT 'bench-m-' || g, 'bench-c-' || (1 + g % 400), 'Bench Motors', 'BM-' || (g % 977), 'SN-' || lpad(g::text, 7, '0'), 400, 50, 1460, 7.5, now()
      FROM generate_series(${from}, ${to}) g`);
    await sql(`INSERT INTO "Job" (id, number, "customerId", "motorId", status, priority, "receivedAt", "promisedAt", "reportedFault", "updatedAt")
      SELECT 'bench-j-' || g, 1000 + g, 'bench-c-' || (1 + g % 400), 'bench-m-' || g,
        (ARRAY['RECEIVED','INSPECTION','QUOTE_SENT','CUSTOMER_APPROVED','WINDING','TESTING','READY','SHIPPED','ON_HOLD','RETURNED_UNREPAIRED'])[1 + g % 10]::"JobStatus",
        (ARRAY['LOW','NORMAL','NORMAL','HIGH','URGENT'])[1 + g % 5]::"Priority",
        timestamp '2026-01-01' + ((g % 330) || ' days')::interval,
        CASE WHEN g % 13 = 0 THEN NULL ELSE date '2026-02-01' + (g % 365) END, 'bench', now()
      FROM generate_series(${from}, ${to}) g`);
  }
  await sql('ANALYZE');
  log(`jobs ${filled} → ${total} in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  filled = total;
}

const SAMPLE_SHEET = JSON.stringify({
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
    jumperNotes: 'x'.repeat(3000),
  },
  wires: [{ standard: 'metric', size: '0.85', count: 2, enamelGrade: 2 }],
  insulation: { thermalClass: 'F' },
  supply: { lineVoltageV: 400, frequencyHz: 50, poles: 4, ratedCurrentA: 5, ratedOutputKw: 2.2 },
  resistance: { readings: [2.86, 2.85, 2.87], temperatureC: 20, between: 'line-to-line' },
});
async function fillSheets(n: number): Promise<void> {
  const t0 = performance.now();
  await sql(
    `INSERT INTO "WindingSheet" (id, "jobId", data, slots, poles, "boreMm", "coreLengthMm", "lineVoltageV", "frequencyHz", "outputKw", manufacturer, model, "updatedAt")
    SELECT 'bench-s-' || g, 'bench-j-' || g, $1::jsonb,
      (ARRAY[24,36,36,48,48,54,60,72,72,96])[1 + g % 10], (ARRAY[2,4,4,4,6,6,8])[1 + (g / 10) % 7],
      60 + (g::bigint * 7919 % 3400) / 10.0, 50 + (g::bigint * 104729 % 4500) / 10.0,
      (ARRAY[230,400,415,460,575,690])[1 + g % 6], (ARRAY[50,60])[1 + g % 2], 0.37 + (g % 2000) / 10.0,
      (ARRAY['Aldermoor','Brightwell','Corrick','Dunstable Electric','Everholt','Farrow & Lane'])[1 + g % 6], 'M-' || (g % 997),
      timestamp '2026-11-30' - (g || ' minutes')::interval
    FROM generate_series(1, ${n}) g`,
    [SAMPLE_SHEET],
  );
  await sql('ANALYZE "WindingSheet"');
  log(`${n} sheets in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
}

// ---- server -----------------------------------------------------------------------------------------
async function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const a = s.address();
      s.close(() => (typeof a === 'object' && a ? ok(a.port) : fail(new Error('no port'))));
    });
  });
}

interface Server {
  base: string;
  child: ChildProcess;
  stop(): Promise<void>;
}
async function startServer(): Promise<Server> {
  if (engine === 'embedded') await closeDb(); // the embedded database is single-process
  const port = await freePort();
  const child = spawn(process.execPath, ['scripts/start.mjs'], {
    cwd: appDir,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', NEXT_TELEMETRY_DISABLED: '1' },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let out = '';
  child.stdout?.on('data', (d: Buffer) => (out += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (out += d.toString()));
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 600_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited:\n${out}`);
    try {
      if ((await fetch(`${base}/login`)).ok) break;
    } catch {
      /* starting */
    }
    if (Date.now() > deadline) throw new Error(`server did not start:\n${out}`);
    await new Promise((r) => setTimeout(r, 500));
  }
  return {
    base,
    child,
    async stop() {
      if (child.pid && child.exitCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        process.kill(-child.pid, 'SIGTERM');
        await Promise.race([exited, new Promise((r) => setTimeout(r, 15_000))]);
        if (child.exitCode === null) process.kill(-child.pid, 'SIGKILL');
      }
    },
  };
}

/** Resident memory of the server (the processes of its group except the `npm start` wrapper), MB. */
function serverRssMb(s: Server): number {
  try {
    const out = execFileSync('ps', ['-o', 'pid=,rss=', '-g', String(s.child.pid)], { encoding: 'utf8' });
    let kb = 0;
    for (const line of out.trim().split('\n')) {
      const [pid, rss] = line.trim().split(/\s+/).map(Number);
      if (pid !== s.child.pid) kb += rss ?? 0;
    }
    return kb / 1024;
  } catch {
    return Number.NaN;
  }
}

async function get(s: Server, path: string): Promise<number> {
  const t0 = performance.now();
  const res = await fetch(`${s.base}${path}`, { headers: { cookie }, redirect: 'manual' });
  const body = await res.arrayBuffer();
  const ms = performance.now() - t0;
  if (res.status !== 200 || body.byteLength === 0) throw new Error(`${path}: HTTP ${res.status}`);
  return ms;
}

const pct = (xs: number[], p: number): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] ?? Number.NaN;
};

async function timePage(s: Server, path: string, runs = RUNS): Promise<{ p50: number; p95: number }> {
  for (let i = 0; i < 3; i++) await get(s, path);
  const xs: number[] = [];
  for (let i = 0; i < runs; i++) xs.push(await get(s, path));
  return { p50: pct(xs, 50), p95: pct(xs, 95) };
}

// ---- cases ------------------------------------------------------------------------------------------
interface Case {
  name: string;
  path: string;
  data: () => Promise<unknown>;
  mayBeEmpty?: boolean;
}

/** The statements the board page sends: session, the board itself, the staff list for the filter. */
const boardCase = (name: string, params: Record<string, string>): Case => ({
  name,
  path: `/jobs?${new URLSearchParams(params)}`,
  data: async () => {
    await findSessionUser(token);
    await listBoard(boardQuerySchema.parse(params));
    await listStaff();
  },
});
const libraryCase = (
  name: string,
  params: Record<string, string>,
  search: Parameters<typeof searchLibrary>[0],
  mayBeEmpty = false,
): Case => ({
  name,
  path: `/library?${new URLSearchParams({ ...params, unit: 'mm' })}`,
  data: async () => {
    await findSessionUser(token);
    await searchLibrary(search);
  },
  mayBeEmpty,
});

/** The cursor of the row at `position` of the open board by promised date (the old "page 400"). */
async function deepCursor(position: number): Promise<string> {
  const row = await db().job.findFirstOrThrow({
    where: { isOpen: true, promisedAt: { not: null } },
    orderBy: [{ promisedAt: 'asc' }, { number: 'asc' }],
    skip: position - 1,
    select: { number: true, promisedAt: true },
  });
  return `${row.number}~${row.promisedAt!.toISOString()}`;
}

/**
 * The statements the board sent before position paging (main before issue 13): an exact count of every
 * match, then an OFFSET page, sorted by customer through a join. Replayed beside the new ones so the SQL
 * before/after comes from the same run and data.
 */
const OPEN = ['RECEIVED', 'INSPECTION', 'QUOTE_SENT', 'CUSTOMER_APPROVED', 'WINDING', 'TESTING', 'READY', 'ON_HOLD'] as const;
const legacyCase = (name: string, opts: { status?: (typeof OPEN)[number]; customer?: boolean; page?: number }): Case => ({
  name,
  path: '',
  data: async () => {
    const where = { AND: [{ status: { in: opts.status ? [opts.status] : [...OPEN] } }] };
    await findSessionUser(token);
    await db().job.count({ where });
    await db().job.findMany({
      where,
      orderBy: opts.customer
        ? [{ customer: { company: 'asc' } }, { number: 'asc' }]
        : [{ promisedAt: { sort: 'asc', nulls: 'last' } }, { number: 'asc' }],
      skip: ((opts.page ?? 1) - 1) * 25,
      take: 25,
      select: {
        id: true,
        number: true,
        status: true,
        customer: { select: { id: true, company: true } },
        motor: { select: { manufacturer: true, serial: true } },
        assignee: { select: { name: true } },
      },
    });
    await db().customer.findMany({ orderBy: { company: 'asc' }, select: { id: true, company: true } });
    await listStaff();
  },
});
const legacyCases = (): Case[] => [
  legacyCase('before: open jobs, page 1 (count + offset + customer list)', {}),
  legacyCase('before: sorted by customer (join)', { customer: true }),
  legacyCase('before: filter by status (Winding)', { status: 'WINDING' }),
  legacyCase('before: page 400 (offset 9,975)', { page: 400 }),
];

interface Floor {
  p50: number;
  rows: number;
  statements: number;
}
async function floors(cases: Case[]): Promise<Map<string, Floor>> {
  const captured = new Map<string, Statement[]>();
  for (const c of cases) captured.set(c.name, await capture(c.data));
  let replay: Replayer;
  let done: () => Promise<void>;
  if (engine === 'postgres') {
    const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await client.connect();
    replay = pgReplayer(client);
    done = () => client.end();
  } else {
    await closeDb();
    const lite = new PGlite({ dataDir, extensions: { pg_trgm } });
    replay = pgliteReplayer(lite);
    done = () => lite.close();
  }
  const out = new Map<string, Floor>();
  try {
    for (const c of cases) {
      const st = captured.get(c.name)!;
      let rows = 0;
      for (let i = 0; i < 3; i++) rows = await replay(st);
      if (rows === 0) throw new Error(`${c.name}: the replayed statements returned no rows`);
      const xs: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const t0 = performance.now();
        await replay(st);
        xs.push(performance.now() - t0);
      }
      out.set(c.name, { p50: pct(xs, 50), rows, statements: st.length });
    }
  } finally {
    await done();
  }
  return out;
}

interface Row {
  name: string;
  size: number;
  p50: number;
  p95: number;
  floor?: Floor;
}
const rows: Row[] = [];

async function measure(size: number, cases: Case[]): Promise<Server> {
  const s = await startServer();
  for (const c of cases) {
    const t = await timePage(s, c.path);
    rows.push({ name: c.name, size, ...t });
  }
  return s;
}
async function attachFloors(size: number, cases: Case[]): Promise<void> {
  const legacy = size === SIZES.small || size === SIZES.large ? legacyCases().slice(0, 2) : legacyCases();
  const f = await floors([...cases, ...legacy]);
  for (const r of rows) if (r.size === size && f.has(r.name)) r.floor = f.get(r.name);
  for (const c of legacy) rows.push({ name: c.name, size, p50: Number.NaN, p95: Number.NaN, floor: f.get(c.name) });
}

const results: Record<string, unknown> = { engine, sizes: SIZES, sheets: SHEETS };

// 5,000 jobs: the growth baseline.
await fillJobs(SIZES.small);
const growthCases = async (): Promise<Case[]> => [
  boardCase('board: open jobs, page 1', {}),
  boardCase('board: sorted by customer', { sort: 'customer' }),
  boardCase('board: deep position (row 3,000 / page 120)', { after: await deepCursor(3_000) }),
];
let cases = await growthCases();
let server = await measure(SIZES.small, cases);
await server.stop();
await attachFloors(SIZES.small, cases);

// 50,000 jobs: every board case.
await fillJobs(SIZES.main);
const mainCases: Case[] = [
  ...(await growthCases()),
  boardCase('board: deep position (row 10,000 / page 400)', { after: await deepCursor(10_000) }),
  boardCase('board: filter by status (Winding)', { status: 'WINDING' }),
  boardCase('board: search by serial (any status)', { q: 'SN-0012345' }),
  boardCase('board: overdue', { due: 'overdue' }),
];
server = await measure(SIZES.main, mainCases);
// A page that reads almost nothing, for the "other pages unaffected" check.
const denied = await timePage(server, '/denied?need=settings.manage');
results.deniedAlone = denied;
await server.stop();
await attachFloors(SIZES.main, mainCases);

// 200,000 jobs + the library's sheets; PDFs, memory.
await fillJobs(SIZES.large);
await fillSheets(SHEETS);
cases = [
  ...(await growthCases()),
  libraryCase('library: text that matches nothing', { q: 'zzqx nothing' }, { text: 'zzqx nothing' }, true),
  libraryCase('library: manufacturer part (ightwe)', { q: 'ightwe' }, { text: 'ightwe' }),
  libraryCase(
    'library: slots + poles + bore ±1 mm',
    { slots: '36', poles: '4', bore: '150', boreTol: '1' },
    { slots: 36, poles: 4, boreMm: { min: 149, max: 151 }, target: { boreMm: 150 } },
  ),
];
server = await measure(SIZES.large, cases);

// Memory idle (after the warm-up above).
await new Promise((r) => setTimeout(r, 3000));
results.rssIdleMb = serverRssMb(server);

// /jobs alone and while another client downloads job sheet PDFs (each a different job: cold renders).
const openJobs = await (async () => {
  const list: number[] = [];
  for (let n = 1001; list.length < 400; n++) if (n % 10 !== 7 && n % 10 !== 9) list.push(n);
  return list;
})();
const jobsAlone = await timePage(server, '/jobs');
let stopPdf = false;
let pdfCount = 0;
const pdfLoop = (async () => {
  for (let i = 0; !stopPdf; i++) {
    const res = await fetch(`${server.base}/jobs/${openJobs[i % openJobs.length]}/job-sheet/pdf`, { headers: { cookie } });
    await res.arrayBuffer();
    if (res.status === 200) pdfCount++;
  }
})();
await new Promise((r) => setTimeout(r, 1500));
const jobsDuringPdf = await timePage(server, '/jobs');
const deniedDuringPdf = await timePage(server, '/denied?need=settings.manage');
stopPdf = true;
await pdfLoop;
results.pdfContention = { jobsAlone, jobsDuringPdf, deniedDuringPdf, pdfsDuring: pdfCount };

// Job sheet PDFs with 10 clients: cold (each a new record issue) and cached (the same again).
let failures = 0;
async function tenClients(offset: number): Promise<{ p50: number; perSecond: number }> {
  const times: number[] = [];
  const t0 = performance.now();
  await Promise.all(
    Array.from({ length: 10 }, async (_, c) => {
      for (let k = 0; k < 3; k++) {
        const t = performance.now();
        const res = await fetch(`${server.base}/jobs/${openJobs[offset + c * 3 + k]}/job-sheet/pdf`, { headers: { cookie } });
        await res.arrayBuffer();
        if (res.status === 200) times.push(performance.now() - t);
        else failures++;
      }
    }),
  );
  return { p50: pct(times, 50), perSecond: times.length / ((performance.now() - t0) / 1000) };
}
results.pdfTenCold = await tenClients(200);
results.pdfTenCached = await tenClients(200);
if (failures > 0 || pdfCount === 0) throw new Error(`job sheet PDFs failed (${failures} refused or failed, ${pdfCount} while browsing)`);

// RSS under 10 mixed clients (board views, library, job pages, PDFs) for 20 s.
const mixed = [
  '/jobs',
  '/jobs?sort=customer',
  '/jobs?status=WINDING',
  '/library?q=ightwe&unit=mm',
  '/jobs/1001',
  `/jobs/1002/job-sheet/pdf`,
  '/jobs?q=SN-0000777',
];
let peak = 0;
let stopMix = false;
const sampler = setInterval(() => (peak = Math.max(peak, serverRssMb(server))), 250);
const clients = Array.from({ length: 10 }, async (_, c) => {
  for (let i = c; !stopMix; i++) await (await fetch(`${server.base}${mixed[i % mixed.length]}`, { headers: { cookie } })).arrayBuffer();
});
await new Promise((r) => setTimeout(r, quick ? 8000 : 20_000));
stopMix = true;
await Promise.all(clients);
clearInterval(sampler);
results.rssTenClientsMb = peak;
await new Promise((r) => setTimeout(r, 5000));
results.rssAfterMb = serverRssMb(server);
await server.stop();
await attachFloors(SIZES.large, cases);

results.rows = rows;
process.stdout.write(`${JSON.stringify(results)}\n`);

// ---- clean up ---------------------------------------------------------------------------------------
await closeDb();
if (engine === 'postgres') {
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
  await admin.end();
} else {
  rmSync(dataDir, { recursive: true, force: true });
}
