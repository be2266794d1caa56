import Link from 'next/link';
import { can } from '@/lib/auth/permissions';
import { getJobByNumber, listStaff, motorHistory } from '@/lib/jobs/job-queries';
import { STATUS_LABELS, allowedMoves, moveLabel } from '@/lib/jobs/status-flow';
import { ShopPath } from '@/app/_components/shop-path';
import { CONNECTION_LABELS } from '@/lib/jobs/motor-schema';
import { fmt } from '@/lib/presentation/format';
import { polesFromSpeed } from '@/lib/engine/speed';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { getGateFacts } from '@/lib/jobs/gate-facts';
import { gateRefusal, releasingDecision } from '@/lib/jobs/shop-gates';
import { JobDetailsForm } from './job-details-form';
import { StatusMoves } from './status-moves';
import { PhotoUpload } from './photo-upload';
import { QuoteNote } from './quote-note';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Job ${(await params).number}` };
}

export default async function JobPage({ params }: { params: Promise<{ number: string }> }) {
  const { user, job } = await loadJobRoute(params, getJobByNumber);
  const [staff, history, redesign] = await Promise.all([listStaff(), motorHistory(job.motorId, job.id), getApprovedRedesign(job.id)]);
  const m = job.motor;
  const poles = m.frequencyHz && m.speedRpm ? polesFromSpeed(m.frequencyHz, m.speedRpm) : null;
  const facts = await getGateFacts(job.id);
  const moves = can(user.role, 'job.move')
    ? allowedMoves(job.status, job.heldFrom, user.role).map((to) => {
        const blocked = gateRefusal(job.status, to, facts);
        const release = blocked ? releasingDecision(job.status, to) : null;
        return { to, label: moveLabel(job.status, to), ...(blocked ? { blocked } : {}), ...(release ? { release } : {}) };
      })
    : [];
  const contact = job.customer.contacts[0];

  return (
    <>
      <p className="no-print">
        <Link href="/jobs">← Job board</Link>
      </p>
      <h1>
        Job {job.number} · {job.customer.company}
      </h1>
      <ShopPath status={job.status} heldFrom={job.heldFrom} />

      <section className="card" aria-labelledby="moves-h">
        <h2 id="moves-h">Status: {STATUS_LABELS[job.status]}</h2>
        <StatusMoves jobId={job.id} version={job.version} moves={moves} mayRelease={can(user.role, 'job.override')} />
        {facts.readyOverride && (
          <p className="small" data-testid="ready-override">
            Engineer’s override on record ({facts.readyOverride.by}, {fmt.date(facts.readyOverride.at)}): {facts.readyOverride.reason}
          </p>
        )}
        {facts.keepOriginal && (
          <p className="small">
            Original winding kept ({facts.keepOriginal.by}, {fmt.date(facts.keepOriginal.at)}): {facts.keepOriginal.reason}
          </p>
        )}
        <QuoteNote jobId={job.id} jobNumber={job.number} status={job.status} />
      </section>

      <nav className="card no-print" aria-label="Workshop records">
        <h2>Workshop records</h2>
        <ul className="row" style={{ listStyle: 'none', padding: 0, gap: '1.5rem' }}>
          <li>
            <Link href={jobRoutes(job.number).quote}>Estimate and quote</Link>
          </li>
          <li>
            <Link href={jobRoutes(job.number).asFound}>As-found data sheet</Link>
          </li>
          <li>
            <Link href={`/jobs/${job.number}/redesign`}>Redesign</Link>
            {redesign && <span className="small"> (current: revision {redesign.revision}, approved)</span>}
          </li>
          <li>
            <Link href={jobRoutes(job.number).coreTest}>Core-loss (loop) test</Link>
          </li>
          <li>
            <Link href={jobRoutes(job.number).finalTests}>Final tests</Link>
          </li>
          <li>
            <Link href={`/jobs/${job.number}/job-sheet`}>Job sheet</Link>
          </li>
          <li>
            <a className="btn secondary" href={`/jobs/${job.number}/job-sheet/pdf`} download>
              Download job sheet (PDF)
            </a>
          </li>
        </ul>
      </nav>

      <div className="grid" style={{ gridTemplateColumns: 'repeat(auto-fit, minmax(min(340px, 100%), 1fr))' }}>
        <section className="card" aria-labelledby="cust-h">
          <h2 id="cust-h">Customer</h2>
          <dl className="dl">
            <dt>Company</dt>
            <dd>{job.customer.company}</dd>
            <dt>Contact</dt>
            <dd>{contact?.name ?? '—'}</dd>
            <dt>Phone</dt>
            <dd>{job.customer.phone ?? '—'}</dd>
            <dt>Email</dt>
            <dd>{job.customer.email ?? '—'}</dd>
            <dt>Received</dt>
            <dd>{fmt.date(job.receivedAt)}</dd>
          </dl>
        </section>
        <section className="card" aria-labelledby="plate-h">
          <h2 id="plate-h">Nameplate</h2>
          <dl className="dl">
            <dt>Motor</dt>
            <dd>
              {m.manufacturer} {m.model ?? ''} · S/N {m.serial ?? '—'} · frame {m.frame ?? '—'}
            </dd>
            <dt>Output</dt>
            <dd>{fmt.power(m.outputKw)}</dd>
            <dt>Voltage</dt>
            <dd>
              {fmt.num(m.ratedVoltageV, 0, 'V')} {m.voltages ? `(plate: ${m.voltages} V)` : ''} ·{' '}
              {m.connection ? (CONNECTION_LABELS[m.connection as keyof typeof CONNECTION_LABELS] ?? m.connection) : 'connection not stated'}
            </dd>
            <dt>Current</dt>
            <dd>{fmt.num(m.currentA, 1, 'A')}</dd>
            <dt>Supply</dt>
            <dd>
              {m.phases} phase · {fmt.num(m.frequencyHz, 0, 'Hz')}
            </dd>
            <dt>Speed</dt>
            <dd>
              {fmt.num(m.speedRpm, 0, 'rpm')} {poles?.ok ? `(${poles.value} poles)` : ''}
            </dd>
            <dt>Insulation / duty</dt>
            <dd>
              Class {m.insulationClass ?? '—'} · {m.duty ?? '—'} · SF {m.serviceFactor ?? '—'}
            </dd>
            <dt>Enclosure</dt>
            <dd>{m.enclosure ?? '—'}</dd>
            <dt>Efficiency, PF</dt>
            <dd>
              {fmt.num(m.efficiencyPercent, 1, '%')} · {fmt.num(m.powerFactor, 2)}
            </dd>
            <dt>Code / design</dt>
            <dd>
              {m.codeLetter ?? '—'} / {m.designLetter ?? '—'}
            </dd>
            <dt>Bearings</dt>
            <dd>
              DE {m.bearingDriveEnd ?? '—'} · ODE {m.bearingOppositeEnd ?? '—'}
            </dd>
          </dl>
        </section>
      </div>

      <section className="card" aria-labelledby="details-h">
        <h2 id="details-h">Job details</h2>
        {can(user.role, 'job.edit') ? (
          <JobDetailsForm
            key={job.id}
            staff={staff.map((s) => ({ id: s.id, name: s.name }))}
            current={{
              jobId: job.id,
              version: job.version,
              promisedAt: job.promisedAt ? job.promisedAt.toISOString().slice(0, 10) : '',
              priority: job.priority,
              customerPo: job.customerPo ?? '',
              reportedFault: job.reportedFault ?? '',
              notes: job.notes ?? '',
              assigneeId: job.assigneeId ?? '',
            }}
          />
        ) : (
          <dl className="dl">
            <dt>Reported fault</dt>
            <dd>{job.reportedFault ?? '—'}</dd>
            <dt>Promised</dt>
            <dd>{fmt.day(job.promisedAt)}</dd>
            <dt>Priority</dt>
            <dd>{job.priority.toLowerCase()}</dd>
            <dt>Customer PO</dt>
            <dd>{job.customerPo ?? '—'}</dd>
            <dt>Assigned to</dt>
            <dd>{job.assignee?.name ?? '—'}</dd>
            <dt>Notes</dt>
            <dd>{job.notes ?? '—'}</dd>
          </dl>
        )}
      </section>

      <section className="card" aria-labelledby="photos-h">
        <h2 id="photos-h">Photos</h2>
        {job.attachments.length === 0 ? (
          <p className="muted">No photos yet.</p>
        ) : (
          <div className="photos">
            {job.attachments.map((a) => (
              <figure key={a.id}>
                <a href={`/api/attachments/${a.id}`}>
                  <img src={`/api/attachments/${a.id}`} alt={`${a.kind.toLowerCase()} photo ${a.filename}`} />
                </a>
                <figcaption>
                  {a.kind.toLowerCase()} · {a.filename} · {fmt.bytes(a.sizeBytes)}
                </figcaption>
              </figure>
            ))}
          </div>
        )}
        {can(user.role, 'job.attach') && <PhotoUpload jobId={job.id} />}
      </section>

      <section className="card" aria-labelledby="timeline-h">
        <h2 id="timeline-h">Timeline</h2>
        <ol className="timeline" reversed>
          {job.events.map((e) => (
            <li key={e.id}>
              <span className="muted small">
                {fmt.dateTime(e.at)} · {e.user?.name ?? 'system'}
              </span>
              <div>{e.message}</div>
            </li>
          ))}
        </ol>
      </section>

      {history.length > 0 && (
        <section className="card" aria-labelledby="history-h">
          <h2 id="history-h">Earlier jobs on this motor</h2>
          <ul>
            {history.map((h) => (
              <li key={h.number}>
                <Link href={`/jobs/${h.number}`}>Job {h.number}</Link> · {fmt.date(h.receivedAt)} · {STATUS_LABELS[h.status]} ·{' '}
                {h.reportedFault}
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
}
