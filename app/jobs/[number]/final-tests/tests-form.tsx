'use client';

import { useMemo, useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { FormProvider, useForm, useFormContext, useWatch, type Control } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  HIPOT_CASES,
  HIPOT_KINDS,
  HIPOT_PRACTICES,
  INSULATION_CLASSES,
  IR_CATEGORIES,
  LEAD_PAIRS,
  PHASE_NAMES,
  RESISTANCE_BETWEEN,
  testRecordFormSchema,
  type TestRecordForm,
  type TestRecordFormInput,
} from '@/lib/final-tests/test-record-schema';
import { saveTestRecordAction } from '@/lib/final-tests/record-actions';
import { lenientTestData, liveJudgement } from '@/lib/final-tests/live-judgement';
import { HIPOT_DURATION_S } from '@/lib/engine/hipot';
import { ratingSentence } from '@/lib/final-tests/readings';
import { ohmText, percentText, megohmText } from '@/lib/final-tests/display';
import type { BasisSources } from '@/lib/final-tests/defaults';
import type { SectionKey, TestJudgement } from '@/lib/final-tests/verdicts';
import { FIX_FIELDS_SUMMARY, showActionFailure } from '@/lib/errors/form-errors';
import { FormStatus } from '@/app/_components/form-status';
import { Field, describe } from '@/app/_components/field';
import { NumberField, SelectField, TextField, idOf, useFieldError } from './test-fields';
import { OverallVerdict, SectionVerdict } from './judgement-view';
import { callAction } from '@/lib/errors/call-action';

const RESULT_OPTIONS = [
  ['pass', 'Pass'],
  ['fail', 'Fail'],
] as const;
const CASE_LABELS: Record<(typeof HIPOT_CASES)[number], string> = {
  new: 'New winding',
  repeat: 'Repeat test (80 %)',
  reconditioned: 'Reconditioned / partial rewind',
};
const PRACTICE_LABELS: Record<(typeof HIPOT_PRACTICES)[number], string> = { nema: 'NEMA MG 1 / ANSI/EASA AR100', iec: 'IEC 60034-1' };
const CATEGORY_LABELS: Record<(typeof IR_CATEGORIES)[number], string> = {
  'random-wound': 'Random-wound or below 1 kV (5 MΩ)',
  'form-wound': 'Form-wound, after about 1970 (100 MΩ)',
  older: 'Older winding (kV + 1 MΩ)',
};

export interface CurrentRecordRef {
  recordId: string;
  version: number;
  sequence: number;
}

interface Target {
  recordId?: string;
  version?: number;
  previousSequence: number;
}

/**
 * The final-tests form: one record's readings, with verdicts recomputed as the winder types. It edits the
 * current record (naming its version) or adds a retest after it; the server refuses either when someone
 * else saved in between, and what was typed stays in the form.
 */
export function TestsForm(props: {
  jobId: string;
  staff: { id: string; name: string }[];
  current: CurrentRecordRef | null;
  editValues: TestRecordFormInput | null;
  newValues: TestRecordFormInput;
  sources: BasisSources;
}) {
  const { current } = props;
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [mode, setMode] = useState<'edit' | 'new'>(props.editValues ? 'edit' : 'new');
  const [target, setTarget] = useState<Target>(
    current && props.editValues ? { ...current, previousSequence: current.sequence } : { previousSequence: current?.sequence ?? 0 },
  );
  const [conflict, setConflict] = useState(false);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(null);
  const methods = useForm<TestRecordFormInput, unknown, TestRecordForm>({
    resolver: zodResolver(testRecordFormSchema),
    defaultValues: props.editValues ?? props.newValues,
  });
  const { handleSubmit, setError, reset } = methods;

  const switchTo = (next: 'edit' | 'new') => {
    setMode(next);
    setConflict(false);
    setSummary(null);
    if (next === 'edit' && current && props.editValues) {
      reset(props.editValues);
      setTarget({ ...current, previousSequence: current.sequence });
    } else {
      reset(props.newValues);
      setTarget({ previousSequence: current?.sequence ?? 0 });
    }
  };

  const onSubmit = handleSubmit(
    (values) =>
      startTransition(async () => {
        const result = await callAction(() =>
          saveTestRecordAction({ ...values, ...target, recordId: target.recordId ?? '', version: target.version ?? '' }),
        );
        if (result.ok) {
          setTarget({ recordId: result.data.recordId, version: result.data.version, previousSequence: result.data.sequence });
          setMode('edit');
          setConflict(false);
          setSummary({ tone: result.data.verdict === 'FAIL' ? 'warn' : 'ok', text: result.message ?? 'Saved.' });
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

  const retryOnCurrent = () => {
    if (!current) return;
    setTarget(mode === 'edit' ? { ...current, previousSequence: current.sequence } : { previousSequence: current.sequence });
    setConflict(false);
    setSummary({
      tone: 'warn',
      text: `Your readings are still in the form. Save again to apply them ${mode === 'edit' ? `over record #${current.sequence} as it is now` : `as record #${current.sequence + 1}`}.`,
    });
  };

  const heading =
    mode === 'edit' && target.recordId
      ? `Edit test record #${target.previousSequence}`
      : `New test record #${target.previousSequence + 1}${target.previousSequence > 0 ? ' (retest)' : ''}`;

  return (
    <FormProvider {...methods}>
      <form onSubmit={onSubmit} noValidate aria-label="Final tests" className="tests-layout">
        <div className="row no-print" style={{ justifyContent: 'space-between' }}>
          <h2 style={{ margin: 0 }}>{heading}</h2>
          {current &&
            props.editValues &&
            (mode === 'edit' ? (
              <button type="button" className="btn quiet" onClick={() => switchTo('new')}>
                Start a retest (record #{current.sequence + 1})
              </button>
            ) : (
              <button type="button" className="btn quiet" onClick={() => switchTo('edit')}>
                Back to editing record #{current.sequence}
              </button>
            ))}
        </div>
        <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
        {conflict && (
          <div className="notice warn" data-testid="conflict">
            {current ? (
              <>
                <p>
                  <strong>Saved by someone else meanwhile.</strong> The newest record is now #{current.sequence} (version {current.version}
                  ); it is shown above the form.
                </p>
                <button type="button" className="btn secondary" onClick={retryOnCurrent}>
                  Keep my readings and retry
                </button>
              </>
            ) : (
              <p>Loading what the other person saved…</p>
            )}
          </div>
        )}
        <Sections control={methods.control} staff={props.staff} sources={props.sources} />
        <Footer control={methods.control} pending={pending || conflict} />
      </form>
    </FormProvider>
  );
}

function useJudgement(control: Control<TestRecordFormInput>): TestJudgement | null {
  const data = useWatch({ control, name: 'data' });
  return useMemo(() => liveJudgement(data), [data]);
}

function Live({ j, section }: { j: TestJudgement | null; section: SectionKey }) {
  const s = j?.sections.find((x) => x.key === section);
  return s ? <SectionVerdict section={s} /> : null;
}

function Sections({
  control,
  staff,
  sources,
}: {
  control: Control<TestRecordFormInput>;
  staff: { id: string; name: string }[];
  sources: BasisSources;
}) {
  const j = useJudgement(control);
  const between = useWatch({ control, name: 'data.resistance.between' });
  const testedByError = useFieldError('testedById');
  const pairs = between === 'phase' ? PHASE_NAMES.map((p) => `phase ${p}`) : LEAD_PAIRS.map((p) => `leads ${p}`);
  const levels = j?.derived.hipotLevels;
  const irv = j?.derived.irTestVoltage;
  return (
    <>
      <fieldset>
        <legend>Who tested, and when</legend>
        <div className="grid">
          <DateTimeField path="testedAt" label="Tested at (UTC)" />
          <SelectField
            path="testedById"
            label="Tested by"
            options={staff.map((s) => [s.id, s.name] as const)}
            blank="Pick a person"
            hint={testedByError ? undefined : 'Signs the record.'}
          />
        </div>
      </fieldset>

      <fieldset>
        <legend>Basis of the verdicts</legend>
        <div className="grid">
          <NumberField path="data.basis.ratedVoltageV" label="Rated voltage" unit="V" hint={sources.ratedVoltageV} />
          <NumberField path="data.basis.ratedOutputKw" label="Rated output" unit="kW" hint="Only for the NEMA rule on small motors." />
          <SelectField
            path="data.basis.insulationClass"
            label="Insulation class"
            options={INSULATION_CLASSES.map((c) => [c, `Class ${c}`] as const)}
            blank="Pick a class"
            hint={sources.insulationClass}
          />
          <SelectField
            path="data.basis.windingKind"
            label="Winding"
            options={[
              ['random', 'Random-wound (round wire)'],
              ['form', 'Form-wound (formed coils)'],
            ]}
            hint={sources.windingKind}
          />
          <SelectField
            path="data.basis.irCategory"
            label="IEEE 43 IR minimum"
            options={IR_CATEGORIES.map((c) => [c, CATEGORY_LABELS[c]] as const)}
          />
          <NumberField path="data.basis.frequencyHz" label="Rated frequency" unit="Hz" hint={sources.rating} />
          <NumberField path="data.basis.poles" label="Poles" hint="With the frequency, gives the synchronous speed." />
          <NumberField path="data.basis.ratedCurrentA" label="Rated current" unit="A" />
          <NumberField path="data.basis.ratedSpeedRpm" label="Rated speed" unit="rpm" />
        </div>
        <RatingLine control={control} />
      </fieldset>

      <fieldset>
        <legend>Insulation resistance and polarization index (winding to frame)</legend>
        <div className="grid">
          <NumberField
            path="data.ir.testVoltageV"
            label="Test voltage"
            unit="V DC"
            hint={irv ? `Recommended ${irv.minV === irv.maxV ? `${irv.minV} V` : `${irv.minV}–${irv.maxV} V`} (IEEE 43).` : undefined}
          />
          <NumberField path="data.ir.temperatureC" label="Winding temperature" unit="°C" readout="temperature" />
          <NumberField path="data.ir.ir1MinMOhm" label="IR at 1 minute" unit="MΩ" />
          <NumberField path="data.ir.ir10MinMOhm" label="IR at 10 minutes" unit="MΩ" />
          <TextField path="data.ir.instrumentSerial" label="Megohmmeter serial" />
        </div>
        <p className="readout" data-testid="ir-derived">
          IR 1 min corrected to 40 °C: {megohmText(j?.derived.ir40MOhm)} · PI: {j?.derived.polarizationIndex?.toFixed(2) ?? '—'}
        </p>
        <Live j={j} section="ir" />
      </fieldset>

      <fieldset>
        <legend>High-potential test (winding to frame)</legend>
        <div className="grid">
          <SelectField path="data.hipot.case" label="Case" options={HIPOT_CASES.map((c) => [c, CASE_LABELS[c]] as const)} />
          <SelectField
            path="data.hipot.practice"
            label="Practice"
            options={HIPOT_PRACTICES.map((p) => [p, PRACTICE_LABELS[p]] as const)}
            hint={sources.practice}
          />
        </div>
        <p className="proposed" data-testid="hipot-proposed">
          Proposed: <strong>{levels ? `${levels.acV} V AC` : '—'}</strong> for 1 minute, or{' '}
          <strong>{levels ? `${levels.dcV} V DC` : '—'}</strong>
          {levels && <span className="small muted"> — {levels.rule}</span>}
        </p>
        <div className="grid">
          <SelectField path="data.hipot.kind" label="Applied as" options={HIPOT_KINDS.map((k) => [k, k.toUpperCase()] as const)} />
          <NumberField path="data.hipot.appliedV" label="Applied voltage" unit="V" />
          <NumberField
            path="data.hipot.durationS"
            label="Held for"
            unit="s"
            hint={`The rule asks ${HIPOT_DURATION_S} s at the full level.`}
          />
          <NumberField path="data.hipot.leakageMa" label="Leakage current" unit="mA" hint="DC: 0.004 mA = 4 µA. Recorded, not judged." />
          <SelectField
            path="data.hipot.result"
            label="Did the winding hold?"
            options={[
              ['pass', 'Held: no breakdown'],
              ['fail', 'Broke down'],
            ]}
            blank="Not tested yet"
          />
          <TextField path="data.hipot.instrumentSerial" label="Hipot tester serial" />
          <TextField
            path="data.hipot.reducedReason"
            label="Reason for a reduced level or time"
            hint="Only when the level or time was lowered on purpose (customer's instruction, repeat test). The sheet then prints a reduced-level test, never a pass."
          />
        </div>
        <Live j={j} section="hipot" />
      </fieldset>

      <fieldset>
        <legend>Surge comparison</legend>
        <div className="grid">
          <NumberField path="data.surge.testVoltageV" label="Surge test voltage" unit="V peak" />
          <TextField path="data.surge.instrumentSerial" label="Surge tester serial" />
        </div>
        {PHASE_NAMES.map((p, i) => (
          <div className="phase-row" key={p}>
            <SelectField
              path={`data.surge.phases.${i}.result`}
              label={`Phase ${p} result`}
              options={RESULT_OPTIONS}
              blank="Not tested yet"
            />
            <TextField path={`data.surge.phases.${i}.notes`} label={`Phase ${p} notes`} />
          </div>
        ))}
        <Live j={j} section="surge" />
      </fieldset>

      <fieldset>
        <legend>Winding resistance</legend>
        <div className="grid">
          <SelectField
            path="data.resistance.between"
            label="Measured"
            options={RESISTANCE_BETWEEN.map((b) => [b, b === 'phase' ? 'Per phase' : 'Line to line'] as const)}
          />
          {pairs.map((label, i) => (
            <NumberField key={label} path={`data.resistance.readings.${i}`} label={`Resistance, ${label}`} unit="Ω" />
          ))}
          <NumberField path="data.resistance.temperatureC" label="Winding temperature" unit="°C" readout="temperature" />
          <NumberField
            path="data.resistance.referenceTemperatureC"
            label="Corrected to"
            unit="°C"
            readout="temperature"
            hint="Copper, 234.5 + t (IEEE)."
          />
          <TextField path="data.resistance.instrumentSerial" label="Ohmmeter serial" />
        </div>
        <p className="readout" data-testid="resistance-derived">
          Corrected: {j?.derived.correctedOhm?.map(ohmText).join(' · ') ?? '—'} · unbalance {percentText(j?.derived.unbalanceFraction)}
        </p>
        <Live j={j} section="resistance" />
      </fieldset>

      <fieldset>
        <legend>Run test</legend>
        <div className="grid">
          <NumberField path="data.run.voltageV" label="Supply voltage" unit="V" />
          {PHASE_NAMES.map((p, i) => (
            <NumberField key={p} path={`data.run.currentsA.${i}`} label={`Current, phase ${p}`} unit="A" />
          ))}
          <NumberField path="data.run.speedRpm" label="Speed" unit="rpm" />
          <NumberField path="data.run.vibrationMmS" label="Vibration, highest reading" unit="mm/s" readout="velocity" />
          <NumberField
            path="data.run.vibrationLimitMmS"
            label="Vibration limit"
            unit="mm/s"
            readout="velocity"
            hint="Same measure (peak or rms) as the reading; blank: not judged."
          />
          <NumberField path="data.run.bearingDeC" label="Bearing temperature, drive end" unit="°C" readout="temperature" />
          <NumberField path="data.run.bearingOdeC" label="Bearing temperature, opposite end" unit="°C" readout="temperature" />
          <SelectField path="data.run.result" label="Run result" options={RESULT_OPTIONS} blank="Not run yet" />
          <TextField path="data.run.instrumentSerial" label="Vibration meter serial" />
          <TextField path="data.run.notes" label="Run notes" />
        </div>
        <Live j={j} section="run" />
      </fieldset>

      <fieldset>
        <legend>Notes</legend>
        <TextField path="data.notes" label="Notes for the job sheet" />
      </fieldset>
    </>
  );
}

/** Which rating the verdicts are judged for, in one sentence (the saved record prints the same). */
function RatingLine({ control }: { control: Control<TestRecordFormInput> }) {
  const data = useWatch({ control, name: 'data' });
  const judged = useMemo(() => lenientTestData(data), [data]);
  return judged ? (
    <p className="readout" data-testid="rating-sentence">
      Verdicts {ratingSentence(judged.basis)}.
    </p>
  ) : null;
}

/** Tested-at date and time: datetime-local gives "YYYY-MM-DDTHH:MM", taken as UTC like every time the app shows. */
function DateTimeField({ path, label }: { path: string; label: string }) {
  const { register } = useFormContext();
  const error = useFieldError(path);
  const id = idOf(path);
  return (
    <Field id={id} label={label} error={error}>
      <input type="datetime-local" {...register(path)} {...describe(id, error)} />
    </Field>
  );
}

function Footer({ control, pending }: { control: Control<TestRecordFormInput>; pending: boolean }) {
  const j = useJudgement(control);
  return (
    <div className="card" aria-live="polite">
      <OverallVerdict judgement={j} live />
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Saving…' : 'Save test record'}
      </button>
    </div>
  );
}
