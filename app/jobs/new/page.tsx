import { requirePageUser } from '@/lib/auth/guard';
import { listCustomers, listStaff } from '@/lib/jobs/job-queries';
import { IntakeForm } from './intake-form';

export const metadata = { title: 'New intake' };

export default async function NewIntakePage() {
  await requirePageUser('job.intake');
  const [customers, staff] = await Promise.all([listCustomers(), listStaff()]);
  return (
    <>
      <h1>Log a motor</h1>
      <p className="muted">
        Fields marked with a star are required. Values may be entered in metric or imperial where a unit choice is shown.
      </p>
      <IntakeForm customers={customers} staff={staff.map((s) => ({ id: s.id, name: s.name }))} />
    </>
  );
}
