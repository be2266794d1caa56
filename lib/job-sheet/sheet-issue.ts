/**
 * The issue number of a job's sheet: Issue 1 is the first sheet produced; a new issue is recorded only when
 * what the sheet prints changes (its content hash differs from the newest issue's). Two requests racing to
 * record the same next issue are settled by the (jobId, issue) unique key: the loser reads the winner's row.
 */
import { createHash } from 'node:crypto';
import { db, Prisma } from '@/lib/db/client';

export const contentHash = (content: unknown): string => createHash('sha256').update(JSON.stringify(content)).digest('hex');

const isUniqueViolation = (err: unknown): boolean => err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002';

export async function sheetIssueFor(jobId: string, hash: string): Promise<{ issue: number; issuedAt: Date }> {
  for (let attempt = 0; attempt < 3; attempt++) {
    const newest = await db().jobSheetIssue.findFirst({ where: { jobId }, orderBy: { issue: 'desc' } });
    if (newest?.contentHash === hash) return { issue: newest.issue, issuedAt: newest.issuedAt };
    try {
      const row = await db().jobSheetIssue.create({ data: { jobId, issue: (newest?.issue ?? 0) + 1, contentHash: hash } });
      return { issue: row.issue, issuedAt: row.issuedAt };
    } catch (err) {
      if (!isUniqueViolation(err)) throw err;
    }
  }
  throw new Error(`Could not record the job sheet issue for job ${jobId}.`);
}
