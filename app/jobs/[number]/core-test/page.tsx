import Link from 'next/link';
import { z } from 'zod';
import { can } from '@/lib/auth/permissions';
import { getCoreLossSettings } from '@/lib/core-test/core-loss-settings';
import { CORE_TEST_CAUTIONS } from '@/lib/core-test/core-test-cautions';
import { getJobForCoreTest, listCoreTests } from '@/lib/core-test/core-test-queries';
import { coreRingFromSheet } from '@/lib/core-test/core-ring-from-sheet';
import { coreTestReport, DEFAULT_PLANNING_SUPPLY_V } from '@/lib/core-test/core-test-report';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { listStaff } from '@/lib/jobs/job-queries';
import { isRecordLocked } from '@/lib/jobs/record-locks';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';
import type { CoreTestFormInput } from '@/lib/core-test/core-test-schema';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { CoreDrawing, type DrawnHotSpot } from './core-drawing';
import { CoreSettingsForm } from './core-settings-form';
import { CoreTestFormView } from './core-test-form';
import { CoreTestResults } from './core-test-results';
import { LoopPlanner } from './loop-planner';
import './core-test.css';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Core-loss test · job ${(await params).number}` };
}

const searchSchema = z.object({ edit: z.uuid().optional().catch(undefined) });
const nowLocal = () => new Date().toISOString().slice(0, 16);
const blank = (v: number | undefined) => (v === undefined ? '' : v);

export default async function CoreTestPage({
  params,
  searchParams,
}: {
  params: Promise<{ number: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { user, job } = await loadJobRoute(params, getJobForCoreTest);
  const { edit } = searchSchema.parse(await searchParams);
  const [sheet, tests, settings, staff] = await Promise.all([
    getAsFoundSheet(job.id),
    listCoreTests(job.id),
    getCoreLossSettings(),
    listStaff(),
  ]);
  const analysis = sheet ? analyseSheet(sheet.sheet) : null;
  const yokeT = analysis?.ok ? (analysis.value.winding.flux?.yoke.tesla ?? null) : null;
  const report = coreTestReport(sheet?.sheet ?? null, tests, settings, yokeT);
  const mayRecord = can(user.role, 'tests.record') && !isRecordLocked('coreTests', job.status, job.heldFrom);
  const editing = edit ? (tests.find((t) => t.id === edit) ?? null) : null;
  const me = staff.find((s) => s.id === user.id)?.id ?? '';
  const frequencyHz = sheet?.sheet.supply.frequencyHz ?? 50;

  const values: CoreTestFormInput = editing
    ? {
        jobId: job.id,
        stage: editing.stage,
        testedAt: editing.testedAt.toISOString().slice(0, 16),
        testedById: editing.testedBy?.id ?? '',
        data: {
          ...editing.data,
          durationMin: blank(editing.data.durationMin),
          ambientC: blank(editing.data.ambientC),
          coreStartC: blank(editing.data.coreStartC),
          coreEndC: blank(editing.data.coreEndC),
          instrument: editing.data.instrument ?? '',
          notes: editing.data.notes ?? '',
        },
      }
    : {
        jobId: job.id,
        stage: tests.some((t) => t.stage === 'BEFORE_STRIPPING') ? 'AFTER_STRIPPING' : 'BEFORE_STRIPPING',
        testedAt: nowLocal(),
        testedById: me,
        data: {
          loopTurns: report.plan?.turns ?? '',
          voltageV: '',
          currentA: '',
          watts: '',
          frequencyHz,
          durationMin: '',
          ambientC: '',
          coreStartC: '',
          coreEndC: '',
          hotSpots: [],
          instrument: '',
          notes: '',
        },
      };

  let n = 0;
  const spots: DrawnHotSpot[] = report.figures.flatMap((fig) =>
    (fig.result?.hotSpots ?? fig.test.data.hotSpots.map((h) => ({ ...h, axialPositionM: h.axialPositionMm / 1000, overLimit: false }))).map(
      (h) => ({
        n: ++n,
        slot: h.slot,
        axialPositionMm: Math.round(h.axialPositionM * 1000 * 10) / 10,
        riseK: h.riseK,
        overLimit: h.overLimit,
        stage: fig.test.stage,
      }),
    ),
  );

  return (
    <>
      <p className="no-print">
        <Link href={jobRoutes(job.number).job}>← Job {job.number}</Link>
      </p>
      <h1>
        Core-loss (loop) test · job {job.number} · {job.customer.company}
      </h1>

      <section className="notice warn cautions" aria-labelledby="core-cautions-h">
        <h2 id="core-cautions-h" style={{ marginTop: 0 }}>
          ⚠ Loop-test hazards
        </h2>
        <ul>
          {CORE_TEST_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      <section className="card" aria-labelledby="plan-h">
        <h2 id="plan-h" style={{ marginTop: 0 }}>
          Planning the test
        </h2>
        {!sheet && (
          <p className="notice">
            No as-found sheet is saved: enter the core on the <Link href={jobRoutes(job.number).asFound}>as-found sheet</Link> to plan the
            test and work out W/kg.
          </p>
        )}
        {report.planError && (
          <p className="notice bad">
            {report.planError.message} {report.planError.hint}
          </p>
        )}
        {sheet && report.plan && (
          <>
            <p className="small muted">
              From the core on the as-found sheet, revision {sheet.revision}: OD {sheet.sheet.core.outsideDiameterMm} mm, bore{' '}
              {sheet.sheet.core.boreMm} mm, slot depth {sheet.sheet.core.slotDepthMm} mm, length {sheet.sheet.core.coreLengthMm} mm,
              stacking factor {sheet.sheet.core.stackingFactor}
              {sheet.sheet.core.ventDucts ? `, ${sheet.sheet.core.ventDucts} vent ducts of ${sheet.sheet.core.ventDuctWidthMm} mm` : ''}.
            </p>
            <LoopPlanner
              ring={coreRingFromSheet(sheet.sheet.core)}
              testFluxDensityT={settings.testFluxDensityT}
              fieldStrengthAPerM={settings.fieldStrengthAPerM}
              frequencyHz={frequencyHz}
              supplyVoltageV={DEFAULT_PLANNING_SUPPLY_V}
            />
          </>
        )}
      </section>

      <section className="card" aria-labelledby="verdict-h">
        <h2 id="verdict-h" style={{ marginTop: 0 }}>
          Verdict on the core
        </h2>
        <div
          className={`notice ${report.verdict.status === 'acceptable' ? 'ok' : report.verdict.status === 'not-acceptable' ? 'bad' : ''}`}
          data-testid="core-verdict"
          role="status"
        >
          <p>
            <strong>
              {report.verdict.status === 'acceptable'
                ? '✓ Core acceptable'
                : report.verdict.status === 'not-acceptable'
                  ? '⚠ Core NOT acceptable'
                  : 'Not judged yet'}
            </strong>
          </p>
          {report.verdict.words.map((w) => (
            <p key={w}>{w}</p>
          ))}
        </div>
        <p className="small muted">
          W/kg over the back iron, brought to {settings.testFluxDensityT} T by the square of the density ratio so that tests at slightly
          different voltages compare. The applied voltage is taken as the induced voltage and the wattmeter reading as the core’s loss. Shop
          limits: loss rise {Math.round(settings.coreLossRiseLimit * 100)} %, hot spots {settings.hotSpotRiseLimitK} K.
        </p>
      </section>

      <section className="card" aria-labelledby="records-h">
        <h2 id="records-h" style={{ marginTop: 0 }}>
          Tests recorded
        </h2>
        <CoreTestResults figures={report.figures} jobNumber={job.number} mayEdit={mayRecord} />
      </section>

      <section className="card" aria-labelledby="spots-h">
        <h2 id="spots-h" style={{ marginTop: 0 }}>
          Hot spots on the core
        </h2>
        {sheet ? (
          <CoreDrawing slots={sheet.sheet.core.slots} coreLengthMm={sheet.sheet.core.coreLengthMm} spots={spots} />
        ) : (
          <p>The drawing needs the core on the as-found sheet.</p>
        )}
        <table className="spots-table">
          <caption>Hot spots by test (▲ filled: above the shop’s {settings.hotSpotRiseLimitK} K; ○ open: within it)</caption>
          <thead>
            <tr>
              <th scope="col">Mark</th>
              <th scope="col">Test</th>
              <th scope="col">Slot</th>
              <th scope="col">From the drive end</th>
              <th scope="col">Rise</th>
              <th scope="col">Judgement</th>
            </tr>
          </thead>
          <tbody>
            {spots.length === 0 ? (
              <tr>
                <td colSpan={6}>No hot spots recorded.</td>
              </tr>
            ) : (
              spots.map((s) => (
                <tr key={s.n}>
                  <td>
                    {s.overLimit ? '▲' : '○'} {s.n}
                  </td>
                  <td>{s.stage.toLowerCase().replace('_', ' ')}</td>
                  <td>{s.slot}</td>
                  <td>
                    {s.axialPositionMm} mm ({(s.axialPositionMm / 25.4).toFixed(2)} in)
                  </td>
                  <td>
                    {s.riseK} K ({(s.riseK * 1.8).toFixed(1)} °F)
                  </td>
                  <td>{s.overLimit ? '⚠ above the limit: repair' : 'within the limit'}</td>
                </tr>
              ))
            )}
          </tbody>
        </table>
      </section>

      {mayRecord && (
        <section className="card">
          <CoreTestFormView
            key={editing ? `${editing.id}-${editing.version}` : 'new'}
            values={values}
            staff={staff.map((s) => ({ id: s.id, name: s.name }))}
            jobNumber={job.number}
            editing={
              editing
                ? {
                    recordId: editing.id,
                    version: editing.version,
                    label: `${editing.stage.toLowerCase().replace('_', ' ')} of ${editing.testedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC`,
                  }
                : null
            }
            slots={sheet?.sheet.core.slots ?? null}
            coreLengthMm={sheet?.sheet.core.coreLengthMm ?? null}
          />
        </section>
      )}

      {can(user.role, 'settings.manage') && (
        <details className="card">
          <summary>Shop settings for core-loss tests and the losses statement</summary>
          <CoreSettingsForm
            values={{
              version: settings.version,
              testFluxDensityT: settings.testFluxDensityT,
              fieldStrengthAPerM: settings.fieldStrengthAPerM,
              coreLossRiseLimitPercent: Math.round(settings.coreLossRiseLimit * 1000) / 10,
              hotSpotRiseLimitK: settings.hotSpotRiseLimitK,
              copperLossRiseLimitPercent: Math.round(settings.copperLossRiseLimit * 1000) / 10,
            }}
          />
        </details>
      )}
    </>
  );
}
