import type { ReactNode } from 'react';

/**
 * A wide table that scrolls sideways inside its own box on a narrow screen, so the page itself never does.
 * The box is focusable and named, so a keyboard user can scroll it too.
 */
export function TableScroll({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="table-scroll" role="region" aria-label={label} tabIndex={0}>
      {children}
    </div>
  );
}
