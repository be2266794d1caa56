'use client';

/** The slot diagram (with its table alternative) and the MMF plots, drawn from the live analysis. */
import { useState } from 'react';
import { useHydrated } from '@/app/_components/use-hydrated';
import type { LiveAnalysis } from '@/lib/as-found/live-analysis';
import { MmfCharts } from './mmf-charts';
import { SlotDiagram, SlotTableView } from './slot-diagram';
import { spansLabel } from '@/lib/engine/notation';

export function Pictures({ live }: { live: LiveAnalysis }) {
  const [showTable, setShowTable] = useState(false);
  // Charts measure their container, which only exists in the browser: draw them after hydration.
  const mounted = useHydrated();
  const w = live.winding;
  const style = live.sheet?.winding.style ?? '';
  const spans = live.sheet?.winding.spans;
  if (!w) {
    return (
      <section className="card no-print-if-empty" aria-labelledby="pics-h">
        <h2 id="pics-h">Slot diagram and MMF</h2>
        <p className="muted">Give the slots, poles, layers, spans and turns to draw the winding.</p>
      </section>
    );
  }
  const caption = `${w.layout.layers === 2 ? 'double' : 'single'}-layer ${w.layout.source === 'explicit' ? '(winder’s slot table)' : style}${spans ? `, span${spans.length > 1 ? 's' : ''} ${spansLabel(spans)}` : ''}`;
  return (
    <section className="card pictures" aria-labelledby="pics-h">
      <h2 id="pics-h">Slot diagram and MMF</h2>
      <div className="pictures-grid">
        <figure className="diagram">
          <SlotDiagram table={w.layout} caption={caption} />
          <button
            type="button"
            className="btn quiet small-btn no-print"
            aria-expanded={showTable}
            aria-controls="slot-table"
            onClick={() => setShowTable((s) => !s)}
          >
            {showTable ? 'Hide' : 'Show'} the slot table
          </button>
          <div id="slot-table" hidden={!showTable}>
            {showTable && <SlotTableView table={w.layout} />}
          </div>
        </figure>
        {mounted ? <MmfCharts waveform={w.waveform} mmf={w.mmf} /> : <p className="muted">Drawing the MMF…</p>}
      </div>
    </section>
  );
}
