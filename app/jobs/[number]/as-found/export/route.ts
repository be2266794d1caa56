import { z } from 'zod';
import { currentUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { db } from '@/lib/db/client';
import { makeWindingSheetExport } from '@/lib/as-found/winding-sheet-schema';
import { getAsFoundSheet, getSheetRevision } from '@/lib/as-found/as-found-queries';
import { jobNumberParamsSchema } from '@/lib/jobs/job-schema';

/**
 * Downloads a job's saved data sheet as JSON in the versioned export format (coilwright.winding-sheet,
 * version 1): the same file the sheet page imports and `npm run calc -- sheet` reads.
 */
export async function GET(req: Request, { params }: { params: Promise<{ number: string }> }): Promise<Response> {
  const user = await currentUser();
  if (!user) return new Response('Sign in first.', { status: 401 });
  if (!can(user.role, 'job.read')) return new Response('Not allowed.', { status: 403 });
  const parsed = jobNumberParamsSchema.safeParse(await params);
  if (!parsed.success) return new Response('Not found.', { status: 404 });
  const job = await db().job.findUnique({ where: { number: parsed.data.number }, select: { id: true, number: true } });
  if (!job) return new Response('Not found.', { status: 404 });
  const saved = await getAsFoundSheet(job.id);
  if (!saved) return new Response('This job has no saved data sheet yet.', { status: 404 });
  // ?rev=N downloads an earlier saved revision from the sheet's history.
  const rev = z.coerce.number().int().positive().max(1_000_000).safeParse(new URL(req.url).searchParams.get('rev') ?? saved.revision);
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
}
