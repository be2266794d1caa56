/**
 * The approved snapshot: exactly what the engineer approved, frozen in the Redesign row. Other modules
 * (the job sheet, the winder's print) read it through getApprovedRedesign in redesign-queries.ts.
 */
import type { RedesignReport } from '@/lib/engine/redesign/report';
import type { RedesignOriginal, RedesignRequest, RedesignSearch, RejectedFamily } from '@/lib/engine/redesign/types';

export const REDESIGN_SNAPSHOT_FORMAT = 'coilwright.redesign';
export const REDESIGN_SNAPSHOT_VERSION = 1;

/** Request, chosen candidate and analysis as approved (version 1). */
export interface RedesignSnapshot {
  format: typeof REDESIGN_SNAPSHOT_FORMAT;
  version: typeof REDESIGN_SNAPSHOT_VERSION;
  jobNumber: number;
  revision: number;
  /** The as-found sheet the redesign was made from. */
  sheet: { id: string; revision: number };
  request: RedesignRequest;
  original: RedesignOriginal;
  originalBasis: RedesignSearch['originalBasis'];
  /** Candidate, side-by-side rows, expected rating, proposed nameplate, cautions. */
  report: RedesignReport;
  search: { familiesTried: number; candidatesFound: number; rank: number; rejected: RejectedFamily[] };
  approval: { byId: string; byName: string; at: string; note: string };
}

/** A stored snapshot is ours only if it says so; anything else is refused rather than misread. */
export function isRedesignSnapshot(v: unknown): v is RedesignSnapshot {
  if (typeof v !== 'object' || v === null) return false;
  const s = v as Record<string, unknown>;
  return (
    s.format === REDESIGN_SNAPSHOT_FORMAT && s.version === REDESIGN_SNAPSHOT_VERSION && typeof s.report === 'object' && s.report !== null
  );
}
