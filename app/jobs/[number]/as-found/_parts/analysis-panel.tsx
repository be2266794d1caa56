/**
 * The live analysis beside the form: findings first (what to check before the old coils are scrapped),
 * then winding factors, flux densities against the configured ranges, current density, slot fill and
 * resistance. Renders a LiveAnalysis; no state of its own, so the print view can use it too.
 */
import type { FluxDensity } from '@/lib/engine/flux';
import type { LiveAnalysis } from '@/lib/as-found/live-analysis';
import { fmt } from '@/lib/presentation/format';
import { fluxBandText } from '@/lib/as-found/flux-band';

const SEVERITY = { problem: 'Problem', check: 'Check', note: 'Note' } as const;

function FluxRow({ name, d }: { name: string; d: FluxDensity }) {
  const band = fluxBandText(d.tesla, d.limit);
  return (
    <tr className={d.verdict === 'high' ? 'is-bad' : d.verdict === 'above-conservative' ? 'is-warn' : undefined}>
      <th scope="row">{name}</th>
      <td className="num">{d.tesla.toFixed(3)} T</td>
      <td className="num">{d.kilolinesPerIn2.toFixed(1)} kl/in²</td>
      <td>
        {band.verdict} <span className="muted">· {band.band}</span>
      </td>
    </tr>
  );
}

export function AnalysisPanel({ live }: { live: LiveAnalysis }) {
  const a = live.full;
  const w = live.winding;
  return (
    <div className="analysis" data-testid="analysis">
      <div role="status" aria-live="polite" aria-atomic="false">
        {live.findings.length > 0 ? (
          <ul className="findings" aria-label="Consistency findings">
            {live.findings.map((f) => (
              <li key={f.id} className={`finding ${f.severity}`} data-finding={f.id}>
                <strong>{SEVERITY[f.severity]}:</strong> {f.message}
                <div className="small">
                  <strong>Check:</strong> {f.check}
                </div>
              </li>
            ))}
          </ul>
        ) : a ? (
          <p className="notice ok small">No inconsistencies found between the counts, the layout and the readings.</p>
        ) : null}
      </div>
      {live.engineError && (
        <p className="notice bad small" data-testid="engine-error">
          {live.engineError.message} <em>{live.engineError.hint}</em>
        </p>
      )}
      {!a && live.issues.length > 0 && (
        <div className="notice warn small">
          <p style={{ margin: 0 }}>Full analysis once these are filled in ({live.issues.length}):</p>
          <ul className="issue-list">
            {live.issues.slice(0, 6).map((i) => (
              <li key={`${i.path}:${i.message}`}>{i.message}</li>
            ))}
            {live.issues.length > 6 && <li>… and {live.issues.length - 6} more</li>}
          </ul>
        </div>
      )}
      {w && (
        <section aria-labelledby="an-winding">
          <h3 id="an-winding">Winding</h3>
          <dl className="dl small">
            <dt>Slots/pole/phase q</dt>
            <dd>
              {w.q.d === 1 ? w.q.z : `${w.q.z}/${w.q.d} (fractional)`} · pole pitch {fmt.num(w.polePitchSlots, 2)} slots · slot angle{' '}
              {fmt.num(w.slotAngleDeg, 2)}° el.
            </dd>
            <dt>
              Winding factor k<sub>w1</sub>
            </dt>
            <dd data-testid="kw1">{w.windingFactor.toFixed(4)}</dd>
            <dt>Series turns/phase</dt>
            <dd>{fmt.num(w.seriesTurnsPerPhase, 1)} (per circuit)</dd>
            <dt>Parallel circuits possible</dt>
            <dd>{w.parallelPaths.allowed.join(', ')}</dd>
            <dt>Balance</dt>
            <dd>{w.balance.verdict}</dd>
          </dl>
          <table className="small compact">
            <caption className="sr-only">Winding factors by harmonic order</caption>
            <thead>
              <tr>
                <th scope="col">Order ν</th>
                {w.factors
                  .filter((f) => [1, 5, 7, 11, 13].includes(f.order))
                  .map((f) => (
                    <th key={f.order} scope="col" className="num">
                      {f.order}
                    </th>
                  ))}
              </tr>
            </thead>
            <tbody>
              <tr>
                <th scope="row">
                  k<sub>w</sub>
                </th>
                {w.factors
                  .filter((f) => [1, 5, 7, 11, 13].includes(f.order))
                  .map((f) => (
                    <td key={f.order} className="num">
                      {f.kw.toFixed(4)}
                    </td>
                  ))}
              </tr>
            </tbody>
          </table>
        </section>
      )}
      {a?.winding.flux && (
        <section aria-labelledby="an-flux">
          <h3 id="an-flux">Flux densities</h3>
          <p className="small muted">
            Φ = {(a.winding.flux.fluxPerPoleWb * 1000).toFixed(3)} mWb per pole at E = V<sub>ph</sub> ={' '}
            {a.winding.flux.phaseVoltageV.toFixed(1)} V. Ranges: typical 50/60 Hz induction motors (shop practice); each row shows the band
            its verdict used.
          </p>
          <table className="small compact">
            <tbody>
              <FluxRow name="Air gap, average" d={a.winding.flux.gapAverage} />
              <FluxRow name="Air gap, peak" d={a.winding.flux.gapPeak} />
              <FluxRow name="Teeth (max)" d={a.winding.flux.toothMax} />
              <FluxRow name="Back iron (yoke)" d={a.winding.flux.yoke} />
            </tbody>
          </table>
        </section>
      )}
      {a && (
        <section aria-labelledby="an-copper">
          <h3 id="an-copper">Copper</h3>
          <dl className="dl small">
            <dt>Copper per turn</dt>
            <dd>
              {a.conductorAreaPerTurnMm2.toFixed(3)} mm² · {fmt.num(a.circularMilsPerTurn, 0)} CM
            </dd>
            <dt>Current density</dt>
            <dd data-testid="current-density">
              {a.currentDensity
                ? `${a.currentDensity.ampsPerMm2.toFixed(2)} A/mm² · ${fmt.num(a.currentDensity.circularMilsPerAmp, 0)} CM/A at ${fmt.num(a.currentDensity.pathCurrentA, 2)} A per circuit`
                : 'give the rated current'}
            </dd>
            <dt>Slot fill</dt>
            <dd>
              {(a.slotFill.bareCopperOverGross * 100).toFixed(1)} % bare copper ÷ gross slot area;{' '}
              {(a.slotFill.insulatedOverGross * 100).toFixed(1)} % insulated wire ÷ gross slot area ({a.slotFill.conductorsPerSlot}{' '}
              conductors/slot; hand insertion ≤ {a.slotFill.handInsertionLimit.low * 100}–{a.slotFill.handInsertionLimit.high * 100} % of
              net area)
            </dd>
          </dl>
        </section>
      )}
      {a && (
        <section aria-labelledby="an-res">
          <h3 id="an-res">Resistance at 20 °C</h3>
          {a.resistance ? (
            <dl className="dl small">
              <dt>Predicted</dt>
              <dd>
                {a.resistance.predictedPhaseOhm20.toFixed(4)} Ω per phase · {a.resistance.predictedLineToLineOhm20.toFixed(4)} Ω
                line-to-line
              </dd>
              {a.resistance.measured && (
                <>
                  <dt>Measured</dt>
                  <dd>{a.resistance.measured.phaseOhm20.toFixed(4)} Ω per phase</dd>
                  <dt>Difference</dt>
                  <dd data-testid="resistance-difference">
                    {a.resistance.measured.differencePercent > 0 ? '+' : ''}
                    {a.resistance.measured.differencePercent.toFixed(1)} %
                  </dd>
                  <dt>Unbalance</dt>
                  <dd>
                    {(a.resistance.measured.unbalance.value * 100).toFixed(2)} % ({a.resistance.measured.unbalance.pass ? 'within' : 'over'}{' '}
                    {a.resistance.measured.unbalance.limit * 100} %)
                  </dd>
                </>
              )}
            </dl>
          ) : (
            <p className="small muted">Give the mean turn length to predict the resistance.</p>
          )}
        </section>
      )}
    </div>
  );
}
