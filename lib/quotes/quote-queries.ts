/** Reads of a job's estimates and quotes. */
import { db } from '@/lib/db/client';

/** Every revision of a job's quote, newest first, with its lines in order. */
export async function listQuotes(jobId: string) {
  return db().quote.findMany({
    where: { jobId },
    orderBy: { revision: 'desc' },
    include: { lines: { orderBy: { position: 'asc' } } },
  });
}
export type QuoteWithLines = Awaited<ReturnType<typeof listQuotes>>[number];

/** The latest revision's status and decision: what the shop path's quote rules look at. */
export async function latestQuoteState(jobId: string) {
  return db().quote.findFirst({ where: { jobId }, orderBy: { revision: 'desc' }, select: { id: true, revision: true, status: true } });
}

/** What the estimate page needs of its job. */
export async function jobForQuotePage(jobNumber: number) {
  return db().job.findUnique({
    where: { number: jobNumber },
    select: { id: true, number: true, status: true, customer: { select: { company: true } } },
  });
}

/** The latest sent revision with its total and order number, for the job page's note. */
export async function latestSentQuoteSummary(jobId: string) {
  return db().quote.findFirst({
    where: { jobId, status: { not: 'DRAFT' } },
    orderBy: { revision: 'desc' },
    select: { revision: true, status: true, totalMinor: true, currency: true, customerOrderNumber: true },
  });
}
