/**
 * Which winding the rewind will be wound to, and its copper: the approved redesign when there is one
 * (its wires, turns, circuits and estimated mean turn length), otherwise the as-found sheet (rewound to
 * the original data). Returns why not when neither gives the figures.
 */
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { windingCopper, type WindingCopper } from '@/lib/engine/winding-copper';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';

export type RewindCopper = { ok: true; source: string; copper: WindingCopper } | { ok: false; reason: string };

const wireLabel = (standard: 'awg' | 'metric', size: string) => (standard === 'awg' ? `AWG ${size}` : `${Number(size).toFixed(3)} mm`);

export async function rewindCopperFor(jobId: string): Promise<RewindCopper> {
  const redesign = await getApprovedRedesign(jobId);
  if (redesign) {
    const c = redesign.snapshot.report.candidate;
    const mlt = redesign.snapshot.report.rows.find((r) => r.key === 'mlt')?.values.candidate ?? redesign.snapshot.original.meanTurnLengthMm;
    if (mlt === undefined || mlt === null)
      return { ok: false, reason: 'The approved redesign has no mean turn length: enter it on the as-found sheet.' };
    const r = windingCopper({
      seriesTurnsPerPhase: c.seriesTurnsPerPhase,
      parallelPaths: c.winding.parallelPaths,
      meanTurnLengthMm: mlt,
      wires: c.wires.parts.map((p) => ({ label: p.wire.label, areaMm2: p.wire.areaMm2, count: p.count })),
    });
    return r.ok
      ? { ok: true, source: `approved redesign, revision ${redesign.revision}`, copper: r.value }
      : { ok: false, reason: r.error.message };
  }
  const sheet = await getAsFoundSheet(jobId);
  if (!sheet) return { ok: false, reason: 'There is no as-found data sheet or approved redesign yet.' };
  const mlt = sheet.sheet.winding.meanTurnLengthMm;
  if (mlt === undefined)
    return { ok: false, reason: 'The as-found sheet has no mean turn length: the copper cannot be worked out without it.' };
  const a = analyseSheet(sheet.sheet);
  if (!a.ok) return { ok: false, reason: `The as-found sheet cannot be analysed: ${a.error.message}` };
  const r = windingCopper({
    seriesTurnsPerPhase: a.value.winding.seriesTurnsPerPhase,
    parallelPaths: sheet.sheet.winding.parallelPaths,
    meanTurnLengthMm: mlt,
    wires: a.value.wires.map((w) => ({ label: wireLabel(w.standard, w.size), areaMm2: w.areaMm2, count: w.count })),
  });
  return r.ok
    ? { ok: true, source: `as-found sheet, revision ${sheet.revision}`, copper: r.value }
    : { ok: false, reason: r.error.message };
}
