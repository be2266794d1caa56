'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { decisionSchema, DECISION_METHODS, DECISION_METHOD_LABELS, type DecisionInput } from '@/lib/quotes/quote-schema';
import { recordDecision } from '@/lib/quotes/quote-actions';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { InputField, Field, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';

/** Records the customer's answer to the sent quote: accepted or declined, by whom, when, how, their order number. */
export function DecisionForm({
  quoteId,
  version,
  quoteNumber,
  today,
}: {
  quoteId: string;
  version: number;
  quoteNumber: string;
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
    formState: { errors },
  } = useForm<DecisionInput, unknown, z.output<typeof decisionSchema>>({
    resolver: zodResolver(decisionSchema),
    defaultValues: {
      quoteId,
      version,
      decision: 'ACCEPTED',
      decidedBy: '',
      decidedOn: today,
      method: 'PHONE',
      customerOrderNumber: '',
      note: '',
    },
  });
  const onSubmit = handleSubmit(
    () =>
      startTransition(async () => {
        const r = await recordDecision(getValues());
        if (r.ok) {
          setSummary({ tone: 'ok', text: r.message ?? 'Recorded.' });
          router.refresh();
        } else showActionFailure(r, { setError, setSummary, onStale: () => router.refresh() });
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Customer's decision on quote ${quoteNumber}`}>
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <fieldset>
        <legend>Decision</legend>
        <label className="inline">
          <input type="radio" value="ACCEPTED" {...register('decision')} /> Accepted
        </label>{' '}
        <label className="inline">
          <input type="radio" value="DECLINED" {...register('decision')} /> Declined
        </label>
      </fieldset>
      <div className="grid">
        <InputField
          id="decision-by"
          label="Decided by (customer’s person)"
          error={errors.decidedBy?.message}
          registration={register('decidedBy')}
          autoComplete="off"
        />
        <InputField id="decision-on" label="On" type="date" error={errors.decidedOn?.message} registration={register('decidedOn')} />
        <Field id="decision-method" label="How" error={errors.method?.message}>
          <select {...describe('decision-method', errors.method?.message)} {...register('method')}>
            {DECISION_METHODS.map((m) => (
              <option key={m} value={m}>
                {DECISION_METHOD_LABELS[m]}
              </option>
            ))}
          </select>
        </Field>
        <InputField
          id="decision-order"
          label="Customer order number"
          hint="Their purchase order or work order, if they gave one."
          error={errors.customerOrderNumber?.message}
          registration={register('customerOrderNumber')}
          autoComplete="off"
        />
        <InputField id="decision-note" label="Note" error={errors.note?.message} registration={register('note')} />
      </div>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Recording…' : 'Record decision'}
      </button>
    </form>
  );
}
