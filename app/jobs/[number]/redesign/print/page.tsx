import Link from 'next/link';
import { jobRoutes } from '@/lib/routes';
import { z } from 'zod';
import { getJobByNumber } from '@/lib/jobs/job-queries';
import { listRedesigns } from '@/lib/redesign/redesign-queries';
import { fmt } from '@/lib/presentation/format';
import { mmToInches } from '@/lib/engine/units';
import { Cautions, ComparisonTable, NameplateProposal } from '../comparison';
import { PrintButton } from '../print-button';
import '../redesign.css';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { spanLabel, layoutLabel } from '@/lib/engine/notation';

const searchSchema = z.object({ rev: z.coerce.number().int().positive().max(100_000).optional().catch(undefined) });

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Approved winding · job ${(await params).number}` };
}

/** The winder's sheet: the approved winding (current revision, or ?rev=N of an approved one), printable. */
export default async function RedesignPrintPage({
  params,
  searchParams,
}: {
  params: Promise<{ number: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { job } = await loadJobRoute(params, getJobByNumber);
  const { rev } = searchSchema.parse(await searchParams);
  const approved = (await listRedesigns(job.id)).filter((r) => r.status === 'APPROVED');
  const r = rev ? approved.find((x) => x.revision === rev) : approved[0];
  const snap = r?.snapshot;
  if (!r || !snap) {
    return (
      <>
        <p className="no-print">
          <Link href={`/jobs/${job.number}/redesign`}>← Redesign</Link>
        </p>
        <h1>Approved winding · job {job.number}</h1>
        <p className="notice bad">
          {rev ? `Revision ${rev} is not an approved revision.` : 'No approved redesign for this job.'} Wind only from an approved revision.
        </p>
      </>
    );
  }
  const c = snap.report.candidate;
  const w = c.winding;
  const isCurrent = approved[0]?.revision === r.revision;
  return (
    <div className="winder-sheet">
      <p className="no-print row">
        <Link href={`/jobs/${job.number}/redesign?rev=${r.revision}`}>← Redesign</Link> <PrintButton label="Print this winding" />{' '}
        <Link className="btn secondary" href={`${jobRoutes(job.number).benchPack}?rev=${r.revision}`}>
          Bench pack: groups, connections, wire, coil sizes
        </Link>
      </p>
      <h1>
        Approved winding · job {job.number} · revision {r.revision}
      </h1>
      <p className={isCurrent ? 'notice ok' : 'notice bad'}>
        {isCurrent
          ? 'Current approved revision.'
          : `Superseded: revision ${approved[0]?.revision} is the current approved revision. Do not wind from this one.`}{' '}
        Approved by <strong>{snap.approval.byName}</strong> on {fmt.dateTime(new Date(snap.approval.at))}: “{snap.approval.note}”
      </p>
      <section className="card" aria-labelledby="motor-h">
        <h2 id="motor-h">Motor</h2>
        <dl className="dl">
          <dt>Customer</dt>
          <dd>{job.customer.company}</dd>
          <dt>Motor</dt>
          <dd>
            {job.motor.manufacturer} {job.motor.model ?? ''} · S/N {job.motor.serial ?? '—'} · frame {job.motor.frame ?? '—'}
          </dd>
          <dt>New supply</dt>
          <dd>
            {snap.request.target.lineVoltageV} V {snap.request.target.frequencyHz} Hz, {w.poles} poles,{' '}
            {w.connection === 'star' ? 'star (Y)' : 'delta (Δ)'}
          </dd>
        </dl>
      </section>
      <section className="card" aria-labelledby="wind-h">
        <h2 id="wind-h">Wind this</h2>
        <dl className="dl">
          <dt>Slots, poles</dt>
          <dd>
            {w.slots} slots, {w.poles} poles
          </dd>
          <dt>Layers, style</dt>
          <dd>
            {layoutLabel(w)}
            {w.singleLayerCoiling ? `, ${w.singleLayerCoiling}-coiled` : ''}
          </dd>
          <dt>Coil span</dt>
          <dd>{w.spans.map((y) => `${spanLabel(y)} (${y} slot pitches)`).join(', ')}</dd>
          <dt>Turns per coil</dt>
          <dd>
            <strong>{w.turnsPerCoil.join(' / ')}</strong>
          </dd>
          <dt>Parallel circuits</dt>
          <dd>
            <strong>{w.parallelPaths}</strong>
          </dd>
          <dt>Connection</dt>
          <dd>
            <strong>{w.connection === 'star' ? 'star (Y)' : 'delta (Δ)'}</strong>
          </dd>
          <dt>Wires in hand</dt>
          <dd>
            <strong>{c.wires.label}</strong>
            <ul className="small">
              {c.wires.parts.map((p) => (
                <li key={p.wire.label + p.wire.enamelGrade}>
                  {p.count} × {p.wire.label}, grade {p.wire.enamelGrade}: bare {p.wire.bareMm.toFixed(3)} mm (
                  {mmToInches(p.wire.bareMm).toFixed(4)} in), insulated about {p.wire.overallMm.toFixed(3)} mm
                </li>
              ))}
            </ul>
          </dd>
          <dt>Conductors per slot</dt>
          <dd>{c.conductorsPerSlot}</dd>
          <dt>Series turns per phase</dt>
          <dd>{c.seriesTurnsPerPhase}</dd>
        </dl>
      </section>
      <section className="card" aria-labelledby="cmp-h">
        <h2 id="cmp-h">As found and as redesigned</h2>
        <ComparisonTable report={snap.report} />
      </section>
      <section className="card" aria-labelledby="plate-h">
        <h2 id="plate-h">Supplementary nameplate (proposed)</h2>
        <NameplateProposal report={snap.report} />
      </section>
      <section className="card" aria-labelledby="caut-h">
        <h2 id="caut-h">Cautions</h2>
        <Cautions report={snap.report} />
      </section>
    </div>
  );
}
