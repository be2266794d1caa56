import { currentUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { jobNumberParamsSchema } from '@/lib/jobs/job-schema';
import { quoteDocument } from '@/lib/quotes/quote-document';
import { renderQuotePdf } from '@/lib/quotes/quote-pdf';
import { quoteRevisionParamSchema } from '@/lib/quotes/quote-schema';

/** The quote as a PDF for a signed-in user who may read jobs: a download by default, in the browser with ?inline=1. */
export async function GET(req: Request, { params }: { params: Promise<{ number: string; revision: string }> }): Promise<Response> {
  const user = await currentUser();
  if (!user) return new Response('Sign in first.', { status: 401 });
  if (!can(user.role, 'job.read')) return new Response('Not allowed.', { status: 403 });
  const p = await params;
  const job = jobNumberParamsSchema.safeParse({ number: p.number });
  const revision = quoteRevisionParamSchema.safeParse(p.revision);
  if (!job.success || !revision.success) return new Response('Not found.', { status: 404 });
  const doc = await quoteDocument(job.data.number, revision.data);
  if (!doc) return new Response('Not found.', { status: 404 });
  const pdf = await renderQuotePdf(doc);
  const inline = new URL(req.url).searchParams.get('inline') === '1';
  return new Response(new Uint8Array(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${doc.filename}"`,
      'Content-Length': String(pdf.length),
      'Cache-Control': 'private, no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
}
