import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { buildBenchPack, type BenchPackInput } from '@/lib/bench-pack/bench-pack-build';
import { renderBenchPackPdf } from '@/lib/bench-pack/bench-pack-pdf';
import { saveBenchSettings } from '@/lib/bench-pack/bench-settings-actions';
import { groupLabel } from '@/lib/engine/bench/coil-groups';
import { connectionPlan, type ConnectionPlan } from '@/lib/engine/bench/connection-plan';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { windingLayout, type WindingSpec } from '@/lib/engine/winding-layout';
import { approveRedesignRevision, chooseCandidate, submitRedesignRequest } from '@/lib/redesign/redesign-actions';
import { loadRedesignContext, runSearch } from '@/lib/redesign/redesign-context';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { limitsToForm, storedRequestSchema } from '@/lib/redesign/redesign-schema';
import { GET } from '@/app/jobs/[number]/redesign/bench-pack/pdf/route';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ADMIN, ENGINEER, WINDER } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';

useTestDatabase();

/** Demo job 1016: 400 V 50 Hz, 4 poles, star, with an invented as-found sheet. */
const JOB_NUMBER = 1016;
const SHOP = { name: 'Test shop', address: null, phone: null };

const PHASES = ['A', 'B', 'C'] as const;
const mark = (e: 'start' | 'finish') => (e === 'start' ? 'S' : 'F');

/** The plan the engine makes for a winding: what the PDF must show. */
function planOf(w: WindingSpec): ConnectionPlan {
  const t = windingLayout(w);
  if (!t.ok) throw new Error(t.error.message);
  const p = connectionPlan(t.value, w.parallelPaths, w.connection);
  if (!p.ok) throw new Error(p.error.message);
  return p.value;
}

/** Checks the group table's order and every circuit's path against the engine's plan. */
function expectPlanInText(text: string, plan: ConnectionPlan): void {
  let at = text.indexOf('Coil groups round the stator');
  expect(at).toBeGreaterThan(-1);
  for (const g of plan.groups.groups) {
    const c = g.coils[0];
    const row = `${g.number} ${groupLabel(g)} ${g.pole} ${g.coils.length} ${c?.startSlot}→${c?.finishSlot}`;
    const next = text.indexOf(row, at);
    expect(next, row).toBeGreaterThan(at);
    at = next;
  }
  for (const ph of PHASES)
    for (const circuit of plan.circuits[ph]) {
      const path = circuit.steps.map((s) => `${mark(s.enter)}·${groupLabel(s.group)}·${mark(s.leave)}`).join(' → ');
      expect(text).toContain(`Circuit ${ph}-${circuit.index} (${circuit.turns} turns):`);
      expect(text).toContain(path);
    }
}

const core = { boreMm: 150, coreLengthMm: 120, slotDepthMm: 20, slots: 36 };
function input(winding: WindingSpec, over: Partial<BenchPackInput> = {}): BenchPackInput {
  return {
    job: { number: 9001, customer: 'Test customer', motor: 'Test motor' },
    basis: {
      kind: 'redesign',
      revision: 1,
      approvedBy: 'Test Engineer',
      approvedAt: new Date('2026-11-30T10:00:00Z'),
      note: 'Checked.',
      current: true,
      currentRevision: 1,
    },
    supply: { lineVoltageV: 400, frequencyHz: 50 },
    winding,
    core: { ...core, slots: winding.slots },
    wires: [{ label: '0.850 mm', enamelGrade: 2, count: 2, areaMm2: 0.56745, onHandKg: 1 }],
    insulation: [{ label: 'Thermal class', value: 'F (155 °C)' }],
    cautions: [],
    wireAllowance: 0.1,
    marking: 'iec',
    leads: 6,
    ...over,
  };
}

describe('the bench pack PDF shows the engine’s groups and connections', () => {
  // Lap and concentric, 1, 2 and 4 circuits, star and delta, both lead conventions; the expected
  // sequence is the engine's own plan (connection-plan.ts, checked in tests/unit/engine/bench).
  it.each([
    [
      'lap 36/4 1–8, 2 circuits, delta, NEMA 12 leads',
      { slots: 36, poles: 4, layers: 2, style: 'lap', spans: [7], turnsPerCoil: [28], parallelPaths: 2, connection: 'delta' },
      'nema',
      12,
    ],
    [
      'concentric single-layer 36/4, 1 circuit, star, IEC 6 leads',
      {
        slots: 36,
        poles: 4,
        layers: 1,
        style: 'concentric',
        singleLayerCoiling: 'half',
        spans: [11, 9, 7],
        turnsPerCoil: [20, 20, 20],
        parallelPaths: 1,
        connection: 'star',
      },
      'iec',
      6,
    ],
    [
      'lap 48/4 1–11, 4 circuits, star, IEC 3 leads',
      { slots: 48, poles: 4, layers: 2, style: 'lap', spans: [10], turnsPerCoil: [40], parallelPaths: 4, connection: 'star' },
      'iec',
      3,
    ],
  ] as [string, WindingSpec, 'iec' | 'nema', 3 | 6 | 12][])('%s', async (_name, winding, marking, leads) => {
    const built = buildBenchPack(input(winding, { marking, leads }));
    if (!built.ok) throw new Error(built.reason);
    const text = pdfText(await renderBenchPackPdf(built.value, SHOP, 'a4'));
    expectPlanInText(text, planOf(winding));
    expect(text).toContain(marking === 'iec' ? 'IEC 60034-8 terminal markings' : 'NEMA MG 1 Part 2 lead numbering');
    if (winding.connection === 'delta' && marking === 'nema') expect(text).toContain('L1: T1 + T7 + T6 + T12');
    if (leads === 3) expect(text).toContain('Star point (inside the motor): phase A finish + phase B finish + phase C finish');
    if (winding.layers === 1) expect(text).toContain('Consecutive-pole connection');
    else expect(text).toContain('Alternate-pole connection');
    expect(text).toContain('for leads, jumpers and waste (shop practice)');
    expect(text).toContain('Check against an old coil before winding the set.');
  });
});

describe('the bench pack of an approved redesign, through the route', () => {
  let jobId = '';
  beforeEach(() => signOutTest());
  beforeAll(async () => {
    jobId = (await db().job.findUniqueOrThrow({ where: { number: JOB_NUMBER }, select: { id: true } })).id;
    await actAs(ENGINEER.email);
    const r = await submitRedesignRequest({
      jobId,
      target: { lineVoltageV: '460', frequencyHz: '60', poles: '4', connection: 'star', spans: '', layers: 'keep', parallelPaths: '' },
      limits: limitsToForm(DEFAULT_REDESIGN_LIMITS),
    });
    if (!r.ok) throw new Error(r.message);
    const row = await db().redesign.findUniqueOrThrow({ where: { id: r.data.id } });
    const ctx = await loadRedesignContext(jobId);
    if (!ctx.ok) throw new Error(ctx.reason);
    const found = await runSearch(ctx.value, storedRequestSchema.parse(row.request));
    const key = found.ok ? found.value.candidates[0]?.key : undefined;
    if (!key) throw new Error('no candidate');
    const chosen = await chooseCandidate({ redesignId: r.data.id, version: r.data.version, key });
    if (!chosen.ok) throw new Error(chosen.message);
    const approved = await approveRedesignRevision({
      redesignId: r.data.id,
      version: chosen.data.version,
      note: 'Checked for the bench pack test.',
    });
    if (!approved.ok) throw new Error(approved.message);
    signOutTest();
  });

  const get = (query = '') =>
    GET(new Request(`http://test/jobs/${JOB_NUMBER}/redesign/bench-pack/pdf${query}`), {
      params: Promise.resolve({ number: String(JOB_NUMBER) }),
    });

  it('refuses a visitor before reading anything', async () => {
    expect((await get()).status).toBe(401);
  });

  it('gives a winder the PDF of the approved revision, with the approval, groups and connections the engine plans', async () => {
    await actAs(WINDER.email);
    const res = await get('?marking=nema&paper=letter');
    expect(res.status).toBe(200);
    expect(res.headers.get('Content-Type')).toBe('application/pdf');
    expect(res.headers.get('Content-Disposition')).toContain('bench-pack-job-1016-rev-1.pdf');
    const text = pdfText(new Uint8Array(await res.arrayBuffer()));
    const approved = await getApprovedRedesign(jobId);
    if (!approved) throw new Error('not approved');
    expect(text).toContain('REDESIGNED WINDING');
    expect(text).toContain(`Approved by ${ENGINEER.name}`);
    expect(text).toContain('Checked for the bench pack test.');
    expect(text).toContain('460 V 60 Hz');
    expectPlanInText(text, planOf(approved.winding));
    expect(text).toContain('NEMA MG 1 Part 2 lead numbering');
    expect(text).toMatch(/On hand/);
  });

  it('answers 404 in words for a revision that is not approved', async () => {
    await actAs(WINDER.email);
    const res = await get('?rev=99');
    expect(res.status).toBe(404);
    expect(await res.text()).toMatch(/not an approved revision/);
  });

  it('makes the pack for a rewind to the original from the as-found sheet, and says a redesign is approved', async () => {
    await actAs(WINDER.email);
    const res = await get('?basis=original');
    expect(res.status).toBe(200);
    const text = pdfText(new Uint8Array(await res.arrayBuffer()));
    expect(text).toContain('Rewind to the original: as-found data sheet, revision');
    expect(text).toContain('Redesign revision 1 is approved for this job');
  });

  it('only an administrator changes the allowance; the pack then states it', async () => {
    await actAs(WINDER.email);
    expect(await saveBenchSettings({ version: 0, wireAllowancePercent: '15', leadConvention: 'iec' })).toMatchObject({
      ok: false,
      code: 'forbidden',
    });
    await actAs(ADMIN.email);
    const version = (await db().shopSettings.findUnique({ where: { id: 'shop' } }))?.version ?? 0;
    expect(await saveBenchSettings({ version, wireAllowancePercent: '150', leadConvention: 'iec' })).toMatchObject({
      ok: false,
      code: 'invalid',
    });
    expect(await saveBenchSettings({ version, wireAllowancePercent: '15', leadConvention: 'iec' })).toMatchObject({ ok: true });
    expect(await saveBenchSettings({ version, wireAllowancePercent: '12', leadConvention: 'iec' })).toMatchObject({
      ok: false,
      code: 'stale',
    });
    await actAs(WINDER.email);
    const text = pdfText(new Uint8Array(await (await get()).arrayBuffer()));
    expect(text).toContain('plus 15 % for leads, jumpers and waste (this shop’s setting)');
    expect(text).toContain('IEC 60034-8 terminal markings');
  });
});
