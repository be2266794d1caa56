'use client';

import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

interface FieldProps {
  id: string;
  label: string;
  /** Shown after the label, e.g. "V", "rpm", "mm / in". */
  unit?: string;
  hint?: string;
  error?: string;
  className?: string;
  children?: ReactNode;
}

/** A label, its control, an optional hint and the field's error, wired for screen readers. */
export function Field({ id, label, unit, hint, error, className, children }: FieldProps) {
  return (
    <div className={className}>
      <label htmlFor={id}>
        {label} {unit && <span className="unit">({unit})</span>}
      </label>
      {children}
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

/** aria attributes for a control inside <Field>. */
export function describe(id: string, error?: string, hint?: string) {
  const by = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(' ');
  return { id, 'aria-invalid': error ? true : undefined, 'aria-describedby': by || undefined } as const;
}

interface InputFieldProps extends Omit<FieldProps, 'children'> {
  registration: UseFormRegisterReturn;
  type?: 'text' | 'number' | 'date' | 'email' | 'tel';
  step?: string;
  inputMode?: 'decimal' | 'numeric' | 'text';
  autoComplete?: string;
}

export function InputField({ registration, type = 'text', step, inputMode, autoComplete, ...field }: InputFieldProps) {
  return (
    <Field {...field}>
      <input
        {...registration}
        {...describe(field.id, field.error, field.hint)}
        type={type}
        step={step ?? (type === 'number' ? 'any' : undefined)}
        inputMode={inputMode ?? (type === 'number' ? 'decimal' : undefined)}
        autoComplete={autoComplete}
      />
    </Field>
  );
}
