'use client';

/** Small field components of the sheet form, reading the form through react-hook-form's context. */
import { createContext, useContext, type ReactNode } from 'react';
import { get, useFormContext, useWatch, type FieldPath } from 'react-hook-form';
import { describe } from '@/app/_components/field';
import type { SheetFormValues } from '@/lib/as-found/as-found-form';

type Path = FieldPath<SheetFormValues>;

/**
 * For a role that may read the sheet but not edit it (or a sheet frozen by the job's status) the fields
 * show their values as text, not disabled inputs: nothing looks editable that is not.
 */
const ReadOnlyContext = createContext(false);
export function ReadOnlyFields({ value, children }: { value: boolean; children: ReactNode }) {
  return <ReadOnlyContext.Provider value={value}>{children}</ReadOnlyContext.Provider>;
}
export const useReadOnly = (): boolean => useContext(ReadOnlyContext);

/** A field's label and value as a term and its description (inside the section's read-only list). */
function ReadOnlyValue({
  name,
  label,
  unit,
  text,
  wide,
}: {
  name: Path;
  label: string;
  unit?: string | undefined;
  text: (v: string) => string;
  wide?: boolean;
}) {
  const { control } = useFormContext<SheetFormValues>();
  const v = useWatch({ control, name });
  const shown = typeof v === 'string' && v.trim() !== '' ? text(v) : '—';
  return (
    <div className={wide ? 'sf wide' : 'sf'} data-field={name}>
      <dt>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </dt>
      <dd className="ro-value">{shown}</dd>
    </div>
  );
}
const asIs = (v: string): string => v;

/** Options long enough to be cut off in one column of the grid get two. */
const LONG_OPTION = 18;
export const fieldId = (name: string): string => `f-${name.replace(/\./g, '-')}`;

export function useFieldError(name: string): string | undefined {
  const {
    formState: { errors },
  } = useFormContext<SheetFormValues>();
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
  const readOnly = useReadOnly();
  const id = fieldId(name);
  const error = useFieldError(name);
  if (readOnly) return <ReadOnlyValue name={name} label={label} unit={unit} text={asIs} />;
  return (
    <div className="sf">
      <label htmlFor={id}>
        {label}
        {unit ? <span className="unit"> ({unit})</span> : null}
      </label>
      <input {...register(name)} {...describe(id, error, hint)} type="text" inputMode={whole ? 'numeric' : 'decimal'} autoComplete="off" />
      {hint && (
        <p id={`${id}-hint`} className="hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}

export function TextField({ name, label, hint, long }: { name: Path; label: string; hint?: string; long?: boolean }) {
  const { register } = useFormContext<SheetFormValues>();
  const readOnly = useReadOnly();
  const id = fieldId(name);
  const error = useFieldError(name);
  if (readOnly) return <ReadOnlyValue name={name} label={label} text={asIs} wide={long ?? false} />;
  return (
    <div className={long ? 'sf wide' : 'sf'}>
      <label htmlFor={id}>{label}</label>
      {long ? (
        <textarea {...register(name)} {...describe(id, error, hint)} />
      ) : (
        <input {...register(name)} {...describe(id, error, hint)} type="text" autoComplete="off" />
      )}
      {hint && (
        <p id={`${id}-hint`} className="hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}

export function SelectField({
  name,
  label,
  options,
  hint,
}: {
  name: Path;
  label: string;
  options: readonly (readonly [string, string])[];
  hint?: string;
}) {
  const { register } = useFormContext<SheetFormValues>();
  const id = fieldId(name);
  const error = useFieldError(name);
  const readOnly = useReadOnly();
  if (readOnly) return <ReadOnlyValue name={name} label={label} text={(v) => options.find(([o]) => o === v)?.[1] ?? v} />;
  return (
    <div className={options.some(([, l]) => l.length > LONG_OPTION) ? 'sf span2' : 'sf'}>
      <label htmlFor={id}>{label}</label>
      <select {...register(name)} {...describe(id, error, hint)}>
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
      {hint && (
        <p id={`${id}-hint`} className="hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}

export function Section({ id, title, children, note }: { id: string; title: string; children: ReactNode; note?: ReactNode }) {
  const readOnly = useReadOnly();
  return (
    <fieldset className="sheet-section" aria-describedby={note ? `${id}-note` : undefined}>
      <legend id={id}>{title}</legend>
      {note && (
        <p id={`${id}-note`} className="hint">
          {note}
        </p>
      )}
      {readOnly ? <dl className="sgrid ro">{children}</dl> : <div className="sgrid">{children}</div>}
    </fieldset>
  );
}
