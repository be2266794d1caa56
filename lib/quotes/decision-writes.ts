/**
 * The customer's decision on a sent quote: accepted or declined, by whom, on which day, how, and the
 * customer's order number. Only the latest revision, only once; a timeline event on the job.
 */
import type { z } from 'zod';
import { db } from '@/lib/db/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { DECISION_METHOD_LABELS, type decisionSchema } from './quote-schema';
import { QUOTE_MESSAGES, quoteNumber } from './quote-messages';

type Decision = z.output<typeof decisionSchema>;

export async function recordDecision(userId: string, input: Decision): Promise<{ version: number }> {
  return db().$transaction(async (tx) => {
    const quote = await tx.quote.findUnique({ where: { id: input.quoteId }, include: { job: { select: { number: true } } } });
    if (!quote) throw new DomainError('not-found', MESSAGES.notFound('quote'));
    if (quote.status === 'ACCEPTED' || quote.status === 'DECLINED') throw new DomainError('conflict', QUOTE_MESSAGES.decided);
    if (quote.status !== 'SENT') throw new DomainError('invalid', QUOTE_MESSAGES.notSent);
    const newer = await tx.quote.count({ where: { jobId: quote.jobId, revision: { gt: quote.revision } } });
    if (newer > 0) throw new DomainError('conflict', QUOTE_MESSAGES.notLatest);
    const r = await tx.quote.updateMany({
      where: { id: quote.id, version: input.version, status: 'SENT' },
      data: {
        status: input.decision,
        decidedAt: new Date(`${input.decidedOn}T12:00:00Z`),
        decidedBy: input.decidedBy,
        decisionMethod: input.method,
        customerOrderNumber: input.customerOrderNumber || null,
        decisionNote: input.note || null,
        decisionRecordedById: userId,
        version: { increment: 1 },
      },
    });
    if (r.count === 0) throw new DomainError('stale', QUOTE_MESSAGES.stale);
    const what = input.decision === 'ACCEPTED' ? 'accepted' : 'declined';
    await tx.jobEvent.create({
      data: {
        jobId: quote.jobId,
        userId,
        kind: 'QUOTE',
        message: `Quote ${quoteNumber(quote.job.number, quote.revision)} ${what} by ${input.decidedBy} on ${input.decidedOn} (${DECISION_METHOD_LABELS[input.method].toLowerCase()})${input.customerOrderNumber ? `, order ${input.customerOrderNumber}` : ''}.`,
      },
    });
    return { version: input.version + 1 };
  });
}
