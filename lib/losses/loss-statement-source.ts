/**
 * Gathers what the losses statement needs for a job: the as-found sheet's predicted resistance and rated
 * current, the redesign (the approved one, or the one being compared), the final resistance readings, the
 * core-loss tests and the shop's limits, and builds the statement (loss-statement.ts).
 */
import { getCoreLossSettings } from '@/lib/core-test/core-loss-settings';
import { listCoreTests } from '@/lib/core-test/core-test-queries';
import { coreTestReport } from '@/lib/core-test/core-test-report';
import { db } from '@/lib/db/client';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import type { WindingForLoss } from '@/lib/engine/losses/rewind-losses';
import type { RedesignReport } from '@/lib/engine/redesign/report';
import { correctResistanceOhm, phaseFromLineToLineOhm, type Connection } from '@/lib/engine/resistance';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { listTestRecords } from '@/lib/final-tests/record-queries';
import { buildLossStatement, type LossStatement } from './loss-statement';

export type LossStatementResult = { statement: LossStatement; reason: null } | { statement: null; reason: string };

const none = (reason: string): LossStatementResult => ({ statement: null, reason });

/**
 * @param comparing a redesign report being looked at (a draft candidate); without it the approved redesign
 *   is used when there is one, and the final resistance readings are added as the measured winding.
 */
export async function lossStatementForJob(jobId: string, comparing?: RedesignReport): Promise<LossStatementResult> {
  const [job, sheet, settings] = await Promise.all([
    db().job.findUnique({
      where: { id: jobId },
      select: { motor: { select: { efficiencyPercent: true, outputKw: true, currentA: true } } },
    }),
    getAsFoundSheet(jobId),
    getCoreLossSettings(),
  ]);
  if (!job) return none('No such job.');
  if (!sheet) return none('No as-found sheet is saved: the copper loss needs its winding data.');
  const analysis = analyseSheet(sheet.sheet);
  if (!analysis.ok) return none(`The as-found sheet cannot be analysed: ${analysis.error.message}`);
  const predicted = analysis.value.resistance;
  if (!predicted) return none('The as-found sheet has no mean turn length, so no resistance can be predicted.');
  const currentA = sheet.sheet.supply.ratedCurrentA ?? job.motor.currentA ?? undefined;
  if (currentA === undefined) return none('No rated current is recorded on the sheet or the nameplate.');

  const approved = comparing ? null : await getApprovedRedesign(jobId);
  const report = comparing ?? approved?.snapshot.report ?? null;
  const sheetSource = `as-found data sheet, revision ${sheet.revision}, predicted`;
  let before: WindingForLoss = {
    source: sheetSource,
    phaseOhm20: predicted.predictedPhaseOhm20,
    connection: sheet.sheet.winding.connection,
    lineCurrentA: currentA,
  };
  let after: WindingForLoss = { ...before, source: `${sheetSource}: rewound to the same data` };
  let outputKw = sheet.sheet.supply.ratedOutputKw ?? job.motor.outputKw ?? undefined;
  if (report) {
    const row = (key: string) => report.rows.find((r) => r.key === key);
    const r = row('resistance');
    const current = row('current');
    const power = row('power');
    const label = approved ? `approved redesign, revision ${approved.revision}, predicted` : 'redesign candidate, predicted';
    if (r?.values.original && r.values.candidate) {
      before = { ...before, source: `${sheetSource} (as in the comparison)`, phaseOhm20: r.values.original };
      const afterCurrent = current?.values.candidate ?? (current?.ratio ? currentA * current.ratio : currentA);
      after = {
        source: label,
        phaseOhm20: r.values.candidate,
        connection: report.candidate.winding.connection,
        lineCurrentA: afterCurrent,
      };
      outputKw = power?.values.candidate ?? (power?.ratio && outputKw ? outputKw * power.ratio : outputKw);
    }
  }

  let measuredAfter: WindingForLoss | null = null;
  if (!comparing) {
    const [current] = await listTestRecords(jobId);
    const res = current?.data.resistance;
    const readings = res?.readings.filter((x): x is number => x !== undefined) ?? [];
    if (current && res && readings.length === 3 && res.temperatureC !== undefined) {
      const mean = readings.reduce((a, b) => a + b, 0) / 3;
      const phase = res.between === 'line-to-line' ? phaseFromLineToLineOhm(mean, after.connection as Connection) : mean;
      measuredAfter = {
        ...after,
        source: `final tests #${current.sequence}, measured at ${res.temperatureC} °C`,
        phaseOhm20: correctResistanceOhm(phase, res.temperatureC, 20),
      };
    }
  }

  const core = coreTestReport(sheet.sheet, await listCoreTests(jobId), settings, analysis.value.winding.flux?.yoke.tesla ?? null);
  const statement = buildLossStatement({
    thermalClass: sheet.sheet.insulation.thermalClass,
    before,
    after,
    measuredAfter,
    redesigned: report !== null,
    outputKw,
    efficiencyPercent: job.motor.efficiencyPercent ?? undefined,
    coreLossChangeW: core.lossChangeAtRatingW,
    coreLossNote: core.lossChangeNote,
    copperLossRiseLimit: settings.copperLossRiseLimit,
  });
  return statement ? { statement, reason: null } : none('The resistance or the rated current is not usable.');
}
