/**
 * Reads of redesign revisions. `getApprovedRedesign(jobId)` is the public read for other modules (the
 * job sheet, the winder's print): the current approved revision's frozen snapshot and proposed nameplate.
 */
import { db } from '@/lib/db/client';
import type { ProposedNameplate } from '@/lib/engine/redesign/report';
import type { WireSet } from '@/lib/engine/redesign/types';
import type { WindingSpec } from '@/lib/engine/winding-layout';
import { storedRequestSchema } from '@/lib/redesign/redesign-schema';
import type { RedesignRequest } from '@/lib/engine/redesign/types';
import { isRedesignSnapshot, type RedesignSnapshot } from './snapshot';
import { isStoredSearch, type StoredSearch } from './stored-search';

/** The current approved redesign of a job (the highest approved revision). */
export interface ApprovedRedesign {
  id: string;
  jobId: string;
  revision: number;
  approvedAt: Date;
  approvedBy: { id: string; name: string };
  note: string;
  /** Exactly what was approved: request, original, candidate, side-by-side rows, expected rating, cautions. */
  snapshot: RedesignSnapshot;
  /** Shortcuts into the snapshot. */
  winding: WindingSpec;
  wires: WireSet;
  nameplate: ProposedNameplate;
}

/** The current approved redesign, or null when no revision is approved. */
export async function getApprovedRedesign(jobId: string): Promise<ApprovedRedesign | null> {
  const row = await db().redesign.findFirst({
    where: { jobId, status: 'APPROVED' },
    orderBy: { revision: 'desc' },
    include: { approvedBy: { select: { id: true, name: true } } },
  });
  if (!row) return null;
  if (!isRedesignSnapshot(row.snapshot) || !row.approvedAt || !row.approvedBy)
    throw new Error(`Approved redesign ${row.id} has no readable snapshot.`);
  const snapshot = row.snapshot;
  return {
    id: row.id,
    jobId: row.jobId,
    revision: row.revision,
    approvedAt: row.approvedAt,
    approvedBy: row.approvedBy,
    note: row.approvalNote ?? '',
    snapshot,
    winding: snapshot.report.candidate.winding,
    wires: snapshot.report.candidate.wires,
    nameplate: snapshot.report.nameplate,
  };
}

/** One revision as the redesign page lists it. */
export interface RedesignRevision {
  id: string;
  revision: number;
  status: 'DRAFT' | 'APPROVED';
  request: RedesignRequest;
  sheetRevision: number;
  chosenKey: string | null;
  version: number;
  createdAt: Date;
  updatedAt: Date;
  createdBy: string | null;
  approvedAt: Date | null;
  approvedBy: string | null;
  approvalNote: string | null;
  snapshot: RedesignSnapshot | null;
}

/** Every revision of a job's redesign, newest first. */
export async function listRedesigns(jobId: string): Promise<RedesignRevision[]> {
  const rows = await db().redesign.findMany({
    where: { jobId },
    orderBy: { revision: 'desc' },
    include: { createdBy: { select: { name: true } }, approvedBy: { select: { name: true } } },
  });
  return rows.map((r) => {
    const request = storedRequestSchema.safeParse(r.request);
    if (!request.success) throw new Error(`Redesign ${r.id} holds a request that no longer matches the schema: ${request.error.message}`);
    return {
      id: r.id,
      revision: r.revision,
      status: r.status,
      request: request.data,
      sheetRevision: r.sheetRevision,
      chosenKey: r.chosenKey,
      version: r.version,
      createdAt: r.createdAt,
      updatedAt: r.updatedAt,
      createdBy: r.createdBy?.name ?? null,
      approvedAt: r.approvedAt,
      approvedBy: r.approvedBy?.name ?? null,
      approvalNote: r.approvalNote,
      snapshot: isRedesignSnapshot(r.snapshot) ? r.snapshot : null,
    };
  });
}

/** The search result stored with a revision (null when none is stored or it cannot be read). */
export async function getStoredSearch(redesignId: string): Promise<StoredSearch | null> {
  const row = await db().redesign.findUnique({ where: { id: redesignId }, select: { search: true } });
  return row && isStoredSearch(row.search) ? row.search : null;
}
