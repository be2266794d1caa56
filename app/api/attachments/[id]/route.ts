import { z } from 'zod';
import { currentUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { db } from '@/lib/db/client';

/** Serves a stored photo to a signed-in user whose role may read jobs. */
export async function GET(_req: Request, { params }: { params: Promise<{ id: string }> }): Promise<Response> {
  const user = await currentUser();
  if (!user) return new Response('Sign in first.', { status: 401 });
  if (!can(user.role, 'job.read')) return new Response('Not allowed.', { status: 403 });
  const parsed = z.object({ id: z.uuid() }).safeParse(await params);
  if (!parsed.success) return new Response('Not found.', { status: 404 });
  const a = await db().attachment.findUnique({ where: { id: parsed.data.id }, select: { data: true, mimeType: true, filename: true } });
  if (!a) return new Response('Not found.', { status: 404 });
  return new Response(new Uint8Array(a.data), {
    headers: {
      'Content-Type': a.mimeType,
      'Content-Disposition': `inline; filename="${a.filename.replace(/[^\w.-]/g, '_')}"`,
      'Cache-Control': 'private, max-age=3600',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
