'use client';

/**
 * Field helpers for the final-tests form: numbers with their unit, selects, and read-outs that show the
 * imperial value (°F, in/s) beside what was typed. Ids follow the value's path ("data.ir.temperatureC" →
 * "data-ir-temperatureC") so error and hint ids stay unique.
 */
import { get, useFormContext, useWatch, type FieldErrors } from 'react-hook-form';
import { Field, InputField, describe } from '@/app/_components/field';
import { temperatureText, velocityText } from '@/lib/final-tests/display';

export const idOf = (path: string) => path.replace(/\./g, '-');

export function useFieldError(path: string): string | undefined {
  const {
    formState: { errors },
  } = useFormContext();
  const e = get(errors as FieldErrors, path) as { message?: unknown } | undefined;
  return typeof e?.message === 'string' ? e.message : undefined;
}

const toNumber = (v: unknown): number | undefined => {
  const n = typeof v === 'number' ? v : typeof v === 'string' && v.trim() !== '' ? Number(v.replace(',', '.')) : Number.NaN;
  return Number.isFinite(n) ? n : undefined;
};

export function NumberField({
  path,
  label,
  unit,
  hint,
  readout,
}: {
  path: string;
  label: string;
  unit?: string;
  hint?: string;
  readout?: 'temperature' | 'velocity';
}) {
  const { register } = useFormContext();
  const error = useFieldError(path);
  return (
    <div>
      <InputField id={idOf(path)} label={label} unit={unit} hint={hint} error={error} type="number" registration={register(path)} />
      {readout && <Readout path={path} kind={readout} />}
    </div>
  );
}

export function TextField({ path, label, hint }: { path: string; label: string; hint?: string }) {
  const { register } = useFormContext();
  return <InputField id={idOf(path)} label={label} hint={hint} error={useFieldError(path)} registration={register(path)} />;
}

export function SelectField({
  path,
  label,
  options,
  hint,
  blank,
}: {
  path: string;
  label: string;
  options: readonly (readonly [string, string])[];
  hint?: string;
  blank?: string;
}) {
  const { register } = useFormContext();
  const error = useFieldError(path);
  const id = idOf(path);
  return (
    <Field id={id} label={label} hint={hint} error={error}>
      <select {...register(path)} {...describe(id, error, hint)}>
        {blank !== undefined && <option value="">{blank}</option>}
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
    </Field>
  );
}

/** The typed value in the other unit, e.g. "= 68 °F" under a °C field. Not announced: it repeats the input. */
function Readout({ path, kind }: { path: string; kind: 'temperature' | 'velocity' }) {
  const value = toNumber(useWatch({ name: path }));
  if (value === undefined) return null;
  const text = kind === 'temperature' ? temperatureText(value) : velocityText(value);
  return (
    <p className="readout" data-testid={`readout-${idOf(path)}`}>
      = {text.replace(/^[^(]*\(/, '').replace(/\)$/, '')}
    </p>
  );
}
