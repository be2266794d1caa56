'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { approveRedesignSchema } from '@/lib/redesign/redesign-schema';
import { approveRedesignRevision } from '@/lib/redesign/redesign-actions';
import { applyFieldErrors } from '@/lib/errors/form-errors';
import { Field, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

/**
 * Approval of a draft revision with a note. Shown to everyone who can open the page: the server decides,
 * and a role without 'redesign.approve' gets its refusal spelled out here.
 */
export function ApproveForm({
  redesignId,
  version,
  revision,
  mayApprove,
}: {
  redesignId: string;
  version: number;
  revision: number;
  mayApprove: boolean;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof approveRedesignSchema>, unknown, z.output<typeof approveRedesignSchema>>({
    resolver: zodResolver(approveRedesignSchema),
    defaultValues: { redesignId, version, note: '' },
  });
  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const r = await callAction(() => approveRedesignRevision(values));
        if (r.ok) {
          setSummary({ tone: 'ok', text: r.message ?? 'Approved.' });
          router.refresh();
        } else {
          applyFieldErrors(r.fieldErrors, setError);
          setSummary({ tone: 'bad', text: r.message });
        }
      }),
    () => setSummary({ tone: 'bad', text: 'Write an approval note first.' }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Approve redesign" className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      {!mayApprove && (
        <p className="notice warn">Only an engineer can approve a redesign. You may read it; approval will be refused for your role.</p>
      )}
      <input type="hidden" {...register('redesignId')} />
      <input type="hidden" {...register('version')} />
      <Field
        id="approval-note"
        label="Approval note *"
        error={errors.note?.message}
        hint="What you checked (flux ratios, fill, insulation, fan and bearings, customer's load) and any condition."
      >
        <textarea {...register('note')} {...describe('approval-note', errors.note?.message, 'hint')} />
      </Field>
      <p className="small">
        Approving freezes revision {revision}: request, chosen winding and every figure on this page. A later change needs a new revision
        and a new approval.
      </p>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Approving…' : `Approve revision ${revision}`}
      </button>
    </form>
  );
}
