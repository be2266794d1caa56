/**
 * What the rewind did to stator copper loss and efficiency, with the figures behind it (each naming its
 * source). One view for the final tests page, the redesign comparison and the job sheet's print view.
 */
import type { LossStatementResult } from '@/lib/losses/loss-statement-source';

export function LossStatementView({
  result,
  headingId,
  title = 'Losses and efficiency after the rewind',
  level = 'h3',
}: {
  result: LossStatementResult;
  headingId: string;
  title?: string;
  level?: 'h2' | 'h3';
}) {
  const s = result.statement;
  const Heading = level;
  return (
    <section className="losses" aria-labelledby={headingId} data-testid="loss-statement">
      <Heading id={headingId}>{title}</Heading>
      {!s ? (
        <p className="small muted">No statement: {result.reason}</p>
      ) : (
        <>
          <p>{s.statement}</p>
          {s.findings.map((f) => (
            <p key={f} className="notice warn">
              <span aria-hidden="true">⚠ </span>
              {f}
            </p>
          ))}
          <details open>
            <summary className="small">The figures behind it</summary>
            <dl className="dl small">
              {s.rows.map((r) => (
                <div key={r.label} style={{ display: 'contents' }}>
                  <dt>{r.label}</dt>
                  <dd>{r.value}</dd>
                </div>
              ))}
            </dl>
            <ul className="small muted">
              {s.assumptions.map((a) => (
                <li key={a}>{a}</li>
              ))}
            </ul>
          </details>
        </>
      )}
    </section>
  );
}
