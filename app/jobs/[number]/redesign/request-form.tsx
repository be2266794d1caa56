'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { redesignRequestFormSchema, type RedesignRequestForm, type RedesignRequestFormInput } from '@/lib/redesign/redesign-schema';
import { submitRedesignRequest } from '@/lib/redesign/redesign-actions';
import { applyFieldErrors, FIX_FIELDS_SUMMARY } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

/** Limits fields: name, label, unit, hint. */
const LIMIT_FIELDS: [keyof RedesignRequestFormInput['limits'], string, string, string?][] = [
  ['gapRisePercent', 'Gap density may rise by', '%'],
  ['gapFallPercent', 'Gap density may fall by', '%'],
  ['toothRisePercent', 'Tooth density may rise by', '%'],
  ['toothFallPercent', 'Tooth density may fall by', '%'],
  ['yokeRisePercent', 'Yoke density may rise by', '%'],
  ['yokeFallPercent', 'Yoke density may fall by', '%', 'A lower yoke density only leaves iron unused.'],
  ['currentDensityRisePercent', 'Current density may rise by', '%'],
  ['currentDensityMaxAPerMm2', 'Current density at most', 'A/mm²', '1 A/mm² ≈ 1973.5 CM/A'],
  ['slotFillMaxPercent', 'Slot fill at most', '% of gross area', 'Insulated wire over the gross slot area.'],
  ['maxStrandsInHand', 'Wires in hand at most', 'strands'],
  ['maxWireSizes', 'Sizes per conductor at most', '1–3'],
  ['mixedSizeRatioMax', 'Mixed sizes: diameter ratio at most', '×'],
  ['minWireBareMm', 'Thinnest wire without penalty', 'mm bare', 'Thinner wire ranks lower (slow to wind, easy to nick).'],
  ['harmonicKwMax', 'k_w5 and k_w7 at most', '', 'A full-pitch winding with q = 2 has 0.259.'],
];

type Err = { message?: string } | undefined;

/**
 * The redesign request: the customer's new supply, the options to search and the limits (the shop's
 * defaults, changeable for this job). Submitting saves the draft revision and shows its candidates.
 */
export function RequestForm({ defaults, submitLabel, intro }: { defaults: RedesignRequestFormInput; submitLabel: string; intro: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<RedesignRequestFormInput, unknown, RedesignRequestForm>({
    resolver: zodResolver(redesignRequestFormSchema),
    defaultValues: defaults,
  });
  const t = errors.target;
  const l = errors.limits as Record<string, Err> | undefined;
  const spansError = (t?.spans as Err)?.message ?? (Array.isArray(t?.spans) ? (t.spans as Err[]).find(Boolean)?.message : undefined);
  const pathsError =
    (t?.parallelPaths as Err)?.message ?? (Array.isArray(t?.parallelPaths) ? (t.parallelPaths as Err[]).find(Boolean)?.message : undefined);

  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        setSummary(null);
        const result = await callAction(() => submitRedesignRequest(values));
        if (result.ok) {
          setSummary({ tone: 'ok', text: result.message ?? 'Saved.' });
          router.push(`?rev=${result.data.revision}#candidates`);
          router.refresh();
        } else {
          applyFieldErrors(result.fieldErrors, setError);
          setSummary({ tone: 'bad', text: result.message });
          if (result.code === 'stale') router.refresh();
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Redesign request" className="no-print">
      <p className="muted small">{intro}</p>
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <input type="hidden" {...register('jobId')} />
      <input type="hidden" {...register('draftVersion')} />
      <fieldset>
        <legend>New supply</legend>
        <div className="grid">
          <InputField
            id="target-lineVoltageV"
            label="Line voltage"
            unit="V"
            type="number"
            error={t?.lineVoltageV?.message}
            registration={register('target.lineVoltageV')}
          />
          <InputField
            id="target-frequencyHz"
            label="Frequency"
            unit="Hz"
            type="number"
            error={t?.frequencyHz?.message}
            registration={register('target.frequencyHz')}
          />
          <InputField
            id="target-poles"
            label="Poles"
            type="number"
            inputMode="numeric"
            error={t?.poles?.message}
            registration={register('target.poles')}
            hint="Fewer poles load the back iron harder."
          />
          <Field id="target-connection" label="Connection" error={t?.connection?.message}>
            <select {...register('target.connection')} {...describe('target-connection', t?.connection?.message)}>
              <option value="star">Star (Y)</option>
              <option value="delta">Delta (Δ)</option>
              <option value="either">Either: try both</option>
            </select>
          </Field>
        </div>
      </fieldset>
      <fieldset>
        <legend>Options to search</legend>
        <div className="grid">
          <InputField
            id="target-spans"
            label="Spans to try"
            unit="slot pitches"
            error={spansError}
            registration={register('target.spans')}
            hint='Empty: keep the as-found span. "7, 8" tries 1–8 and 1–9.'
          />
          <Field id="target-layers" label="Layers" error={t?.layers?.message}>
            <select {...register('target.layers')} {...describe('target-layers', t?.layers?.message)}>
              <option value="keep">Keep the as-found layers and style</option>
              <option value="double-lap">Rewind as double-layer lap</option>
            </select>
          </Field>
          <InputField
            id="target-parallelPaths"
            label="Parallel circuits to try"
            error={pathsError}
            registration={register('target.parallelPaths')}
            hint="Empty: every count the layout allows (up to 8)."
          />
        </div>
        <p className="check">
          <input
            id="target-allowOverPitch"
            type="checkbox"
            {...register('target.allowOverPitch')}
            aria-describedby="target-allowOverPitch-hint"
          />{' '}
          <label htmlFor="target-allowOverPitch">Also evaluate over-pitched spans (longer than the pole pitch)</label>
          <br />
          <span id="target-allowOverPitch-hint" className="small muted">
            Off: a span longer than the pole pitch is refused. On a pole change the usual spans of the new pole pitch are always tried.
          </span>
        </p>
      </fieldset>
      <details>
        <summary>Limits for this job (shop defaults; change them here for this request only)</summary>
        <div className="grid" style={{ marginTop: '0.5rem' }}>
          {LIMIT_FIELDS.map(([name, label, unit, hint]) => (
            <InputField
              key={name}
              id={`limits-${name}`}
              label={label}
              unit={unit}
              type="number"
              error={l?.[name]?.message}
              registration={register(`limits.${name}`)}
              {...(hint ? { hint } : {})}
            />
          ))}
        </div>
      </details>
      <div className="row" style={{ marginTop: '0.75rem' }}>
        <button className="btn" type="submit" disabled={pending}>
          {pending ? 'Searching…' : submitLabel}
        </button>
        {pending && (
          <span className="muted" role="status">
            Searching every turns, circuit, connection and wire combination…
          </span>
        )}
      </div>
    </form>
  );
}
