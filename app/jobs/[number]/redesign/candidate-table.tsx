'use client';

import { useState } from 'react';
import type { Candidate, RedesignLimits, RedesignSearch } from '@/lib/engine/redesign/types';
import { RANKING_RULE } from '@/lib/engine/redesign/ranking';
import { spansLabel } from '@/lib/engine/notation';
import { comparisonBands, type OriginalFlux } from '@/lib/redesign/comparison-bands';
import { ChooseButton } from './choose-button';
import { ComparisonBands } from './comparison-bands';

const pct = (r: number): string => (Math.abs(r - 1) < 0.0005 ? '±0.0 %' : `${r >= 1 ? '+' : '−'}${Math.abs((r - 1) * 100).toFixed(1)} %`);

/** How many candidates show before the "more" fold. */
const SHOWN = 12;

interface RowProps {
  c: Candidate;
  choose: { redesignId: string; version: number } | null;
  chosen: boolean;
  fillLimit: number;
  pinned: number;
  onPin: (key: string) => void;
  pinDisabled: boolean;
}

function Row({ c, choose, chosen, fillLimit, pinned, onPin, pinDisabled }: RowProps) {
  const w = c.winding;
  const short = c.wireNeeds.filter((n) => n.short);
  return (
    <tr className={chosen ? 'chosen' : undefined} data-key={c.key}>
      <td className="num">
        {c.rank}
        {chosen && (
          <>
            <br />
            <span className="tag">chosen</span>
          </>
        )}
      </td>
      <td>
        {c.keepsAsFoundWire && (
          <>
            <span className="tag keep">keep the wire{c.changes.length > 0 ? ', change the turns/connection' : ': rewind as found'}</span>
            <br />
          </>
        )}
        <strong>{w.turnsPerCoil.join('/')} turns</strong> · {w.connection === 'star' ? 'star (Y)' : 'delta (Δ)'} · {w.parallelPaths} circuit
        {w.parallelPaths === 1 ? '' : 's'} · {spansLabel(w.spans)} ({(c.pitch * 100).toFixed(0)} % pitch)
        {w.layers === 1 ? ' single layer' : ''}
        <br />
        <span className="small">{c.wires.label}</span>
        {c.overPitched && (
          <>
            <br />
            <span className="out small">
              <span aria-hidden="true">⚠ </span>Over-pitched span: longer end turns and more copper; chosen only on request.
            </span>
          </>
        )}
        {c.fractional && (
          <>
            <br />
            <span className="out small">
              <span aria-hidden="true">⚠ </span>Fractional slot:{' '}
              {c.subHarmonics.length > 0
                ? `orders ${c.subHarmonics
                    .slice(0, 4)
                    .map((h) => `${h.order.toFixed(2)} (${(h.relativeAmplitude * 100).toFixed(1)} %)`)
                    .join(', ')}`
                : 'even or sub-harmonic orders'}
              ; engineer review.
            </span>
          </>
        )}
      </td>
      <td className="num">
        {pct(c.ratios.gap)} / {pct(c.ratios.tooth)} / {pct(c.ratios.yoke)}
      </td>
      <td className="num">
        {c.currentDensity.aPerMm2 !== null ? (
          <>
            {c.currentDensity.aPerMm2.toFixed(2)} A/mm²
            <br />
          </>
        ) : null}
        <span className="small">({pct(c.currentDensity.ratio)})</span>
      </td>
      <td className="num">
        {c.slotFill > fillLimit ? (
          <span className="out">
            <span aria-hidden="true">⚠ </span>
            {(c.slotFill * 100).toFixed(0)} %<br />
            <span className="small">over the {(fillLimit * 100).toFixed(0)} % shop limit, as the as-found winding is</span>
          </span>
        ) : (
          `${(c.slotFill * 100).toFixed(0)} %`
        )}
      </td>
      <td className="num small">
        {c.wireNeeds.map((n) => (
          <span key={n.label} className={n.short ? 'out' : undefined}>
            {n.short && <span aria-hidden="true">⚠ </span>}
            {n.kg.toFixed(2)} kg {n.label}
            {n.onHandKg === null ? '' : ` (${n.onHandKg.toFixed(1)} kg free)`}
            {n.short ? ' — short' : ''}
            <br />
          </span>
        ))}
        {short.length > 0 && <span className="sr-only">Not enough wire in stock.</span>}
      </td>
      <td className="small">
        {c.changes.join('; ') || 'no change'}
        <br />
        <span className="muted">
          score {c.score.toFixed(1)}: {c.effort.map((e) => `${e.what} ${e.points.toFixed(1)}`).join(', ') || 'no effort points'}
        </span>
      </td>
      <td>
        <label className="pin no-print">
          <input type="checkbox" checked={pinned >= 0} disabled={pinDisabled && pinned < 0} onChange={() => onPin(c.key)} />{' '}
          {pinned >= 0 ? `pinned ${pinned === 0 ? 'A' : 'B'}` : 'pin'}
          <span className="sr-only"> candidate {c.rank}</span>
        </label>
        {choose && !chosen ? (
          <ChooseButton redesignId={choose.redesignId} version={choose.version} candidateKey={c.key} rank={c.rank} />
        ) : null}
      </td>
    </tr>
  );
}

export interface CandidateTableProps {
  search: RedesignSearch;
  candidatesFound: number;
  choose: { redesignId: string; version: number } | null;
  chosenKey: string | null;
  fillLimit: number;
  limits: RedesignLimits;
  originalFlux: OriginalFlux | null;
  originalHarmonic: number;
  poleRatio: number;
}

/** The ranked candidates of a draft (stored with the revision), two of them pinned side by side on the bands. */
export function CandidateTable({
  search,
  candidatesFound,
  choose,
  chosenKey,
  fillLimit,
  limits,
  originalFlux,
  originalHarmonic,
  poleRatio,
}: CandidateTableProps) {
  const [pins, setPins] = useState<string[]>(() => search.candidates.slice(0, 2).map((c) => c.key));
  const toggle = (key: string): void => setPins((p) => (p.includes(key) ? p.filter((k) => k !== key) : p.length >= 2 ? p : [...p, key]));
  const pinned = pins.map((k) => search.candidates.find((c) => c.key === k)).filter((c): c is Candidate => c !== undefined);
  const head = (
    <thead>
      <tr>
        <th scope="col" className="num">
          Rank
        </th>
        <th scope="col">Winding and wires in hand</th>
        <th scope="col" className="num">
          Gap / tooth / yoke change
        </th>
        <th scope="col" className="num">
          Current density
        </th>
        <th scope="col" className="num">
          Slot fill
        </th>
        <th scope="col" className="num">
          Wire (as wound) against stock
        </th>
        <th scope="col">What changes, and its score</th>
        <th scope="col">
          <span className="sr-only">Pin and choose</span>
        </th>
      </tr>
    </thead>
  );
  const row = (c: Candidate) => (
    <Row
      key={c.key}
      c={c}
      choose={choose}
      chosen={c.key === chosenKey}
      fillLimit={fillLimit}
      pinned={pins.indexOf(c.key)}
      onPin={toggle}
      pinDisabled={pins.length >= 2}
    />
  );
  const first = search.candidates.slice(0, SHOWN);
  const rest = search.candidates.slice(SHOWN);
  return (
    <>
      <p className="small" data-testid="ranking-rule">
        <strong>How they are ranked:</strong> {RANKING_RULE}
      </p>
      <p className="small muted" data-testid="search-counts">
        {candidatesFound} candidate{candidatesFound === 1 ? '' : 's'}
        {candidatesFound > search.candidates.length ? ` (the first ${search.candidates.length} kept)` : ''} from {search.familiesTried}{' '}
        famil{search.familiesTried === 1 ? 'y' : 'ies'} examined (layout × connection × circuits): {search.turnsChecked} turn counts checked
        against the flux limits, {search.wireSetsConsidered} wire combinations looked at, {search.rejected.length} famil
        {search.rejected.length === 1 ? 'y' : 'ies'} refused.
      </p>
      <p className={search.asFound.key ? 'notice ok' : 'notice warn'} data-testid="as-found-check">
        {search.asFound.key
          ? 'The as-found wires in hand can be kept: the winding marked “keep the wire” ranks first.'
          : `The as-found wires cannot be kept: ${search.asFound.reason ?? ''}`}
      </p>
      {search.spanNotes.length > 0 && (
        <ul className="notice warn small" data-testid="span-notes">
          {search.spanNotes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      )}
      {pinned.length > 0 && (
        <section aria-labelledby="pinned-h" className="pinned">
          <h3 id="pinned-h">Pinned for comparison ({pinned.length} of 2)</h3>
          <ComparisonBands
            bands={comparisonBands(pinned, search, limits, originalFlux, originalHarmonic, poleRatio)}
            labels={pinned.map(
              (c) => `rank ${c.rank}: ${c.winding.turnsPerCoil.join('/')} turns, ${c.winding.parallelPaths} circuit(s), ${c.wires.label}`,
            )}
          />
        </section>
      )}
      {search.candidates.length > 0 && (
        <div className="scroll">
          <table className="candidates" aria-label="Candidate windings">
            {head}
            <tbody>{first.map(row)}</tbody>
          </table>
        </div>
      )}
      {rest.length > 0 && (
        <details>
          <summary>{rest.length} more candidates</summary>
          <div className="scroll">
            <table className="candidates" aria-label="More candidate windings">
              {head}
              <tbody>{rest.map(row)}</tbody>
            </table>
          </div>
        </details>
      )}
      {search.rejected.length > 0 && (
        <details open={search.candidates.length === 0}>
          <summary>Families refused, and the limit that binds ({search.rejected.length})</summary>
          <ul className="small">
            {search.rejected.map((r) => (
              <li key={r.family + r.reason}>
                <strong>{r.family}:</strong> {r.reason}
              </li>
            ))}
          </ul>
        </details>
      )}
    </>
  );
}
