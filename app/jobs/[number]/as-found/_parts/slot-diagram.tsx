/**
 * The stator drawn from its slot table: slots round the bore, each coil side's phase and direction, the
 * phase belts outside, and the span of the first coil group inside the bore. Readable in black and white
 * and without colour: every side carries its letter and sign (A+, B−), phases also differ by fill pattern
 * (A plain, B hatched, C dotted) and returning sides have a dashed outline. No hooks: it renders on the
 * server for the print view too.
 */
import type { CoilSide, SlotTable } from '@/lib/engine/winding-layout';

const R_BORE = 118;
const RING = 56;
const PHASE_TINT = { A: '#f3c77a', B: '#a9d6f2', C: '#8fd3bd' } as const;
const MINUS = '−';
/**
 * Smallest text on the drawing, in drawing units: the diagram shows at up to 520 px for 530 units, so this
 * is about 11 px on screen. Slot numbers, phase belts, captions and the legend use
 * it; the labels inside the slots never drop below CELL_TEXT_MIN (they are repeated in the slot table).
 */
const TEXT_MIN = 11;
const CELL_TEXT_MIN = 7.5;

export const sideLabel = (s: Pick<CoilSide, 'phase' | 'polarity'>): string => `${s.phase}${s.polarity > 0 ? '+' : MINUS}`;

const polar = (r: number, deg: number): [number, number] => {
  const a = ((deg - 90) * Math.PI) / 180;
  return [r * Math.cos(a), r * Math.sin(a)];
};
const f = (n: number): string => n.toFixed(2);

function sector(r1: number, r2: number, a1: number, a2: number): string {
  const [x1, y1] = polar(r1, a1);
  const [x2, y2] = polar(r2, a1);
  const [x3, y3] = polar(r2, a2);
  const [x4, y4] = polar(r1, a2);
  const large = a2 - a1 > 180 ? 1 : 0;
  return `M${f(x1)},${f(y1)} L${f(x2)},${f(y2)} A${r2},${r2} 0 ${large} 1 ${f(x3)},${f(y3)} L${f(x4)},${f(y4)} A${r1},${r1} 0 ${large} 0 ${f(x1)},${f(y1)} Z`;
}

function arc(r: number, a1: number, a2: number): string {
  const [x1, y1] = polar(r, a1);
  const [x2, y2] = polar(r, a2);
  return `M${f(x1)},${f(y1)} A${r},${r} 0 ${a2 - a1 > 180 ? 1 : 0} 1 ${f(x2)},${f(y2)}`;
}

/** Runs of consecutive slots whose top-layer side has the same phase and direction (the phase belts). */
export function phaseBelts(table: SlotTable): { first: number; last: number; label: string }[] {
  const top = new Map<number, CoilSide>();
  for (const s of table.sides) if (s.layer === 1) top.set(s.slot, s);
  const runs: { first: number; last: number; label: string }[] = [];
  for (let slot = 1; slot <= table.slots; slot++) {
    const s = top.get(slot);
    const label = s ? sideLabel(s) : '';
    const last = runs[runs.length - 1];
    if (last && last.label === label && last.last === slot - 1) last.last = slot;
    else runs.push({ first: slot, last: slot, label });
  }
  const first = runs[0];
  const end = runs[runs.length - 1];
  if (runs.length > 1 && first && end && first.label === end.label && end.last === table.slots && first.first === 1) {
    runs.pop();
    runs[0] = { first: end.first - table.slots, last: first.last, label: first.label };
  }
  return runs.filter((r) => r.label !== '');
}

/** The coils of the first A+ group, as [going slot, return slot] pairs, for drawing the spans. */
function firstGroupCoils(table: SlotTable, belts: ReturnType<typeof phaseBelts>): [number, number][] {
  const belt = belts.find((b) => b.label === 'A+');
  if (!belt) return [];
  const bySlot = (slot: number) => table.sides.find((s) => s.layer === 1 && s.slot === ((slot - 1 + table.slots) % table.slots) + 1);
  const out: [number, number][] = [];
  for (let slot = belt.first; slot <= belt.last; slot++) {
    const side = bySlot(slot);
    if (!side || side.coil === undefined) continue;
    const partner = table.sides.find((s) => s.coil === side.coil && s !== side);
    if (partner) out.push([side.slot, partner.slot]);
  }
  return out;
}

export interface SlotDiagramProps {
  table: SlotTable;
  /** e.g. "double-layer lap, span 1–8" */
  caption: string;
  id?: string;
}

export function SlotDiagram({ table, caption, id = 'slot-diagram' }: SlotDiagramProps) {
  const S = table.slots;
  const pitch = 360 / S;
  const belts = phaseBelts(table);
  const group = firstGroupCoils(table, belts);
  const showCellLabels = S <= 72;
  const labelEvery = S <= 48 ? 1 : S <= 96 ? 3 : 6;
  const layerR = (layer: number): [number, number] =>
    table.layers === 2 ? (layer === 1 ? [R_BORE, R_BORE + RING / 2] : [R_BORE + RING / 2, R_BORE + RING]) : [R_BORE, R_BORE + RING];
  const fontCell = Math.max(CELL_TEXT_MIN, Math.min(11, ((2 * Math.PI * R_BORE) / S) * 0.5));
  const beltText = belts.map((b) => `${b.label} slots ${((b.first - 1 + S) % S) + 1}–${b.last}`).join('; ');
  return (
    <svg viewBox="-265 -265 530 580" role="img" aria-labelledby={`${id}-title ${id}-desc`} className="slot-diagram" id={id}>
      {/* One string child: React renders a <title> with several children as empty on the server. */}
      <title id={`${id}-title`}>{`Slot diagram: ${S} slots, ${table.poles} poles, ${caption}`}</title>
      <desc id={`${id}-desc`}>
        Each slot shows its coil sides by phase and direction (top layer next to the bore
        {table.layers === 2 ? ', bottom layer outside it' : ''}). Phase belts round the top layer: {beltText}.{' '}
        {group.length ? `First A+ group spans: ${group.map(([a, b]) => `${a}–${b}`).join(', ')}.` : ''} The table below lists every slot.
      </desc>
      <defs>
        <pattern id={`${id}-hatch`} width="4" height="4" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <rect width="4" height="4" fill={PHASE_TINT.B} />
          <line x1="0" y1="0" x2="0" y2="4" stroke="#1d2430" strokeWidth="1.1" />
        </pattern>
        <pattern id={`${id}-dots`} width="4" height="4" patternUnits="userSpaceOnUse">
          <rect width="4" height="4" fill={PHASE_TINT.C} />
          <circle cx="2" cy="2" r="0.9" fill="#1d2430" />
        </pattern>
        <marker id={`${id}-arrow`} viewBox="0 0 6 6" refX="5" refY="3" markerWidth="5" markerHeight="5" orient="auto-start-reverse">
          <path d="M0,0 L6,3 L0,6 Z" fill="#1d2430" />
        </marker>
      </defs>
      <circle r={R_BORE} fill="none" stroke="#1d2430" strokeWidth="0.8" />
      <circle r={R_BORE + RING + 4} fill="none" stroke="#1d2430" strokeWidth="0.8" />
      {table.sides.map((s) => {
        const [r1, r2] = layerR(s.layer);
        const mid = (s.slot - 1) * pitch;
        const fill = s.phase === 'A' ? PHASE_TINT.A : `url(#${id}-${s.phase === 'B' ? 'hatch' : 'dots'})`;
        const [tx, ty] = polar((r1 + r2) / 2, mid);
        return (
          <g key={`${s.slot}-${s.layer}`} data-slot={s.slot} data-layer={s.layer}>
            <path
              d={sector(r1 + 1, r2 - 1, mid - pitch * 0.42, mid + pitch * 0.42)}
              fill={fill}
              stroke="#1d2430"
              strokeWidth={s.polarity > 0 ? 1.2 : 0.9}
              strokeDasharray={s.polarity > 0 ? undefined : '2 1.5'}
            />
            {showCellLabels && (
              <text
                x={f(tx)}
                y={f(ty)}
                fontSize={fontCell}
                textAnchor="middle"
                dominantBaseline="central"
                className="cell-label"
                paintOrder="stroke"
                stroke="#fff"
                strokeWidth={fontCell / 3.5}
              >
                {sideLabel(s)}
              </text>
            )}
          </g>
        );
      })}
      {Array.from({ length: S }, (_, i) => i + 1)
        .filter((n) => n === 1 || (n - 1) % labelEvery === 0)
        .map((n) => {
          const [x, y] = polar(R_BORE + RING + 13, (n - 1) * pitch);
          return (
            <text key={n} x={f(x)} y={f(y)} fontSize={TEXT_MIN} textAnchor="middle" dominantBaseline="central" fill="#3d4654">
              {n}
            </text>
          );
        })}
      {belts.map((b) => {
        const a1 = (b.first - 1) * pitch - pitch * 0.45;
        const a2 = (b.last - 1) * pitch + pitch * 0.45;
        const [lx, ly] = polar(R_BORE + RING + 38, (a1 + a2) / 2);
        return (
          <g key={`${b.first}-${b.label}`}>
            <path
              d={arc(R_BORE + RING + 26, a1, a2)}
              fill="none"
              stroke="#1d2430"
              strokeWidth="2"
              strokeDasharray={b.label.endsWith('+') ? undefined : '4 2'}
            />
            <text x={f(lx)} y={f(ly)} fontSize={TEXT_MIN + 1} fontWeight="700" textAnchor="middle" dominantBaseline="central">
              {b.label}
            </text>
          </g>
        );
      })}
      {group.map(([from, to], k) => {
        let a1 = (from - 1) * pitch;
        let a2 = (to - 1) * pitch;
        if (a2 < a1) a2 += 360;
        if (a2 - a1 > 180) [a1, a2] = [a2 - 360, a1];
        const r = R_BORE - 10 - k * 9;
        return (
          <path key={`${from}-${to}`} d={arc(r, a1, a2)} fill="none" stroke="#a4531c" strokeWidth="1.6" markerEnd={`url(#${id}-arrow)`} />
        );
      })}
      <text y="-16" textAnchor="middle" fontSize={TEXT_MIN + 1} fontWeight="700">
        {S} slots · {table.poles} poles
      </text>
      <text y="2" textAnchor="middle" fontSize={TEXT_MIN}>
        {caption}
      </text>
      {group.length > 0 && (
        <text y="20" textAnchor="middle" fontSize={TEXT_MIN} fill="#8a4516">
          <tspan x="0">arrows: span of the first A+ group</tspan>
          <tspan x="0" dy={TEXT_MIN + 3}>
            {group.map(([a, b]) => `${a}–${b}`).join(', ')}
          </tspan>
        </text>
      )}
      <g transform="translate(-255,285)" fontSize={TEXT_MIN}>
        <rect width="18" height="12" fill={PHASE_TINT.A} stroke="#1d2430" />
        <text x="23" y="10">
          Phase A (plain)
        </text>
        <rect x="118" width="18" height="12" fill={`url(#${id}-hatch)`} stroke="#1d2430" />
        <text x="141" y="10">
          Phase B (hatched)
        </text>
        <rect x="250" width="18" height="12" fill={`url(#${id}-dots)`} stroke="#1d2430" />
        <text x="273" y="10">
          Phase C (dotted)
        </text>
        <rect x="372" width="18" height="12" fill="#fff" stroke="#1d2430" strokeDasharray="2 1.5" />
        <text x="395" y="10">
          − returning
        </text>
      </g>
    </svg>
  );
}

/** Slot-by-slot rows for the table alternative. */
export function slotRows(table: SlotTable): { slot: number; top: string; bottom: string }[] {
  const at = (slot: number, layer: number) => table.sides.find((s) => s.slot === slot && s.layer === layer);
  const text = (s: CoilSide | undefined) =>
    s ? `${sideLabel(s)}${s.coil !== undefined ? ` (coil ${s.coil}, ${s.turns} turns)` : ` (${s.turns} turns)`}` : '—';
  return Array.from({ length: table.slots }, (_, i) => ({ slot: i + 1, top: text(at(i + 1, 1)), bottom: text(at(i + 1, 2)) }));
}

export function SlotTableView({ table }: { table: SlotTable }) {
  return (
    <table className="slot-table small">
      <caption className="sr-only">Coil sides in each slot</caption>
      <thead>
        <tr>
          <th scope="col">Slot</th>
          <th scope="col">{table.layers === 2 ? 'Top layer' : 'Coil side'}</th>
          {table.layers === 2 && <th scope="col">Bottom layer</th>}
        </tr>
      </thead>
      <tbody>
        {slotRows(table).map((r) => (
          <tr key={r.slot}>
            <td className="num">{r.slot}</td>
            <td>{r.top}</td>
            {table.layers === 2 && <td>{r.bottom}</td>}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
