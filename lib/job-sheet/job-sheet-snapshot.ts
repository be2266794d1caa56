/**
 * Which PDF a job's sheet download serves. An open job gets a freshly generated sheet. A shipped job keeps
 * the sheet it shipped with: it is generated and stored when the job moves to SHIPPED (see moveJobStatus),
 * and served from the database afterwards, so later changes (to the shop's data or to this program) never
 * alter what the customer was handed. If the store after shipping failed (a crash between the two), the
 * first download stores it instead; test records are frozen once shipped, so that copy says the same.
 */
import { db, Prisma } from '@/lib/db/client';
import { loadJobSheet } from './job-sheet-data';
import { cachedJobSheetPdf } from './pdf-cache';

export interface JobSheetPdf {
  pdf: Uint8Array;
  filename: string;
  /** True when served from the snapshot stored at shipping. */
  snapshot: boolean;
  /** True when a generated sheet came from the per-issue cache. */
  cached?: boolean;
  revision: number;
}

export const jobSheetFilename = (number: number, revision: number) => `job-${number}-sheet-rev${revision}.pdf`;

const isUniqueViolation = (err: unknown): boolean => err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002';

/** Generates and stores the shipped sheet once; a second call (or a racing one) keeps the first copy. */
export async function snapshotShippedJobSheet(jobId: string): Promise<{ revision: number } | null> {
  const existing = await db().jobSheetSnapshot.findUnique({ where: { jobId }, select: { revision: true } });
  if (existing) return existing;
  const job = await db().job.findUnique({ where: { id: jobId }, select: { number: true, status: true } });
  if (!job || job.status !== 'SHIPPED') return null;
  const data = await loadJobSheet(job.number);
  if (!data) return null;
  const { pdf } = await cachedJobSheetPdf(data);
  try {
    await db().jobSheetSnapshot.create({ data: { jobId, pdf: new Uint8Array(pdf), sizeBytes: pdf.length, revision: data.revision } });
  } catch (err) {
    if (!isUniqueViolation(err)) throw err;
  }
  return { revision: data.revision };
}

/** The sheet to serve for job `number`: the stored snapshot for a shipped job, else a fresh one; null if no such job. */
/** Which issue of the sheet a shipped job keeps, and when it was stored (null before shipping). */
export async function shippedSnapshotInfo(jobId: string): Promise<{ revision: number; generatedAt: Date } | null> {
  return db().jobSheetSnapshot.findUnique({ where: { jobId }, select: { revision: true, generatedAt: true } });
}

export async function jobSheetPdf(number: number): Promise<JobSheetPdf | null> {
  const job = await db().job.findUnique({ where: { number }, select: { id: true, status: true } });
  if (!job) return null;
  if (job.status === 'SHIPPED') {
    await snapshotShippedJobSheet(job.id);
    const snap = await db().jobSheetSnapshot.findUnique({ where: { jobId: job.id } });
    if (snap)
      return { pdf: new Uint8Array(snap.pdf), filename: jobSheetFilename(number, snap.revision), snapshot: true, revision: snap.revision };
  }
  const data = await loadJobSheet(number);
  if (!data) return null;
  // Rendered on a worker thread, once per issue of the record (pdf-cache.ts).
  const { pdf, cached } = await cachedJobSheetPdf(data);
  return { pdf, filename: jobSheetFilename(number, data.revision), snapshot: false, cached, revision: data.revision };
}
