import Link from 'next/link';
import { loadBenchPack } from '@/lib/bench-pack/bench-pack-data';
import { connectionDiagram } from '@/lib/bench-pack/connection-diagram';
import { LEAD_STANDARD } from '@/lib/engine/bench/lead-markings';
import { benchPackSearch, parseBenchPackQuery } from '@/lib/bench-pack/bench-pack-schema';
import { loadJobRoute, type JobRouteParams } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';
import { PrintButton } from '../print-button';
import { ConnectionDiagramSvg } from './connection-diagram-svg';
import './bench-pack.css';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Bench pack · job ${(await params).number}` };
}

function Rows({ rows }: { rows: { label: string; value: string }[] }) {
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

/** The winder's bench pack: the approved winding (or the original) as groups, circuits, leads, wire and coil sizes. */
export default async function BenchPackPage({
  params,
  searchParams,
}: JobRouteParams & { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const q = parseBenchPackQuery(await searchParams);
  // A job that does not exist is the not-found page; a job without a pack says why.
  const { job: r } = await loadJobRoute(params, async (n) => {
    const loaded = await loadBenchPack(n, q);
    return !loaded.ok && !loaded.job ? null : loaded;
  });
  const number = r.ok ? r.value.input.job.number : (r.job?.number ?? 0);
  const routes = jobRoutes(number);
  if (!r.ok) {
    return (
      <div className="bench-pack">
        <p className="no-print">
          <Link href={routes.redesign}>← Redesign</Link>
        </p>
        <h1>Bench pack · job {number}</h1>
        <p className="notice bad" role="alert">
          {r.reason}
        </p>
      </div>
    );
  }
  const d = r.value;
  const o = r.options;
  const basis = d.input.basis;
  const pdfHref = `${routes.benchPackPdf}${benchPackSearch({ ...q, marking: o.marking, leads: d.leadPlan.leads, paper: o.paper })}`;
  const diagram = connectionDiagram(d.plan, d.leadPlan);
  return (
    <div className="bench-pack">
      <p className="no-print row">
        <Link href={basis.kind === 'redesign' ? `${routes.redesign}?rev=${basis.revision}` : routes.asFound}>
          ← {basis.kind === 'redesign' ? 'Redesign' : 'As-found sheet'}
        </Link>{' '}
        <PrintButton label="Print the bench pack" />{' '}
        <a className="btn secondary" href={pdfHref}>
          Download PDF
        </a>
      </p>
      <form className="options no-print card" method="get" aria-label="Bench pack options">
        {q.rev && <input type="hidden" name="rev" value={q.rev} />}
        {q.basis && <input type="hidden" name="basis" value={q.basis} />}
        <label>
          Lead marking
          <select name="marking" defaultValue={o.marking}>
            <option value="iec">{LEAD_STANDARD.iec}</option>
            <option value="nema">{LEAD_STANDARD.nema}</option>
          </select>
        </label>
        <label>
          Leads brought out
          <select name="leads" defaultValue={String(d.leadPlan.leads)}>
            {d.leadCounts.map((n) => (
              <option key={n} value={n}>
                {n} leads
              </option>
            ))}
          </select>
        </label>
        <label>
          Paper (PDF)
          <select name="paper" defaultValue={o.paper}>
            <option value="a4">A4</option>
            <option value="letter">Letter</option>
          </select>
        </label>
        <button className="btn" type="submit">
          Show
        </button>
      </form>

      <h1>{d.title}</h1>
      <p>
        {d.input.job.customer} · {d.input.job.motor}
      </p>
      <section className="approval" aria-label="Approval">
        {basis.kind === 'redesign' && (
          <p>
            <strong>⚠ REDESIGNED WINDING: it differs from the original. Wind exactly this.</strong>
          </p>
        )}
        <Rows rows={d.approval} />
      </section>

      <section aria-labelledby="bp-wind">
        <h2 id="bp-wind">Wind this</h2>
        <Rows rows={d.summary} />
      </section>

      <section aria-labelledby="bp-groups">
        <h2 id="bp-groups">Coil groups round the stator</h2>
        <p className="small">
          S = start of a group (first coil, top side), F = finish. Slots listed start → finish for each coil, in winding order.
        </p>
        <div className="scroll">
          <table aria-label="Coil groups round the stator">
            <thead>
              <tr>
                <th scope="col">No.</th>
                <th scope="col">Group</th>
                <th scope="col">Pole</th>
                <th scope="col">Coils</th>
                <th scope="col">Slots (S → F)</th>
                <th scope="col">Span</th>
                <th scope="col">Turns</th>
                <th scope="col">Sense</th>
              </tr>
            </thead>
            <tbody>
              {d.groups.map((g) => (
                <tr key={g.number}>
                  <td>{g.number}</td>
                  <th scope="row">{g.label}</th>
                  <td>{g.pole}</td>
                  <td>{g.coils}</td>
                  <td>{g.slots}</td>
                  <td>{g.spans}</td>
                  <td>{g.turns}</td>
                  <td>{g.senseText}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="bp-conn">
        <h2 id="bp-conn">Connection</h2>
        <p>
          <strong>{d.poleConnectionText}</strong>
        </p>
        <p className="small">
          Each circuit is written lead to lead, every group entry end first: S·A1·F means in at the start of A1, out at its finish.
        </p>
        {d.circuits.map((c) => (
          <div key={`${c.phase}-${c.index}`} className="circuit">
            <strong>
              Circuit {c.phase}-{c.index}
            </strong>{' '}
            ({c.turns} turns):{' '}
            <code>
              {c.startLead} → {c.path} → {c.finishLead}
            </code>
            {c.jumpers.length > 0 && <div className="small">Jumpers: {c.jumpers.join('; ')}</div>}
          </div>
        ))}
        <p>
          <strong>Supply lines: {d.leadText.lines.join(' · ')}</strong>
        </p>
        <ul>
          {d.leadText.joints.map((j) => (
            <li key={j}>{j}</li>
          ))}
        </ul>
        <h3>Connection diagram ({d.leadPlan.standard})</h3>
        <ConnectionDiagramSvg
          diagram={diagram}
          title={`Connection diagram: ${d.circuits.map((c) => `circuit ${c.phase}-${c.index} ${c.startLead} ${c.path} ${c.finishLead}`).join('; ')}`}
        />
      </section>

      <section aria-labelledby="bp-wire">
        <h2 id="bp-wire">Wire to draw from stock</h2>
        <p>{d.wire.allowanceText}</p>
        <div className="scroll">
          <table aria-label="Wire to draw from stock">
            <thead>
              <tr>
                <th scope="col">Wires in hand</th>
                <th scope="col">Length in the winding</th>
                <th scope="col">Copper</th>
                <th scope="col">Draw (with allowance)</th>
                <th scope="col">On hand</th>
              </tr>
            </thead>
            <tbody>
              {d.wire.rows.map((w) => (
                <tr key={w.label}>
                  <th scope="row">{w.label}</th>
                  {w.values.map((v, i) => (
                    <td key={i} className={v.includes('NOT ENOUGH') ? 'short' : undefined}>
                      {v}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p>
          <strong>{d.wire.totalText}</strong>
        </p>
      </section>

      <section aria-labelledby="bp-coils">
        <h2 id="bp-coils">Coil dimensions for the former (estimates)</h2>
        <div className="scroll">
          <table aria-label="Coil dimensions">
            <thead>
              <tr>
                <th scope="col">Coil</th>
                <th scope="col">Straight (slot) length</th>
                <th scope="col">End extension, each end</th>
                <th scope="col">Pitch at mid-slot</th>
                <th scope="col">Mean turn length</th>
              </tr>
            </thead>
            <tbody>
              {d.coilRows.map((c) => (
                <tr key={c.label}>
                  <th scope="row">{c.label}</th>
                  {c.values.map((v, i) => (
                    <td key={i}>{v}</td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="small">{d.coilNote}</p>
      </section>

      <section aria-labelledby="bp-ins">
        <h2 id="bp-ins">Insulation</h2>
        <Rows rows={d.insulation} />
      </section>

      <section aria-labelledby="bp-caut">
        <h2 id="bp-caut">Cautions</h2>
        <ul className="cautions">
          {d.cautions.map((c) => (
            <li key={c}>⚠ {c}</li>
          ))}
        </ul>
      </section>
      <div className="sign">
        <div>Wound by · date</div>
        <div>Connected and checked by · date</div>
      </div>
    </div>
  );
}
