'use client';

/**
 * On a tablet or phone the live analysis would sit far below the form; this strip stays at the bottom of
 * the screen while the winder types (findings count, the first finding, key figures) and opens the full
 * analysis as a drawer. Hidden on wide screens, where the analysis sits beside the form.
 */
import type { LiveAnalysis } from '@/lib/as-found/live-analysis';
import { findingsSummary } from '@/lib/as-found/findings-summary';

export function FindingsStrip({
  live,
  open,
  onToggle,
  controls,
}: {
  live: LiveAnalysis;
  open: boolean;
  onToggle: () => void;
  controls: string;
}) {
  const s = findingsSummary(live);
  return (
    <div className={`findings-strip ${s.tone}`} data-testid="findings-strip">
      <div className="strip-text">
        <p className="strip-headline">
          <strong>{s.headline}</strong>
          {s.figures.length > 0 && <span className="strip-figures"> · {s.figures.join(' · ')}</span>}
        </p>
        {s.first && <p className="strip-first">{s.first}</p>}
      </div>
      <button type="button" className="btn quiet" aria-expanded={open} aria-controls={controls} onClick={onToggle}>
        {open ? 'Close the analysis' : 'Full analysis'}
      </button>
    </div>
  );
}
