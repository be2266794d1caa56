/**
 * The app's addresses for one job's records, in one place, so a renamed route is one edit (the old
 * addresses /sheet and /tests redirect here from next.config.js).
 */
export const jobRoutes = (jobNumber: number | string) => {
  const base = `/jobs/${jobNumber}`;
  return {
    job: base,
    asFound: `${base}/as-found`,
    asFoundPrint: `${base}/as-found/print`,
    asFoundExport: `${base}/as-found/export`,
    coreTest: `${base}/core-test`,
    finalTests: `${base}/final-tests`,
    redesign: `${base}/redesign`,
    redesignPrint: `${base}/redesign/print`,
    benchPack: `${base}/redesign/bench-pack`,
    benchPackPdf: `${base}/redesign/bench-pack/pdf`,
    jobSheet: `${base}/job-sheet`,
    jobSheetPdf: `${base}/job-sheet/pdf`,
  };
};
