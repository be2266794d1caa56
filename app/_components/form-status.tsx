'use client';

/** The form's summary line, announced to screen readers when it changes. */
export function FormStatus({ message, tone }: { message?: string | null; tone: 'ok' | 'bad' | 'warn' }) {
  return (
    <div role={tone === 'bad' ? 'alert' : 'status'} aria-live={tone === 'bad' ? 'assertive' : 'polite'}>
      {message ? <p className={`notice ${tone}`}>{message}</p> : null}
    </div>
  );
}
