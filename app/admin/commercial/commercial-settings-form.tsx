'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { commercialSettingsSchema, type CommercialSettingsInput } from '@/lib/settings/commercial-schema';
import { saveCommercialSettings } from '@/lib/settings/commercial-actions';
import { CURRENCY_CODES } from '@/lib/quotes/money';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';

/** Currency, tax, rates, allowances, validity, warranty and the shop's terms (administrators only). */
export function CommercialSettingsForm({ defaults }: { defaults: CommercialSettingsInput }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [base, setBase] = useState(defaults.version);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    getValues,
    formState: { errors },
  } = useForm<CommercialSettingsInput, unknown, z.output<typeof commercialSettingsSchema>>({
    resolver: zodResolver(commercialSettingsSchema),
    defaultValues: defaults,
  });
  const onSubmit = handleSubmit(
    () =>
      startTransition(async () => {
        const r = await saveCommercialSettings({ ...getValues(), version: base });
        if (r.ok) {
          setBase(r.data.version);
          setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
          router.refresh();
        } else showActionFailure(r, { setError, setSummary, onStale: () => router.refresh() });
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Quoting settings">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <Field id="cs-currency" label="Currency" error={errors.currency?.message}>
          <select {...describe('cs-currency', errors.currency?.message)} {...register('currency')}>
            {CURRENCY_CODES.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        </Field>
        <Field id="cs-taxmode" label="Tax worked out" error={errors.taxMode?.message}>
          <select {...describe('cs-taxmode', errors.taxMode?.message)} {...register('taxMode')}>
            <option value="ON_TOTAL">On the total, per rate</option>
            <option value="PER_LINE">On every line, rounded per line</option>
          </select>
        </Field>
        <InputField
          id="cs-tax"
          label="Default tax rate"
          unit="%"
          inputMode="decimal"
          error={errors.defaultTaxRate?.message}
          registration={register('defaultTaxRate')}
        />
        <InputField
          id="cs-labour"
          label="Labour rate"
          unit="per hour"
          inputMode="decimal"
          error={errors.labourRate?.message}
          registration={register('labourRate')}
        />
        <InputField
          id="cs-copper"
          label="Copper magnet wire price"
          unit="per kg"
          inputMode="decimal"
          error={errors.copperPricePerKg?.message}
          registration={register('copperPricePerKg')}
        />
        <InputField
          id="cs-copper-allow"
          label="Copper allowance for leads and waste"
          unit="% of the winding’s copper"
          inputMode="decimal"
          error={errors.copperAllowance?.message}
          registration={register('copperAllowance')}
        />
        <InputField
          id="cs-ins"
          label="Insulation allowance"
          unit="% of the copper cost"
          inputMode="decimal"
          error={errors.insulationAllowance?.message}
          registration={register('insulationAllowance')}
        />
        <InputField
          id="cs-varnish"
          label="Varnish allowance"
          unit="% of the copper cost"
          inputMode="decimal"
          error={errors.varnishAllowance?.message}
          registration={register('varnishAllowance')}
        />
        <InputField
          id="cs-valid"
          label="Quotes valid for"
          unit="days"
          type="number"
          error={errors.quoteValidityDays?.message}
          registration={register('quoteValidityDays')}
        />
        <InputField
          id="cs-warranty"
          label="Repair warranty period"
          unit="days from shipment"
          type="number"
          error={errors.warrantyDays?.message}
          registration={register('warrantyDays')}
        />
      </div>
      <Field id="cs-terms" label="Terms printed on every quote" error={errors.quoteTerms?.message}>
        <textarea rows={6} {...describe('cs-terms', errors.quoteTerms?.message)} {...register('quoteTerms')} />
      </Field>
      <button className="btn" type="submit" disabled={pending} style={{ marginTop: '0.5rem' }}>
        {pending ? 'Saving…' : 'Save quoting settings'}
      </button>
    </form>
  );
}
