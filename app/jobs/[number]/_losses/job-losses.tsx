/** The losses statement of a job, loaded on the server (final tests page, redesign comparison). */
import { findJobRef } from '@/lib/jobs/job-queries';
import type { RedesignReport } from '@/lib/engine/redesign/report';
import { lossStatementForJob } from '@/lib/losses/loss-statement-source';
import { LossStatementView } from './loss-statement-view';

type Props = ({ jobId: string } | { jobNumber: number }) & { comparing?: RedesignReport; headingId: string; level?: 'h2' | 'h3' };

export async function JobLosses(props: Props) {
  const jobId = 'jobId' in props ? props.jobId : (await findJobRef(props.jobNumber))?.id;
  if (!jobId) return null;
  const result = await lossStatementForJob(jobId, props.comparing);
  return (
    <LossStatementView
      result={result}
      headingId={props.headingId}
      level={props.level ?? 'h3'}
      title={props.comparing ? 'Copper loss and efficiency with this redesign' : undefined}
    />
  );
}
