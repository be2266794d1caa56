'use client';

/** Opens the browser's print dialog for the print view. */
export function PrintButton() {
  return (
    <button type="button" className="btn" onClick={() => window.print()}>
      Print job sheet
    </button>
  );
}
