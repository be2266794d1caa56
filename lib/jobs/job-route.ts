/**
 * The one preamble of every job screen: signed-in user with the permission (else sign-in or the refusal
 * page), the job number from the route checked, the job loaded by the caller's query, or the not-found page.
 */
import { notFound } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/guard';
import type { Permission } from '@/lib/auth/permissions';
import type { SessionUser } from '@/lib/auth/session-store';
import { jobNumberParamsSchema } from './job-schema';

export type JobRouteParams = { params: Promise<{ number: string }> };

export async function loadJobRoute<T>(
  params: JobRouteParams['params'],
  load: (jobNumber: number) => Promise<T | null>,
  permission: Permission = 'job.read',
): Promise<{ user: SessionUser; job: T }> {
  const user = await requirePageUser(permission);
  const parsed = jobNumberParamsSchema.safeParse(await params);
  if (!parsed.success) notFound();
  const job = await load(parsed.data.number);
  if (job === null) notFound();
  return { user, job };
}
