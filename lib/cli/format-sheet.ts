/** Text report of a whole winding data sheet for the calc CLI. */
import type { SheetAnalysis } from '../engine/analyse-sheet';
import type { FluxDensity } from '../engine/flux';
import type { WindingSpec } from '../engine/winding-layout';
import { fixed, formatTable } from './format-table';
import { formatWinding } from './format-winding';
import type { SheetFinding } from '../engine/sheet-findings';

const range = (d: FluxDensity): string =>
  `${fixed(d.limit.typical.low, 2)}–${fixed(d.limit.typical.high, 2)}${d.limit.conservative ? ` (conservative ≤ ${fixed(d.limit.conservative.high, 2)})` : ''}`;

function fluxLines(s: SheetAnalysis): string[] {
  const f = s.winding.flux;
  if (!f) return [];
  const rows = (
    [
      ['gap average', f.gapAverage],
      ['gap peak', f.gapPeak],
      ['tooth max', f.toothMax],
      ['yoke', f.yoke],
    ] as const
  ).map(([name, d]) => [name, fixed(d.tesla, 4), fixed(d.kilolinesPerIn2, 2), range(d), d.verdict]);
  return [
    '',
    `Flux      Φ ${fixed(f.fluxPerPoleWb * 1000, 4)} mWb per pole; V_ph ${fixed(f.phaseVoltageV, 1)} V, E ${fixed(f.emfV, 1)} V; series turns per phase ${fixed(s.winding.seriesTurnsPerPhase, 2)}, k_w1 ${fixed(s.winding.windingFactor, 4)}`,
    `          slot pitch ${fixed(f.slotPitchM * 1000, 2)} mm, back iron ${fixed(f.yokeDepthM * 1000, 2)} mm`,
    formatTable(['density', 'T', 'kl/in²', 'typical T [from memory]', 'verdict'], rows),
    ...f.remarks.map((r) => `Note: ${r}`),
  ];
}

function copperLines(s: SheetAnalysis): string[] {
  const lines = [
    '',
    'Wire      ' +
      s.wires
        .map(
          (w) =>
            `${w.count} × ${w.standard === 'awg' ? `AWG ${w.size}` : `${w.size} mm`} (bare ${fixed(w.bareMm, 4)} mm, over enamel ≈ ${fixed(w.overallMm, 4)} mm)`,
        )
        .join(' + '),
    `          copper per turn ${fixed(s.conductorAreaPerTurnMm2, 4)} mm² = ${fixed(s.circularMilsPerTurn, 0)} CM; synchronous speed ${fixed(s.synchronousRpm, 1)} rpm`,
  ];
  const r = s.resistance;
  if (r) {
    lines.push(
      `Resistance predicted at 20 °C: phase ${fixed(r.predictedPhaseOhm20, 4)} Ω, line-to-line ${fixed(r.predictedLineToLineOhm20, 4)} Ω`,
    );
    if (r.measured)
      lines.push(
        `          measured, corrected to 20 °C: phase ${fixed(r.measured.phaseOhm20, 4)} Ω (${r.measured.differencePercent >= 0 ? '+' : ''}${fixed(r.measured.differencePercent, 2)} % against predicted); unbalance ${fixed(r.measured.unbalance.value * 100, 2)} % — ${r.measured.unbalance.pass ? 'pass' : 'FAIL'} (${r.measured.unbalance.rule})`,
      );
  }
  const j = s.currentDensity;
  if (j)
    lines.push(
      `Current   phase ${fixed(j.phaseCurrentA, 2)} A, path ${fixed(j.pathCurrentA, 2)} A; J ${fixed(j.ampsPerMm2, 2)} A/mm² = ${fixed(j.circularMilsPerAmp, 0)} CM/A; typical ${j.typical.map((t) => `${t.minAPerMm2}–${t.maxAPerMm2} A/mm² (${t.source})`).join('; ')}`,
    );
  const f = s.slotFill;
  lines.push(
    `Slot fill ${fixed(f.conductorsPerSlot, 0)} conductors per slot in ${fixed(f.grossSlotAreaMm2, 1)} mm² gross: bare copper / gross ${fixed(f.bareCopperOverGross * 100, 1)} %, insulated wire / gross ${fixed(f.insulatedOverGross * 100, 1)} % (hand insertion ≤ ${f.handInsertionLimit.low * 100}–${f.handInsertionLimit.high * 100} % of the net area [common practice, from memory])`,
  );
  return lines;
}

const SEVERITY_WORD: Record<SheetFinding['severity'], string> = { problem: 'Problem', check: 'Check', note: 'Note' };

/** The findings exactly as the live analysis shows them: what was found, then what to check. */
const findingLines = (findings: readonly SheetFinding[]): string[] =>
  findings.length
    ? ['', 'Findings', ...findings.flatMap((f) => [`${SEVERITY_WORD[f.severity]}: ${f.message}`, `  What to check: ${f.check}`])]
    : ['', 'Findings: none.'];

/** The whole sheet: winding report, flux densities, wire, resistance, current density, slot fill, findings. */
export function formatSheet(spec: WindingSpec, s: SheetAnalysis, findings: readonly SheetFinding[], orders: number): string {
  // The layout's own notes are among the findings; print them once.
  const winding = formatWinding(spec, { ...s.winding, warnings: [] }, orders);
  return [winding, ...fluxLines(s), ...copperLines(s), ...findingLines(findings)].join('\n');
}
