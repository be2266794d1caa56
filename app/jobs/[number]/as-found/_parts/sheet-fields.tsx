'use client';

/** Small field components of the sheet form, reading the form through react-hook-form's context. */
import type { ReactNode } from 'react';
import { get, useFormContext, type FieldPath } from 'react-hook-form';
import { describe } from '@/app/_components/field';
import type { SheetFormValues } from '@/lib/as-found/as-found-form';

type Path = FieldPath<SheetFormValues>;
export const fieldId = (name: string): string => `f-${name.replace(/\./g, '-')}`;

export function useFieldError(name: string): string | undefined {
  const { formState: { errors } } = useFormContext<SheetFormValues>();
  const e = get(errors, name) as { message?: string } | undefined;
  return e?.message;
}

interface NumProps {
  name: Path;
  label: string;
  /** Shown beside the label, e.g. "mm" or "in". */
  unit?: string;
  hint?: string;
  wide?: boolean;
  /** Whole numbers only (counts). */
  whole?: boolean;
}

/** A number typed as text (keeps "12." while typing), with its unit beside the label and its error below. */
export function NumField({ name, label, unit, hint, whole }: NumProps) {
  const { register } = useFormContext<SheetFormValues>();
  const id = fieldId(name);
  const error = useFieldError(name);
  return (
    <div className="sf">
      <label htmlFor={id}>{label}{unit ? <span className="unit"> ({unit})</span> : null}</label>
      <input {...register(name)} {...describe(id, error, hint)} type="text" inputMode={whole ? 'numeric' : 'decimal'} autoComplete="off" />
      {hint && <p id={`${id}-hint`} className="hint">{hint}</p>}
      {error && <p id={`${id}-error`} className="field-error">{error}</p>}
    </div>
  );
}

export function TextField({ name, label, hint, long }: { name: Path; label: string; hint?: string; long?: boolean }) {
  const { register } = useFormContext<SheetFormValues>();
  const id = fieldId(name);
  const error = useFieldError(name);
  return (
    <div className={long ? 'sf wide' : 'sf'}>
      <label htmlFor={id}>{label}</label>
      {long ? <textarea {...register(name)} {...describe(id, error, hint)} /> : <input {...register(name)} {...describe(id, error, hint)} type="text" autoComplete="off" />}
      {hint && <p id={`${id}-hint`} className="hint">{hint}</p>}
      {error && <p id={`${id}-error`} className="field-error">{error}</p>}
    </div>
  );
}

export function SelectField({ name, label, options, hint }: { name: Path; label: string; options: readonly (readonly [string, string])[]; hint?: string }) {
  const { register } = useFormContext<SheetFormValues>();
  const id = fieldId(name);
  const error = useFieldError(name);
  return (
    <div className="sf">
      <label htmlFor={id}>{label}</label>
      <select {...register(name)} {...describe(id, error, hint)}>
        {options.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
      </select>
      {hint && <p id={`${id}-hint`} className="hint">{hint}</p>}
      {error && <p id={`${id}-error`} className="field-error">{error}</p>}
    </div>
  );
}

export function Section({ id, title, children, note }: { id: string; title: string; children: ReactNode; note?: ReactNode }) {
  return (
    <fieldset className="sheet-section" aria-describedby={note ? `${id}-note` : undefined}>
      <legend id={id}>{title}</legend>
      {note && <p id={`${id}-note`} className="hint">{note}</p>}
      <div className="sgrid">{children}</div>
    </fieldset>
  );
}
