import { z } from 'zod';
import { guardedRoute } from '@/lib/auth/route-guard';
import { getAttachment } from '@/lib/jobs/attachments';

/** Serves a stored photo to a signed-in user whose role may read jobs. */
export const GET = guardedRoute('job.read', z.object({ id: z.uuid() }), async (_req, _user, params) => {
  const a = await getAttachment(params.id);
  if (!a) return new Response('Not found.', { status: 404 });
  return new Response(new Uint8Array(a.data), {
    headers: {
      'Content-Type': a.mimeType,
      'Content-Disposition': `inline; filename="${a.filename.replace(/[^\w.-]/g, '_')}"`,
      'Cache-Control': 'private, max-age=3600',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
