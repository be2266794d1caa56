/**
 * Reads of a job's final test records, newest first. Stored data is parsed with the same schema it was
 * saved with, so screens and the job sheet always get checked values.
 */
import { db } from '@/lib/db/client';
import { testDataSchema, type TestDataValues } from '@/lib/final-tests/test-record-schema';

export interface StoredTestRecord {
  id: string;
  jobId: string;
  sequence: number;
  version: number;
  verdict: 'PASS' | 'FAIL' | 'INCOMPLETE';
  testedAt: Date;
  testedBy: { id: string; name: string } | null;
  instrumentSerials: string[];
  updatedAt: Date;
  data: TestDataValues;
}

/** What the final-tests screen needs of a job: status, customer, nameplate. */
export async function getJobForFinalTests(number: number) {
  return db().job.findUnique({
    where: { number },
    select: { id: true, number: true, status: true, heldFrom: true, customer: { select: { company: true } }, motor: true },
  });
}

/** Every test record of a job, newest (the current one) first. */
export async function listTestRecords(jobId: string): Promise<StoredTestRecord[]> {
  const rows = await db().testRecord.findMany({
    where: { jobId },
    orderBy: { sequence: 'desc' },
    include: { testedBy: { select: { id: true, name: true } } },
  });
  return rows.map((row) => {
    const parsed = testDataSchema.safeParse(row.data);
    // Records were validated on save; a failure means the schema changed without a data migration.
    if (!parsed.success) throw new Error(`Stored test record ${row.id} no longer matches the test schema: ${parsed.error.message}`);
    return {
      id: row.id,
      jobId: row.jobId,
      sequence: row.sequence,
      version: row.version,
      verdict: row.verdict,
      testedAt: row.testedAt,
      testedBy: row.testedBy,
      instrumentSerials: row.instrumentSerials,
      updatedAt: row.updatedAt,
      data: parsed.data,
    };
  });
}
