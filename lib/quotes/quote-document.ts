/**
 * One data object for a quote as the customer receives it: it feeds both the print view and the PDF, so
 * the two always say the same. Amounts are formatted here from the stored integers through the money rules.
 */
import { db } from '@/lib/db/client';
import { shopDetails, type ShopDetails } from '@/lib/job-sheet/shop-details';
import { CLOSING_STATEMENT, SAFETY_NOTICES, type SafetyNotice } from '@/lib/job-sheet/safety-notices';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { getCommercialSettings } from '@/lib/settings/commercial-queries';
import { basisPointsToPercent, formatScaledShort } from './decimal-input';
import { estimateTotals } from './estimate-totals';
import { formatMoney } from './money';
import { quoteNumber } from './quote-messages';
import { LINE_KIND_LABELS, type LineKind } from './quote-schema';
import { quoteCurrency } from './quote-writes';

export interface QuoteDocumentLine {
  kind: string;
  description: string;
  reference: string;
  quantity: string;
  unitPrice: string;
  taxRate: string;
  amount: string;
}

export interface QuoteDocument {
  shop: ShopDetails;
  number: string;
  revision: number;
  status: 'DRAFT' | 'SENT' | 'ACCEPTED' | 'DECLINED';
  jobNumber: number;
  issued: string | null;
  validUntil: string | null;
  customer: { company: string; contact: string | null; address: string | null; phone: string | null; email: string | null };
  motor: string;
  customerPo: string | null;
  lines: QuoteDocumentLine[];
  totals: { label: string; value: string; strong?: boolean }[];
  notes: string | null;
  terms: string;
  decision: string | null;
  notices: SafetyNotice[];
  closing: string;
  filename: string;
}

const day = (d: Date | null): string | null => (d ? d.toISOString().slice(0, 10) : null);

/** The quote of job `jobNumber`, revision `revision`, or null. */
export async function quoteDocument(jobNumber: number, revision: number): Promise<QuoteDocument | null> {
  const job = await db().job.findUnique({
    where: { number: jobNumber },
    include: { customer: { include: { contacts: { take: 1 } } }, motor: true },
  });
  if (!job) return null;
  const quote = await db().quote.findUnique({
    where: { jobId_revision: { jobId: job.id, revision } },
    include: { lines: { orderBy: { position: 'asc' } } },
  });
  if (!quote) return null;
  const [redesign, { settings }] = await Promise.all([getApprovedRedesign(job.id), getCommercialSettings()]);
  const code = quoteCurrency(quote.currency);
  const m = (minor: number) => formatMoney(minor, code);
  const t = estimateTotals(quote.lines, {
    currency: code,
    taxMode: quote.taxMode === 'PER_LINE' ? 'PER_LINE' : 'ON_TOTAL',
    discountBp: quote.discountBp,
  });
  const number = quoteNumber(job.number, quote.revision);
  const totals: QuoteDocument['totals'] = [{ label: 'Subtotal', value: m(t.subtotalMinor) }];
  if (t.discountMinor) totals.push({ label: `Discount ${basisPointsToPercent(quote.discountBp)} %`, value: `−${m(t.discountMinor)}` });
  for (const b of t.bands)
    if (b.rateBp > 0) totals.push({ label: `Tax ${basisPointsToPercent(b.rateBp)} % on ${m(b.baseMinor)}`, value: m(b.taxMinor) });
  totals.push({ label: `Total (${code})`, value: m(t.totalMinor), strong: true });
  const noticeIds = redesign ? ['isolation', 'redesign', 'hazardous-location'] : ['isolation', 'hazardous-location'];
  const decision =
    quote.status === 'ACCEPTED' || quote.status === 'DECLINED'
      ? `${quote.status === 'ACCEPTED' ? 'Accepted' : 'Declined'} by ${quote.decidedBy ?? '—'} on ${day(quote.decidedAt) ?? '—'}${quote.customerOrderNumber ? ` · customer order ${quote.customerOrderNumber}` : ''}`
      : null;
  return {
    shop: shopDetails(),
    number,
    revision: quote.revision,
    status: quote.status,
    jobNumber: job.number,
    issued: day(quote.sentAt),
    validUntil: day(quote.validUntil),
    customer: {
      company: job.customer.company,
      contact: job.customer.contacts[0]?.name ?? null,
      address: job.customer.address,
      phone: job.customer.phone,
      email: job.customer.email,
    },
    motor: [
      job.motor.manufacturer,
      job.motor.model,
      job.motor.serial ? `S/N ${job.motor.serial}` : null,
      job.motor.outputKw ? `${job.motor.outputKw.toFixed(2)} kW` : null,
    ]
      .filter(Boolean)
      .join(' · '),
    customerPo: job.customerPo,
    lines: quote.lines.map((l, i) => ({
      kind: LINE_KIND_LABELS[l.kind as LineKind],
      description: l.description,
      reference: l.reference ?? '',
      quantity: `${formatScaledShort(l.quantityMilli, 3)} ${l.unit}`,
      unitPrice: m(l.unitPriceMinor),
      taxRate: `${basisPointsToPercent(l.taxRateBp)} %`,
      amount: m(t.lines[i]?.netMinor ?? 0),
    })),
    totals,
    notes: quote.notes,
    // A sent quote prints the terms it was sent with; a draft shows the shop's current wording.
    terms: quote.terms ?? settings.quoteTerms,
    decision,
    notices: SAFETY_NOTICES.filter((n) => noticeIds.includes(n.id)),
    closing: CLOSING_STATEMENT,
    filename: `quote-${number}.pdf`,
  };
}
