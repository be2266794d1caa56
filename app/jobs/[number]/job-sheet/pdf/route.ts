import { guardedRoute } from '@/lib/auth/route-guard';
import { jobSheetPdf } from '@/lib/job-sheet/job-sheet-snapshot';
import { PdfBusyError } from '@/lib/job-sheet/pdf-pool';
import { jobNumberParamsSchema } from '@/lib/jobs/job-schema';

/**
 * The job sheet PDF for a signed-in user whose role may read jobs: a download by default, shown in the
 * browser with ?inline=1. Shipped jobs get the copy stored when they shipped.
 */
export const GET = guardedRoute('job.read', jobNumberParamsSchema, async (req, _user, params) => {
  let sheet;
  try {
    sheet = await jobSheetPdf(params.number);
  } catch (err) {
    if (err instanceof PdfBusyError) return new Response(err.message, { status: 503, headers: { 'Retry-After': '5' } });
    throw err;
  }
  if (!sheet) return new Response('Not found.', { status: 404 });
  const inline = new URL(req.url).searchParams.get('inline') === '1';
  return new Response(new Uint8Array(sheet.pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${sheet.filename}"`,
      'Content-Length': String(sheet.pdf.length),
      'Cache-Control': 'private, no-store',
      'X-Content-Type-Options': 'nosniff',
      'X-Job-Sheet-Source': sheet.snapshot ? 'shipped-snapshot' : sheet.cached ? 'cached' : 'generated',
    },
  });
});
