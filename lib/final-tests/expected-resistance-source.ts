/**
 * Which prediction the final resistance is compared with: the approved redesign's when there is one (the
 * motor was wound to it), otherwise the as-found winding's (rewound to the original data).
 */
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import type { StoredSheet } from '@/lib/as-found/as-found-queries';
import type { ExpectedResistance } from './expected-resistance';

export async function expectedResistanceFor(jobId: string, sheet: StoredSheet | null): Promise<ExpectedResistance | null> {
  const redesign = await getApprovedRedesign(jobId);
  const predicted = redesign?.snapshot.report.rows.find((r) => r.key === 'resistance')?.values.candidate;
  if (redesign && predicted) {
    return { source: `approved redesign, revision ${redesign.revision}`, phaseOhm20: predicted, connection: redesign.winding.connection };
  }
  if (!sheet) return null;
  const analysis = analyseSheet(sheet.sheet);
  const resistance = analysis.ok ? analysis.value.resistance : null;
  return resistance
    ? {
        source: `as-found data sheet, revision ${sheet.revision}`,
        phaseOhm20: resistance.predictedPhaseOhm20,
        connection: sheet.sheet.winding.connection,
      }
    : null;
}
