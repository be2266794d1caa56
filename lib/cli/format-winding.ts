/** Text report of one winding analysis for the calc CLI. */
import type { WindingAnalysis } from '../engine/analyse-winding';
import type { WindingSpec } from '../engine/winding-layout';
import { slotRow } from '../engine/winding-layout';
import { fixed, formatTable, orderLabel } from './format-table';
import { spanLabel } from '../engine/notation';

function describe(spec: WindingSpec, a: WindingAnalysis): string {
  const layers = spec.layers === 2 ? 'double-layer' : `single-layer ${spec.singleLayerCoiling ?? 'half'}-coiled`;
  const spans = spec.spans.map((y) => `${y} (${spanLabel(y)})`).join(', ');
  const source = a.layout.source === 'explicit' ? ', slot table from the winder' : '';
  return `${spec.slots} slots, ${spec.poles} poles, ${layers} ${spec.style}, span ${spans}, ${spec.turnsPerCoil.join('/')} turns per coil, ${spec.parallelPaths} path(s), ${spec.connection}${source}`;
}

function layoutRows(a: WindingAnalysis): string[] {
  const tau = a.polePitchSlots;
  const group = (row: string[]): string =>
    Number.isInteger(tau) ? row.map((c, i) => (i > 0 && i % tau === 0 ? ` ${c}` : c)).join('') : row.join('');
  const rows = [`Layer 1   ${group(slotRow(a.layout, 1))}`];
  if (a.layout.layers === 2) rows.push(`Layer 2   ${group(slotRow(a.layout, 2))}`);
  return rows;
}

/** Summary, layout, winding factors (closed form beside slot star) and the MMF spectrum up to `orders`. */
export function formatWinding(spec: WindingSpec, a: WindingAnalysis, orders: number): string {
  const q = a.fractional ? `${a.q.z}/${a.q.d} (fractional)` : `${a.q.z} (integral)`;
  const b = a.balance;
  const closed = new Map(a.closedForm.checks.map((c) => [c.order, c]));
  const factorRows = a.factors
    .filter((f) => f.order <= orders)
    .map((f) => {
      const c = closed.get(f.order);
      return [
        orderLabel(f.order, f.mechanicalOrder),
        fixed(c?.kd === undefined ? undefined : Math.abs(c.kd), 4),
        fixed(c?.kp === undefined ? undefined : Math.abs(c.kp), 4),
        fixed(c ? Math.abs(c.kw) : undefined, 4),
        fixed(f.kw, 4),
      ];
    });
  const mmfRows = a.mmf.harmonics
    .filter((h) => h.order <= orders)
    .map((h) => [
      orderLabel(h.order, h.mechanicalOrder),
      fixed(h.relativeAmplitude, 4),
      h.direction,
      h.direction === 'cancelled' ? '—' : fixed(h.speedFraction, 4),
      h.direction === 'cancelled' ? '—' : fixed(h.speedRpm, 1),
    ]);
  return [
    `Winding   ${describe(spec, a)}`,
    `q         ${q}; pole pitch ${fixed(a.polePitchSlots, 3)} slots; slot angle ${fixed(a.slotAngleDeg, 3)}° electrical`,
    ...layoutRows(a),
    '          (upper case going, lower case returning)',
    `Balance   ${b.verdict}: EMF spread ${fixed(b.magnitudeSpread * 100, 3)} %, angle error ${fixed(b.angleErrorDeg, 3)}°, sequence ${b.sequence}`,
    `Paths     allowed ${a.parallelPaths.allowed.join(', ')} (${a.parallelPaths.sections} identical section(s))${a.parallelPaths.note ? `; ${a.parallelPaths.note}` : ''}`,
    `k_w1      ${fixed(a.windingFactor, 4)}${a.closedForm.checks.length ? ` (closed form agrees to ${a.closedForm.maxDifference.toExponential(1)})` : ''}`,
    '',
    'Winding factors (closed form for odd whole orders; slot-star sum for every order present)',
    formatTable(['order', 'k_d', 'k_p', 'k_w closed', 'k_w slot star'], factorRows),
    '',
    `MMF space harmonics: balanced currents, ${fixed(a.mmf.synchronousRpm, 1)} rpm synchronous, amplitude relative to the working wave`,
    formatTable(['order', 'amplitude', 'direction', 'speed ×n_s', 'speed rpm'], mmfRows),
    ...(a.warnings.length ? ['', ...a.warnings.map((w) => `Warning: ${w}`)] : []),
  ].join('\n');
}
