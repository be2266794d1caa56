import { beforeEach, describe, expect, it } from 'vitest';
import { db } from '@/lib/db/client';
import { moveStatus, saveJobDetails, submitIntake } from '@/lib/jobs/job-actions';
import { listBoard } from '@/lib/jobs/job-queries';
import { boardQuerySchema, type IntakeInput } from '@/lib/jobs/job-schema';
import { MESSAGES } from '@/lib/errors/domain-errors';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { FRONT_DESK, WINDER } from '../support/demo-users';

useTestDatabase();

function intake(overrides: Partial<IntakeInput['motor']> = {}, company = 'Integration Test Quarry'): IntakeInput {
  return {
    customer: { mode: 'new', company, contactName: 'Test Contact' },
    motor: {
      manufacturer: 'Testwell',
      serial: `IT-${Math.random().toString(36).slice(2, 9)}`,
      ratedVoltageV: 400,
      frequencyHz: 50,
      speedRpm: 1460,
      outputValue: 15,
      outputUnit: 'hp',
      phases: 3,
      ...overrides,
    },
    job: { priority: 'NORMAL', reportedFault: 'Burnt phase' },
  };
}

function form(payload: unknown, files: File[] = []): FormData {
  const fd = new FormData();
  fd.set('payload', JSON.stringify(payload));
  for (const f of files) fd.append('photos', f);
  return fd;
}

const PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);

describe('intake', () => {
  beforeEach(() => signOutTest());

  it('refuses a visitor without a session before looking at the input', async () => {
    const result = await submitIntake(form({ nonsense: true }));
    expect(result).toMatchObject({ ok: false, code: 'unauthenticated' });
  });

  it('refuses a winder, since intake is the front desk’s', async () => {
    await actAs(WINDER.email);
    const result = await submitIntake(form(intake()));
    expect(result).toMatchObject({ ok: false, code: 'forbidden' });
  });

  it('logs a customer, motor and job, stores output in kW and keeps the photo', async () => {
    await actAs(FRONT_DESK.email);
    const result = await submitIntake(form(intake(), [new File([PNG], 'plate.png', { type: 'image/png' })]));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const job = await db().job.findUniqueOrThrow({
      where: { number: result.data.number },
      include: { motor: true, attachments: true, events: true },
    });
    expect(job.motor.outputKw).toBeCloseTo(15 * 0.7457, 6);
    expect(job.attachments).toHaveLength(1);
    expect(job.events.map((e) => e.kind).sort()).toEqual(['CREATED', 'PHOTO']);
  });

  it('returns field errors by path and writes nothing for bad input', async () => {
    await actAs(FRONT_DESK.email);
    const before = await db().job.count();
    const bad = intake({ speedRpm: -5, frequencyHz: '' as unknown as number });
    const result = await submitIntake(form(bad));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.code).toBe('invalid');
    expect(Object.keys(result.fieldErrors ?? {})).toEqual(expect.arrayContaining(['motor.speedRpm', 'motor.frequencyHz']));
    expect(await db().job.count()).toBe(before);
  });

  it('rejects a file that is not an image and saves nothing', async () => {
    await actAs(FRONT_DESK.email);
    const before = await db().job.count();
    const result = await submitIntake(form(intake(), [new File([new TextEncoder().encode('#!/bin/sh')], 'plate.png')]));
    expect(result).toMatchObject({ ok: false, code: 'invalid' });
    expect(await db().job.count()).toBe(before);
  });

  it('allocates job numbers without gaps or duplicates when intakes race', async () => {
    await actAs(FRONT_DESK.email);
    const results = await Promise.all(Array.from({ length: 8 }, (_, i) => submitIntake(form(intake({}, `Race Co ${i}`)))));
    const numbers = results.map((r) => (r.ok ? r.data.number : -1)).sort((a, b) => a - b);
    expect(numbers).not.toContain(-1);
    expect(new Set(numbers).size).toBe(8);
    expect(numbers[7]! - numbers[0]!).toBe(7);
    const all = (await db().job.findMany({ select: { number: true }, orderBy: { number: 'asc' } })).map((j) => j.number);
    all.forEach((n, i) => expect(n).toBe(all[0]! + i));
  });
});

describe('editing and moving a job', () => {
  it('refuses a stale edit with the stale message and keeps the newer save', async () => {
    await actAs(FRONT_DESK.email);
    const job = await db().job.findFirstOrThrow({ where: { status: 'RECEIVED' } });
    const base = { jobId: job.id, version: job.version, priority: 'NORMAL', reportedFault: job.reportedFault ?? 'x' };
    const first = await saveJobDetails({ ...base, notes: 'first writer' });
    expect(first.ok).toBe(true);
    const second = await saveJobDetails({ ...base, notes: 'second writer, stale' });
    expect(second).toMatchObject({ ok: false, code: 'stale', message: MESSAGES.stale });
    expect((await db().job.findUniqueOrThrow({ where: { id: job.id } })).notes).toBe('first writer');
  });

  it('accepts only the moves the shop path allows, and records them on the timeline', async () => {
    await actAs(FRONT_DESK.email);
    const job = await db().job.findFirstOrThrow({ where: { status: 'RECEIVED' } });
    const skip = await moveStatus({ jobId: job.id, version: job.version, to: 'SHIPPED' });
    expect(skip).toMatchObject({ ok: false, code: 'invalid' });
    const ok = await moveStatus({ jobId: job.id, version: job.version, to: 'INSPECTION', note: 'stripped' });
    expect(ok.ok).toBe(true);
    const events = await db().jobEvent.findMany({ where: { jobId: job.id, kind: 'STATUS' } });
    expect(events.at(-1)).toMatchObject({ fromStatus: 'RECEIVED', toStatus: 'INSPECTION' });
  });

  it('lets a winder hold and resume a job but not ship it', async () => {
    await actAs(WINDER.email);
    const job = await db().job.findFirstOrThrow({ where: { status: 'READY' } });
    const ship = await moveStatus({ jobId: job.id, version: job.version, to: 'SHIPPED' });
    expect(ship).toMatchObject({ ok: false, code: 'invalid' });
    const hold = await moveStatus({ jobId: job.id, version: job.version, to: 'ON_HOLD' });
    expect(hold.ok).toBe(true);
    const resume = await moveStatus({ jobId: job.id, version: job.version + 1, to: 'READY' });
    expect(resume.ok).toBe(true);
  });
});

describe('job board', () => {
  it('finds a job by number, customer, serial and model', async () => {
    const job = await db().job.findFirstOrThrow({ include: { motor: true, customer: true }, where: { status: 'WINDING' } });
    for (const q of [String(job.number), job.customer.company.slice(0, 6).toUpperCase(), job.motor.serial!, job.motor.model!]) {
      const board = await listBoard(boardQuerySchema.parse({ q, status: 'WINDING' }));
      expect(board.rows.map((r) => r.number)).toContain(job.number);
    }
  });

  it('marks overdue open jobs and filters to them', async () => {
    const board = await listBoard(boardQuerySchema.parse({ due: 'overdue' }));
    expect(board.count).toBeGreaterThan(0);
    expect(board.rows.every((r) => r.overdue)).toBe(true);
  });
});
