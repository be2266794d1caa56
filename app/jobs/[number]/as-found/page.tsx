import Link from 'next/link';
import { can } from '@/lib/auth/permissions';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { draftPayloadSchema } from '@/lib/as-found/draft-schema';
import { restoreDraftValues } from '@/lib/as-found/draft-values';
import { prefillFromNameplate } from '@/lib/as-found/prefill';
import { savedLengthMemory, sheetToForm } from '@/lib/as-found/as-found-form';
import { SHEET_MESSAGES } from '@/lib/as-found/as-found-messages';
import { getAsFoundSheet, getJobForSheet, getLengthUnit, getSheetDraft, listSheetRevisions } from '@/lib/as-found/as-found-queries';
import { fmt } from '@/lib/presentation/format';
import { PhotoUpload } from '../photo-upload';
import { SheetEditor, type SheetEditorProps } from './_parts/sheet-editor';
import './sheet.css';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';
import { isRecordLocked } from '@/lib/jobs/record-locks';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Data sheet · job ${(await params).number}` };
}

export default async function SheetPage({ params }: { params: Promise<{ number: string }> }) {
  const { user, job } = await loadJobRoute(params, getJobForSheet);
  const frozen = isRecordLocked('asFoundSheet', job.status, job.heldFrom);
  const mayEdit = can(user.role, 'sheet.edit');
  const editable = mayEdit && !frozen;
  const [saved, draftRow, unit] = await Promise.all([
    getAsFoundSheet(job.id),
    editable ? getSheetDraft(job.id, user.id) : null,
    getLengthUnit(user.id),
  ]);
  const draft = draftRow ? draftPayloadSchema.safeParse(draftRow.data) : null;
  const revisions = saved ? await listSheetRevisions(saved.id) : [];

  let initial: SheetEditorProps['initial'];
  if (draft?.success && draftRow) {
    initial = {
      values: restoreDraftValues(draft.data.values),
      unit: draft.data.unit,
      slotTable: draft.data.slotTable,
      source: 'draft',
      draftSavedAt: draftRow.updatedAt.toISOString(),
      ...(draft.data.baseRevision !== undefined ? { baseRevision: draft.data.baseRevision } : {}),
    };
  } else if (saved) {
    initial = {
      values: sheetToForm(saved.sheet, unit),
      unit,
      slotTable: saved.sheet.winding.slotTable,
      source: 'saved',
      lengthMemory: savedLengthMemory(saved.sheet, unit),
    };
  } else {
    initial = { values: prefillFromNameplate(job.motor), unit, source: 'nameplate' };
  }
  const readOnlyReason = frozen
    ? SHEET_MESSAGES.frozen(STATUS_LABELS[job.status])
    : !mayEdit
      ? 'Your role can read this data sheet; winders and engineers record it.'
      : null;
  const m = job.motor;

  return (
    <>
      <p className="no-print">
        <Link href={`/jobs/${job.number}`}>← Job {job.number}</Link>
      </p>
      <h1>As-found data sheet · job {job.number}</h1>
      <p className="muted">
        {job.customer.company} · {m.manufacturer} {m.model ?? ''} · S/N {m.serial ?? '—'} · {fmt.power(m.outputKw)} ·{' '}
        {fmt.num(m.ratedVoltageV, 0, 'V')} · {fmt.num(m.speedRpm, 0, 'rpm')} · status {STATUS_LABELS[job.status]} ·{' '}
        {saved ? `saved revision ${saved.revision}, ${fmt.dateTime(saved.updatedAt)}` : 'not recorded yet'}
      </p>
      {saved && (
        <p className="no-print">
          <Link href={`${jobRoutes(job.number).benchPack}?basis=original`}>Bench pack for a rewind to the original winding</Link> (coil
          groups, connections, wire to draw, coil sizes)
        </p>
      )}
      {!saved && initial.source === 'nameplate' && editable && (
        <p className="notice small">
          New sheet: supply and rating are filled in from the nameplate. Check them against the winding you find.
        </p>
      )}
      <SheetEditor
        key={job.id}
        jobId={job.id}
        jobNumber={job.number}
        editable={editable}
        readOnlyReason={readOnlyReason}
        savedRevision={saved?.revision ?? null}
        initial={initial}
      />
      {revisions.length > 0 && (
        <section className="card no-print" aria-labelledby="sheet-history-h">
          <h2 id="sheet-history-h">Revision history</h2>
          <table>
            <thead>
              <tr>
                <th scope="col">Revision</th>
                <th scope="col">Saved</th>
                <th scope="col">By</th>
                <th scope="col">Download</th>
              </tr>
            </thead>
            <tbody>
              {revisions.map((r) => (
                <tr key={r.revision}>
                  <td>
                    {r.revision}
                    {r.revision === saved?.revision ? ' (current)' : ''}
                  </td>
                  <td>{fmt.dateTime(r.savedAt)}</td>
                  <td>{r.savedBy}</td>
                  <td>
                    <a href={`${jobRoutes(job.number).asFoundExport}?rev=${r.revision}`}>JSON of revision {r.revision}</a>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      )}
      <section className="card" aria-labelledby="sheet-photos-h">
        <h2 id="sheet-photos-h">Photos</h2>
        {job.attachments.length === 0 ? (
          <p className="muted">No photos yet. Photograph the connections, the lead markings and a coil group before stripping.</p>
        ) : (
          <div className="photos">
            {job.attachments.map((a) => (
              <figure key={a.id}>
                <a href={`/api/attachments/${a.id}`}>
                  <img src={`/api/attachments/${a.id}`} alt={`${a.kind.toLowerCase()} photo ${a.filename}`} />
                </a>
                <figcaption>
                  {a.kind.toLowerCase()} · {a.filename}
                </figcaption>
              </figure>
            ))}
          </div>
        )}
        {can(user.role, 'job.attach') && <PhotoUpload jobId={job.id} />}
      </section>
    </>
  );
}
