'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { wireStockSchema, type WireStockEntry, type WireStockInput } from '@/lib/stock/wire-stock-schema';
import { addStockWire, deleteStockWire } from '@/lib/stock/stock-actions';
import { applyFieldErrors, FIX_FIELDS_SUMMARY } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

/** Adds a size on hand (the same size and grade again updates its quantity and note). */
export function AddStockForm() {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<WireStockInput, unknown, WireStockEntry>({
    resolver: zodResolver(wireStockSchema),
    defaultValues: { standard: 'metric', size: '', enamelGrade: 2, quantityKg: '', note: '' },
  });
  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const r = await callAction(() => addStockWire(values));
        if (r.ok) {
          setSummary({ tone: 'ok', text: r.message ?? 'Added.' });
          reset({ standard: values.standard, size: '', enamelGrade: values.enamelGrade, quantityKg: '', note: '' });
          router.refresh();
        } else {
          applyFieldErrors(r.fieldErrors, setError);
          setSummary({ tone: 'bad', text: r.message });
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Add a wire size" className="no-print" style={{ marginBottom: '1rem' }}>
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <Field id="stock-standard" label="Standard" error={errors.standard?.message}>
          <select {...register('standard')} {...describe('stock-standard', errors.standard?.message)}>
            <option value="metric">Metric (mm, IEC 60317)</option>
            <option value="awg">AWG (ASTM B258)</option>
          </select>
        </Field>
        <InputField
          id="stock-size"
          label="Size"
          hint="Metric: bare diameter in mm, e.g. 0.85. AWG: gauge, e.g. 18."
          error={errors.size?.message}
          registration={register('size')}
        />
        <Field id="stock-grade" label="Enamel grade" error={errors.enamelGrade?.message}>
          <select {...register('enamelGrade')} {...describe('stock-grade', errors.enamelGrade?.message)}>
            <option value={1}>1 (single build)</option>
            <option value={2}>2 (heavy build)</option>
            <option value={3}>3 (triple build)</option>
          </select>
        </Field>
        <InputField
          id="stock-quantity"
          label="On hand"
          unit="kg"
          type="number"
          error={errors.quantityKg?.message}
          registration={register('quantityKg')}
        />
        <InputField id="stock-note" label="Note" error={errors.note?.message} registration={register('note')} />
      </div>
      <button className="btn" type="submit" disabled={pending} style={{ marginTop: '0.5rem' }}>
        {pending ? 'Adding…' : 'Add to stock'}
      </button>
    </form>
  );
}

/** Removes a size from the stock after a confirmation. */
export function RemoveStockButton({ id, label }: { id: string; label: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="no-print">
      <button
        type="button"
        className="btn quiet"
        disabled={pending}
        aria-label={`Remove ${label}`}
        onClick={() => {
          if (!window.confirm(`Remove ${label} from the stock? The redesign search will no longer use it.`)) return;
          startTransition(async () => {
            const r = await callAction(() => deleteStockWire({ id }));
            if (r.ok) router.refresh();
            else setError(r.message);
          });
        }}
      >
        {pending ? 'Removing…' : 'Remove'}
      </button>
      {error && (
        <span role="alert" className="field-error">
          {error}
        </span>
      )}
    </span>
  );
}
