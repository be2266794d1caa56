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
import { noNul } from '@/lib/validation/safe-text';
import { findMotorsBySerial } from './job-queries';

// A server action is a public endpoint: the argument may be anything a client sends, not the FormData
// the form sends, so it is checked before use (a bare `form.get` on a JSON body was an HTTP 500).
const isForm = (v: unknown): v is FormData => v instanceof FormData;

function jsonField(form: unknown, name: string): unknown {
  if (!isForm(form)) return undefined;
  const raw = form.get(name);
  if (typeof raw !== 'string') return undefined;
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    return undefined;
  }
}

// Photos are read only inside the guarded work: after the session and role checks (issue 12).
export async function submitIntake(form: FormData): Promise<ActionResult<{ number: number }>> {
  const run = guardedAction('job.intake', 'log motors at intake', intakeSchema, async (user, input) => {
    const photos = isForm(form) ? await photosFromFormData(form) : [];
    const problems = checkPhotos(photos);
    if (Object.keys(problems).length) {
      return { ok: false, code: 'invalid', message: 'Some photos cannot be stored.', fieldErrors: { photos: Object.values(problems) } };
    }
    const { jobId, number, replayed } = await createIntake(user.id, input);
    // A replayed request (same idempotency key) already stored its photos with the first answer.
    if (!replayed) await addPhotos(jobId, user.id, 'NAMEPLATE', photos);
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
  const schema = z.object({ jobId: z.uuid(), kind: z.enum(['NAMEPLATE', 'DAMAGE', 'OTHER']) });
  return guardedAction('job.attach', 'add photos', schema, async (user, input) => {
    const photos = isForm(form) ? await photosFromFormData(form) : [];
    if (photos.length === 0)
      return {
        ok: false,
        code: 'invalid',
        message: 'Choose at least one photo to add.',
        fieldErrors: { photos: ['Choose at least one photo to add.'] },
      };
    const added = await addPhotos(input.jobId, user.id, input.kind, photos);
    return success({ added }, `${added} photo${added === 1 ? '' : 's'} added.`);
  })(isForm(form) ? { jobId: form.get('jobId'), kind: form.get('kind') } : form);
}

export async function lookupSerial(raw: unknown) {
  return guardedAction('job.intake', 'look up motors', z.object({ serial: noNul(z.string().trim().max(80)) }), async (_user, input) => {
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
          frame: m.frame,
          outputKw: m.outputKw,
          voltages: m.voltages,
          ratedVoltageV: m.ratedVoltageV,
          connection: m.connection,
          currentA: m.currentA,
          frequencyHz: m.frequencyHz,
          speedRpm: m.speedRpm,
          phases: m.phases,
          serviceFactor: m.serviceFactor,
          insulationClass: m.insulationClass,
          duty: m.duty,
          enclosure: m.enclosure,
          efficiencyPercent: m.efficiencyPercent,
          powerFactor: m.powerFactor,
          codeLetter: m.codeLetter,
          designLetter: m.designLetter,
          bearingDriveEnd: m.bearingDriveEnd,
          bearingOppositeEnd: m.bearingOppositeEnd,
        },
      })),
    );
  })(raw);
}
