/**
 * The approved redesign as the job sheet prints it: the rows of the frozen comparison whose value changed
 * (display strings with units, exactly as approved) and the proposed supplementary nameplate. Null when the
 * job has no approved redesign: the sheet then says the winding was rewound to the original data.
 */
import { getApprovedRedesign } from '@/lib/redesign/redesign-queries';
import { nameplateLines } from '@/lib/redesign/nameplate-lines';

/** One quantity the redesign changed. */
export interface RedesignChange {
  label: string;
  original: string;
  redesigned: string;
}

/** The approved redesign of a job, as printed on the job sheet. */
export interface ApprovedRedesignSummary {
  revision: number;
  approvedBy: string;
  approvedAt: Date;
  note: string | null;
  changes: RedesignChange[];
  proposedNameplate: { label: string; value: string }[];
}

/** The job's current approved redesign (highest approved revision), or null. */
export async function getApprovedRedesignSummary(jobId: string): Promise<ApprovedRedesignSummary | null> {
  const approved = await getApprovedRedesign(jobId);
  if (!approved) return null;
  return {
    revision: approved.revision,
    approvedBy: approved.approvedBy.name,
    approvedAt: approved.approvedAt,
    note: approved.note || null,
    changes: approved.snapshot.report.rows
      .filter((r) => r.original !== r.candidate)
      .map((r) => ({ label: r.label, original: r.original, redesigned: r.candidate })),
    proposedNameplate: nameplateLines(approved.nameplate),
  };
}
