import type { Candidate, RedesignSearch } from '@/lib/engine/redesign/types';
import { ChooseButton } from './choose-button';
import { spansLabel } from '@/lib/engine/notation';

const pct = (r: number): string => (Math.abs(r - 1) < 0.0005 ? '±0.0 %' : `${r >= 1 ? '+' : '−'}${Math.abs((r - 1) * 100).toFixed(1)} %`);

/** How many candidates show before the "more" fold. */
const SHOWN = 12;

function Row({ c, choose, chosen, fillLimit }: { c: Candidate; choose: { redesignId: string; version: number } | null; chosen: boolean; fillLimit: number }) {
  const w = c.winding;
  return (
    <tr className={chosen ? 'chosen' : undefined} data-key={c.key}>
      <td className="num">{c.rank}{chosen && <><br /><span className="tag">chosen</span></>}</td>
      <td>
        <strong>{w.turnsPerCoil.join('/')} turns</strong> · {w.connection === 'star' ? 'star (Y)' : 'delta (Δ)'} · {w.parallelPaths} circuit{w.parallelPaths === 1 ? '' : 's'} · {spansLabel(w.spans)}{w.layers === 1 ? ' single layer' : ''}
        <br /><span className="small">{c.wires.label}</span>
      </td>
      <td className="num">{pct(c.ratios.gap)} / {pct(c.ratios.tooth)} / {pct(c.ratios.yoke)}</td>
      <td className="num">{c.currentDensity.aPerMm2 !== null ? <>{c.currentDensity.aPerMm2.toFixed(2)} A/mm²<br /></> : null}<span className="small">({pct(c.currentDensity.ratio)})</span></td>
      <td className="num">
        {c.slotFill > fillLimit
          ? <span className="out"><span aria-hidden="true">⚠ </span>{(c.slotFill * 100).toFixed(0)} %<br /><span className="small">over the {(fillLimit * 100).toFixed(0)} % shop limit, as the as-found winding is</span></span>
          : `${(c.slotFill * 100).toFixed(0)} %`}
      </td>
      <td className="small">{c.fractional ? '⚠ fractional slot; ' : ''}{c.changes.join('; ') || 'no change'}</td>
      <td>{choose && !chosen ? <ChooseButton redesignId={choose.redesignId} version={choose.version} candidateKey={c.key} rank={c.rank} /> : null}</td>
    </tr>
  );
}

/** The ranked candidates of a draft, with the families the search gave up on and why. */
export function CandidateTable({ search, choose, chosenKey, fillLimit }: { search: RedesignSearch; choose: { redesignId: string; version: number } | null; chosenKey: string | null; fillLimit: number }) {
  const head = (
    <thead>
      <tr>
        <th scope="col" className="num">Rank</th><th scope="col">Winding and wires in hand</th><th scope="col" className="num">Gap / tooth / yoke change</th>
        <th scope="col" className="num">Current density</th><th scope="col" className="num">Slot fill</th><th scope="col">What changes</th><th scope="col"><span className="sr-only">Choose</span></th>
      </tr>
    </thead>
  );
  const first = search.candidates.slice(0, SHOWN);
  const rest = search.candidates.slice(SHOWN);
  return (
    <>
      <p className="small muted">
        {search.candidates.length} candidate{search.candidates.length === 1 ? '' : 's'} from {search.familiesTried} families ({search.wireSetsConsidered} wire combinations looked at).
        Ranked by how closely they keep the as-found flux densities and current density (2 % bands), then by how simple they are to wind.
      </p>
      {search.candidates.length > 0 && (
        <div className="scroll">
          <table className="candidates" aria-label="Candidate windings">
            {head}
            <tbody>{first.map((c) => <Row key={c.key} c={c} choose={choose} chosen={c.key === chosenKey} fillLimit={fillLimit} />)}</tbody>
          </table>
        </div>
      )}
      {rest.length > 0 && (
        <details>
          <summary>{rest.length} more candidates</summary>
          <div className="scroll">
            <table className="candidates" aria-label="More candidate windings">
              {head}
              <tbody>{rest.map((c) => <Row key={c.key} c={c} choose={choose} chosen={c.key === chosenKey} fillLimit={fillLimit} />)}</tbody>
            </table>
          </div>
        </details>
      )}
      {search.rejected.length > 0 && (
        <details open={search.candidates.length === 0}>
          <summary>Families that failed, and why ({search.rejected.length})</summary>
          <ul className="small">{search.rejected.map((r) => <li key={r.family + r.reason}><strong>{r.family}:</strong> {r.reason}</li>)}</ul>
        </details>
      )}
    </>
  );
}
