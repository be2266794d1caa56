import Link from 'next/link';
import { shippedSnapshotInfo } from '@/lib/job-sheet/job-sheet-snapshot';
import { loadJobSheet, type Row } from '@/lib/job-sheet/job-sheet-data';
import { OverallVerdict, SectionVerdict } from '../final-tests/judgement-view';
import { PrintButton } from './print-button';
import { LossStatementView } from '../_losses/loss-statement-view';
import '../final-tests/final-tests.css';
import './job-sheet.css';
import { loadJobRoute } from '@/lib/jobs/job-route';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Job sheet ${(await params).number}` };
}

function Rows({ rows }: { rows: Row[] }) {
  return (
    <dl className="dl">
      {rows.map((r) => (
        <div key={r.label} style={{ display: 'contents' }}>
          <dt>{r.label}</dt>
          <dd>{r.value}</dd>
        </div>
      ))}
    </dl>
  );
}

/**
 * The job sheet as a web page made for printing (the same content as the PDF, from the same data).
 * For a shipped job, the stored PDF is what was handed over; this page says so and links to it.
 */
export default async function JobSheetPage({ params }: { params: Promise<{ number: string }> }) {
  const { job: d } = await loadJobRoute(params, loadJobSheet);
  const snapshot = d.job.shipped ? await shippedSnapshotInfo(d.job.id) : null;
  const pdfHref = `/jobs/${d.job.number}/job-sheet/pdf`;
  const t = d.tests;

  return (
    <>
      <div className="row no-print" style={{ marginBottom: '1rem' }}>
        <Link href={`/jobs/${d.job.number}`}>← Job {d.job.number}</Link>
        <PrintButton />
        <a className="btn secondary" href={pdfHref} download>
          Download PDF
        </a>
      </div>
      {d.job.shipped && (
        <p className="notice no-print snapshot-note">
          This job has shipped.{' '}
          {snapshot
            ? `The PDF is the sheet stored when it shipped (issue ${snapshot.revision}).`
            : 'The PDF download stores the shipped sheet the first time it is opened.'}{' '}
          This page shows the current records.
        </p>
      )}
      <article className="jobsheet" aria-labelledby="sheet-title">
        <header className="sheet-head">
          <div>
            <strong style={{ fontSize: '1.2rem' }}>{d.shop.name}</strong>
            {(d.shop.address || d.shop.phone) && <div className="small">{[d.shop.address, d.shop.phone].filter(Boolean).join(' · ')}</div>}
          </div>
          <div data-testid="sheet-revision">
            Job {d.job.number} · Issue {d.revision} · {d.revisionDate}
          </div>
        </header>
        <h1 id="sheet-title">Motor repair job sheet · job {d.job.number}</h1>

        <div className="cols">
          <section aria-labelledby="js-job">
            <h2 id="js-job">Job</h2>
            <Rows rows={d.job.rows} />
          </section>
          <section aria-labelledby="js-cust">
            <h2 id="js-cust">Customer</h2>
            <Rows rows={d.customer} />
          </section>
          <section aria-labelledby="js-plate">
            <h2 id="js-plate">Nameplate as received</h2>
            <Rows rows={d.nameplate} />
          </section>
          {d.asRepaired && (
            <section aria-labelledby="js-plate-new" data-testid="nameplate-as-repaired">
              <h2 id="js-plate-new">Nameplate as repaired</h2>
              <p className="small muted">Update the plate or fit a supplementary plate.</p>
              <Rows rows={d.asRepaired} />
            </section>
          )}
          <section aria-labelledby="js-found">
            <h2 id="js-found">As-found winding</h2>
            {d.asFound ? (
              <>
                <p className="small muted">
                  From the as-found data sheet, revision {d.asFound.revision}, {d.asFound.updatedAt}
                </p>
                <Rows rows={d.asFound.rows} />
              </>
            ) : (
              <p>No as-found winding data was recorded.</p>
            )}
          </section>
        </div>

        <section aria-labelledby="js-repaired">
          <h2 id="js-repaired">Winding as repaired</h2>
          <p data-testid="statement-of-work">
            <strong>{d.statementOfWork}</strong>
          </p>
          {d.redesign ? (
            <div className="redesigned">
              <p>
                <strong>⚠ REDESIGNED WINDING: differs from the original.</strong> Approved redesign revision {d.redesign.revision}, by{' '}
                {d.redesign.approvedBy} on {d.redesign.approvedAt}.
              </p>
              {d.redesign.note && <p>Note: {d.redesign.note}</p>}
              <table>
                <thead>
                  <tr>
                    <th>Item</th>
                    <th>Original</th>
                    <th>Redesigned</th>
                  </tr>
                </thead>
                <tbody>
                  {d.redesign.changes.map((c) => (
                    <tr key={c.label}>
                      <td>{c.label}</td>
                      <td>{c.original}</td>
                      <td>{c.redesigned}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
        </section>

        {d.decisions.length > 0 && (
          <section aria-labelledby="js-decisions" data-testid="decisions">
            <h2 id="js-decisions">Engineer’s decisions</h2>
            <Rows rows={d.decisions} />
          </section>
        )}

        <section aria-labelledby="js-tests">
          <h2 id="js-tests">Final tests</h2>
          {t ? (
            <>
              <p data-testid="judged-for">
                <strong>Verdicts {t.judgedFor}.</strong>
              </p>
              <p className="small muted">Basis: {t.basis}.</p>
              <p>
                Record #{t.sequence} · tested {t.testedAt} by {t.testedBy} · instruments {t.instruments}
              </p>
              <OverallVerdict judgement={{ overall: t.verdict, sections: t.sections, qualifiers: t.qualifiers, derived: {} }} />
              {t.sections.map((s) => {
                const readings = t.readings.find((r) => r.key === s.key);
                return (
                  <div key={s.key}>
                    <SectionVerdict section={s} id={`sheet-${s.key}`} />
                    {readings && (
                      <div className="small" style={{ margin: '0 0 0.6rem 1rem' }}>
                        <Rows rows={readings.rows} />
                      </div>
                    )}
                  </div>
                );
              })}
              {t.notes && <p>Notes: {t.notes}</p>}
              {t.earlier.length > 0 && (
                <p className="small muted">
                  Earlier records: {t.earlier.map((e) => `#${e.sequence} ${e.testedAt} ${e.verdict}`).join('; ')}
                </p>
              )}
            </>
          ) : (
            <p>No final tests have been recorded yet.</p>
          )}
        </section>
        <LossStatementView result={d.losses} headingId="js-losses" level="h2" />

        <section aria-labelledby="js-sign">
          <h2 id="js-sign">Signatures</h2>
          <div className="signatures">
            {d.signatures.map((l) => (
              <div key={l}>
                {l}
                <br />
                Date:
              </div>
            ))}
          </div>
        </section>

        <section className="notices" aria-labelledby="js-safety">
          <h2 id="js-safety">Safety notices</h2>
          {d.notices.map((n) => (
            <div key={n.id}>
              <h3>⚠ {n.title}</h3>
              <p>{n.text}</p>
            </div>
          ))}
          <p className="closing">{d.closing}</p>
        </section>
      </article>
    </>
  );
}
