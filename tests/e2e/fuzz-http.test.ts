/**
 * Issue 12: random, hostile and malformed input to every server action and route handler of the
 * production build, over real HTTP. Never a 5xx; a refusal writes nothing; an `invalid` refusal names the
 * field. Runs on PostgreSQL (E2E_DB=postgres with TEST_DATABASE_URL) so the test can read the database
 * between calls; a modest number of runs keeps it under two minutes.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import pg from 'pg';
import { createHash, randomBytes } from 'node:crypto';
import { startApp, type AppServer } from '../support/app-server';
import { callActionOverHttp, listActions, pagePath } from '../support/action-client';

const ON_POSTGRES = process.env.E2E_DB === 'postgres' && Boolean(process.env.TEST_DATABASE_URL);
const RUNS = Number(process.env.FUZZ_RUNS ?? 12);

let app: AppServer;
let sql: pg.Client;
let cookie = '';

// Tables a refused call must not touch (sessions, sign-in counters and drafts are not records).
const RECORD_TABLES = [
  'Customer',
  'CustomerContact',
  'Motor',
  'Job',
  'JobEvent',
  'Attachment',
  'WindingSheet',
  'WindingSheetRevision',
  'Redesign',
  'TestRecord',
  'WireStock',
  'ShopSettings',
  'User',
  'JobSheetSnapshot',
];

async function fingerprint(): Promise<string> {
  const parts: string[] = [];
  for (const t of RECORD_TABLES) {
    const r = await sql.query(`SELECT md5(coalesce(string_agg(to_jsonb(x)::text, '|' ORDER BY to_jsonb(x)::text), '')) AS h FROM "${t}" x`);
    parts.push(`${t}:${String(r.rows[0]?.h)}`);
  }
  return parts.join(',');
}

const hostileString = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.constantFrom(
    '\u0000',
    'a\u0000b',
    ' '.repeat(5000) + 'x',
    'x'.repeat(100_000),
    '1'.repeat(80_000) + ' awg',
    "' OR 1=1 --",
    '<script>alert(1)</script>',
    '../../etc/passwd',
    '%00',
    '\uD800',
    'NaN',
    '-0',
    '1e309',
  ),
);
const hostileNumber = fc.oneof(
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -1, 1e308, -1e308, 2 ** 53, 0.1),
);
const leaf = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null));
const nested = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    leaf,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(
        fc.string({ maxLength: 8 }),
        fc.constantFrom('jobId', 'version', 'sheet', 'draft', 'core', '__proto__', 'constructor', 'a\u0000'),
      ),
      tie('value'),
      { maxKeys: 5 },
    ),
  ),
})).value;
const deep = fc.integer({ min: 200, max: 2000 }).map((n) => {
  let v: unknown = 'x';
  for (let i = 0; i < n; i++) v = { a: v };
  return v;
});
const argument = fc.oneof(nested, deep, fc.constant(undefined), fc.constant({}));

describe.skipIf(!ON_POSTGRES)('fuzz over HTTP (production build, PostgreSQL)', () => {
  beforeAll(async () => {
    app = await startApp();
    const url = app.databaseUrl;
    if (!url) throw new Error('the e2e harness did not report its database');
    sql = new pg.Client({ connectionString: url });
    await sql.connect();
    // A real session for an administrator (every permission), created as the app does: SHA-256 of the token.
    const token = randomBytes(32).toString('base64url');
    const admin = await sql.query(`SELECT id FROM "User" WHERE role = 'ADMIN' ORDER BY email LIMIT 1`);
    await sql.query(`INSERT INTO "Session" (id, "userId", "expiresAt") VALUES ($1, $2, now() + interval '1 hour')`, [
      createHash('sha256').update(token).digest('hex'),
      admin.rows[0]?.id,
    ]);
    cookie = `cw_session=${token}`;
  }, 300_000);
  afterAll(async () => {
    await sql?.end();
    await app?.stop();
  });

  it('every server action: no 5xx, refusals write nothing, field errors name a field', async () => {
    const actions = listActions().filter((a) => a.name !== 'signIn' && a.name !== 'signOut');
    expect(actions.length).toBeGreaterThan(10);
    for (const action of actions) {
      await fc.assert(
        fc.asyncProperty(argument, async (arg) => {
          const before = await fingerprint();
          const reply = await callActionOverHttp(app.baseUrl, action, pagePath(action.page, 1003), [arg], cookie);
          expect(reply.status, `${action.name} answered ${reply.status}: ${reply.text.slice(0, 300)}`).toBeLessThan(500);
          const r = reply.result as { ok?: boolean; code?: string; fieldErrors?: Record<string, string[]> } | undefined;
          if (r && r.ok === false) {
            expect(r.code, `${action.name}: ${JSON.stringify(r).slice(0, 300)}`).not.toBe('unexpected');
            expect(await fingerprint(), `${action.name} wrote on refusal`).toBe(before);
            if (r.code === 'invalid')
              expect(Object.keys(r.fieldErrors ?? {}).length, `${action.name}: invalid without a field`).toBeGreaterThan(0);
          }
        }),
        { numRuns: RUNS },
      );
    }
  }, 600_000);

  it('route handlers and search parameters: no 5xx on any id, number or query', async () => {
    await fc.assert(
      fc.asyncProperty(hostileString, async (s) => {
        const e = encodeURIComponent(s.slice(0, 2000));
        for (const path of [
          `/api/attachments/${e}`,
          `/jobs/${e}`,
          `/jobs/${e}/as-found/export`,
          `/jobs/${e}/job-sheet/pdf`,
          `/jobs?q=${e}`,
          `/library?q=${e}`,
          `/login?next=${e}`,
        ]) {
          const res = await fetch(`${app.baseUrl}${path}`, { headers: { Cookie: cookie }, redirect: 'manual' });
          expect(res.status, `${path} → ${res.status}`).toBeLessThan(500);
          await res.arrayBuffer();
        }
      }),
      { numRuns: RUNS },
    );
  }, 600_000);
});
