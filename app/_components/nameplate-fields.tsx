'use client';

import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { CONNECTIONS, CONNECTION_LABELS, INSULATION_CLASSES } from '@/lib/jobs/motor-schema';
import { Field, InputField, describe } from './field';
import { SpeedReadout } from './speed-readout';

type AnyForm = Record<string, unknown>;

function errorAt(errors: FieldErrors<AnyForm>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[key];
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === 'string' ? message : undefined;
}

/**
 * The nameplate as printed on the motor. `prefix` is where the motor lives in the form's values
 * (e.g. "motor"). Output takes kW or hp; the server stores kW.
 */
export function NameplateFields({
  prefix,
  register,
  errors,
  frequencyHz,
  speedRpm,
}: {
  prefix: string;
  register: UseFormRegister<AnyForm>;
  errors: FieldErrors<AnyForm>;
  frequencyHz: unknown;
  speedRpm: unknown;
}) {
  const p = (k: string) => `${prefix}.${k}`;
  const id = (k: string) => `${prefix}-${k}`;
  const e = (k: string) => errorAt(errors, p(k));
  const num = (k: string, label: string, unit?: string, hint?: string) => (
    <InputField id={id(k)} label={label} unit={unit} hint={hint} error={e(k)} type="number" registration={register(p(k))} />
  );
  const text = (k: string, label: string, hint?: string) => (
    <InputField id={id(k)} label={label} hint={hint} error={e(k)} registration={register(p(k))} />
  );
  return (
    <fieldset>
      <legend>Motor and nameplate</legend>
      <div className="grid">
        <p className="small wide" id={id('required-note')}>
          Fields marked * are required. A plate that cannot be read: tick “Plate unreadable”; rated voltage, frequency and speed may then be
          left blank and are recorded as unknown (write “unknown” as the manufacturer if that is unreadable too).
        </p>
        <label className="wide">
          <input type="checkbox" {...register(p('plateUnreadable'))} /> Plate unreadable
        </label>
        {text('manufacturer', 'Manufacturer *')}
        {text('model', 'Model / type')}
        {text('serial', 'Serial number')}
        {text('frame', 'Frame')}
        <Field id={id('outputValue')} label="Rated output" unit="kW or hp" error={e('outputValue')}>
          <div className="with-unit">
            <input
              {...register(p('outputValue'))}
              {...describe(id('outputValue'), e('outputValue'))}
              type="number"
              step="any"
              inputMode="decimal"
            />
            <select {...register(p('outputUnit'))} aria-label="Output unit">
              <option value="kW">kW</option>
              <option value="hp">hp</option>
            </select>
          </div>
        </Field>
        {num('ratedVoltageV', 'Rated voltage *', 'V', 'Line voltage the winding is connected for')}
        {text('voltages', 'All nameplate voltages', 'e.g. 230/460 or 400/690')}
        <Field id={id('connection')} label="Connection" error={e('connection')}>
          <select
            {...register(p('connection'), { setValueAs: (v: string) => (v === '' ? undefined : v) })}
            {...describe(id('connection'), e('connection'))}
          >
            <option value="">Not stated</option>
            {CONNECTIONS.map((c) => (
              <option key={c} value={c}>
                {CONNECTION_LABELS[c]}
              </option>
            ))}
          </select>
        </Field>
        {num('currentA', 'Full-load current', 'A')}
        {num('frequencyHz', 'Frequency *', 'Hz')}
        <div>
          {num('speedRpm', 'Rated speed *', 'rpm')}
          <SpeedReadout frequencyHz={frequencyHz} speedRpm={speedRpm} />
        </div>
        <Field id={id('phases')} label="Phases" error={e('phases')}>
          <select {...register(p('phases'))} {...describe(id('phases'), e('phases'))}>
            <option value="3">3</option>
            <option value="1">1</option>
          </select>
        </Field>
        {num('serviceFactor', 'Service factor', undefined, 'e.g. 1.15')}
        <Field id={id('insulationClass')} label="Insulation class" error={e('insulationClass')}>
          <select {...register(p('insulationClass'))} {...describe(id('insulationClass'), e('insulationClass'))}>
            <option value="">Not stated</option>
            {INSULATION_CLASSES.map((c) => (
              <option key={c} value={c}>
                Class {c}
              </option>
            ))}
          </select>
        </Field>
        {text('duty', 'Duty', 'S1 … S10, or continuous')}
        {text('enclosure', 'Enclosure / IP', 'e.g. IP55, TEFC, ODP')}
        {num('efficiencyPercent', 'Efficiency', '%')}
        {num('powerFactor', 'Power factor', 'cos φ')}
        {text('codeLetter', 'Code letter', 'NEMA locked-rotor kVA code')}
        {text('designLetter', 'Design letter', 'NEMA A, B, C, D')}
        {text('bearingDriveEnd', 'Bearing, drive end')}
        {text('bearingOppositeEnd', 'Bearing, opposite end')}
      </div>
    </fieldset>
  );
}
