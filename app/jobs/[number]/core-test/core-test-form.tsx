'use client';

/**
 * Recording a core-loss (loop) test: stage, readings, temperatures, instrument and hot spots. A new test
 * is added, or one test is edited under its version; the server refuses a stale edit and the form keeps
 * everything typed.
 */
import { useState, useTransition } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { FormProvider, useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { saveCoreTestAction } from '@/lib/core-test/core-test-actions';
import {
  CORE_TEST_STAGES,
  CORE_TEST_STAGE_LABELS,
  MAX_HOT_SPOTS,
  coreTestFormSchema,
  type CoreTestForm,
  type CoreTestFormInput,
} from '@/lib/core-test/core-test-schema';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { FormStatus } from '@/app/_components/form-status';
import { jobRoutes } from '@/lib/routes';
import { NumberField, SelectField, TextField } from '../final-tests/test-fields';

export function CoreTestFormView({
  values,
  editing,
  staff,
  jobNumber,
  slots,
  coreLengthMm,
}: {
  values: CoreTestFormInput;
  editing: { recordId: string; version: number; label: string } | null;
  staff: { id: string; name: string }[];
  jobNumber: number;
  slots: number | null;
  coreLengthMm: number | null;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const [target, setTarget] = useState(editing ? { recordId: editing.recordId, version: editing.version } : null);
  const methods = useForm<CoreTestFormInput, unknown, CoreTestForm>({ resolver: zodResolver(coreTestFormSchema), defaultValues: values });
  const { handleSubmit, setError, control, reset } = methods;
  const spots = useFieldArray({ control, name: 'data.hotSpots' });

  const onSubmit = handleSubmit(
    (v) =>
      startTransition(async () => {
        const result = await saveCoreTestAction({ ...v, recordId: target?.recordId ?? '', version: target?.version ?? '' });
        if (result.ok) {
          setSummary({ tone: 'ok', text: result.message ?? 'Saved.' });
          if (target) setTarget({ recordId: result.data.recordId, version: result.data.version });
          else reset(values);
          router.refresh();
        } else {
          showActionFailure(result, { setError, setSummary, onStale: () => router.refresh() });
        }
      }),
    () => setSummary({ tone: 'bad', text: FIX_FIELDS_SUMMARY }),
  );

  return (
    <FormProvider {...methods}>
      <form onSubmit={onSubmit} noValidate aria-labelledby="core-form-h">
        <h2 id="core-form-h" style={{ marginTop: 0 }}>
          {editing ? `Edit the test ${editing.label}` : 'Record a core-loss test'}
        </h2>
        {editing && (
          <p className="small">
            <Link href={jobRoutes(jobNumber).coreTest}>Record a new test instead</Link>
          </p>
        )}
        <div className="grid">
          <SelectField path="stage" label="When" options={CORE_TEST_STAGES.map((s) => [s, CORE_TEST_STAGE_LABELS[s]] as const)} />
          <TextField path="testedAt" label="Tested at (UTC, YYYY-MM-DDTHH:MM)" />
          <SelectField path="testedById" label="Tested by" options={staff.map((s) => [s.id, s.name] as const)} blank="Pick who tested" />
        </div>
        <fieldset>
          <legend>Loop and readings</legend>
          <div className="grid">
            <NumberField path="data.loopTurns" label="Loop turns" />
            <NumberField path="data.voltageV" label="Applied voltage" unit="V" />
            <NumberField path="data.currentA" label="Current" unit="A" />
            <NumberField path="data.watts" label="Watts" unit="W" />
            <NumberField path="data.frequencyHz" label="Frequency" unit="Hz" />
            <NumberField path="data.durationMin" label="Duration" unit="min" />
          </div>
        </fieldset>
        <fieldset>
          <legend>Temperatures</legend>
          <div className="grid">
            <NumberField path="data.ambientC" label="Ambient" unit="°C" readout="temperature" />
            <NumberField path="data.coreStartC" label="Core at the start" unit="°C" readout="temperature" />
            <NumberField path="data.coreEndC" label="Core at the end" unit="°C" readout="temperature" />
          </div>
        </fieldset>
        <fieldset>
          <legend>Hot spots</legend>
          <p className="hint">
            Slot number{slots ? ` (1–${slots})` : ''}, distance from the drive-end face of the core
            {coreLengthMm ? ` (0–${coreLengthMm} mm)` : ''}, and the rise above the surrounding core.
          </p>
          {spots.fields.map((field, i) => (
            <div key={field.id} className="grid hotspot-row" role="group" aria-label={`Hot spot ${i + 1}`}>
              <NumberField path={`data.hotSpots.${i}.slot`} label={`Hot spot ${i + 1}: slot`} />
              <NumberField path={`data.hotSpots.${i}.axialPositionMm`} label="From the drive end" unit="mm" />
              <NumberField path={`data.hotSpots.${i}.riseK`} label="Rise" unit="K" />
              <button type="button" className="btn secondary" onClick={() => spots.remove(i)}>
                Remove hot spot {i + 1}
              </button>
            </div>
          ))}
          {spots.fields.length < MAX_HOT_SPOTS && (
            <button type="button" className="btn secondary" onClick={() => spots.append({ slot: '', axialPositionMm: '', riseK: '' })}>
              Add a hot spot
            </button>
          )}
        </fieldset>
        <div className="grid">
          <TextField path="data.instrument" label="Instrument (power analyser, serial)" />
          <TextField path="data.notes" label="Notes" />
        </div>
        <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
        <button type="submit" className="btn" disabled={pending}>
          {pending ? 'Saving…' : editing ? 'Save changes' : 'Save test'}
        </button>
      </form>
    </FormProvider>
  );
}
