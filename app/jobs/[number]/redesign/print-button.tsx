'use client';

/** Opens the browser's print dialogue (the page's print styles hide the screen furniture). */
export function PrintButton({ label = 'Print' }: { label?: string }) {
  return (
    <button type="button" className="btn secondary no-print" onClick={() => window.print()}>
      {label}
    </button>
  );
}
