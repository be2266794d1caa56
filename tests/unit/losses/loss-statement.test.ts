import { describe, expect, it } from 'vitest';
import { buildLossStatement, type LossStatementInput } from '@/lib/losses/loss-statement';

/** Example A winding (docs/engineering/wire-and-resistance.md): R_ph(20 °C) 1.4293 Ω, star, 5 A; class F → 115 °C. */
const base: LossStatementInput = {
  thermalClass: 'F',
  before: { source: 'as-found data sheet, revision 1, predicted', phaseOhm20: 1.4293, connection: 'star', lineCurrentA: 5 },
  after: {
    source: 'as-found data sheet, revision 1, predicted: rewound to the same data',
    phaseOhm20: 1.4293,
    connection: 'star',
    lineCurrentA: 5,
  },
  measuredAfter: null,
  redesigned: false,
  outputKw: 2.2,
  efficiencyPercent: 85,
  coreLossChangeW: null,
  coreLossNote: 'No core-loss change is included: the loop tests before and after stripping are not both recorded.',
  copperLossRiseLimit: 0.05,
};

describe('the losses statement', () => {
  it('says a rewind to the original data leaves copper loss unchanged at 147.2 W [derived: 3·5²·1.96283]', () => {
    const s = buildLossStatement(base);
    expect(s?.statement).toBe(
      'Rewinding to the original data (predicted) leaves the stator copper loss unchanged at 147.2 W at 115 °C (class F, IEEE 112 specified temperature); efficiency 85.0 % → 85.00 % (+0.00 points).',
    );
    expect(s?.findings).toEqual([]);
  });
  it('traces every figure: resistance at 20 °C and at 115 °C with its source, the I²R product and the nameplate losses', () => {
    const rows = buildLossStatement(base)!.rows;
    expect(rows.find((r) => r.label === 'As found: resistance')?.value).toBe(
      '1.429 Ω per phase at 20 °C → 1.963 Ω at the reference temperature (as-found data sheet, revision 1, predicted)',
    );
    expect(rows.find((r) => r.label === 'As found: copper loss')?.value).toContain('= 147.2 W (star)');
    // 2.2 kW × (1/0.85 − 1) = 388.2 W [derived]
    expect(rows.find((r) => r.label === 'Losses at rated output')?.value).toContain('= 388.2 W');
  });
  it('adds the measured winding and a finding when it is 10 % over: +14.7 W, −0.54 points with +1.75 W core [derived]', () => {
    const s = buildLossStatement({
      ...base,
      measuredAfter: { ...base.after, source: 'final tests #1', phaseOhm20: 1.4293 * 1.1 },
      coreLossChangeW: 1.7513,
      coreLossNote: 'from the loop tests',
    });
    // η₁ = 2200/(2200 + 388.235 + 14.721 + 1.751) = 84.462 %; before with core only: 2200/(2588.235 + 1.751) = 84.943 %
    expect(s?.statement).toContain(
      'The winding as measured after the rewind changes the stator copper loss from 147.2 W to 161.9 W (+14.7 W, +10.0 %)',
    );
    expect(s?.statement).toContain('85.0 % → 84.46 % (−0.54 points)');
    expect(s?.findings[0]).toMatch(/raises stator copper loss by 10\.0 % \(14\.7 W\), more than the shop's limit of 5\.0 %/);
    expect(s?.rows.find((r) => r.label === 'Core loss change')?.value).toBe('+1.75 W: from the loop tests');
  });
  it('says only the change in watts without a nameplate efficiency', () => {
    const s = buildLossStatement({ ...base, efficiencyPercent: undefined });
    expect(s?.statement).not.toContain('efficiency');
    expect(s?.assumptions).toContain('No nameplate efficiency is recorded, so only the change in watts is given.');
  });
});
