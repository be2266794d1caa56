'use server';

/**
 * Server actions of estimates and quotes. Each is a public POST endpoint: guardedAction checks the session
 * and the role first, then the zod schema, then the data layer writes in one transaction.
 */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { decisionSchema, estimateSaveSchema, quoteRefSchema, startQuoteSchema } from './quote-schema';
import { saveEstimate as save, sendQuote as send, startQuote as start } from './quote-writes';
import { recordDecision as decide } from './decision-writes';
import { labourBookingSchema } from './labour-schema';
import { bookLabour as book } from './labour-writes';

export async function startEstimate(raw: unknown) {
  return guardedAction('quote.edit', 'build estimates', startQuoteSchema, async (user, input) =>
    success(await start(user.id, input.jobId), 'Estimate opened.'),
  )(raw);
}

export async function saveEstimate(raw: unknown) {
  return guardedAction('quote.edit', 'build estimates', estimateSaveSchema, async (user, input) =>
    success(await save(user.id, input), 'Estimate saved.'),
  )(raw);
}

export async function sendQuote(raw: unknown) {
  return guardedAction('quote.send', 'send quotes to customers', quoteRefSchema, async (user, input) =>
    success(await send(user.id, input), 'Quote sent and frozen. Print it or download the PDF for the customer.'),
  )(raw);
}

export async function recordDecision(raw: unknown) {
  return guardedAction('quote.send', 'record the customer’s decision', decisionSchema, async (user, input) =>
    success(await decide(user.id, input), input.decision === 'ACCEPTED' ? 'Acceptance recorded.' : 'Decline recorded.'),
  )(raw);
}

export async function bookLabour(raw: unknown) {
  return guardedAction('labour.book', 'book labour', labourBookingSchema, async (user, input) =>
    success(await book(user.id, input), 'Labour booked.'),
  )(raw);
}
