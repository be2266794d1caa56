/**
 * The approved redesign as the job sheet prints it. The redesign module is built in another branch; this
 * file is the seam between the two.
 *
 * TO WIRE IT UP when the redesign module is merged: make `getApprovedRedesignSummary(jobId)` read the
 * job's APPROVED redesign (not a draft, not a rejected one) and map it to `ApprovedRedesignSummary`:
 *   - revision:  the approved redesign's revision number;
 *   - approvedBy / approvedAt: the approving engineer's name and the approval time;
 *   - note: the engineer's approval note (or null);
 *   - changes: one row per quantity that differs from the as-found winding, e.g.
 *       { label: 'Turns per coil', original: '14', redesigned: '12' },
 *       { label: 'Wire', original: '2 × 0.85 mm', redesigned: '1 × 1.18 mm' },
 *       { label: 'Connection', original: 'star', redesigned: 'delta' };
 *   - proposedNameplate: the nameplate data the motor should carry after the redesign, e.g.
 *       { label: 'Voltage', value: '690 V' }, { label: 'Current', value: '15.2 A' }.
 * Values are display strings with their units, already formatted (metric with imperial where the trade
 * uses both), because the sheet prints them as given. Return null when the job has no approved redesign:
 * the sheet then says the winding was rewound to the original data.
 * Nothing else in the job-sheet code needs to change: the PDF and the print view render whatever this
 * returns (tests/integration/job-sheet.test.ts mocks it to check the "differs from the original" section).
 */

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

/** The job's approved redesign, or null. Returns null until the redesign module is wired in (see above). */
export async function getApprovedRedesignSummary(jobId: string): Promise<ApprovedRedesignSummary | null> {
  void jobId;
  return null;
}
