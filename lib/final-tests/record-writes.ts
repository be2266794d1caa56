/**
 * Saving final test records. One transaction per save: the record (verdict recomputed here from the
 * validated data, never taken from the browser) and an event on the job's timeline. Edits name the
 * version they were made from; a retest names the sequence it follows, and the (jobId, sequence) unique
 * key refuses two retests racing for the same number.
 */
import { fromZonedLocal } from '@/lib/presentation/format';
import { db, Prisma } from '@/lib/db/client';
import { recordJobEvent } from '@/lib/jobs/job-writes';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { instrumentSerials, type TestRecordForm } from '@/lib/final-tests/test-record-schema';
import { judgeTestRecord, type TestJudgement } from './verdicts';
import { jobAsRepairedRating } from './test-rating-source';
import type { AsRepairedRating } from './test-rating';
import { isRecordLocked } from '@/lib/jobs/record-locks';

export const TEST_MESSAGES = {
  closed: (status: string) => `This job is ${status.toLowerCase()}: its test records are kept as they were and cannot be changed.`,
  notCurrent: 'Only the newest test record can be edited; earlier ones are kept as history. Start a retest instead.',
  unknownTester: 'Pick who tested from the list.',
  ratingMismatch: (field: string, value: string, revision: number) =>
    `The approved redesign, revision ${revision}, rates this motor ${value}: the tests are judged for the rating it leaves with, not ${field}.`,
} as const;

/**
 * Ties the record's basis to the job's as-repaired rating: the source and redesign revision are set here
 * (never taken from the browser), and a basis that contradicts an approved redesign is refused, so the
 * sheet's "judged for the as-repaired rating …" sentence is always true.
 */
function bindRating(input: TestRecordForm, rating: AsRepairedRating): TestRecordForm {
  const b = input.data.basis;
  if (rating.source === 'redesign' && rating.redesignRevision !== undefined) {
    const problems: Record<string, string[]> = {};
    if (rating.ratedVoltageV !== undefined && b.ratedVoltageV !== rating.ratedVoltageV) {
      problems['data.basis.ratedVoltageV'] = [
        TEST_MESSAGES.ratingMismatch(`${b.ratedVoltageV} V`, `${rating.ratedVoltageV} V`, rating.redesignRevision),
      ];
    }
    if (rating.frequencyHz !== undefined && b.frequencyHz !== undefined && b.frequencyHz !== rating.frequencyHz) {
      problems['data.basis.frequencyHz'] = [
        TEST_MESSAGES.ratingMismatch(`${b.frequencyHz} Hz`, `${rating.frequencyHz} Hz`, rating.redesignRevision),
      ];
    }
    if (Object.keys(problems).length) throw new DomainError('invalid', MESSAGES.invalid, problems);
    return {
      ...input,
      data: {
        ...input.data,
        basis: {
          ...b,
          frequencyHz: b.frequencyHz ?? rating.frequencyHz,
          ratingSource: 'redesign',
          redesignRevision: rating.redesignRevision,
        },
      },
    };
  }
  // Without a redesign the plate governs; a basis that differs from it is printed as entered, not as the plate.
  const { redesignRevision: _dropped, ...rest } = b;
  const differs =
    (rating.ratedVoltageV !== undefined && b.ratedVoltageV !== rating.ratedVoltageV) ||
    (rating.frequencyHz !== undefined && b.frequencyHz !== undefined && b.frequencyHz !== rating.frequencyHz);
  return { ...input, data: { ...input.data, basis: { ...rest, ratingSource: differs ? 'entered' : 'nameplate' } } };
}

export interface SavedTestRecord {
  recordId: string;
  sequence: number;
  version: number;
  verdict: TestJudgement['overall'];
}

/** The timeline line: sequence, overall verdict and each section's status. */
export function testEventMessage(sequence: number, created: boolean, j: TestJudgement): string {
  const parts = j.sections.map((s) => `${s.title.split(' and ')[0]} ${s.status}`);
  return `Final tests #${sequence} ${created ? 'recorded' : 'updated'}: ${j.overall} (${parts.join('; ')}).`;
}

const isUniqueViolation = (err: unknown): boolean => err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002';

export async function saveTestRecord(userId: string, raw: TestRecordForm): Promise<SavedTestRecord> {
  const rating = await jobAsRepairedRating(raw.jobId);
  if (!rating) throw new DomainError('not-found', MESSAGES.notFound('job'));
  const input = bindRating(raw, rating);
  const judgement = judgeTestRecord(input.data);
  // Typed as the shop's wall-clock time (shop settings), stored as the instant it names.
  const testedAt = fromZonedLocal(input.testedAt);
  const columns = {
    // JSON has no undefined: a blank reading inside a tuple (e.g. one phase current) is stored as null,
    // which the schema reads back as blank; blank fields of objects are simply left out.
    data: JSON.parse(JSON.stringify(input.data)) as Prisma.InputJsonObject,
    verdict: judgement.overall,
    testedAt,
    testedById: input.testedById,
    instrumentSerials: instrumentSerials(input.data),
  };
  try {
    return await db().$transaction(async (tx) => {
      const job = await tx.job.findUnique({ where: { id: input.jobId }, select: { status: true, heldFrom: true } });
      if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
      if (isRecordLocked('finalTests', job.status, job.heldFrom))
        throw new DomainError('frozen', TEST_MESSAGES.closed(STATUS_LABELS[job.status]));
      const tester = await tx.user.findUnique({ where: { id: input.testedById }, select: { active: true } });
      if (!tester?.active) throw new DomainError('invalid', MESSAGES.invalid, { testedById: [TEST_MESSAGES.unknownTester] });
      const latest = await tx.testRecord.findFirst({
        where: { jobId: input.jobId },
        orderBy: { sequence: 'desc' },
        select: { id: true, sequence: true },
      });

      let saved: SavedTestRecord;
      if (input.recordId) {
        if (input.version === undefined) throw new DomainError('invalid', MESSAGES.invalid, { _form: ['The record version is missing.'] });
        if (!latest || latest.id !== input.recordId) {
          const exists = await tx.testRecord.findFirst({ where: { id: input.recordId, jobId: input.jobId }, select: { id: true } });
          if (!exists) throw new DomainError('not-found', MESSAGES.notFound('test record'));
          throw new DomainError('frozen', TEST_MESSAGES.notCurrent);
        }
        const updated = await tx.testRecord.updateMany({
          where: { id: input.recordId, version: input.version },
          data: { ...columns, version: { increment: 1 } },
        });
        if (updated.count === 0) throw new DomainError('stale', MESSAGES.stale);
        saved = { recordId: input.recordId, sequence: latest.sequence, version: input.version + 1, verdict: judgement.overall };
      } else {
        if ((latest?.sequence ?? 0) !== input.previousSequence) throw new DomainError('stale', MESSAGES.stale);
        const sequence = input.previousSequence + 1;
        const row = await tx.testRecord.create({ data: { ...columns, jobId: input.jobId, sequence } });
        saved = { recordId: row.id, sequence, version: row.version, verdict: judgement.overall };
      }
      await recordJobEvent(tx, {
        jobId: input.jobId,
        userId,
        kind: 'TESTS',
        message: testEventMessage(saved.sequence, !input.recordId, judgement),
        data: { recordId: saved.recordId, sequence: saved.sequence, version: saved.version, verdict: saved.verdict },
      });
      return saved;
    });
  } catch (err) {
    // Two retests raced for the same sequence: the database refused the second.
    if (isUniqueViolation(err)) throw new DomainError('stale', MESSAGES.stale);
    throw err;
  }
}
