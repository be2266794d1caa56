/**
 * The shop path follows the commercial records: "Quote sent" needs a sent quote, "Customer approved" needs
 * the latest sent quote accepted. Small rule functions so they sit beside the other gates on the status path
 * (lib/jobs/job-writes.ts calls refuseByQuoteRules inside the move's transaction). Resuming from hold returns
 * a job where it was and is not gated again.
 */
import type { JobStatus, QuoteStatus } from '@/lib/db/generated/enums';
import type { Prisma } from '@/lib/db/generated/client';
import { DomainError } from '@/lib/errors/domain-errors';

export const QUOTE_GATE_MESSAGES = {
  needsSent: 'A job moves to "Quote sent" only once a quote has been sent: send it from the job’s Estimate and quote page first.',
  needsAccepted:
    'A job moves to "Customer approved" only when the customer’s acceptance of the latest quote is recorded: record it on the Estimate and quote page first.',
} as const;

/** The latest revision that was sent (drafts after it do not count), or null. */
export type LatestSentQuote = { revision: number; status: QuoteStatus } | null;

/** Why the move is refused by the quote rules, or null when they allow it. */
export function quoteGateRefusal(from: JobStatus, to: JobStatus, latestSent: LatestSentQuote): string | null {
  if (from === 'ON_HOLD') return null;
  if (to === 'QUOTE_SENT' && !latestSent) return QUOTE_GATE_MESSAGES.needsSent;
  if (to === 'CUSTOMER_APPROVED' && latestSent?.status !== 'ACCEPTED') return QUOTE_GATE_MESSAGES.needsAccepted;
  return null;
}

/** The moves the quote rules care about, so other moves cost no query. */
const GATED: readonly JobStatus[] = ['QUOTE_SENT', 'CUSTOMER_APPROVED'];

export async function latestSentQuote(tx: Prisma.TransactionClient, jobId: string): Promise<LatestSentQuote> {
  return tx.quote.findFirst({
    where: { jobId, status: { not: 'DRAFT' } },
    orderBy: { revision: 'desc' },
    select: { revision: true, status: true },
  });
}

/** Throws the refusal inside the status move's transaction. */
export async function refuseByQuoteRules(tx: Prisma.TransactionClient, jobId: string, from: JobStatus, to: JobStatus): Promise<void> {
  if (from === 'ON_HOLD' || !GATED.includes(to)) return;
  const refusal = quoteGateRefusal(from, to, await latestSentQuote(tx, jobId));
  if (refusal) throw new DomainError('invalid', refusal);
}
