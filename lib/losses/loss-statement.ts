/**
 * The statement of what the rewind did to stator copper loss and efficiency, in words and in rows whose
 * every figure names where it came from. Pure: built from the engine's rewindLosses results, the same
 * object feeds the final tests page, the redesign comparison and the job sheet (print view and PDF).
 */
import { rewindLosses, type RewindLossInput, type RewindLosses, type WindingForLoss } from '@/lib/engine/losses/rewind-losses';
import type { ThermalClass } from '@/lib/engine/losses/reference-temperature';

export interface LossRow {
  label: string;
  value: string;
}

export interface LossStatement {
  /** One or two sentences: the change in copper loss and, with a nameplate efficiency, in efficiency. */
  statement: string;
  /** The figures behind the statement, each with its source. */
  rows: LossRow[];
  /** Rise above the shop's limit: what to check. */
  findings: string[];
  /** Assumptions, stated once. */
  assumptions: string[];
}

export interface LossStatementInput {
  thermalClass: ThermalClass;
  before: WindingForLoss;
  /** The winding as rewound, predicted (the approved redesign, or the original data again). */
  after: WindingForLoss;
  /** The winding as rewound, from the final resistance readings, when recorded. */
  measuredAfter: WindingForLoss | null;
  redesigned: boolean;
  outputKw: number | undefined;
  efficiencyPercent: number | undefined;
  coreLossChangeW: number | null;
  coreLossNote: string;
  copperLossRiseLimit: number;
}

const w = (v: number): string => `${v.toFixed(1)} W`;
const ohm = (v: number): string => `${v.toPrecision(4)} Ω`;
/** Sign and magnitude, rounded first so that a rounding residue never prints as "−0.00". */
const signed = (v: number, unit: string, digits = 1): string => {
  const r = Number(v.toFixed(digits));
  return `${r >= 0 ? '+' : '−'}${Math.abs(r).toFixed(digits)}${unit}`;
};

function sentence(l: RewindLosses, what: string): string {
  const copper =
    Math.abs(l.copperChangeW) < 0.05
      ? `${what} leaves the stator copper loss unchanged at ${w(l.after.copperLossW)}`
      : `${what} changes the stator copper loss from ${w(l.before.copperLossW)} to ${w(l.after.copperLossW)} (${signed(l.copperChangeW, ' W')}, ${signed(l.copperChangeFraction * 100, ' %')})`;
  const eff = l.efficiency
    ? `; efficiency ${(l.efficiency.efficiencyBefore * 100).toFixed(1)} % → ${(l.efficiency.efficiencyAfter * 100).toFixed(2)} % (${signed(l.efficiency.changePoints, ' points', 2)})`
    : '';
  return `${copper} at ${l.referenceTemperatureC} °C (class ${l.thermalClass}, IEEE 112 specified temperature)${eff}.`;
}

function windingRows(prefix: string, l: RewindLosses['before']): LossRow[] {
  return [
    {
      label: `${prefix}: resistance`,
      value: `${ohm(l.phaseOhm20)} per phase at 20 °C → ${ohm(l.phaseOhmAtReference)} at the reference temperature (${l.source})`,
    },
    {
      label: `${prefix}: copper loss`,
      value: `3 × (${l.lineCurrentA.toFixed(2)} A${l.connection === 'delta' ? ' ÷ √3' : ''})² × ${ohm(l.phaseOhmAtReference)} = ${w(l.copperLossW)} (${l.connection})`,
    },
  ];
}

/** The statement, or null when a resistance or the rated current is missing. */
export function buildLossStatement(i: LossStatementInput): LossStatement | null {
  const base: Omit<RewindLossInput, 'after'> = {
    thermalClass: i.thermalClass,
    before: i.before,
    outputKw: i.outputKw,
    efficiency: i.efficiencyPercent !== undefined ? i.efficiencyPercent / 100 : undefined,
    coreLossChangeW: i.coreLossChangeW ?? undefined,
    limitFraction: i.copperLossRiseLimit,
  };
  const predicted = rewindLosses({ ...base, after: i.after });
  if (!predicted) return null;
  const measured = i.measuredAfter ? rewindLosses({ ...base, after: i.measuredAfter }) : null;
  const what = i.redesigned ? 'The approved redesign' : 'Rewinding to the original data';
  const parts = [sentence(predicted, `${what} (predicted)`)];
  if (measured) parts.push(sentence(measured, 'The winding as measured after the rewind'));
  const rows: LossRow[] = [
    ...windingRows('As found', predicted.before),
    ...windingRows(i.redesigned ? 'Redesign' : 'Rewound', predicted.after),
    ...(measured ? windingRows('Measured after rewind', measured.after) : []),
  ];
  if (predicted.efficiency) {
    rows.push({
      label: 'Losses at rated output',
      value: `${i.outputKw?.toFixed(2)} kW × (1/${predicted.efficiency.efficiencyBefore.toFixed(3)} − 1) = ${w(predicted.efficiency.lossesBeforeW)} from the nameplate efficiency`,
    });
  }
  rows.push({
    label: 'Core loss change',
    value: i.coreLossChangeW === null ? i.coreLossNote : `${signed(i.coreLossChangeW, ' W', 2)}: ${i.coreLossNote}`,
  });
  const findings = [predicted.finding, measured?.finding].filter((f): f is string => typeof f === 'string');
  const assumptions = [
    'Copper loss P = 3·I_ph²·R_ph at rated current (= 1.5·I²·R line-to-line, as IEEE 112 and IEC 60034-2-1 write it), resistance brought from 20 °C with copper’s 234.5 °C constant.',
    predicted.efficiency
      ? 'Efficiency from the nameplate figure at the same output, every other loss (friction and windage, rotor, stray load) unchanged; only the copper-loss change and the measured core-loss change are added.'
      : 'No nameplate efficiency is recorded, so only the change in watts is given.',
  ];
  if (i.redesigned)
    assumptions.push(
      'For a redesign to another voltage, frequency or speed the other losses change too: the efficiency figure is a guide, confirmed only by a load test.',
    );
  return { statement: parts.join(' '), rows, findings, assumptions };
}
