import Link from 'next/link';
import { z } from 'zod';
import { can } from '@/lib/auth/permissions';
import { getJobByNumber } from '@/lib/jobs/job-queries';
import { redesignReport } from '@/lib/engine/redesign/report';
import type { RedesignRequest } from '@/lib/engine/redesign/types';
import { loadRedesignContext, type RedesignContext } from '@/lib/redesign/redesign-context';
import { analyseWinding } from '@/lib/engine/analyse-winding';
import { harmonicSummary } from '@/lib/engine/redesign/families';
import { harmonicOf } from '@/lib/engine/redesign/ranking';
import { getStoredSearch, listRedesigns, type RedesignRevision } from '@/lib/redesign/redesign-queries';
import { REDESIGN_MESSAGES } from '@/lib/redesign/redesign-writes';
import { limitsToForm, type RedesignRequestFormInput } from '@/lib/redesign/redesign-schema';
import { fmt } from '@/lib/presentation/format';
import { RequestForm } from './request-form';
import { CandidateTable } from './candidate-table';
import { Cautions, ComparisonTable, NameplateProposal } from './comparison';
import { JobLosses } from '../_losses/job-losses';
import { ApproveForm } from './approve-form';
import './redesign.css';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';
import { spansLabel, layoutLabel } from '@/lib/engine/notation';

const searchSchema = z.object({ rev: z.coerce.number().int().positive().max(100_000).optional().catch(undefined) });

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Redesign · job ${(await params).number}` };
}

function formDefaults(jobId: string, request: RedesignRequest, draftVersion?: number): RedesignRequestFormInput {
  const t = request.target;
  return {
    jobId,
    ...(draftVersion ? { draftVersion } : {}),
    target: {
      lineVoltageV: t.lineVoltageV,
      frequencyHz: t.frequencyHz,
      poles: t.poles,
      connection: t.connection,
      spans: t.spans.join(', '),
      layers: t.layers,
      parallelPaths: t.parallelPaths.join(', '),
      allowOverPitch: t.allowOverPitch,
    },
    limits: limitsToForm(request.limits),
  };
}

function RevisionList({ revisions, selected, number }: { revisions: RedesignRevision[]; selected: number | undefined; number: number }) {
  const current = revisions.find((r) => r.status === 'APPROVED');
  return (
    <ul className="revisions">
      {revisions.map((r) => (
        <li key={r.id}>
          <Link href={`/jobs/${number}/redesign?rev=${r.revision}`} aria-current={r.revision === selected ? 'page' : undefined}>
            Revision {r.revision}
          </Link>
          {' · '}
          <span className="rev-status">{r.status === 'APPROVED' ? 'approved' : 'draft'}</span>
          {r === current && <strong> · current approved design</strong>}
          {r.status === 'APPROVED' ? (
            <>
              {' '}
              · by {r.approvedBy ?? '—'} on {fmt.dateTime(r.approvedAt)} ·{' '}
              <Link href={`/jobs/${number}/redesign/print?rev=${r.revision}`}>printable winding</Link> ·{' '}
              <Link href={`${jobRoutes(number).benchPack}?rev=${r.revision}`}>bench pack</Link>
            </>
          ) : (
            <>
              {' '}
              · opened by {r.createdBy ?? '—'}, last changed {fmt.dateTime(r.updatedAt)}
            </>
          )}
          {' · '}
          <span className="small muted">
            {r.request.target.lineVoltageV} V {r.request.target.frequencyHz} Hz, {r.request.target.poles} poles
          </span>
        </li>
      ))}
    </ul>
  );
}

export default async function RedesignPage({
  params,
  searchParams,
}: {
  params: Promise<{ number: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { user, job } = await loadJobRoute(params, getJobByNumber);
  const { rev } = searchSchema.parse(await searchParams);
  const [revisions, ctx] = await Promise.all([listRedesigns(job.id), loadRedesignContext(job.id)]);
  const latest = revisions[0];
  const current = revisions.find((r) => r.status === 'APPROVED');
  const selected = revisions.find((r) => r.revision === rev) ?? latest;
  const canEdit = can(user.role, 'redesign.edit');

  let requestDefaults: RedesignRequestFormInput | null = null;
  if (ctx.ok) {
    const s = ctx.value.sheet.sheet;
    const fromSheet: RedesignRequest = {
      target: {
        lineVoltageV: s.supply.lineVoltageV,
        frequencyHz: s.supply.frequencyHz,
        poles: s.supply.poles,
        connection: s.winding.connection,
        spans: [],
        layers: 'keep',
        parallelPaths: [],
        allowOverPitch: false,
      },
      limits: ctx.value.shopLimits,
    };
    requestDefaults =
      latest?.status === 'DRAFT'
        ? formDefaults(job.id, latest.request, latest.version)
        : formDefaults(job.id, latest?.request ?? fromSheet);
  }
  const nextRevision = latest?.status === 'DRAFT' ? latest.revision : (latest?.revision ?? 0) + 1;

  return (
    <>
      <p className="no-print">
        <Link href={`/jobs/${job.number}`}>← Job {job.number}</Link>
      </p>
      <h1>
        Redesign · job {job.number} · {job.customer.company}
      </h1>
      <p className="notice warn">
        A redesigned winding differs from the original. It must be reviewed and approved by a qualified person before it is wound, and the
        motor needs a supplementary nameplate. Hazardous-location and listed motors may lose their certification (IEC 60079-19). Local codes
        and licensed practice take precedence.
      </p>

      <section className="card" aria-labelledby="rev-h">
        <h2 id="rev-h">Revisions</h2>
        {revisions.length === 0 ? (
          <p className="muted">No redesign yet for this job.</p>
        ) : (
          <RevisionList revisions={revisions} selected={selected?.revision} number={job.number} />
        )}
        <p className="small" data-testid="current-revision">
          {current ? (
            <>
              The winder winds from <strong>revision {current.revision}</strong> (approved {fmt.dateTime(current.approvedAt)} by{' '}
              {current.approvedBy}).
            </>
          ) : (
            'No approved revision yet: nothing may be wound from this page.'
          )}
        </p>
      </section>

      {!ctx.ok ? (
        <p className="notice bad">
          {ctx.reason} <Link href={jobRoutes(job.number).asFound}>Open the as-found sheet</Link>
        </p>
      ) : (
        <section className="card" aria-labelledby="asfound-h">
          <h2 id="asfound-h">As found</h2>
          <AsFound ctx={ctx.value} />
        </section>
      )}

      {canEdit && requestDefaults && (
        <section className="card" aria-labelledby="req-h">
          <h2 id="req-h">
            {latest?.status === 'DRAFT' ? `Request (revision ${nextRevision}, draft)` : `New request (revision ${nextRevision})`}
          </h2>
          <RequestForm
            key={`${latest?.id ?? 'none'}-${latest?.version ?? 0}`}
            defaults={requestDefaults}
            submitLabel={
              latest?.status === 'DRAFT'
                ? `Find windings (update revision ${nextRevision})`
                : `Find windings (open revision ${nextRevision})`
            }
            intro={
              latest?.status === 'APPROVED'
                ? `Revision ${latest.revision} is approved and frozen. A new request opens revision ${nextRevision}, which needs its own approval; revision ${latest.revision} stays current until then.`
                : 'Enter the customer’s supply. The search tries every turns count, allowed circuit count, connection and span option with the wire sizes in stock.'
            }
          />
        </section>
      )}

      {selected &&
        (selected.status === 'APPROVED' ? (
          <ApprovedRevision r={selected} number={job.number} />
        ) : ctx.ok ? (
          <DraftRevision r={selected} ctx={ctx.value} canEdit={canEdit} mayApprove={can(user.role, 'redesign.approve')} />
        ) : null)}
    </>
  );
}

function AsFound({ ctx }: { ctx: RedesignContext }) {
  const s = ctx.sheet.sheet;
  const w = s.winding;
  return (
    <dl className="dl">
      <dt>Supply</dt>
      <dd>
        {s.supply.lineVoltageV} V {s.supply.frequencyHz} Hz, {s.supply.poles} poles, {w.connection} ·{' '}
        {fmt.num(s.supply.ratedCurrentA, 1, 'A')} · {fmt.power(s.supply.ratedOutputKw)}
      </dd>
      <dt>Core</dt>
      <dd>
        {s.core.slots} slots · bore {s.core.boreMm} mm · length {s.core.coreLengthMm} mm · OD {s.core.outsideDiameterMm} mm
      </dd>
      <dt>Winding</dt>
      <dd>
        {layoutLabel(w)}, span {spansLabel(w.spans)}, {w.turnsPerCoil.join('/')} turns, {w.parallelPaths} circuit(s)
      </dd>
      <dt>Wires in hand</dt>
      <dd>{ctx.original.wires.map((x) => `${x.count} × ${x.label}`).join(' + ')}</dd>
      <dt>Sheet</dt>
      <dd>
        revision {ctx.sheet.revision}, saved {fmt.dateTime(ctx.sheet.updatedAt)} · stock: {ctx.stock.length} sizes
      </dd>
    </dl>
  );
}

function ApprovedRevision({ r, number }: { r: RedesignRevision; number: number }) {
  const snap = r.snapshot;
  if (!snap) return <p className="notice bad">Revision {r.revision} is approved but its snapshot cannot be read.</p>;
  return (
    <section className="card" aria-labelledby="approved-h" id="chosen">
      <h2 id="approved-h">Revision {r.revision}: approved and frozen</h2>
      <p className="notice ok">
        Approved by <strong>{snap.approval.byName}</strong> on {fmt.dateTime(new Date(snap.approval.at))}. Note: “{snap.approval.note}”.
        Candidate {snap.search.rank} of {snap.search.candidatesFound}. This revision cannot be changed: a new request opens the next
        revision. <Link href={`/jobs/${number}/redesign/print?rev=${r.revision}`}>Printable winding for the winder</Link> ·{' '}
        <Link href={`${jobRoutes(number).benchPack}?rev=${r.revision}`}>Winder’s bench pack (groups, connections, wire, coil sizes)</Link>
      </p>
      <ComparisonTable report={snap.report} />
      <JobLosses jobNumber={number} comparing={snap.report} headingId="losses-approved-h" />
      <h3>Proposed supplementary nameplate</h3>
      <NameplateProposal report={snap.report} />
      <h3>Cautions</h3>
      <Cautions report={snap.report} />
    </section>
  );
}

async function DraftRevision({
  r,
  ctx,
  canEdit,
  mayApprove,
}: {
  r: RedesignRevision;
  ctx: RedesignContext;
  canEdit: boolean;
  mayApprove: boolean;
}) {
  // The page reads the result stored when the request was saved: it never searches on render.
  const stored = await getStoredSearch(r.id);
  if (!stored) return <p className="notice warn">{REDESIGN_MESSAGES.noStoredSearch}</p>;
  const search = stored.search;
  const chosen = r.chosenKey ? search.candidates.find((c) => c.key === r.chosenKey) : undefined;
  const report = chosen ? redesignReport(ctx.original, r.request, search, chosen) : null;
  const old = analyseWinding({ winding: ctx.original.winding, supply: ctx.original.supply, core: ctx.original.core });
  const flux =
    old.ok && old.value.flux
      ? { gapPeakT: old.value.flux.gapPeak.tesla, toothT: old.value.flux.toothMax.tesla, yokeT: old.value.flux.yoke.tesla }
      : null;
  const originalHarmonic = old.ok ? harmonicOf(harmonicSummary(old.value)) : 0;
  const t = r.request.target;
  return (
    <>
      <section className="card" aria-labelledby="cand-h" id="candidates">
        <h2 id="cand-h">
          Revision {r.revision} (draft): candidates for {t.lineVoltageV} V {t.frequencyHz} Hz, {t.poles} poles,{' '}
          {t.connection === 'either' ? 'star or delta' : t.connection}
        </h2>
        {r.sheetRevision !== ctx.sheet.revision && <p className="notice warn">{REDESIGN_MESSAGES.sheetChanged}</p>}
        <CandidateTable
          search={search}
          candidatesFound={stored.candidatesFound}
          choose={canEdit ? { redesignId: r.id, version: r.version } : null}
          chosenKey={r.chosenKey}
          fillLimit={search.originalBasis.slotFillLimit}
          limits={r.request.limits}
          originalFlux={flux}
          originalHarmonic={originalHarmonic}
          poleRatio={t.poles / ctx.original.winding.poles}
        />
      </section>
      {r.chosenKey && !chosen && <p className="notice bad">{REDESIGN_MESSAGES.candidateGone}</p>}
      {chosen && report?.ok && (
        <section className="card" aria-labelledby="chosen-h" id="chosen">
          <h2 id="chosen-h">Candidate {chosen.rank} beside the as-found winding</h2>
          <ComparisonTable report={report.value} />
          <JobLosses jobId={ctx.sheet.jobId} comparing={report.value} headingId="losses-draft-h" />
          <h3>Proposed supplementary nameplate</h3>
          <NameplateProposal report={report.value} />
          <h3>Cautions</h3>
          <Cautions report={report.value} />
          <h3>Approval</h3>
          <ApproveForm redesignId={r.id} version={r.version} revision={r.revision} mayApprove={mayApprove} />
        </section>
      )}
    </>
  );
}
