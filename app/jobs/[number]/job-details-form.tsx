'use client';

import { useEffect, useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { jobEditSchema, PRIORITIES, type JobEditInput } from '@/lib/jobs/job-schema';
import { saveJobDetails } from '@/lib/jobs/job-actions';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';
import { onJobVersion } from './job-version';

export interface JobDetails {
  jobId: string;
  version: number;
  promisedAt: string;
  priority: (typeof PRIORITIES)[number];
  customerPo: string;
  reportedFault: string;
  notes: string;
  assigneeId: string;
}

/**
 * The job's editable details. Saving names the version the form was loaded from; if someone else saved
 * in between, the server refuses, the typed values stay, and the current values are shown for review.
 */
export function JobDetailsForm({ current, staff }: { current: JobDetails; staff: { id: string; name: string }[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [baseVersion, setBaseVersion] = useState(current.version);
  const [conflict, setConflict] = useState(false);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors },
  } = useForm<JobEditInput, unknown, z.output<typeof jobEditSchema>>({
    resolver: zodResolver(jobEditSchema),
    defaultValues: current,
  });
  useEffect(() => setValue('version', baseVersion), [baseVersion, setValue]);
  // Your own status move bumps the job's version: follow it when this form was based on the old one.
  useEffect(
    () =>
      onJobVersion((c) => {
        if (c.jobId === current.jobId) setBaseVersion((v) => (v === c.from ? c.to : v));
      }),
    [current.jobId],
  );

  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const result = await callAction(() => saveJobDetails({ ...values, version: baseVersion }));
        if (result.ok) {
          setBaseVersion(result.data.version);
          setConflict(false);
          setSummary({ tone: 'ok', text: result.message ?? 'Saved.' });
          router.refresh();
        } else {
          showActionFailure(result, {
            setError,
            setSummary,
            onStale: () => {
              setConflict(true);
              router.refresh();
            },
          });
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Job details">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      {conflict && (
        <div className="notice warn" data-testid="conflict" aria-live="polite">
          {current.version === baseVersion ? (
            <p>Loading the values saved by the other person…</p>
          ) : (
            <>
              <p>
                <strong>Saved by someone else</strong> (now version {current.version}). Their values:
              </p>
              <ul className="small">
                <li>
                  Promised: {current.promisedAt || '—'} · Priority: {current.priority.toLowerCase()} · PO: {current.customerPo || '—'}
                </li>
                <li>Reported fault: {current.reportedFault}</li>
                <li>Notes: {current.notes || '—'}</li>
              </ul>
              <button
                type="button"
                className="btn secondary"
                onClick={() => {
                  setBaseVersion(current.version);
                  setConflict(false);
                  setSummary({
                    tone: 'warn',
                    text: 'Your changes are still in the form. Save again to apply them over the current version.',
                  });
                }}
              >
                Keep my changes and retry on the current version
              </button>
            </>
          )}
        </div>
      )}
      <input type="hidden" {...register('jobId')} />
      <div className="grid">
        <Field id="reportedFault" label="Reported fault *" className="wide" error={errors.reportedFault?.message}>
          <textarea {...register('reportedFault')} {...describe('reportedFault', errors.reportedFault?.message)} />
        </Field>
        <InputField
          id="promisedAt"
          label="Promised date"
          type="date"
          error={errors.promisedAt?.message}
          registration={register('promisedAt')}
        />
        <Field id="priority" label="Priority" error={errors.priority?.message}>
          <select id="priority" {...register('priority')}>
            {PRIORITIES.map((p) => (
              <option key={p} value={p}>
                {p.charAt(0) + p.slice(1).toLowerCase()}
              </option>
            ))}
          </select>
        </Field>
        <InputField id="customerPo" label="Customer PO" error={errors.customerPo?.message} registration={register('customerPo')} />
        <Field id="assigneeId" label="Assigned to" error={errors.assigneeId?.message}>
          <select id="assigneeId" {...register('assigneeId')}>
            <option value="">Nobody yet</option>
            {staff.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </Field>
        <Field id="notes" label="Notes" className="wide" error={errors.notes?.message}>
          <textarea id="notes" {...register('notes')} />
        </Field>
      </div>
      <button className="btn" type="submit" disabled={pending || conflict}>
        {pending ? 'Saving…' : 'Save job details'}
      </button>
    </form>
  );
}
