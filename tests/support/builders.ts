/**
 * Test-data builders: each test makes the records it needs instead of leaning on demo job numbers, so the
 * demo shop can change without breaking tests. Writes go straight to the database (the rules under test are
 * exercised through the actions, not here).
 */
import { db } from '@/lib/db/client';
import type { JobStatus } from '@/lib/db/generated/enums';
import { allocateJobNumber } from '@/lib/jobs/job-writes';

let serial = 0;

export interface BuiltJob {
  id: string;
  number: number;
  customerId: string;
  motorId: string;
}

/**
 * A new job in `status` with its own invented customer and motor (nameplate 400 V 50 Hz, 4 poles,
 * 7.5 kW unless overridden). `heldFrom` is set for a job on hold.
 */
export async function buildJob(
  opts: {
    status?: JobStatus;
    heldFrom?: JobStatus;
    motor?: Partial<{
      ratedVoltageV: number;
      frequencyHz: number;
      speedRpm: number;
      outputKw: number;
      currentA: number;
      insulationClass: string;
      serial: string;
    }>;
  } = {},
): Promise<BuiltJob> {
  serial += 1;
  const tag = `${process.pid}-${Date.now().toString(36)}-${serial}`;
  return db().$transaction(async (tx) => {
    const customer = await tx.customer.create({ data: { company: `Test customer ${tag}` } });
    const motor = await tx.motor.create({
      data: {
        customerId: customer.id,
        manufacturer: 'Test motors',
        model: 'TM-132',
        serial: `T-${tag}`,
        ratedVoltageV: 400,
        frequencyHz: 50,
        speedRpm: 1450,
        outputKw: 7.5,
        currentA: 15,
        insulationClass: 'F',
        connection: 'star',
        ...opts.motor,
      },
    });
    const job = await tx.job.create({
      data: {
        number: await allocateJobNumber(tx),
        customerId: customer.id,
        motorId: motor.id,
        status: opts.status ?? 'INSPECTION',
        heldFrom: opts.heldFrom ?? null,
        reportedFault: 'Test job',
      },
    });
    return { id: job.id, number: job.number, customerId: customer.id, motorId: motor.id };
  });
}
