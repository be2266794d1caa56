/**
 * Reads the facts the shop-path gates need (lib/jobs/shop-gates.ts), with the transaction client of the
 * status move so the check and the move see the same rows.
 */
import { z } from 'zod';
import { db, type Prisma } from '@/lib/db/client';
import { GATE_DECISIONS, type GateDecision, type GateFacts } from './shop-gates';

type Reader = Prisma.TransactionClient;

/** JobEvent kind of an engineer's gate decision; `data` holds {decision, reason, recordSequence}. */
export const DECISION_EVENT_KIND = 'DECISION';

const decisionData = z.object({
  decision: z.enum(GATE_DECISIONS),
  reason: z.string().min(1).max(1000),
  recordSequence: z.number().int().positive().nullable(),
});

export async function loadGateDecisions(tx: Reader, jobId: string): Promise<GateDecision[]> {
  const events = await tx.jobEvent.findMany({
    where: { jobId, kind: DECISION_EVENT_KIND },
    orderBy: { at: 'desc' },
    include: { user: { select: { name: true } } },
  });
  return events.flatMap((e) => {
    const d = decisionData.safeParse(e.data);
    return d.success
      ? [{ kind: d.data.decision, reason: d.data.reason, recordSequence: d.data.recordSequence, by: e.user?.name ?? '—', at: e.at }]
      : [];
  });
}

export async function loadGateFacts(tx: Reader, jobId: string): Promise<GateFacts> {
  const [latest, decisions, approved, requests, sheet] = await Promise.all([
    tx.testRecord.findFirst({ where: { jobId }, orderBy: { sequence: 'desc' }, select: { sequence: true, verdict: true } }),
    loadGateDecisions(tx, jobId),
    tx.redesign.findFirst({ where: { jobId, status: 'APPROVED' }, orderBy: { revision: 'desc' }, select: { revision: true } }),
    tx.redesign.findFirst({ where: { jobId }, orderBy: { revision: 'desc' }, select: { revision: true, status: true } }),
    tx.windingSheet.findUnique({ where: { jobId }, select: { id: true } }),
  ]);
  return {
    latestTest: latest,
    readyOverride: decisions.find((d) => d.kind === 'ready-override') ?? null,
    keepOriginal: decisions.find((d) => d.kind === 'keep-original-winding') ?? null,
    otherSupplyAsked: requests ? `a redesign request, revision ${requests.revision}` : null,
    approvedRedesign: approved,
    hasAsFoundSheet: sheet !== null,
  };
}

/** The gate facts of a job for a screen (outside any transaction). */
export const getGateFacts = (jobId: string): Promise<GateFacts> => loadGateFacts(db(), jobId);
