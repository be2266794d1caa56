'use client';

import { useRef, useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { intakeSchema, PRIORITIES, type Intake, type IntakeInput } from '@/lib/jobs/job-schema';
import { lookupSerial, submitIntake } from '@/lib/jobs/job-actions';
import { applyFieldErrors, FIX_FIELDS_SUMMARY } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { NameplateFields } from '@/app/_components/nameplate-fields';
import { callAction } from '@/lib/errors/call-action';
import { photoSizeProblems } from '@/lib/jobs/photo-rules';
import { newRequestKey } from '@/lib/errors/request-key';

type Option = { id: string; name: string };
type Match = Extract<Awaited<ReturnType<typeof lookupSerial>>, { ok: true }>['data'][number];

const DEFAULTS: IntakeInput = {
  customer: { mode: 'existing', customerId: '' },
  existingMotorId: '',
  motor: { manufacturer: '', outputUnit: 'kW', phases: 3, ratedVoltageV: '', frequencyHz: '', speedRpm: '' },
  job: { priority: 'NORMAL', reportedFault: '' },
};

export function IntakeForm({ customers, staff }: { customers: { id: string; company: string }[]; staff: Option[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const [matches, setMatches] = useState<Match[] | null>(null);
  const photosRef = useRef<HTMLInputElement>(null);
  const [requestKey] = useState(newRequestKey);
  const form = useForm<IntakeInput, unknown, Intake>({ resolver: zodResolver(intakeSchema), defaultValues: DEFAULTS });
  const {
    register,
    handleSubmit,
    watch,
    setValue,
    setError,
    formState: { errors },
  } = form;
  const anyRegister = register as unknown as UseFormRegister<Record<string, unknown>>;
  const anyErrors = errors as FieldErrors<Record<string, unknown>>;
  const mode = watch('customer.mode');
  const existingMotorId = watch('existingMotorId');
  const custErr = errors.customer as Record<string, { message?: string }> | undefined;

  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const photos = Array.from(photosRef.current?.files ?? []);
        const problems = photoSizeProblems(photos);
        if (problems.length) {
          applyFieldErrors({ photos: problems }, setError);
          return setSummary({ tone: 'bad', text: problems.join(' ') });
        }
        setSummary({ tone: 'warn', text: 'Saving…' });
        const fd = new FormData();
        // The same key on every retry of this form: the server returns the first job instead of a second.
        fd.set('payload', JSON.stringify({ ...values, requestKey }));
        for (const f of photos) fd.append('photos', f);
        const result = await callAction(() => submitIntake(fd));
        if (result.ok) {
          setSummary({ tone: 'ok', text: result.message ?? 'Saved.' });
          router.push(`/jobs/${result.data.number}`);
        } else {
          applyFieldErrors(result.fieldErrors, setError);
          setSummary({ tone: 'bad', text: result.message });
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );

  async function checkSerial() {
    const serial = String(form.getValues('motor.serial') ?? '');
    const result = await callAction(() => lookupSerial({ serial }));
    setMatches(result.ok ? result.data : []);
  }

  function takeMatch(m: Match) {
    setValue('existingMotorId', m.id);
    setValue('customer', { mode: 'existing', customerId: m.customer.id });
    setValue('motor.manufacturer', m.manufacturer);
    setValue('motor.model', m.model ?? '');
    for (const [k, v] of Object.entries(m.nameplate)) {
      if (v !== null && v !== undefined) setValue(`motor.${k}` as 'motor.frame', String(v));
    }
    if (m.nameplate.outputKw != null) {
      setValue('motor.outputValue', String(m.nameplate.outputKw));
      setValue('motor.outputUnit', 'kW');
    }
    setMatches(null);
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-describedby="intake-status">
      <div id="intake-status">
        <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      </div>

      <fieldset>
        <legend>Customer</legend>
        <div className="row" role="radiogroup" aria-label="Customer">
          <label className="row" style={{ fontWeight: 400 }}>
            <input type="radio" value="existing" {...register('customer.mode')} style={{ width: 'auto' }} /> Existing customer
          </label>
          <label className="row" style={{ fontWeight: 400 }}>
            <input type="radio" value="new" {...register('customer.mode')} style={{ width: 'auto' }} /> New customer
          </label>
        </div>
        {mode === 'existing' ? (
          <Field id="customerId" label="Customer *" error={custErr?.customerId?.message}>
            <select {...register('customer.customerId')} {...describe('customerId', custErr?.customerId?.message)}>
              <option value="">Choose…</option>
              {customers.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.company}
                </option>
              ))}
            </select>
          </Field>
        ) : (
          <div className="grid">
            <InputField id="company" label="Company *" error={custErr?.company?.message} registration={register('customer.company')} />
            <InputField
              id="contactName"
              label="Contact"
              error={custErr?.contactName?.message}
              registration={register('customer.contactName')}
            />
            <InputField id="phone" label="Phone" type="tel" error={custErr?.phone?.message} registration={register('customer.phone')} />
            <InputField id="email" label="Email" type="email" error={custErr?.email?.message} registration={register('customer.email')} />
            <InputField
              id="address"
              label="Address"
              className="wide"
              error={custErr?.address?.message}
              registration={register('customer.address')}
            />
          </div>
        )}
      </fieldset>

      <div className="row no-print" style={{ marginBottom: '0.5rem' }}>
        <button type="button" className="btn quiet" onClick={checkSerial}>
          Check serial for a returning motor
        </button>
        {existingMotorId ? (
          <span className="notice ok" style={{ margin: 0 }}>
            Returning motor: its job history is kept.
          </span>
        ) : null}
      </div>
      {matches && (
        <div className="card" aria-live="polite">
          {matches.length === 0 ? (
            <p>No motor with that serial has been here before.</p>
          ) : (
            <ul>
              {matches.map((m) => (
                <li key={m.id}>
                  {m.manufacturer} {m.model} S/N {m.serial} — {m.customer.company}; jobs {m.jobs.map((j) => j.number).join(', ')}{' '}
                  <button type="button" className="btn secondary" onClick={() => takeMatch(m)}>
                    Use this motor
                  </button>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}

      <NameplateFields
        prefix="motor"
        register={anyRegister}
        errors={anyErrors}
        frequencyHz={watch('motor.frequencyHz')}
        speedRpm={watch('motor.speedRpm')}
      />

      <fieldset>
        <legend>The job</legend>
        <div className="grid">
          <Field id="reportedFault" label="Reported fault *" className="wide" error={errors.job?.reportedFault?.message}>
            <textarea {...register('job.reportedFault')} {...describe('reportedFault', errors.job?.reportedFault?.message)} />
          </Field>
          <InputField
            id="promisedAt"
            label="Promised date"
            type="date"
            error={errors.job?.promisedAt?.message}
            registration={register('job.promisedAt')}
          />
          <Field id="priority" label="Priority" error={errors.job?.priority?.message}>
            <select {...register('job.priority')} id="priority">
              {PRIORITIES.map((p) => (
                <option key={p} value={p}>
                  {p.charAt(0) + p.slice(1).toLowerCase()}
                </option>
              ))}
            </select>
          </Field>
          <InputField
            id="customerPo"
            label="Customer PO"
            error={errors.job?.customerPo?.message}
            registration={register('job.customerPo')}
          />
          <Field id="assigneeId" label="Assign to" error={errors.job?.assigneeId?.message}>
            <select {...register('job.assigneeId')} id="assigneeId">
              <option value="">Nobody yet</option>
              {staff.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </select>
          </Field>
          <Field id="notes" label="Notes" className="wide" error={errors.job?.notes?.message}>
            <textarea {...register('job.notes')} id="notes" />
          </Field>
          <Field
            id="photos"
            label="Nameplate photos"
            hint="JPEG, PNG, WebP or GIF; up to 5 MB each, 6 at a time."
            error={(errors as Record<string, { message?: string }>).photos?.message}
          >
            <input ref={photosRef} id="photos" name="photos" type="file" accept="image/*" multiple aria-describedby="photos-hint" />
          </Field>
        </div>
      </fieldset>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Saving…' : 'Log motor and open job'}
      </button>
    </form>
  );
}
