'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { benchSettingsSchema, type BenchSettings, type BenchSettingsInput } from '@/lib/bench-pack/bench-pack-schema';
import { saveBenchSettings } from '@/lib/bench-pack/bench-settings-actions';
import { applyFieldErrors, FIX_FIELDS_SUMMARY } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';

/** The bench pack's wire allowance and lead convention (administrators only). */
export function BenchSettingsForm({
  version,
  allowancePercent,
  leadConvention,
}: {
  version: number;
  allowancePercent: number;
  leadConvention: 'iec' | 'nema';
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [base, setBase] = useState(version);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<BenchSettingsInput, unknown, BenchSettings>({
    resolver: zodResolver(benchSettingsSchema),
    defaultValues: { version, wireAllowancePercent: allowancePercent, leadConvention },
  });
  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const r = await saveBenchSettings({ ...values, version: base });
        if (r.ok) {
          setBase(r.data.version);
          setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
          router.refresh();
        } else {
          applyFieldErrors(r.fieldErrors, setError);
          setSummary({ tone: 'bad', text: r.message });
          if (r.code === 'stale') router.refresh();
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Bench pack settings" className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <InputField
          id="bench-allowance"
          label="Allowance for leads, jumpers and waste"
          unit="%"
          type="number"
          hint="Added to the copper weight of the winding when the bench pack lists the wire to draw."
          error={errors.wireAllowancePercent?.message}
          registration={register('wireAllowancePercent')}
        />
        <Field id="bench-convention" label="Lead marking shown first" error={errors.leadConvention?.message}>
          <select {...register('leadConvention')} {...describe('bench-convention', errors.leadConvention?.message)}>
            <option value="iec">IEC 60034-8 terminal markings (U1, V1, W1 …)</option>
            <option value="nema">NEMA MG 1 Part 2 lead numbering (T1 … T12)</option>
          </select>
        </Field>
      </div>
      <button className="btn" type="submit" disabled={pending} style={{ marginTop: '0.5rem' }}>
        {pending ? 'Saving…' : 'Save bench pack settings'}
      </button>
    </form>
  );
}
