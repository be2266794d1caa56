import Link from 'next/link';
import { notFound } from 'next/navigation';
import { can } from '@/lib/auth/permissions';
import { listStaff } from '@/lib/jobs/job-queries';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { TEST_HAZARD_CAUTIONS } from '@/lib/job-sheet/safety-notices';
import { listTestRecords, getJobForFinalTests } from '@/lib/final-tests/record-queries';
import { basisDefaults, newRecordDefaults, recordToFormData } from '@/lib/final-tests/defaults';
import { judgeTestRecord } from '@/lib/final-tests/verdicts';
import { compareFinalResistance, RESISTANCE_CHECK_PERCENT, type ExpectedResistance } from '@/lib/final-tests/expected-resistance';
import { expectedResistanceFor } from '@/lib/final-tests/expected-resistance-source';
import { jobAsRepairedRating } from '@/lib/final-tests/test-rating-source';
import { ratingSentence } from '@/lib/final-tests/readings';
import { fmt, toZonedLocal } from '@/lib/presentation/format';
import type { TestRecordFormInput } from '@/lib/final-tests/test-record-schema';
import { OverallVerdict, SectionVerdict } from './judgement-view';
import { RecordReadings } from './record-readings';
import { TestsForm } from './tests-form';
import './final-tests.css';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { JobLosses } from '../_losses/job-losses';
import { isRecordLocked } from '@/lib/jobs/record-locks';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Final tests · job ${(await params).number}` };
}

/** datetime-local value for now, in UTC (minutes). */
const nowLocal = () => toZonedLocal(new Date());

export default async function TestsPage({ params }: { params: Promise<{ number: string }> }) {
  const { user, job } = await loadJobRoute(params, getJobForFinalTests);
  const [records, sheet, staff] = await Promise.all([listTestRecords(job.id), getAsFoundSheet(job.id), listStaff()]);
  const current = records[0] ?? null;
  const expected = await expectedResistanceFor(job.id, sheet);
  const rating = await jobAsRepairedRating(job.id);
  if (!rating) notFound();
  const motor = { rating, insulationClass: job.motor.insulationClass };
  const { sources } = basisDefaults(motor, sheet?.sheet ?? null);
  const closed = isRecordLocked('finalTests', job.status, job.heldFrom);
  const mayRecord = can(user.role, 'tests.record') && !closed;
  const me = staff.find((s) => s.id === user.id)?.id ?? '';

  const newValues: TestRecordFormInput = {
    jobId: job.id,
    recordId: '',
    version: '',
    previousSequence: current?.sequence ?? 0,
    testedAt: nowLocal(),
    testedById: me,
    data: newRecordDefaults(motor, sheet?.sheet ?? null, current?.data ?? null),
  };
  const editValues: TestRecordFormInput | null = current
    ? {
        jobId: job.id,
        recordId: current.id,
        version: current.version,
        previousSequence: current.sequence,
        testedAt: toZonedLocal(current.testedAt),
        testedById: current.testedBy?.id ?? '',
        data: recordToFormData(current.data),
      }
    : null;

  return (
    <>
      <p className="no-print">
        <Link href={`/jobs/${job.number}`}>← Job {job.number}</Link>
      </p>
      <h1>
        Final tests · job {job.number} · {job.customer.company}
      </h1>

      <section className="notice warn cautions" aria-labelledby="cautions-h">
        <h2 id="cautions-h" style={{ marginTop: 0 }}>
          ⚠ Test hazards
        </h2>
        <ul>
          {TEST_HAZARD_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      {!sheet && <p className="notice">No as-found sheet is saved for this job: the basis below comes from the nameplate alone.</p>}
      <p className="notice" data-testid="rating-basis">
        {rating.source === 'redesign'
          ? `New records are judged for the as-repaired rating from the approved redesign, revision ${rating.redesignRevision}: ${rating.ratedVoltageV ?? '—'} V ${rating.frequencyHz ?? '—'} Hz${rating.connection ? `, ${rating.connection}` : ''}. The nameplate as received no longer applies.`
          : 'New records are judged for the nameplate rating as received: no redesign is approved for this job.'}
      </p>

      <section className="card" aria-labelledby="current-h">
        <h2 id="current-h" style={{ marginTop: 0 }}>
          {current ? `Current record #${current.sequence}` : 'No tests recorded yet'}
        </h2>
        {current && (
          <>
            <p className="muted small">
              Tested {fmt.dateTime(current.testedAt)} by {current.testedBy?.name ?? '—'} · instruments{' '}
              {current.instrumentSerials.join(', ') || '—'} · version {current.version}
            </p>
            <p data-testid="current-rating">
              <strong>Verdicts {ratingSentence(current.data.basis)}.</strong>
            </p>
            <CurrentJudgement data={current.data} />
            <ResistanceAgainstPrediction expected={expected} data={current.data} />
            <RecordReadings data={current.data} />
          </>
        )}
        {closed && <p className="notice">This job is {STATUS_LABELS[job.status].toLowerCase()}: its test records are kept as they were.</p>}
      </section>
      <section className="card">
        <JobLosses jobId={job.id} headingId="losses-h" level="h2" />
      </section>

      {mayRecord && (
        <section className="card">
          <TestsForm
            key={job.id}
            jobId={job.id}
            staff={staff.map((s) => ({ id: s.id, name: s.name }))}
            current={current ? { recordId: current.id, version: current.version, sequence: current.sequence } : null}
            editValues={editValues}
            newValues={newValues}
            sources={sources}
          />
        </section>
      )}

      {records.length > 1 && (
        <section className="card history" aria-labelledby="history-h">
          <h2 id="history-h" style={{ marginTop: 0 }}>
            Earlier records
          </h2>
          {records.slice(1).map((r) => (
            <details key={r.id}>
              <summary>
                #{r.sequence} · {fmt.dateTime(r.testedAt)} · {r.testedBy?.name ?? '—'} · {r.verdict}
              </summary>
              <CurrentJudgement data={r.data} />
              <RecordReadings data={r.data} />
            </details>
          ))}
        </section>
      )}
    </>
  );
}

function CurrentJudgement({ data }: { data: Parameters<typeof judgeTestRecord>[0] }) {
  const j = judgeTestRecord(data);
  return (
    <>
      <OverallVerdict judgement={j} />
      {j.sections.map((s) => (
        <SectionVerdict key={s.key} section={s} id={`saved-${s.key}`} />
      ))}
    </>
  );
}

/** The final resistance beside the prediction from the winding data (information, not a verdict). */
function ResistanceAgainstPrediction({
  expected,
  data,
}: {
  expected: ExpectedResistance | null;
  data: Parameters<typeof judgeTestRecord>[0];
}) {
  if (!expected) return null;
  const c = compareFinalResistance(expected, data.resistance);
  if (!c) return null;
  const off = Math.abs(c.differencePercent) > RESISTANCE_CHECK_PERCENT;
  return (
    <p className={`notice ${off ? 'warn' : 'ok'}`} data-testid="resistance-vs-prediction">
      {off ? '⚠ ' : ''}Winding resistance against the prediction from the {expected.source}: expected {fmt.num(c.expectedOhm, 4, 'Ω')}{' '}
      {c.between} at {fmt.num(c.temperatureC, 1, '°C')}, measured average {fmt.num(c.finalAverageOhm, 4, 'Ω')} (
      {c.differencePercent >= 0 ? '+' : ''}
      {c.differencePercent.toFixed(1)} %).
      {off
        ? ` More than ${RESISTANCE_CHECK_PERCENT} % apart: check the turns, connections and wire size against the data before the motor leaves.`
        : ''}
    </p>
  );
}
