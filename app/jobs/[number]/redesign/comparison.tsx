import { Fragment } from 'react';
import { nameplateLines } from '@/lib/redesign/nameplate-lines';
import type { ComparisonRow, RedesignReport } from '@/lib/engine/redesign/report';

const GROUPS: [ComparisonRow['group'], string][] = [
  ['winding', 'Winding'],
  ['magnetic', 'Flux and flux densities'],
  ['copper', 'Copper, current density and slot fill'],
  ['rating', 'Speed and expected rating'],
];

/** A value with its range mark: a symbol and words, never colour alone. */
function Marked({ text, status }: { text: string; status: ComparisonRow['status'] }) {
  if (status !== 'out') return <>{text}</>;
  return (
    <span className="out">
      <span aria-hidden="true">⚠ </span>
      {text} <strong>(out of range)</strong>
    </span>
  );
}

const ratioText = (r: number | null): string => (r === null || !Number.isFinite(r) ? '' : `× ${r.toFixed(4)}`);

/** Original beside the chosen candidate, row by row, with ratios and the range each was judged against. */
export function ComparisonTable({ report }: { report: RedesignReport }) {
  return (
    <table className="compare">
      <caption className="sr-only">As-found winding beside the chosen redesign</caption>
      <thead>
        <tr>
          <th scope="col">Quantity</th>
          <th scope="col">As found</th>
          <th scope="col">Redesign</th>
          <th scope="col" className="num">
            Ratio
          </th>
          <th scope="col">Range / note</th>
        </tr>
      </thead>
      {GROUPS.map(([group, title]) => (
        <tbody key={group}>
          <tr className="group">
            <th scope="rowgroup" colSpan={5}>
              {title}
            </th>
          </tr>
          {report.rows
            .filter((r) => r.group === group)
            .map((r) => (
              <tr key={r.key} data-row={r.key}>
                <th scope="row">{r.label}</th>
                <td>
                  <Marked text={r.original} status={r.originalStatus} />
                </td>
                <td>
                  <Marked text={r.candidate} status={r.status} />
                </td>
                <td className="num">{ratioText(r.ratio)}</td>
                <td className="small">{r.note ?? ''}</td>
              </tr>
            ))}
        </tbody>
      ))}
    </table>
  );
}

/** The proposed supplementary nameplate. */
export function NameplateProposal({ report }: { report: RedesignReport }) {
  const p = report.nameplate;
  return (
    <>
      <dl className="dl">
        {nameplateLines(p).map((l) => (
          <Fragment key={l.label}>
            <dt>{l.label}</dt>
            <dd>{l.value}</dd>
          </Fragment>
        ))}
      </dl>
      <ul className="small">
        {p.notes.map((n) => (
          <li key={n}>{n}</li>
        ))}
      </ul>
    </>
  );
}

/** The cautions and the assumptions behind the expected rating. */
export function Cautions({ report }: { report: RedesignReport }) {
  return (
    <>
      <ul className="cautions">
        {report.warnings.map((w) => (
          <li key={w.topic + w.text}>
            <span aria-hidden="true">⚠ </span>
            <strong>{w.topic[0]?.toUpperCase() + w.topic.slice(1)}:</strong> {w.text}
          </li>
        ))}
      </ul>
      <h3>Assumptions behind the expected rating</h3>
      <ul className="small">
        {report.expected.assumptions.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </>
  );
}
