/**
 * `npm run soak [-- --clients 50 --seconds 180 --restart-db]`: a bounded load-and-fault run against the
 * production build (run `npx next build` first) on a fresh PostgreSQL database, loopback only, that stops
 * by itself. Clients mix board and job-page views, intakes, status moves, detail edits, as-found sheet
 * saves and draft autosaves through the real HTTP interface. With --restart-db the PostgreSQL cluster is
 * restarted hard in the middle (`pg_ctlcluster <ver> <name> restart -m immediate`; needs the right to do
 * so, and stops every other user of that server: never on a shared machine). At the end it checks in the
 * database: every acknowledged intake present exactly once, job numbers gap-free, no job in an impossible
 * state, every acknowledged sheet revision stored; and prints requests, 5xx, p50/p95 per kind and the
 * recovery time after the restart. Exit code 1 when a check fails.
 *
 * Settings: SOAK_DATABASE_URL (a server where it may create and drop `cw_soak_*` databases; default the
 * local postgresql://postgres@127.0.0.1:5432/postgres), SOAK_PG_CLUSTER (default "15 main").
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { createServer } from 'node:net';
import { join } from 'node:path';
import pg from 'pg';
import { callActionOverHttp, listActions, type ActionRef } from '../tests/support/action-client';

interface Options {
  clients: number;
  seconds: number;
  restartDb: boolean;
}

function options(argv: string[]): Options {
  const num = (name: string, dflt: number, max: number) => {
    const i = argv.indexOf(name);
    const v = i >= 0 ? Number(argv[i + 1]) : dflt;
    if (!Number.isInteger(v) || v < 1 || v > max) throw new Error(`${name} must be a whole number from 1 to ${max}`);
    return v;
  };
  return { clients: num('--clients', 50, 500), seconds: num('--seconds', 180, 3600), restartDb: argv.includes('--restart-db') };
}

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const a = s.address();
      s.close(() => (typeof a === 'object' && a ? resolve(a.port) : reject(new Error('no port'))));
    });
  });

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

interface Sample {
  kind: string;
  ms: number;
  status: number;
  ok: boolean;
  at: number;
}

export interface SoakReport {
  requests: number;
  fiveHundreds: number;
  fiveHundredsOutsideOutage: number;
  perKind: Record<string, { n: number; p50: number; p95: number; failed: number }>;
  recoverySeconds: number | null;
  problems: string[];
}

const pct = (xs: number[], p: number) => {
  if (!xs.length) return 0;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] ?? 0;
};

export async function soak(opt: Options): Promise<SoakReport> {
  const server = new URL(process.env.SOAK_DATABASE_URL ?? 'postgresql://postgres@127.0.0.1:5432/postgres');
  if (!['127.0.0.1', 'localhost', '::1'].includes(server.hostname)) throw new Error('soak runs against a loopback database only');
  const name = `cw_soak_${randomBytes(4).toString('hex')}`;
  const admin = new pg.Client({ connectionString: server.toString() });
  await admin.connect();
  await admin.query(`CREATE DATABASE "${name}"`);
  await admin.end();
  const dbUrl = new URL(server.toString());
  dbUrl.pathname = `/${name}`;
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const app: ChildProcess = spawn(process.execPath, [join('scripts', 'serve.mjs')], {
    env: {
      ...process.env,
      NEXT_TELEMETRY_DISABLED: '1',
      DATABASE_URL: dbUrl.toString(),
      COILWRIGHT_SEED_DEMO: '1',
      PORT: String(port),
      HOST: '127.0.0.1',
    },
    stdio: ['ignore', 'ignore', 'pipe'],
    detached: true,
  });
  let appLog = '';
  app.stderr?.on('data', (d: Buffer) => (appLog = (appLog + d.toString()).slice(-4000)));
  const sql = new pg.Client({ connectionString: dbUrl.toString() });
  const problems: string[] = [];
  const samples: Sample[] = [];
  let outage: { from: number; to: number | null } | null = null;
  let firstOkAfterOutage: number | null = null;
  try {
    for (const deadline = Date.now() + 600_000; ;) {
      if (app.exitCode !== null) throw new Error(`app exited:\n${appLog}`);
      if (Date.now() > deadline) throw new Error('app did not start within 10 minutes');
      try {
        if ((await fetch(`${baseUrl}/login`)).ok) break;
      } catch {
        /* starting */
      }
      await sleep(1000);
    }
    await sql.connect();
    const users = (await sql.query<{ id: string; role: string }>(`SELECT id, role FROM "User"`)).rows;
    const cookieFor = async (role: string) => {
      const u = users.find((x) => x.role === role);
      const token = randomBytes(32).toString('base64url');
      await sql.query(`INSERT INTO "Session" (id, "userId", "expiresAt") VALUES ($1, $2, now() + interval '1 day')`, [
        createHash('sha256').update(token).digest('hex'),
        u?.id,
      ]);
      return `cw_session=${token}`;
    };
    const desk = await cookieFor('FRONT_DESK');
    const winder = await cookieFor('WINDER');
    const actions = new Map(listActions().map((a) => [a.name, a] as const));
    const act = (n: string): ActionRef => {
      const a = actions.get(n);
      if (!a) throw new Error(`no action ${n} in the build`);
      return a;
    };
    const jobs = (await sql.query<{ id: string; number: number; status: string }>(`SELECT id, number, status FROM "Job" ORDER BY number`))
      .rows;
    const sheets = (
      await sql.query<{ jobId: string; number: number; data: unknown }>(
        `SELECT s."jobId", j.number, s.data FROM "WindingSheet" s JOIN "Job" j ON j.id = s."jobId" WHERE j.status IN ('QUOTE_SENT','CUSTOMER_APPROVED','WINDING')`,
      )
    ).rows;
    const acknowledgedIntakes = new Map<string, number>(); // request key → job number
    const acknowledgedRevisions: { jobId: string; revision: number }[] = [];

    const timed = async (kind: string, run: () => Promise<{ status: number; ok: boolean }>) => {
      const t0 = performance.now();
      let r = { status: 0, ok: false };
      try {
        r = await run();
      } catch {
        r = { status: 0, ok: false };
      }
      const at = Date.now();
      samples.push({ kind, ms: performance.now() - t0, status: r.status, ok: r.ok, at });
      if (outage?.to && r.ok && firstOkAfterOutage === null && at > outage.to) firstOkAfterOutage = at;
    };
    const page = (kind: string, path: string, cookie: string) =>
      timed(kind, async () => {
        const res = await fetch(`${baseUrl}${path}`, { headers: { Cookie: cookie }, redirect: 'manual' });
        await res.arrayBuffer();
        return { status: res.status, ok: res.status < 400 };
      });
    const action = (
      kind: string,
      n: string,
      path: string,
      arg: unknown,
      cookie: string,
      onOk?: (result: Record<string, unknown>) => void,
    ) =>
      timed(kind, async () => {
        const r = await callActionOverHttp(baseUrl, act(n), path, [arg], cookie);
        const result = r.result as { ok?: boolean; data?: Record<string, unknown> } | undefined;
        const ok = r.status < 400 && result?.ok === true;
        if (ok && onOk) onOk(result?.data ?? {});
        return { status: r.status, ok };
      });

    const pick = <T>(xs: readonly T[]): T => xs[Math.floor(Math.random() * xs.length)] as T;
    const stopAt = Date.now() + opt.seconds * 1000;
    const client = async (i: number) => {
      while (Date.now() < stopAt) {
        const roll = Math.random();
        const job = pick(jobs);
        if (roll < 0.3) await page('board', `/jobs?q=${pick(['', 'pump', '10', 'fan'])}`, desk);
        else if (roll < 0.55) await page('job page', `/jobs/${job.number}`, winder);
        else if (roll < 0.65) {
          const requestKey = randomUUID();
          const fd = {
            customer: { mode: 'new', company: `Soak ${requestKey}` },
            motor: {
              manufacturer: 'Soakwell',
              serial: `S-${i}-${Date.now()}`,
              ratedVoltageV: 400,
              frequencyHz: 50,
              speedRpm: 1460,
              outputValue: 5.5,
              outputUnit: 'kW',
              phases: 3,
            },
            job: { priority: 'NORMAL', reportedFault: 'Soak test' },
            requestKey,
          };
          await timed('intake', async () => {
            const body = new FormData();
            body.set('0', '["$K1"]');
            body.set('1_payload', JSON.stringify(fd));
            const res = await fetch(`${baseUrl}/jobs/new`, {
              method: 'POST',
              headers: { 'Next-Action': act('submitIntake').id, Accept: 'text/x-component', Origin: baseUrl, Cookie: desk },
              body,
            });
            const text = await res.text();
            const m = /^1:(\{.*\})$/m.exec(text);
            const result = m?.[1] ? (JSON.parse(m[1]) as { ok?: boolean; data?: { number?: number } }) : undefined;
            if (result?.ok && typeof result.data?.number === 'number') acknowledgedIntakes.set(requestKey, result.data.number);
            return { status: res.status, ok: result?.ok === true };
          });
        } else if (roll < 0.75) {
          const row = (
            await sql
              .query<{ version: number; status: string; heldFrom: string | null }>(
                `SELECT version, status, "heldFrom" FROM "Job" WHERE id = $1`,
                [job.id],
              )
              .catch(() => ({ rows: [] }))
          ).rows[0];
          if (!row) continue;
          const to =
            row.status === 'ON_HOLD'
              ? row.heldFrom
              : ['RECEIVED', 'INSPECTION', 'WINDING', 'TESTING'].includes(row.status)
                ? 'ON_HOLD'
                : null;
          if (to)
            await action('move', 'moveStatus', `/jobs/${job.number}`, { jobId: job.id, version: row.version, to, note: 'soak' }, winder);
        } else if (roll < 0.85) {
          const row = (
            await sql
              .query<{ version: number; reportedFault: string; priority: string }>(
                `SELECT version, "reportedFault", priority FROM "Job" WHERE id = $1`,
                [job.id],
              )
              .catch(() => ({ rows: [] }))
          ).rows[0];
          if (row)
            await action(
              'edit',
              'saveJobDetails',
              `/jobs/${job.number}`,
              {
                jobId: job.id,
                version: row.version,
                priority: row.priority,
                reportedFault: row.reportedFault,
                notes: `soak ${i} ${Date.now()}`,
              },
              winder,
            );
        } else if (roll < 0.93 && sheets.length) {
          const s = pick(sheets);
          const rev = (
            await sql
              .query<{ revision: number }>(`SELECT revision FROM "WindingSheet" WHERE "jobId" = $1`, [s.jobId])
              .catch(() => ({ rows: [] }))
          ).rows[0];
          if (rev)
            await action(
              'sheet save',
              'saveAsFoundSheet',
              `/jobs/${s.number}/as-found`,
              { jobId: s.jobId, baseRevision: rev.revision, sheet: s.data },
              winder,
              (d) => {
                if (typeof d.revision === 'number') acknowledgedRevisions.push({ jobId: s.jobId, revision: d.revision });
              },
            );
        } else if (sheets.length) {
          const s = pick(sheets);
          const draft = {
            unit: 'mm',
            values: {
              core: { boreMm: String(100 + (i % 50)) },
              winding: {},
              wires: [],
              insulation: {},
              supply: {},
              resistance: {},
              notes: `soak ${i}`,
            },
          };
          await action('draft autosave', 'saveSheetDraft', `/jobs/${s.number}/as-found`, { jobId: s.jobId, draft }, winder);
        }
      }
    };
    const restarter = async () => {
      if (!opt.restartDb) return;
      await sleep((opt.seconds * 1000) / 2);
      const [ver, cluster] = (process.env.SOAK_PG_CLUSTER ?? '15 main').split(' ');
      outage = { from: Date.now(), to: null };
      const r = spawnSync('pg_ctlcluster', [ver ?? '15', cluster ?? 'main', 'restart', '-m', 'immediate'], { encoding: 'utf8' });
      if (r.status !== 0) problems.push(`database restart failed: ${r.stderr}`);
      outage.to = Date.now();
    };
    await Promise.all([...Array.from({ length: opt.clients }, (_, i) => client(i)), restarter()]);

    // Checks in the database (a fresh connection: the old one may have died with the restart).
    await sql.end().catch(() => {});
    const check = new pg.Client({ connectionString: dbUrl.toString() });
    await check.connect();
    try {
      for (const [key, number] of acknowledgedIntakes) {
        const r = await check.query(`SELECT j.number FROM "Job" j JOIN "Customer" c ON c.id = j."customerId" WHERE c.company = $1`, [
          `Soak ${key}`,
        ]);
        if (r.rows.length !== 1 || r.rows[0]?.number !== number)
          problems.push(`intake ${key}: acknowledged as ${number}, found ${JSON.stringify(r.rows)}`);
      }
      const nums = (await check.query<{ number: number }>(`SELECT number FROM "Job" ORDER BY number`)).rows.map((r) => r.number);
      nums.forEach((n, i) => {
        if (n !== 1001 + i) problems.push(`job numbers not gap-free at position ${i}: ${n}`);
      });
      const impossible = await check.query(`SELECT number FROM "Job" WHERE (status = 'ON_HOLD') <> ("heldFrom" IS NOT NULL)`);
      if (impossible.rows.length) problems.push(`jobs in an impossible hold state: ${impossible.rows.map((r) => r.number).join(', ')}`);
      for (const { jobId, revision } of acknowledgedRevisions) {
        const r = await check.query(
          `SELECT count(*)::int AS n FROM "WindingSheetRevision" r JOIN "WindingSheet" s ON s.id = r."sheetId" WHERE s."jobId" = $1 AND r.revision = $2`,
          [jobId, revision],
        );
        if (r.rows[0]?.n !== 1) problems.push(`sheet revision ${revision} of job ${jobId} acknowledged but stored ${r.rows[0]?.n} times`);
      }
    } finally {
      await check.end();
    }
  } finally {
    if (app.pid && app.exitCode === null) process.kill(-app.pid, 'SIGTERM');
    await sleep(2000);
    if (app.pid && app.exitCode === null) process.kill(-app.pid, 'SIGKILL');
    const cleanup = new pg.Client({ connectionString: server.toString() });
    await cleanup
      .connect()
      .then(() => cleanup.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`))
      .finally(() => cleanup.end());
  }
  const out = outage as { from: number; to: number | null } | null;
  const inOutage = (s: Sample) => out !== null && s.at >= out.from && s.at <= (firstOkAfterOutage ?? out.to ?? Infinity) + 5000;
  const perKind: SoakReport['perKind'] = {};
  for (const kind of new Set(samples.map((s) => s.kind))) {
    const ks = samples.filter((s) => s.kind === kind);
    perKind[kind] = {
      n: ks.length,
      p50: Math.round(
        pct(
          ks.map((s) => s.ms),
          50,
        ),
      ),
      p95: Math.round(
        pct(
          ks.map((s) => s.ms),
          95,
        ),
      ),
      failed: ks.filter((s) => !s.ok).length,
    };
  }
  return {
    requests: samples.length,
    fiveHundreds: samples.filter((s) => s.status >= 500).length,
    fiveHundredsOutsideOutage: samples.filter((s) => s.status >= 500 && !inOutage(s)).length,
    perKind,
    recoverySeconds: out?.to && firstOkAfterOutage ? (firstOkAfterOutage - out.to) / 1000 : null,
    problems,
  };
}

if (process.argv[1]?.endsWith('soak.ts')) {
  const opt = options(process.argv.slice(2));
  console.log(`Soak: ${opt.clients} clients for ${opt.seconds} s${opt.restartDb ? ', database restart in the middle' : ''} …`);
  soak(opt).then(
    (r) => {
      console.log(
        `requests ${r.requests}, 5xx ${r.fiveHundreds} (outside the outage ${r.fiveHundredsOutsideOutage}), recovery ${r.recoverySeconds ?? '-'} s`,
      );
      for (const [k, v] of Object.entries(r.perKind))
        console.log(
          `  ${k.padEnd(15)} n ${String(v.n).padStart(6)}  p50 ${String(v.p50).padStart(5)} ms  p95 ${String(v.p95).padStart(5)} ms  refused/failed ${v.failed}`,
        );
      for (const p of r.problems) console.log(`PROBLEM: ${p}`);
      process.exit(r.problems.length || r.fiveHundredsOutsideOutage ? 1 : 0);
    },
    (e: unknown) => {
      console.error(`Soak failed: ${e instanceof Error ? e.message : String(e)}`);
      process.exit(1);
    },
  );
}
