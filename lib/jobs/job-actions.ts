'use server';

/**
 * Server actions for jobs. Each is a public POST endpoint: `guardedAction` checks the session and the role
 * first, then parses with the entity's zod schema, then calls the data layer, and returns a typed result.
 */
import { z } from 'zod';
import { guardedAction } from '@/lib/auth/guard';
import { success, type ActionResult } from '@/lib/errors/action-result';
import { gateDecisionSchema, intakeSchema, jobEditSchema, statusMoveSchema } from '@/lib/jobs/job-schema';
import { addPhotos, checkPhotos, photosFromFormData } from './attachments';
import { createIntake, moveJobStatus, recordGateDecision, updateJob } from './job-writes';
import { findMotorsBySerial } from './job-queries';

function jsonField(form: FormData, name: string): unknown {
  const raw = form.get(name);
  if (typeof raw !== 'string') return undefined;
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    return undefined;
  }
}

export async function submitIntake(form: FormData): Promise<ActionResult<{ number: number }>> {
  const photos = await photosFromFormData(form);
  const run = guardedAction('job.intake', 'log motors at intake', intakeSchema, async (user, input) => {
    const problems = checkPhotos(photos);
    if (Object.keys(problems).length) {
      return { ok: false, code: 'invalid', message: 'Some photos cannot be stored.', fieldErrors: { photos: Object.values(problems) } };
    }
    const { jobId, number } = await createIntake(user.id, input);
    await addPhotos(jobId, user.id, 'NAMEPLATE', photos);
    return success({ number }, `Job ${number} logged.`);
  });
  return run(jsonField(form, 'payload'));
}

export async function saveJobDetails(raw: unknown) {
  return guardedAction('job.edit', 'edit job details', jobEditSchema, async (user, input) =>
    success(await updateJob(user.id, input), 'Job saved.'),
  )(raw);
}

export async function moveStatus(raw: unknown) {
  return guardedAction('job.move', 'move jobs along the shop path', statusMoveSchema, async (user, input) =>
    success(await moveJobStatus(user.id, user.role, input), 'Status changed.'),
  )(raw);
}

export async function recordGateDecisionAction(raw: unknown) {
  return guardedAction('job.override', 'release a shop-path gate (engineers only)', gateDecisionSchema, async (user, input) => {
    await recordGateDecision(user.id, input);
    return success(undefined, 'Decision recorded on the timeline and the job sheet.');
  })(raw);
}

export async function uploadJobPhotos(form: FormData): Promise<ActionResult<{ added: number }>> {
  const photos = await photosFromFormData(form);
  const schema = z.object({ jobId: z.uuid(), kind: z.enum(['NAMEPLATE', 'DAMAGE', 'OTHER']) });
  return guardedAction('job.attach', 'add photos', schema, async (user, input) =>
    success({ added: await addPhotos(input.jobId, user.id, input.kind, photos) }, 'Photos added.'),
  )({ jobId: form.get('jobId'), kind: form.get('kind') });
}

export async function lookupSerial(raw: unknown) {
  return guardedAction('job.intake', 'look up motors', z.object({ serial: z.string().trim().max(80) }), async (_user, input) => {
    const motors = await findMotorsBySerial(input.serial);
    return success(
      motors.map((m) => ({
        id: m.id,
        manufacturer: m.manufacturer,
        model: m.model,
        serial: m.serial,
        customer: m.customer,
        jobs: m.jobs.map((j) => ({ number: j.number, receivedAt: j.receivedAt.toISOString() })),
        nameplate: {
          frame: m.frame, outputKw: m.outputKw, voltages: m.voltages, ratedVoltageV: m.ratedVoltageV, connection: m.connection,
          currentA: m.currentA, frequencyHz: m.frequencyHz, speedRpm: m.speedRpm, phases: m.phases, serviceFactor: m.serviceFactor,
          insulationClass: m.insulationClass, duty: m.duty, enclosure: m.enclosure, efficiencyPercent: m.efficiencyPercent,
          powerFactor: m.powerFactor, codeLetter: m.codeLetter, designLetter: m.designLetter,
          bearingDriveEnd: m.bearingDriveEnd, bearingOppositeEnd: m.bearingOppositeEnd,
        },
      })),
    );
  })(raw);
}
