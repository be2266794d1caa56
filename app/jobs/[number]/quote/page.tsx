import Link from 'next/link';
import { can } from '@/lib/auth/permissions';
import { loadJobRoute, type JobRouteParams } from '@/lib/jobs/job-route';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { jobRoutes } from '@/lib/routes';
import { jobForQuotePage, listQuotes } from '@/lib/quotes/quote-queries';
import { quoteNumber } from '@/lib/quotes/quote-messages';
import { quoteCurrency } from '@/lib/quotes/quote-writes';
import { formatMoney, decimalText } from '@/lib/quotes/money';
import { basisPointsToPercent } from '@/lib/quotes/decimal-input';
import { lineToForm } from '@/lib/quotes/estimate-form-values';
import { rewindCopperFor } from '@/lib/quotes/rewind-source';
import { rewindMaterialLines } from '@/lib/quotes/rewind-material';
import { DECISION_METHOD_LABELS } from '@/lib/quotes/quote-schema';
import { getCommercialSettings } from '@/lib/settings/commercial-queries';
import { fmt } from '@/lib/presentation/format';
import { EstimateForm } from './estimate-form';
import { StartEstimateButton } from './quote-buttons';
import { DecisionForm } from './decision-form';
import { LabourForm } from './labour-section';
import { labourComparison } from '@/lib/quotes/labour-queries';
import { formatScaledShort } from '@/lib/quotes/decimal-input';
import { listStaff } from '@/lib/jobs/job-queries';
import './quote.css';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Estimate and quote · job ${(await params).number}` };
}

const STATUS_TEXT = { DRAFT: 'Draft estimate', SENT: 'Sent, awaiting the customer', ACCEPTED: 'Accepted', DECLINED: 'Declined' } as const;

export default async function QuotePage({ params }: JobRouteParams) {
  const { user, job } = await loadJobRoute(params, jobForQuotePage);
  const [quotes, { settings }, rewind, labour, staff] = await Promise.all([
    listQuotes(job.id),
    getCommercialSettings(),
    rewindCopperFor(job.id),
    labourComparison(job.id),
    listStaff(),
  ]);
  const latest = quotes[0];
  const draft = latest?.status === 'DRAFT' ? latest : null;
  const routes = jobRoutes(job.number);
  const canEdit = can(user.role, 'quote.edit');
  const canSend = can(user.role, 'quote.send');

  return (
    <>
      <p className="no-print">
        <Link href={routes.job}>← Job {job.number}</Link>
      </p>
      <h1>
        Estimate and quote · job {job.number} · {job.customer.company}
      </h1>
      <p className="muted">
        Job status: {STATUS_LABELS[job.status]}. Prices in {settings.currency}; tax{' '}
        {settings.taxMode === 'PER_LINE' ? 'worked out on every line' : 'worked out on the total per rate'}.
      </p>

      {draft &&
        canEdit &&
        (() => {
          const code = quoteCurrency(draft.currency);
          const rewindLines = rewind.ok
            ? {
                source: rewind.source,
                lines: rewindMaterialLines(rewind.copper, rewind.source, { ...settings, currency: code }).map((l) => lineToForm(l, code)),
              }
            : { reason: rewind.reason };
          return (
            <section className="card" aria-labelledby="draft-h">
              <h2 id="draft-h">Estimate {quoteNumber(job.number, draft.revision)} (draft)</h2>
              <EstimateForm
                key={`${draft.id}-${draft.version}`}
                quoteId={draft.id}
                quoteNumber={quoteNumber(job.number, draft.revision)}
                version={draft.version}
                currency={code}
                taxMode={draft.taxMode === 'PER_LINE' ? 'PER_LINE' : 'ON_TOTAL'}
                initial={{
                  discount: basisPointsToPercent(draft.discountBp),
                  notes: draft.notes ?? '',
                  lines: draft.lines.map((l) => lineToForm(l, code)),
                }}
                defaults={{
                  labourRate: decimalText(settings.labourRateMinor, code),
                  taxRate: basisPointsToPercent(settings.defaultTaxRateBp),
                }}
                rewind={rewindLines}
                canSend={canSend}
              />
              <p className="small">
                <a href={routes.quotePrint(draft.revision)}>Preview the quote</a>
              </p>
            </section>
          );
        })()}

      {!draft && canEdit && (
        <section className="card no-print">
          <h2>{latest ? 'Change the quote' : 'Start the estimate'}</h2>
          <p>
            {latest
              ? `A new revision starts from ${quoteNumber(job.number, latest.revision)}; the earlier quotes are kept as they were sent.`
              : 'Build the estimate from the inspection findings: labour, parts, materials, outside services and the rewind material from the winding data.'}
          </p>
          <StartEstimateButton jobId={job.id} label={latest ? `Start revision ${latest.revision + 1}` : 'Start the estimate'} />
        </section>
      )}

      {latest?.status === 'SENT' && canSend && (
        <section className="card" aria-labelledby="decision-h">
          <h2 id="decision-h">Customer’s decision on {quoteNumber(job.number, latest.revision)}</h2>
          <DecisionForm
            quoteId={latest.id}
            version={latest.version}
            quoteNumber={quoteNumber(job.number, latest.revision)}
            today={new Date().toISOString().slice(0, 10)}
          />
        </section>
      )}

      <section className="card" aria-labelledby="labour-h">
        <h2 id="labour-h">Labour: estimate against actual</h2>
        <p>
          Booked <strong>{formatScaledShort(labour.actualMilli, 3)} h</strong>
          {labour.estimateMilli !== null ? (
            <>
              {' '}
              against <strong>{formatScaledShort(labour.estimateMilli, 3)} h</strong> estimated (quote {labour.estimateSource})
            </>
          ) : (
            ' (no estimate yet)'
          )}
          {labour.estimateMilli ? <> · {Math.round((labour.actualMilli / labour.estimateMilli) * 100)} % of the estimate</> : null}
        </p>
        {labour.bookings.length > 0 && (
          <table>
            <thead>
              <tr>
                <th scope="col">Day</th>
                <th scope="col">Who</th>
                <th scope="col">Task</th>
                <th scope="col" className="num">
                  Hours
                </th>
              </tr>
            </thead>
            <tbody>
              {labour.bookings.map((b) => (
                <tr key={b.id}>
                  <td>{fmt.date(b.workedOn)}</td>
                  <td>{b.personName}</td>
                  <td>{b.task}</td>
                  <td className="num">{formatScaledShort(b.hoursMilli, 3)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {can(user.role, 'labour.book') && (
          <LabourForm
            jobId={job.id}
            staff={staff.map((p) => ({ id: p.id, name: p.name }))}
            me={user.id}
            today={new Date().toISOString().slice(0, 10)}
          />
        )}
      </section>

      <section className="card" aria-labelledby="revisions-h">
        <h2 id="revisions-h">Quotes</h2>
        {quotes.length === 0 ? (
          <p className="muted">No estimate yet.</p>
        ) : (
          <div className="table-scroll">
            <table>
              <thead>
                <tr>
                  <th scope="col">Quote</th>
                  <th scope="col">Status</th>
                  <th scope="col">Sent</th>
                  <th scope="col">Valid until</th>
                  <th scope="col" className="num">
                    Total
                  </th>
                  <th scope="col">Decision</th>
                  <th scope="col">Documents</th>
                </tr>
              </thead>
              <tbody>
                {quotes.map((q) => {
                  const code = quoteCurrency(q.currency);
                  return (
                    <tr key={q.id}>
                      <th scope="row">
                        {quoteNumber(job.number, q.revision)}
                        {q !== latest && <span className="small muted"> (earlier)</span>}
                      </th>
                      <td>{STATUS_TEXT[q.status]}</td>
                      <td>{q.sentAt ? fmt.date(q.sentAt) : '—'}</td>
                      <td>{q.validUntil ? fmt.date(q.validUntil) : '—'}</td>
                      <td className="num">{q.status === 'DRAFT' ? '—' : formatMoney(Number(q.totalMinor), code)}</td>
                      <td>
                        {q.decidedAt
                          ? `${q.decidedBy ?? ''} · ${fmt.date(q.decidedAt)} · ${q.decisionMethod ? (DECISION_METHOD_LABELS[q.decisionMethod as keyof typeof DECISION_METHOD_LABELS] ?? q.decisionMethod) : ''}${q.customerOrderNumber ? ` · order ${q.customerOrderNumber}` : ''}`
                          : '—'}
                      </td>
                      <td className="nowrap">
                        <a href={routes.quotePrint(q.revision)}>Print</a> ·{' '}
                        <a href={routes.quotePdf(q.revision)} download>
                          PDF
                        </a>
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
