import { z } from 'zod';
import { guardedRoute } from '@/lib/auth/route-guard';
import { jobNumberSchema } from '@/lib/jobs/job-schema';
import { quoteDocument } from '@/lib/quotes/quote-document';
import { renderQuotePdf } from '@/lib/quotes/quote-pdf';
import { quoteRevisionParamSchema } from '@/lib/quotes/quote-schema';

/** The quote as a PDF for a signed-in user who may read jobs: a download by default, in the browser with ?inline=1. */
export const GET = guardedRoute(
  'job.read',
  z.object({ number: jobNumberSchema, revision: quoteRevisionParamSchema }),
  async (req, _user, params) => {
    const doc = await quoteDocument(params.number, params.revision);
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
  },
);
