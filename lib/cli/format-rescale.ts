/** Text report of `calc rescale`: the flux ratios of a winding moved to another supply on the same core. */
import { spansLabel } from '../engine/notation';
import type { ScalingCase, SupplyScaling } from '../engine/supply-scaling';
import { fixed, formatTable } from './format-table';

const describe = (c: ScalingCase): string =>
  `${c.supply.lineVoltageV} V ${c.supply.frequencyHz} Hz ${c.winding.connection}, ${c.winding.poles} poles, span ${spansLabel(c.winding.spans)}, ` +
  `${c.winding.turnsPerCoil.join('/')} turns per coil, ${c.winding.parallelPaths} circuit(s)`;

const percent = (ratio: number): string => `${ratio >= 1 ? '+' : ''}${fixed((ratio - 1) * 100, 1)} %`;

/**
 * Keeping the original flux: Φ ∝ V_ph/(f·N_ph·k_w), so turns scale with the flux ratio (same spans, circuits
 * and connection as the new case) [derived, docs/engineering/redesign.md].
 */
export function formatRescale(old: ScalingCase, next: ScalingCase, r: SupplyScaling): string {
  const rows = [
    ['flux per pole', fixed(r.fluxRatio, 4), percent(r.fluxRatio)],
    ['gap and teeth (Φ·P_new/P_old)', fixed(r.gapToothRatio, 4), percent(r.gapToothRatio)],
    ['back iron (Φ)', fixed(r.yokeRatio, 4), percent(r.yokeRatio)],
  ];
  const keepTurns = next.winding.turnsPerCoil.map((n) => fixed(n * r.fluxRatio, 2)).join('/');
  const verdict =
    r.verdict === 'ok'
      ? 'within the limits'
      : r.verdict === 'over-fluxed'
        ? 'OVER-FLUXED: more turns are needed'
        : 'under-fluxed: fewer turns would do';
  return [
    `From: ${describe(old)}`,
    `To:   ${describe(next)}`,
    '',
    formatTable(['density', 'new/old', 'change'], rows),
    '',
    `Verdict: ${verdict} (rise at most +${fixed(r.tolerance.over * 100, 0)} %, fall at most −${fixed(r.tolerance.under * 100, 0)} %).`,
    `Turns per coil that keep the original flux: ${keepTurns} (round to whole turns and check slot fill and current density).`,
    ...r.notes.map((n) => `Note: ${n}`),
  ].join('\n');
}
