/** Reads the as-repaired rating of a job: its motor's nameplate and its approved redesign, if any. */
import { db } from '@/lib/db/client';
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { asRepairedRating, type AsRepairedRating } from './test-rating';

export async function jobAsRepairedRating(jobId: string): Promise<AsRepairedRating | null> {
  const [job, redesign] = await Promise.all([
    db().job.findUnique({ where: { id: jobId }, select: { motor: true } }),
    getApprovedRedesign(jobId),
  ]);
  if (!job) return null;
  const m = job.motor;
  return asRepairedRating(
    {
      ratedVoltageV: m.ratedVoltageV,
      frequencyHz: m.frequencyHz,
      speedRpm: m.speedRpm,
      currentA: m.currentA,
      outputKw: m.outputKw,
      connection: m.connection,
    },
    redesign ? { revision: redesign.revision, nameplate: redesign.nameplate } : null,
  );
}
