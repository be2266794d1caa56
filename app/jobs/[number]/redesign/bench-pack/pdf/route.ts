import { guardedRoute } from '@/lib/auth/route-guard';
import { loadBenchPack } from '@/lib/bench-pack/bench-pack-data';
import { renderBenchPackPdf } from '@/lib/bench-pack/bench-pack-pdf';
import { parseBenchPackQuery } from '@/lib/bench-pack/bench-pack-schema';
import { shopDetails } from '@/lib/job-sheet/shop-details';
import { jobNumberParamsSchema } from '@/lib/jobs/job-schema';

/**
 * The bench pack PDF for a signed-in user whose role may read jobs (session and role checked first): a
 * download by default, shown in the browser with ?inline=1. Options as the print view (?marking, ?leads,
 * ?paper, ?rev, ?basis).
 */
export const GET = guardedRoute('job.read', jobNumberParamsSchema, async (req, _user, params) => {
  const url = new URL(req.url);
  const r = await loadBenchPack(params.number, parseBenchPackQuery(url.searchParams));
  if (!r.ok) return new Response(r.reason, { status: r.status, headers: { 'Content-Type': 'text/plain; charset=utf-8' } });
  const pdf = await renderBenchPackPdf(r.value, shopDetails(), r.options.paper);
  const basis = r.value.input.basis;
  const filename = `bench-pack-job-${params.number}-${basis.kind === 'redesign' ? `rev-${basis.revision}` : 'original'}.pdf`;
  const inline = url.searchParams.get('inline') === '1';
  return new Response(new Uint8Array(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `${inline ? 'inline' : 'attachment'}; filename="${filename}"`,
      'Content-Length': String(pdf.length),
      'Cache-Control': 'private, no-store',
      'X-Content-Type-Options': 'nosniff',
    },
  });
});
