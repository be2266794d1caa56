/** Messages of the sheet module, pinned by the tests. */
export const SHEET_MESSAGES = {
  stale: (current: number) =>
    `Someone else saved this data sheet (now revision ${current}) while you were editing. Your values are still in the form: review the saved sheet, then save again to replace it.`,
  staleCreated:
    'Someone else saved a data sheet for this job while you were editing. Your values are still in the form: review the saved sheet, then save again to replace it.',
  frozen: (status: string) =>
    `The winding is done (job status: ${status}), so the as-found sheet can no longer be changed. Ask an engineer if a correction is needed.`,
  saved: (revision: number) => `Data sheet saved (revision ${revision}).`,
  noSheet: 'This job has no saved data sheet yet.',
} as const;
