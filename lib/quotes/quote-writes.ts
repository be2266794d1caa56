/**
 * Writes of estimates and quotes, each in one transaction with a timeline event on the job. A DRAFT is
 * edited under optimistic locking (`updateMany where {id, version, status: DRAFT}`); sending freezes it.
 */
import { db } from '@/lib/db/client';
import type { Prisma } from '@/lib/db/generated/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { getCommercialSettings } from '@/lib/settings/commercial-queries';
import { estimateTotals } from './estimate-totals';
import { formatMoney, isCurrencyCode, type CurrencyCode } from './money';
import { QUOTE_MESSAGES, quoteNumber } from './quote-messages';
import type { EstimateLine, EstimateSave } from './quote-schema';

type Tx = Prisma.TransactionClient;

const lineRows = (quoteId: string, lines: readonly EstimateLine[]) => lines.map((l, position) => ({ quoteId, position, ...l }));

/** The quote's currency as the money rules know it (a stored code outside the list is a corrupt row). */
export function quoteCurrency(code: string): CurrencyCode {
  if (!isCurrencyCode(code)) throw new Error(`Quote currency ${code} is not one Coilwright prices in.`);
  return code;
}

/** Opens the job's draft estimate: the current draft, or a new revision (copying the latest one's lines). */
export async function startQuote(userId: string, jobId: string): Promise<{ quoteId: string; revision: number }> {
  const { settings } = await getCommercialSettings();
  return db()
    .$transaction(async (tx) => {
      const job = await tx.job.findUnique({ where: { id: jobId }, select: { id: true, number: true } });
      if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
      const latest = await tx.quote.findFirst({
        where: { jobId },
        orderBy: { revision: 'desc' },
        include: { lines: { orderBy: { position: 'asc' } } },
      });
      if (latest?.status === 'DRAFT') return { quoteId: latest.id, revision: latest.revision };
      const revision = (latest?.revision ?? 0) + 1;
      const quote = await tx.quote.create({
        data: {
          jobId,
          revision,
          createdById: userId,
          currency: latest?.currency ?? settings.currency,
          taxMode: latest?.taxMode ?? settings.taxMode,
          discountBp: latest?.discountBp ?? 0,
          notes: latest?.notes ?? null,
        },
      });
      if (latest) {
        await tx.quoteLine.createMany({
          data: lineRows(
            quote.id,
            latest.lines.map((l) => ({
              kind: l.kind,
              description: l.description,
              reference: l.reference,
              quantityMilli: l.quantityMilli,
              unit: l.unit,
              unitPriceMinor: l.unitPriceMinor,
              taxRateBp: l.taxRateBp,
            })),
          ),
        });
      }
      await tx.jobEvent.create({
        data: {
          jobId,
          userId,
          kind: 'QUOTE',
          message: latest
            ? `Estimate ${quoteNumber(job.number, revision)} started from ${quoteNumber(job.number, latest.revision)}.`
            : `Estimate ${quoteNumber(job.number, revision)} started.`,
        },
      });
      return { quoteId: quote.id, revision };
    })
    .catch((err: unknown) => {
      // Two people starting a revision at once: the unique (job, revision) lets one through.
      if (err instanceof Error && /Unique constraint|unique/i.test(err.message)) throw new DomainError('stale', QUOTE_MESSAGES.stale);
      throw err;
    });
}

async function draftOrRefuse(tx: Tx, quoteId: string, version: number) {
  const quote = await tx.quote.findUnique({ where: { id: quoteId }, include: { job: { select: { number: true } } } });
  if (!quote) throw new DomainError('not-found', MESSAGES.notFound('estimate'));
  if (quote.status !== 'DRAFT') throw new DomainError('frozen', QUOTE_MESSAGES.frozen);
  if (quote.version !== version) throw new DomainError('stale', QUOTE_MESSAGES.stale);
  return quote;
}

export async function saveEstimate(userId: string, input: EstimateSave): Promise<{ version: number }> {
  return db().$transaction(async (tx) => {
    const quote = await draftOrRefuse(tx, input.quoteId, input.version);
    if (quote.currency !== input.currency) throw new DomainError('stale', QUOTE_MESSAGES.currencyChanged);
    const r = await tx.quote.updateMany({
      where: { id: quote.id, version: input.version, status: 'DRAFT' },
      data: { discountBp: input.discountBp, notes: input.notes, version: { increment: 1 } },
    });
    if (r.count === 0) throw new DomainError('stale', QUOTE_MESSAGES.stale);
    await tx.quoteLine.deleteMany({ where: { quoteId: quote.id } });
    await tx.quoteLine.createMany({ data: lineRows(quote.id, input.lines) });
    return { version: input.version + 1 };
  });
}

/** Adds `days` calendar days to a date (UTC date part; the column is a DATE). */
export function validUntilFrom(sentAt: Date, days: number): Date {
  const d = new Date(Date.UTC(sentAt.getUTCFullYear(), sentAt.getUTCMonth(), sentAt.getUTCDate()));
  d.setUTCDate(d.getUTCDate() + days);
  return d;
}

/** Freezes the draft as the quote the customer receives: totals, terms and validity date stored. */
export async function sendQuote(
  userId: string,
  input: { quoteId: string; version: number },
  now = new Date(),
): Promise<{ version: number; totalMinor: number }> {
  const { settings } = await getCommercialSettings();
  return db().$transaction(async (tx) => {
    const quote = await draftOrRefuse(tx, input.quoteId, input.version);
    const lines = await tx.quoteLine.findMany({ where: { quoteId: quote.id }, orderBy: { position: 'asc' } });
    if (lines.length === 0) throw new DomainError('invalid', QUOTE_MESSAGES.empty);
    const currency = quoteCurrency(quote.currency);
    const totals = estimateTotals(lines, {
      currency,
      taxMode: quote.taxMode === 'PER_LINE' ? 'PER_LINE' : 'ON_TOTAL',
      discountBp: quote.discountBp,
    });
    const validUntil = validUntilFrom(now, settings.quoteValidityDays);
    const r = await tx.quote.updateMany({
      where: { id: quote.id, version: input.version, status: 'DRAFT' },
      data: {
        status: 'SENT',
        sentAt: now,
        sentById: userId,
        validUntil,
        terms: settings.quoteTerms,
        version: { increment: 1 },
        subtotalMinor: BigInt(totals.subtotalMinor),
        discountMinor: BigInt(totals.discountMinor),
        taxMinor: BigInt(totals.taxMinor),
        totalMinor: BigInt(totals.totalMinor),
      },
    });
    if (r.count === 0) throw new DomainError('stale', QUOTE_MESSAGES.stale);
    await tx.jobEvent.create({
      data: {
        jobId: quote.jobId,
        userId,
        kind: 'QUOTE',
        message: `Quote ${quoteNumber(quote.job.number, quote.revision)} sent: ${formatMoney(totals.totalMinor, currency)}, valid until ${validUntil.toISOString().slice(0, 10)}.`,
        data: { quoteId: quote.id, revision: quote.revision, totalMinor: totals.totalMinor, currency },
      },
    });
    return { version: input.version + 1, totalMinor: totals.totalMinor };
  });
}
