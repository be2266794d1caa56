import { z } from 'zod';
import { guardedRoute } from '@/lib/auth/route-guard';
import { findCustomers } from '@/lib/jobs/job-queries';

const querySchema = z.object({
  q: z
    .string()
    .trim()
    .min(1)
    .max(80)
    .regex(/^[^\u0000]*$/),
});

/**
 * Customers whose name contains `q`, for the board's customer filter (a typeahead that asks as you type,
 * instead of every page carrying the whole customer list). Session and role first, then the input.
 */
export const GET = guardedRoute('job.read', z.object({}), async (req) => {
  const parsed = querySchema.safeParse({ q: new URL(req.url).searchParams.get('q') ?? '' });
  if (!parsed.success) return Response.json({ customers: [] });
  const customers = await findCustomers(parsed.data.q);
  return Response.json({ customers }, { headers: { 'Cache-Control': 'private, no-store' } });
});
