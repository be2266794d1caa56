import { beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import type { JobStatus } from '@/lib/db/generated/enums';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { MAX_DRAFT_BYTES } from '@/lib/as-found/draft-schema';
import {
  chooseLengthUnit,
  discardSheetDraft,
  saveAsFoundSheet,
  saveSheetDraft,
  copyLibrarySheetToJob,
} from '@/lib/as-found/as-found-actions';
import { getAsFoundSheet, getLengthUnit, getSheetDraft, getSheetRevision, listSheetRevisions } from '@/lib/as-found/as-found-queries';
import { searchLibrary } from '@/lib/library/library-queries';
import { SHEET_MESSAGES } from '@/lib/as-found/as-found-messages';
import { emptySheetForm, sheetToForm } from '@/lib/as-found/as-found-form';
import { useTestDatabase } from '../support/test-db';
import { buildJob } from '../support/builders';
import { actAs, signOutTest } from '../support/session';
import { ENGINEER, FRONT_DESK, WINDER } from '../support/demo-users';
import { EXAMPLE_A_SHEET } from '../support/fixtures/winding-fixtures';

useTestDatabase();

/** A fresh job in `status`, without a sheet. */
const jobWithoutSheet = (status: JobStatus = 'INSPECTION') => buildJob({ status });

const draftOf = (boreMm: string) => {
  const values = emptySheetForm();
  values.core.boreMm = boreMm;
  return { unit: 'mm' as const, values };
};

describe('saving the as-found sheet', () => {
  beforeEach(() => signOutTest());

  it('records a first sheet with its searchable copies, a revision row and a job event', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    const r = await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
    expect(r).toMatchObject({ ok: true, data: { revision: 1 }, message: SHEET_MESSAGES.saved(1) });
    const row = await db().windingSheet.findUniqueOrThrow({ where: { jobId: job.id }, include: { job: { include: { motor: true } } } });
    expect(row).toMatchObject({
      slots: 36,
      poles: 4,
      boreMm: 150,
      coreLengthMm: 120,
      lineVoltageV: 400,
      frequencyHz: 50,
      manufacturer: row.job.motor.manufacturer,
    });
    expect((await getAsFoundSheet(job.id))?.sheet).toEqual(EXAMPLE_A_SHEET);
    expect(await listSheetRevisions(row.id)).toHaveLength(1);
    const events = await db().jobEvent.findMany({ where: { jobId: job.id, kind: 'SHEET' } });
    expect(events.map((e) => e.message)).toEqual([expect.stringContaining('recorded (revision 1): 36 slots, 4 poles')]);
  });

  it('revises with the current revision, keeps the history and names what changed', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
    const changed: WindingSheet = { ...EXAMPLE_A_SHEET, notes: 'Leads re-marked.' };
    const r = await saveAsFoundSheet({ jobId: job.id, baseRevision: 1, sheet: changed });
    expect(r).toMatchObject({ ok: true, data: { revision: 2 } });
    const stored = await getAsFoundSheet(job.id);
    expect(stored).toMatchObject({ revision: 2, sheet: { notes: 'Leads re-marked.' } });
    const history = await listSheetRevisions(stored!.id);
    expect(history.map((x) => x.revision)).toEqual([2, 1]);
    expect(history.every((x) => x.savedBy === WINDER.name)).toBe(true);
    // The earlier revision is kept whole: revision 1 has no notes, revision 2 has them.
    expect((await getSheetRevision(job.id, 1))?.notes).toBeUndefined();
    expect((await getSheetRevision(job.id, 2))?.notes).toBe('Leads re-marked.');
    expect(await getSheetRevision(job.id, 3)).toBeNull();
    const last = await db().jobEvent.findFirstOrThrow({ where: { jobId: job.id, kind: 'SHEET' }, orderBy: { at: 'desc' } });
    expect(last.message).toBe('As-found data sheet revised (revision 2): notes changed.');
  });

  it('refuses a stale save clearly and keeps the newer sheet', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
    await saveAsFoundSheet({ jobId: job.id, baseRevision: 1, sheet: { ...EXAMPLE_A_SHEET, notes: 'first' } });
    const stale = await saveAsFoundSheet({ jobId: job.id, baseRevision: 1, sheet: { ...EXAMPLE_A_SHEET, notes: 'second, stale' } });
    expect(stale).toMatchObject({ ok: false, code: 'stale', message: SHEET_MESSAGES.stale(2) });
    const twoFirsts = await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
    expect(twoFirsts).toMatchObject({ ok: false, code: 'stale', message: SHEET_MESSAGES.staleCreated });
    expect((await getAsFoundSheet(job.id))?.sheet.notes).toBe('first');
  });

  it('lets only one of two racing first saves in', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    const results = await Promise.all(
      [1, 2].map((i) => saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: { ...EXAMPLE_A_SHEET, notes: `racer ${i}` } })),
    );
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.find((r) => !r.ok)).toMatchObject({ code: 'stale' });
  });

  it('refuses the front desk before reading the input, and saves nothing', async () => {
    await actAs(FRONT_DESK.email);
    const job = await jobWithoutSheet();
    expect(await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET })).toMatchObject({
      ok: false,
      code: 'forbidden',
    });
    expect(await saveSheetDraft({ jobId: job.id, draft: draftOf('1') })).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await saveAsFoundSheet({ nonsense: true })).toMatchObject({ ok: false, code: 'forbidden' });
    expect(await db().windingSheet.count({ where: { jobId: job.id } })).toBe(0);
  });

  it('refuses a visitor without a session', async () => {
    expect(await saveAsFoundSheet({})).toMatchObject({ ok: false, code: 'unauthenticated' });
  });

  it.each(['TESTING', 'READY', 'SHIPPED', 'RETURNED_UNREPAIRED'] as const)(
    'refuses saves once the job is %s (past winding)',
    async (status) => {
      await actAs(ENGINEER.email);
      const job = await jobWithoutSheet(status);
      const r = await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
      expect(r).toMatchObject({ ok: false, code: 'frozen' });
      expect(r.ok ? '' : r.message).toContain('can no longer be changed');
      expect(await saveSheetDraft({ jobId: job.id, draft: draftOf('1') })).toMatchObject({ ok: false, code: 'frozen' });
    },
  );

  it('judges a job on hold by the status it was held from', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    await db().job.update({ where: { id: job.id }, data: { status: 'ON_HOLD', heldFrom: 'READY' } });
    expect(await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET })).toMatchObject({
      ok: false,
      code: 'frozen',
    });
    await db().job.update({ where: { id: job.id }, data: { heldFrom: 'WINDING' } });
    expect(await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET })).toMatchObject({ ok: true });
  });

  it('returns every schema problem by path and writes nothing', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    const bad = {
      ...EXAMPLE_A_SHEET,
      core: { ...EXAMPLE_A_SHEET.core, boreMm: -1 },
      wires: [{ standard: 'awg', size: '99', count: 1, enamelGrade: 2 }],
    };
    const r = await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: bad });
    expect(r).toMatchObject({ ok: false, code: 'invalid' });
    expect(Object.keys(r.ok ? {} : (r.fieldErrors ?? {}))).toEqual(expect.arrayContaining(['sheet.core.boreMm', 'sheet.wires.0.size']));
    expect(await db().windingSheet.count({ where: { jobId: job.id } })).toBe(0);
  });
});

describe('drafts and preferences', () => {
  beforeEach(() => signOutTest());

  it('keeps one draft per job and user, replaces it as the winder types, and clears it on save', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    const user = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    expect(await saveSheetDraft({ jobId: job.id, draft: draftOf('15') })).toMatchObject({ ok: true });
    expect(await saveSheetDraft({ jobId: job.id, draft: draftOf('150.') })).toMatchObject({ ok: true });
    const draft = await getSheetDraft(job.id, user.id);
    expect(draft?.data).toMatchObject({ unit: 'mm', values: { core: { boreMm: '150.' } } });
    await saveAsFoundSheet({ jobId: job.id, baseRevision: null, sheet: EXAMPLE_A_SHEET });
    expect(await getSheetDraft(job.id, user.id)).toBeNull();
  });

  it('discards a draft on request', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    const user = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    await saveSheetDraft({ jobId: job.id, draft: draftOf('99') });
    expect(await discardSheetDraft({ jobId: job.id })).toMatchObject({ ok: true });
    expect(await getSheetDraft(job.id, user.id)).toBeNull();
  });

  it('refuses a draft that is not shaped like the form or is too large', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    expect(await saveSheetDraft({ jobId: job.id, draft: { unit: 'mm', values: 'x' } })).toMatchObject({ ok: false, code: 'invalid' });
    const slotTable = Array.from({ length: 2400 }, (_, i) => ({
      slot: (i % 600) + 1,
      layer: 1,
      phase: 'A',
      polarity: 1,
      turns: 10_000,
      coil: i + 1,
    }));
    const huge = draftOf('1');
    for (const k of Object.keys(huge.values.core) as (keyof typeof huge.values.core)[]) huge.values.core[k] = 'x'.repeat(5000);
    huge.values.notes = 'x'.repeat(5000);
    huge.values.winding.jumperNotes = 'y'.repeat(5000);
    huge.values.winding.leadMarkings = 'y'.repeat(5000);
    huge.values.insulation.varnish = 'z'.repeat(5000);
    expect(JSON.stringify({ ...huge, slotTable }).length).toBeGreaterThan(MAX_DRAFT_BYTES);
    expect(await saveSheetDraft({ jobId: job.id, draft: { ...huge, slotTable } })).toMatchObject({ ok: false, code: 'invalid' });
    expect(await saveSheetDraft({ jobId: job.id, draft: { ...huge, slotTable: slotTable.slice(0, 1000) } })).toMatchObject({ ok: true });
  });

  it('remembers the length unit per user', async () => {
    await actAs(WINDER.email);
    const user = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    expect(await getLengthUnit(user.id)).toBe('mm');
    expect(await chooseLengthUnit({ unit: 'in' })).toMatchObject({ ok: true });
    expect(await getLengthUnit(user.id)).toBe('in');
    expect(await chooseLengthUnit({ unit: 'furlong' })).toMatchObject({ ok: false, code: 'invalid' });
  });
});

describe('the winding library', () => {
  beforeEach(() => signOutTest());

  it('finds sheets by slots, poles and bore within tolerance, closest first', async () => {
    await actAs(WINDER.email);
    const job = await jobWithoutSheet();
    await saveAsFoundSheet({
      jobId: job.id,
      baseRevision: null,
      sheet: { ...EXAMPLE_A_SHEET, core: { ...EXAMPLE_A_SHEET.core, boreMm: 150.4 } },
    });
    const hit = await searchLibrary({ slots: 36, poles: 4, boreMm: { min: 149.5, max: 150.5 }, target: { boreMm: 150 } });
    expect(hit.rows.map((r) => r.jobNumber)).toContain(job.number);
    expect(hit.rows.every((r) => r.slots === 36 && r.poles === 4 && r.boreMm >= 149.5 && r.boreMm <= 150.5)).toBe(true);
    const miss = await searchLibrary({ slots: 36, poles: 4, boreMm: { min: 150.5, max: 151 } });
    expect(miss.rows.map((r) => r.jobNumber)).not.toContain(job.number);
  });

  it('finds by manufacturer or model text in any case, and by output and voltage ranges', async () => {
    const any = await db().windingSheet.findFirstOrThrow({ where: { manufacturer: { not: null } } });
    const byText = await searchLibrary({ text: any.manufacturer!.toUpperCase().slice(0, 5) });
    expect(byText.rows.map((r) => r.id)).toContain(any.id);
    const byRating = await searchLibrary({
      outputKw: { min: any.outputKw! * 0.99, max: any.outputKw! * 1.01 },
      lineVoltageV: { min: any.lineVoltageV, max: any.lineVoltageV },
    });
    expect(byRating.rows.map((r) => r.id)).toContain(any.id);
  });

  it('copies a match into a job’s draft with that job’s own nameplate supply', async () => {
    await actAs(WINDER.email);
    const user = await db().user.findUniqueOrThrow({ where: { email: WINDER.email } });
    const source = await db().windingSheet.findFirstOrThrow({ include: { job: true } });
    const target = await jobWithoutSheet();
    const r = await copyLibrarySheetToJob({ jobNumber: target.number, sheetId: source.id });
    expect(r).toMatchObject({ ok: true, data: { jobNumber: target.number } });
    const draft = (await getSheetDraft(target.id, user.id))?.data as { values: ReturnType<typeof sheetToForm> };
    expect(draft.values.core.slots).toBe(String(source.slots));
    const motor = await db().motor.findUniqueOrThrow({ where: { id: target.motorId } });
    expect(draft.values.supply.lineVoltageV).toBe(motor.ratedVoltageV === null ? '' : String(motor.ratedVoltageV));
    expect(draft.values.resistance.readings).toEqual(['', '', '']);
    await actAs(FRONT_DESK.email);
    expect(await copyLibrarySheetToJob({ jobNumber: target.number, sheetId: source.id })).toMatchObject({ ok: false, code: 'forbidden' });
  });
});
