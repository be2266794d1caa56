import Link from 'next/link';
import { latestSentQuoteSummary } from '@/lib/quotes/quote-queries';
import type { JobStatus } from '@/lib/db/generated/enums';
import { jobRoutes } from '@/lib/routes';
import { quoteGateRefusal } from '@/lib/quotes/quote-gates';
import { quoteNumber } from '@/lib/quotes/quote-messages';
import { formatMoney, isCurrencyCode } from '@/lib/quotes/money';

/** Where the quote stands, beside the status moves: what the next move needs, and the choice after a decline. */
export async function QuoteNote({ jobId, jobNumber, status }: { jobId: string; jobNumber: number; status: JobStatus }) {
  const sent = await latestSentQuoteSummary(jobId);
  const href = jobRoutes(jobNumber).quote;
  const next = status === 'INSPECTION' ? 'QUOTE_SENT' : status === 'QUOTE_SENT' ? 'CUSTOMER_APPROVED' : null;
  const refusal = next ? quoteGateRefusal(status, next, sent) : null;
  const total = sent && isCurrencyCode(sent.currency) ? formatMoney(Number(sent.totalMinor), sent.currency) : null;
  return (
    <div className="small" aria-live="polite">
      {sent && (
        <p>
          Quote {quoteNumber(jobNumber, sent.revision)}
          {total ? ` (${total})` : ''}:{' '}
          {sent.status === 'SENT'
            ? 'sent, awaiting the customer'
            : sent.status === 'ACCEPTED'
              ? `accepted${sent.customerOrderNumber ? `, customer order ${sent.customerOrderNumber}` : ''}`
              : 'declined'}
          . <Link href={href}>Estimate and quote</Link>
        </p>
      )}
      {sent?.status === 'DECLINED' && status !== 'RETURNED_UNREPAIRED' && (
        <p className="notice warn">
          The customer declined the quote: return the motor unrepaired (“Move to Returned unrepaired”), or start a revised quote.
        </p>
      )}
      {refusal && <p className="muted">{refusal}</p>}
    </div>
  );
}
