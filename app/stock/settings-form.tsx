'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { shopSettingsSchema, type LimitsForm, type ShopSettingsInput } from '@/lib/redesign/redesign-schema';
import { saveShopSettings } from '@/lib/settings/settings-actions';
import { applyFieldErrors, FIX_FIELDS_SUMMARY } from '@/lib/errors/form-errors';
import { InputField } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

const FIELDS: [keyof LimitsForm, string, string][] = [
  ['gapRisePercent', 'Gap density may rise by', '%'],
  ['gapFallPercent', 'Gap density may fall by', '%'],
  ['toothRisePercent', 'Tooth density may rise by', '%'],
  ['toothFallPercent', 'Tooth density may fall by', '%'],
  ['yokeRisePercent', 'Yoke density may rise by', '%'],
  ['yokeFallPercent', 'Yoke density may fall by', '%'],
  ['currentDensityRisePercent', 'Current density may rise by', '%'],
  ['currentDensityMaxAPerMm2', 'Current density at most', 'A/mm²'],
  ['slotFillMaxPercent', 'Slot fill at most', '% of gross area'],
  ['maxStrandsInHand', 'Wires in hand at most', 'strands'],
  ['maxWireSizes', 'Sizes per conductor at most', '1–3'],
  ['mixedSizeRatioMax', 'Mixed sizes: diameter ratio at most', '×'],
  ['minWireBareMm', 'Thinnest wire without a ranking penalty', 'mm bare'],
  ['harmonicKwMax', 'k_w5 and k_w7 at most', ''],
];

/** The shop's redesign limits (administrators only); saving names the version it was loaded from. */
export function SettingsForm({ version, defaults, starting }: { version: number; defaults: LimitsForm; starting: LimitsForm }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [base, setBase] = useState(version);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<ShopSettingsInput, unknown, z.output<typeof shopSettingsSchema>>({
    resolver: zodResolver(shopSettingsSchema),
    defaultValues: { version, limits: defaults },
  });
  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const r = await callAction(() => saveShopSettings({ ...values, version: base }));
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
  const e = errors.limits as Record<string, { message?: string } | undefined> | undefined;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Shop redesign limits" className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        {FIELDS.map(([name, label, unit]) => (
          <InputField
            key={name}
            id={`settings-${name}`}
            label={label}
            unit={unit}
            type="number"
            error={e?.[name]?.message}
            registration={register(`limits.${name}`)}
          />
        ))}
      </div>
      <div className="row" style={{ marginTop: '0.5rem' }}>
        <button className="btn" type="submit" disabled={pending}>
          {pending ? 'Saving…' : 'Save shop limits'}
        </button>
        <button type="button" className="btn quiet" onClick={() => reset({ version: base, limits: starting })}>
          Fill in the starting values
        </button>
      </div>
    </form>
  );
}
