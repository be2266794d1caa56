/**
 * Saving core-loss tests: one transaction per save (the record and a timeline event). An edit names the
 * version it was made from and is refused when someone saved since; hot spots are checked against the core
 * on the as-found sheet (a slot that does not exist or a position beyond the core is refused by field).
 */
import { db, Prisma } from '@/lib/db/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { recordJobEvent } from '@/lib/jobs/job-writes';
import { isRecordLocked } from '@/lib/jobs/record-locks';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { CORE_TEST_STAGE_LABELS, type CoreTestData, type CoreTestForm } from '@/lib/core-test/core-test-schema';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';

export const CORE_TEST_MESSAGES = {
  closed: (status: string) => `This job is ${status.toLowerCase()}: its core-loss tests are kept as they were and cannot be changed.`,
  unknownTester: 'Pick who tested from the list.',
  noSuchSlot: (slots: number) => `The core has ${slots} slots (as-found sheet): give a slot from 1 to ${slots}.`,
  beyondCore: (lengthMm: number) => `The core is ${lengthMm} mm long (as-found sheet): give a distance from 0 to ${lengthMm} mm.`,
} as const;

export interface SavedCoreTest {
  recordId: string;
  version: number;
}

/** The timeline line: stage, readings and hot spots. */
export function coreTestEventMessage(stage: CoreTestForm['stage'], created: boolean, d: CoreTestData): string {
  const spots = d.hotSpots.length === 0 ? 'no hot spots' : `${d.hotSpots.length} hot spot${d.hotSpots.length > 1 ? 's' : ''}`;
  return `Core-loss test ${CORE_TEST_STAGE_LABELS[stage].toLowerCase()} ${created ? 'recorded' : 'updated'}: ${d.voltageV} V, ${d.currentA} A, ${d.watts} W at ${d.frequencyHz} Hz, ${d.loopTurns} loop turns, ${spots}.`;
}

async function checkHotSpots(jobId: string, d: CoreTestData): Promise<void> {
  const sheet = await getAsFoundSheet(jobId);
  if (!sheet) return;
  const { slots, coreLengthMm } = sheet.sheet.core;
  const errors: Record<string, string[]> = {};
  d.hotSpots.forEach((h, i) => {
    if (h.slot > slots) errors[`data.hotSpots.${i}.slot`] = [CORE_TEST_MESSAGES.noSuchSlot(slots)];
    if (h.axialPositionMm > coreLengthMm) errors[`data.hotSpots.${i}.axialPositionMm`] = [CORE_TEST_MESSAGES.beyondCore(coreLengthMm)];
  });
  if (Object.keys(errors).length > 0) throw new DomainError('invalid', MESSAGES.invalid, errors);
}

export async function saveCoreTest(userId: string, input: CoreTestForm): Promise<SavedCoreTest> {
  await checkHotSpots(input.jobId, input.data);
  const testedAt = new Date(`${input.testedAt.length === 16 ? `${input.testedAt}:00` : input.testedAt}Z`);
  const columns = {
    stage: input.stage,
    data: JSON.parse(JSON.stringify(input.data)) as Prisma.InputJsonObject,
    testedAt,
    testedById: input.testedById,
  };
  return db().$transaction(async (tx) => {
    const job = await tx.job.findUnique({ where: { id: input.jobId }, select: { status: true, heldFrom: true } });
    if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
    if (isRecordLocked('coreTests', job.status, job.heldFrom))
      throw new DomainError('frozen', CORE_TEST_MESSAGES.closed(STATUS_LABELS[job.status]));
    const tester = await tx.user.findUnique({ where: { id: input.testedById }, select: { active: true } });
    if (!tester?.active) throw new DomainError('invalid', MESSAGES.invalid, { testedById: [CORE_TEST_MESSAGES.unknownTester] });

    let saved: SavedCoreTest;
    if (input.recordId) {
      if (input.version === undefined) throw new DomainError('invalid', MESSAGES.invalid, { _form: ['The record version is missing.'] });
      const updated = await tx.coreLossTest.updateMany({
        where: { id: input.recordId, jobId: input.jobId, version: input.version },
        data: { ...columns, version: { increment: 1 } },
      });
      if (updated.count === 0) {
        const exists = await tx.coreLossTest.findFirst({ where: { id: input.recordId, jobId: input.jobId }, select: { id: true } });
        if (!exists) throw new DomainError('not-found', MESSAGES.notFound('core-loss test'));
        throw new DomainError('stale', MESSAGES.stale);
      }
      saved = { recordId: input.recordId, version: input.version + 1 };
    } else {
      const row = await tx.coreLossTest.create({ data: { ...columns, jobId: input.jobId } });
      saved = { recordId: row.id, version: row.version };
    }
    await recordJobEvent(tx, {
      jobId: input.jobId,
      userId,
      kind: 'CORE_TEST',
      message: coreTestEventMessage(input.stage, !input.recordId, input.data),
      data: { recordId: saved.recordId, version: saved.version, stage: input.stage },
    });
    return saved;
  });
}
