import Link from 'next/link';
import { notFound } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/guard';
import { jobNumberSchema } from '@/lib/jobs/job-schema';
import { jobRoutes } from '@/lib/routes';
import { quoteDocument } from '@/lib/quotes/quote-document';
import { quoteRevisionParamSchema } from '@/lib/quotes/quote-schema';
import '../../quote.css';

export async function generateMetadata({ params }: { params: Promise<{ number: string; revision: string }> }) {
  const p = await params;
  return { title: `Quote Q${p.number}-${p.revision}` };
}

/** The quote as printed for the customer: the same data as the PDF. */
export default async function QuotePrintPage({ params }: { params: Promise<{ number: string; revision: string }> }) {
  await requirePageUser('job.read');
  const p = await params;
  const job = jobNumberSchema.safeParse(p.number);
  const revision = quoteRevisionParamSchema.safeParse(p.revision);
  if (!job.success || !revision.success) notFound();
  const d = await quoteDocument(job.data, revision.data);
  if (!d) notFound();
  const routes = jobRoutes(d.jobNumber);
  return (
    <article className="quote-doc">
      <p className="no-print">
        <Link href={routes.quote}>← Estimate and quote</Link> ·{' '}
        <a href={routes.quotePdf(d.revision)} download>
          Download PDF
        </a>
      </p>
      <header>
        <p>
          <strong>{d.shop.name}</strong>
          {d.shop.address ? ` · ${d.shop.address}` : ''}
          {d.shop.phone ? ` · ${d.shop.phone}` : ''}
        </p>
        <h1>Quote {d.number}</h1>
        {d.status === 'DRAFT' && <p className="draft-mark">DRAFT — not yet sent; figures may change.</p>}
      </header>
      <div className="grid" style={{ gridTemplateColumns: '1fr 1fr' }}>
        <dl className="dl">
          <dt>Customer</dt>
          <dd>{d.customer.company}</dd>
          <dt>Contact</dt>
          <dd>{d.customer.contact ?? '—'}</dd>
          <dt>Address</dt>
          <dd>{d.customer.address ?? '—'}</dd>
        </dl>
        <dl className="dl">
          <dt>Job</dt>
          <dd>{d.jobNumber}</dd>
          <dt>Motor</dt>
          <dd>{d.motor}</dd>
          <dt>Issued</dt>
          <dd>{d.issued ?? '—'}</dd>
          <dt>Valid until</dt>
          <dd>{d.validUntil ?? '—'}</dd>
          {d.decision && (
            <>
              <dt>Decision</dt>
              <dd>{d.decision}</dd>
            </>
          )}
        </dl>
      </div>
      <table>
        <thead>
          <tr>
            <th scope="col">Kind</th>
            <th scope="col">Description</th>
            <th scope="col" className="num">
              Quantity
            </th>
            <th scope="col" className="num">
              Unit price
            </th>
            <th scope="col" className="num">
              Tax
            </th>
            <th scope="col" className="num">
              Amount
            </th>
          </tr>
        </thead>
        <tbody>
          {d.lines.map((l, i) => (
            <tr key={i}>
              <td>{l.kind}</td>
              <td>
                {l.description}
                {l.reference ? ` — ${l.reference}` : ''}
              </td>
              <td className="num">{l.quantity}</td>
              <td className="num">{l.unitPrice}</td>
              <td className="num">{l.taxRate}</td>
              <td className="num">{l.amount}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <table className="totals-table" aria-label="Totals">
        <tbody>
          {d.totals.map((t) => (
            <tr key={t.label}>
              <th scope="row">{t.label}</th>
              <td className="num">{t.strong ? <strong>{t.value}</strong> : t.value}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {d.notes && (
        <>
          <h2>Notes</h2>
          <p>{d.notes}</p>
        </>
      )}
      <h2>Terms</h2>
      <p>{d.terms}</p>
      <h2>Safety</h2>
      {d.notices.map((n) => (
        <p key={n.id} className="notice">
          ⚠ <strong>{n.title}:</strong> {n.text}
        </p>
      ))}
      <p className="muted small">{d.closing}</p>
    </article>
  );
}
