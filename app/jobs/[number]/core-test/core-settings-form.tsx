'use client';

/** The shop's core-loss settings (administrator): test density, field strength and the three limits. */
import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { FormProvider, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { saveCoreLossSettingsAction } from '@/lib/core-test/core-test-actions';
import { coreLossSettingsSchema, type CoreLossSettingsForm, type CoreLossSettingsFormInput } from '@/lib/core-test/core-test-schema';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { FormStatus } from '@/app/_components/form-status';
import { NumberField } from '../final-tests/test-fields';

export function CoreSettingsForm({ values }: { values: CoreLossSettingsFormInput }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const [version, setVersion] = useState(Number(values.version));
  const methods = useForm<CoreLossSettingsFormInput, unknown, CoreLossSettingsForm>({
    resolver: zodResolver(coreLossSettingsSchema),
    defaultValues: values,
  });
  const onSubmit = methods.handleSubmit(
    (v) =>
      startTransition(async () => {
        const r = await saveCoreLossSettingsAction({ ...v, version });
        if (r.ok) {
          setVersion(r.data.version);
          setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
          router.refresh();
        } else showActionFailure(r, { setError: methods.setError, setSummary, onStale: () => router.refresh() });
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );
  return (
    <FormProvider {...methods}>
      <form onSubmit={onSubmit} noValidate aria-label="Core-loss settings">
        <div className="grid">
          <NumberField
            path="testFluxDensityT"
            label="Test flux density in the back iron"
            unit="T"
            hint="Loop tests commonly run at 1.0–1.5 T (shop practice)."
          />
          <NumberField
            path="fieldStrengthAPerM"
            label="Magnetising field strength at that density"
            unit="A/m"
            hint="For the expected loop current."
          />
          <NumberField
            path="coreLossRiseLimitPercent"
            label="Largest accepted rise in core loss after stripping"
            unit="%"
            hint="Shop practice: about 20 %."
          />
          <NumberField path="hotSpotRiseLimitK" label="Largest accepted hot-spot rise" unit="K" hint="Shop practice: 5–10 K." />
          <NumberField path="copperLossRiseLimitPercent" label="Largest rise in stator copper loss before a finding" unit="%" />
        </div>
        <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
        <button type="submit" className="btn" disabled={pending}>
          {pending ? 'Saving…' : 'Save settings'}
        </button>
      </form>
    </FormProvider>
  );
}
