'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { labourBookingSchema, type LabourBookingInput } from '@/lib/quotes/labour-schema';
import { bookLabour } from '@/lib/quotes/quote-actions';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';

/** Books hours against the job: who, task, hours, day. The list and the comparison are rendered by the page. */
export function LabourForm({
  jobId,
  staff,
  me,
  today,
}: {
  jobId: string;
  staff: { id: string; name: string }[];
  me: string;
  today: string;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    getValues,
    reset,
    formState: { errors },
  } = useForm<LabourBookingInput, unknown, z.output<typeof labourBookingSchema>>({
    resolver: zodResolver(labourBookingSchema),
    defaultValues: { jobId, personId: staff.some((s) => s.id === me) ? me : (staff[0]?.id ?? ''), task: '', hours: '', workedOn: today },
  });
  const onSubmit = handleSubmit(
    () =>
      startTransition(async () => {
        const r = await bookLabour(getValues());
        if (r.ok) {
          setSummary({ tone: 'ok', text: r.message ?? 'Booked.' });
          reset({ ...getValues(), task: '', hours: '' });
          router.refresh();
        } else showActionFailure(r, { setError, setSummary });
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Book labour">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <Field id="labour-person" label="Who" error={errors.personId?.message}>
          <select {...describe('labour-person', errors.personId?.message)} {...register('personId')}>
            {staff.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </Field>
        <InputField id="labour-task" label="Task" error={errors.task?.message} registration={register('task')} />
        <InputField
          id="labour-hours"
          label="Hours"
          unit="h"
          inputMode="decimal"
          error={errors.hours?.message}
          registration={register('hours')}
        />
        <InputField id="labour-day" label="Day" type="date" error={errors.workedOn?.message} registration={register('workedOn')} />
      </div>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Booking…' : 'Book labour'}
      </button>
    </form>
  );
}
