/** Books labour against a job in one transaction with a timeline event. */
import type { z } from 'zod';
import { db } from '@/lib/db/client';
import { DomainError, MESSAGES } from '@/lib/errors/domain-errors';
import { formatScaledShort } from './decimal-input';
import type { labourBookingSchema } from './labour-schema';

export async function bookLabour(userId: string, input: z.output<typeof labourBookingSchema>): Promise<{ id: string }> {
  return db().$transaction(async (tx) => {
    const [job, person] = await Promise.all([
      tx.job.findUnique({ where: { id: input.jobId }, select: { id: true } }),
      tx.user.findUnique({ where: { id: input.personId }, select: { id: true, name: true, active: true } }),
    ]);
    if (!job) throw new DomainError('not-found', MESSAGES.notFound('job'));
    if (!person?.active)
      throw new DomainError('invalid', 'Choose someone who works here.', { personId: ['Choose someone who works here.'] });
    const row = await tx.labourBooking.create({
      data: {
        jobId: job.id,
        personId: person.id,
        personName: person.name,
        task: input.task,
        hoursMilli: input.hours,
        workedOn: new Date(`${input.workedOn}T00:00:00Z`),
        bookedById: userId,
      },
    });
    await tx.jobEvent.create({
      data: {
        jobId: job.id,
        userId,
        kind: 'LABOUR',
        message: `${formatScaledShort(input.hours, 3)} h booked for ${person.name}: ${input.task} (${input.workedOn}).`,
      },
    });
    return { id: row.id };
  });
}
