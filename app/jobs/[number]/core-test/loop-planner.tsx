'use client';

/**
 * Loop-test planning from the as-found core: the shop types the supply it has (and, if it likes, its own
 * number of turns) and sees the turns, the test voltage and the current to expect at the shop's test
 * density. The figures come from the pure engine, recomputed as the shop types.
 */
import { useId, useState } from 'react';
import type { CoreRing } from '@/lib/engine/core-loss/core-ring';
import { loopTestPlan } from '@/lib/engine/core-loss/loop-plan';
import { coreText } from '@/lib/core-test/core-test-display';
import { fmt } from '@/lib/presentation/format';

const num = (s: string): number | undefined => {
  const n = Number(s.trim().replace(',', '.'));
  return s.trim() !== '' && Number.isFinite(n) ? n : undefined;
};

export function LoopPlanner({
  ring,
  testFluxDensityT,
  fieldStrengthAPerM,
  frequencyHz,
  supplyVoltageV,
}: {
  ring: CoreRing;
  testFluxDensityT: number;
  fieldStrengthAPerM: number;
  frequencyHz: number;
  supplyVoltageV: number;
}) {
  const id = useId();
  const [supply, setSupply] = useState(String(supplyVoltageV));
  const [freq, setFreq] = useState(String(frequencyHz));
  const [turns, setTurns] = useState('');
  const turnsN = num(turns);
  const plan = loopTestPlan({
    ring,
    testFluxDensityT,
    fieldStrengthAPerM,
    supplyVoltageV: num(supply) ?? Number.NaN,
    frequencyHz: num(freq) ?? Number.NaN,
    ...(turnsN !== undefined ? { turns: turnsN } : {}),
  });
  const p = plan.ok ? plan.value : null;
  return (
    <div className="planner">
      <div className="row planner-inputs">
        <div className="field">
          <label htmlFor={`${id}-v`}>
            Test supply available <span className="unit">V</span>
          </label>
          <input id={`${id}-v`} type="number" inputMode="decimal" step="any" value={supply} onChange={(e) => setSupply(e.target.value)} />
        </div>
        <div className="field">
          <label htmlFor={`${id}-f`}>
            Test frequency <span className="unit">Hz</span>
          </label>
          <input id={`${id}-f`} type="number" inputMode="decimal" step="any" value={freq} onChange={(e) => setFreq(e.target.value)} />
        </div>
        <div className="field">
          <label htmlFor={`${id}-n`}>
            Loop turns <span className="unit">(blank: suggest)</span>
          </label>
          <input
            id={`${id}-n`}
            type="number"
            inputMode="numeric"
            step="1"
            min="1"
            value={turns}
            onChange={(e) => setTurns(e.target.value)}
            aria-describedby={`${id}-n-hint`}
          />
          <p className="hint" id={`${id}-n-hint`}>
            Leave blank for the fewest turns that keep the core at or below {testFluxDensityT} T.
          </p>
        </div>
      </div>
      <div aria-live="polite">
        {!plan.ok && (
          <p className="notice bad">
            {plan.error.message} {plan.error.hint}
          </p>
        )}
        {p && (
          <dl className="dl" data-testid="loop-plan">
            <dt>Back-iron depth</dt>
            <dd>{coreText.mm(p.section.depthM * 1000)}</dd>
            <dt>Net iron length</dt>
            <dd>{coreText.mm(p.section.netIronLengthM * 1000)} (vent ducts out, stacking factor applied)</dd>
            <dt>Back-iron cross-section</dt>
            <dd>{coreText.mm2(p.section.areaM2 * 1e6)}</dd>
            <dt>Mean magnetic path</dt>
            <dd>{coreText.mm(p.meanPathM * 1000, 0)}</dd>
            <dt>Iron mass</dt>
            <dd>
              back iron {coreText.kg(p.backIronMassKg)} · teeth {coreText.kg(p.teethMassKg)} · core {coreText.kg(p.coreMassKg)} (steel at{' '}
              {p.steelDensityKgPerM3} kg/m³)
            </dd>
            <dt>Test flux density</dt>
            <dd>{coreText.tesla(testFluxDensityT)} in the back iron (shop setting)</dd>
            <dt>Volts per turn</dt>
            <dd>{fmt.num(p.voltsPerTurn, 3, 'V')} at the test density</dd>
            <dt>Loop turns</dt>
            <dd>
              <strong>{p.turns}</strong>
              {p.turnsSuggested ? ' (suggested: rounded up, so the density stays at or below the target)' : ' (as typed)'}
            </dd>
            <dt>Test voltage</dt>
            <dd>
              <strong>{fmt.num(p.voltageAtTargetV, 1, 'V')}</strong> for {testFluxDensityT} T with {p.turns} turns (E = √2·π·f·N·B·A)
            </dd>
            <dt>On the available supply</dt>
            <dd>
              {coreText.tesla(p.fluxDensityAtSupplyT)}
              {p.fluxDensityAtSupplyT > testFluxDensityT * 1.05 ? ' ⚠ above the test density: add turns or lower the voltage' : ''}
            </dd>
            <dt>Expected current</dt>
            <dd>
              <strong>{fmt.num(p.currentA, 1, 'A')}</strong> ({fmt.num(p.ampereTurns, 0, 'ampere-turns')} = {p.fieldStrengthAPerM} A/m ×{' '}
              {fmt.num(p.meanPathM, 3, 'm')}) · about {fmt.num(p.apparentPowerVA / 1000, 2, 'kVA')}
            </dd>
          </dl>
        )}
        <p className="small muted">
          The current assumes the steel needs {fieldStrengthAPerM} A/m (rms) at the test density, a shop setting: older or damaged cores
          draw more, and the loss current adds to it. Choose the cable and the supply with margin.
        </p>
      </div>
    </div>
  );
}
