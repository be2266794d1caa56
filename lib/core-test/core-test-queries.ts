/**
 * Reads of a job's core-loss tests, newest first; stored data is parsed with the schema it was saved with.
 */
import { db } from '@/lib/db/client';
import { coreTestDataSchema, type CoreTestData, type CoreTestStageValue } from '@/lib/core-test/core-test-schema';

/** What the core-test screen needs of a job: status and customer. */
export async function getJobForCoreTest(number: number) {
  return db().job.findUnique({
    where: { number },
    select: { id: true, number: true, status: true, heldFrom: true, customer: { select: { company: true } } },
  });
}

export interface StoredCoreTest {
  id: string;
  jobId: string;
  stage: CoreTestStageValue;
  version: number;
  testedAt: Date;
  testedBy: { id: string; name: string } | null;
  updatedAt: Date;
  data: CoreTestData;
}

export async function listCoreTests(jobId: string): Promise<StoredCoreTest[]> {
  const rows = await db().coreLossTest.findMany({
    where: { jobId },
    orderBy: [{ testedAt: 'desc' }, { createdAt: 'desc' }],
    include: { testedBy: { select: { id: true, name: true } } },
  });
  return rows.map((row) => {
    const parsed = coreTestDataSchema.safeParse(row.data);
    // Saved data was validated; a failure means the schema changed without a data migration.
    if (!parsed.success) throw new Error(`Stored core-loss test ${row.id} no longer matches the schema: ${parsed.error.message}`);
    return {
      id: row.id,
      jobId: row.jobId,
      stage: row.stage,
      version: row.version,
      testedAt: row.testedAt,
      testedBy: row.testedBy,
      updatedAt: row.updatedAt,
      data: parsed.data,
    };
  });
}

/** The newest test of each stage (the ones judged). */
export function latestByStage(tests: readonly StoredCoreTest[]): Partial<Record<CoreTestStageValue, StoredCoreTest>> {
  const out: Partial<Record<CoreTestStageValue, StoredCoreTest>> = {};
  for (const t of tests) if (!out[t.stage]) out[t.stage] = t; // input is newest first
  return out;
}
