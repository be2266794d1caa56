import { z } from 'zod';
import { guardedRoute } from '@/lib/auth/route-guard';
import { findJobRef } from '@/lib/jobs/job-queries';
import { makeWindingSheetExport } from '@/lib/as-found/winding-sheet-schema';
import { getAsFoundSheet, getSheetRevision } from '@/lib/as-found/as-found-queries';
import { jobNumberParamsSchema } from '@/lib/jobs/job-schema';

/**
 * Downloads a job's saved data sheet as JSON in the versioned export format (coilwright.winding-sheet,
 * version 1): the same file the sheet page imports and `npm run calc -- sheet` reads.
 */
export const GET = guardedRoute('job.read', jobNumberParamsSchema, async (req, _user, params) => {
  const job = await findJobRef(params.number);
  if (!job) return new Response('Not found.', { status: 404 });
  const saved = await getAsFoundSheet(job.id);
  if (!saved) return new Response('This job has no saved data sheet yet.', { status: 404 });
  // ?rev=N downloads an earlier saved revision from the sheet's history.
  const rev = z.coerce
    .number()
    .int()
    .positive()
    .max(1_000_000)
    .safeParse(new URL(req.url).searchParams.get('rev') ?? saved.revision);
  if (!rev.success) return new Response('Not found.', { status: 404 });
  const sheet = rev.data === saved.revision ? saved.sheet : await getSheetRevision(job.id, rev.data);
  if (!sheet) return new Response(`This sheet has no revision ${rev.data}.`, { status: 404 });
  const body = JSON.stringify(makeWindingSheetExport(sheet), null, 2);
  return new Response(body, {
    headers: {
      'Content-Type': 'application/json; charset=utf-8',
      'Content-Disposition': `attachment; filename="job-${job.number}-sheet-r${rev.data}.json"`,
      'Cache-Control': 'private, no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
