import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { MESSAGES } from '@/lib/errors/domain-errors';
import { saveCoreLossSettingsAction, saveCoreTestAction } from '@/lib/core-test/core-test-actions';
import { getCoreLossSettings } from '@/lib/core-test/core-loss-settings';
import { CORE_SETTINGS_STALE } from '@/lib/core-test/core-loss-settings-writes';
import { listCoreTests } from '@/lib/core-test/core-test-queries';
import { CORE_TEST_MESSAGES } from '@/lib/core-test/core-test-writes';
import { lossStatementForJob } from '@/lib/losses/loss-statement-source';
import { type CoreTestFormInput } from '@/lib/core-test/core-test-schema';
import { NUL_MESSAGE } from '@/lib/validation/safe-text';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ADMIN, ENGINEER, FRONT_DESK, WINDER } from '../support/demo-users';

useTestDatabase();

let jobId = '';
let winderId = '';
let slots = 0;
let hz = 50;

beforeAll(async () => {
  const job = await db().job.findFirstOrThrow({
    where: { status: { in: ['WINDING', 'TESTING'] }, windingSheet: { isNot: null } },
    orderBy: { number: 'asc' },
    include: { windingSheet: true },
  });
  jobId = job.id;
  const sheet = job.windingSheet!.data as { core: { slots: number }; supply: { frequencyHz: number } };
  slots = sheet.core.slots;
  hz = sheet.supply.frequencyHz;
  winderId = (await db().user.findUniqueOrThrow({ where: { email: WINDER.email } })).id;
});

function form(over: Partial<CoreTestFormInput> = {}, data: Partial<CoreTestFormInput['data']> = {}): CoreTestFormInput {
  return {
    jobId,
    stage: 'BEFORE_STRIPPING',
    testedAt: '2026-11-30T08:00',
    testedById: winderId,
    data: {
      loopTurns: 40,
      voltageV: 230,
      currentA: 12,
      watts: 180,
      frequencyHz: hz,
      durationMin: 30,
      ambientC: 21,
      coreStartC: 21,
      coreEndC: 34,
      hotSpots: [],
      instrument: 'PA-12',
      notes: '',
      ...data,
    },
    ...over,
  };
}

describe('recording core-loss tests', () => {
  beforeEach(() => signOutTest());

  it('refuses a visitor without a session and the front desk, writing nothing', async () => {
    expect(await saveCoreTestAction(form())).toMatchObject({ ok: false, code: 'unauthenticated' });
    await actAs(FRONT_DESK.email);
    expect(await saveCoreTestAction(form())).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await db().coreLossTest.count({ where: { jobId } })).toBe(0);
  });

  it('saves a winder’s test before stripping with a timeline event', async () => {
    await actAs(WINDER.email);
    const r = await saveCoreTestAction(form());
    expect(r).toMatchObject({ ok: true, data: { version: 1 } });
    const [t] = await listCoreTests(jobId);
    expect(t).toMatchObject({
      stage: 'BEFORE_STRIPPING',
      version: 1,
      testedBy: { name: WINDER.name },
      data: { watts: 180, loopTurns: 40, instrument: 'PA-12' },
    });
    const event = await db().jobEvent.findFirstOrThrow({ where: { jobId, kind: 'CORE_TEST' }, orderBy: { at: 'desc' } });
    expect(event.message).toBe(`Core-loss test before stripping recorded: 230 V, 12 A, 180 W at ${hz} Hz, 40 loop turns, no hot spots.`);
  });

  it('edits under the version, then refuses the stale edit and keeps the newer save', async () => {
    await actAs(ENGINEER.email);
    const [t] = await listCoreTests(jobId);
    expect(await saveCoreTestAction(form({ recordId: t!.id, version: t!.version }, { watts: 185 }))).toMatchObject({
      ok: true,
      data: { version: 2 },
    });
    const stale = await saveCoreTestAction(form({ recordId: t!.id, version: 1 }, { watts: 999 }));
    expect(stale).toMatchObject({ ok: false, code: 'stale', message: MESSAGES.stale });
    expect((await listCoreTests(jobId))[0]!.data.watts).toBe(185);
  });

  it('refuses bad input by field: a slot the core does not have, NUL in text, negative watts, too many hot spots', async () => {
    await actAs(WINDER.email);
    const noSlot = await saveCoreTestAction(
      form({ stage: 'AFTER_STRIPPING' }, { hotSpots: [{ slot: slots + 1, axialPositionMm: 10, riseK: 12 }] }),
    );
    expect(noSlot).toMatchObject({
      ok: false,
      code: 'invalid',
      fieldErrors: { 'data.hotSpots.0.slot': [CORE_TEST_MESSAGES.noSuchSlot(slots)] },
    });
    const nul = await saveCoreTestAction(form({}, { notes: 'burnt\u0000' }));
    expect(nul).toMatchObject({ ok: false, code: 'invalid', fieldErrors: { 'data.notes': [NUL_MESSAGE] } });
    expect(await saveCoreTestAction(form({}, { watts: -5 }))).toMatchObject({ ok: false, code: 'invalid' });
    const many = Array.from({ length: 51 }, () => ({ slot: 1, axialPositionMm: 0, riseK: 1 }));
    expect(await saveCoreTestAction(form({}, { hotSpots: many }))).toMatchObject({ ok: false, code: 'invalid' });
    expect(await saveCoreTestAction({ ...form(), stage: 'DURING_LUNCH' })).toMatchObject({ ok: false, code: 'invalid' });
    expect(await db().coreLossTest.count({ where: { jobId } })).toBe(1);
  });

  it('records the test after stripping with a hot spot, and the losses statement takes the core-loss change', async () => {
    await actAs(WINDER.email);
    const r = await saveCoreTestAction(
      form(
        { stage: 'AFTER_STRIPPING', testedAt: '2026-11-30T14:00' },
        { watts: 200, hotSpots: [{ slot: 3, axialPositionMm: 20, riseK: 6 }] },
      ),
    );
    expect(r.ok).toBe(true);
    const tests = await listCoreTests(jobId);
    expect(tests.map((t) => t.stage)).toEqual(['AFTER_STRIPPING', 'BEFORE_STRIPPING']);
    const s = await lossStatementForJob(jobId);
    expect(s.statement?.statement).toContain('Rewinding to the original data (predicted) leaves the stator copper loss unchanged');
    expect(s.statement?.rows.find((x) => x.label === 'Core loss change')?.value).toMatch(
      /^\+\d+\.\d\d W: Core-loss change from the loop tests/,
    );
  });
});

describe('core-loss settings', () => {
  beforeEach(() => signOutTest());
  const settings = {
    version: 0,
    testFluxDensityT: 1.4,
    fieldStrengthAPerM: 350,
    coreLossRiseLimitPercent: 15,
    hotSpotRiseLimitK: 8,
    copperLossRiseLimitPercent: 3,
  };

  it('only an administrator changes them; a stale save is refused', async () => {
    await actAs(WINDER.email);
    expect(await saveCoreLossSettingsAction(settings)).toMatchObject({ ok: false, code: 'forbidden' });
    await actAs(ADMIN.email);
    expect(await saveCoreLossSettingsAction(settings)).toMatchObject({ ok: true, data: { version: 1 } });
    expect(await getCoreLossSettings()).toMatchObject({
      testFluxDensityT: 1.4,
      coreLossRiseLimit: 0.15,
      copperLossRiseLimit: 0.03,
      version: 1,
    });
    expect(await saveCoreLossSettingsAction({ ...settings, testFluxDensityT: 1.2 })).toMatchObject({
      ok: false,
      code: 'stale',
      message: CORE_SETTINGS_STALE,
    });
    expect(await saveCoreLossSettingsAction({ ...settings, testFluxDensityT: 5, version: 1 })).toMatchObject({
      ok: false,
      code: 'invalid',
    });
    expect((await getCoreLossSettings()).testFluxDensityT).toBe(1.4);
  });
});
