/**
 * The connection diagram as plain shapes (lines, boxes, circles, arrows, text), drawn from the connection
 * plan so the print view (SVG) and the PDF (@react-pdf's Svg) draw exactly the same picture. Our own
 * design: one band per phase; in each, the phase's start lead, a bus joining the starts of its parallel
 * circuits, each circuit as its groups in series left to right in the order current passes, a bus joining
 * the finishes, the finish lead. Every group box carries its name, its pole, its S and F ends, and an arrow
 * from S to F (forward groups point along the current, reversed groups against it), with the word, so
 * polarity never rests on colour or shape alone. Below, the terminal joints for the chosen leads, and the
 * lead-marking standard.
 */
import { groupLabel } from '@/lib/engine/bench/coil-groups';
import type { ConnectionPlan } from '@/lib/engine/bench/connection-plan';
import type { LeadPlan } from '@/lib/engine/bench/lead-markings';
import type { Phase } from '@/lib/engine/winding-layout';

export type Shape =
  | { kind: 'line'; x1: number; y1: number; x2: number; y2: number; width: number; dashed?: boolean }
  | { kind: 'rect'; x: number; y: number; w: number; h: number; width: number }
  | { kind: 'circle'; cx: number; cy: number; r: number; filled: boolean }
  | { kind: 'arrow'; x1: number; y: number; x2: number }
  | { kind: 'text'; x: number; y: number; text: string; size: number; anchor: 'start' | 'middle' | 'end'; bold?: boolean };

export interface Diagram {
  width: number;
  height: number;
  shapes: Shape[];
}

export const DIAGRAM_WIDTH = 760;
const LEFT = 84;
const RIGHT = DIAGRAM_WIDTH - 84;
const ROW = 58;
const BOX_H = 40;
const MAX_PER_ROW = 5;

const PHASE_NAME: Record<Phase, string> = { A: 'Phase A', B: 'Phase B', C: 'Phase C' };

/** The whole diagram for a plan and a lead plan. */
export function connectionDiagram(plan: ConnectionPlan, leads: LeadPlan): Diagram {
  const shapes: Shape[] = [];
  let y = 8;
  const text = (x: number, yy: number, t: string, size = 11, anchor: 'start' | 'middle' | 'end' = 'middle', bold = false) =>
    shapes.push({ kind: 'text', x, y: yy, text: t, size, anchor, bold });

  for (const ph of ['A', 'B', 'C'] as const) {
    text(8, y + 14, `${PHASE_NAME[ph]} — ${plan.circuits[ph].length} circuit(s) in parallel`, 13, 'start', true);
    y += 24;
    for (const section of leads.sections.filter((s) => s.phase === ph)) {
      const circuits = section.circuits.map((k) => plan.circuits[ph][k - 1]).filter((c) => c !== undefined);
      const rowsPer = circuits.map((c) => Math.max(1, Math.ceil(c.steps.length / MAX_PER_ROW)));
      const top = y;
      const mids: { start: number; finish: number }[] = [];
      circuits.forEach((c, ci) => {
        const per = Math.min(MAX_PER_ROW, c.steps.length);
        const slot = (RIGHT - LEFT - 24) / per;
        const boxW = Math.min(104, slot - 22);
        const rows = rowsPer[ci] ?? 1;
        let startY = 0;
        let finishY = 0;
        for (let r = 0; r < rows; r++) {
          const rowSteps = c.steps.slice(r * MAX_PER_ROW, (r + 1) * MAX_PER_ROW);
          const cy = y + BOX_H / 2 + 6;
          if (r === 0) startY = cy;
          rowSteps.forEach((st, i) => {
            const x = LEFT + 12 + i * slot + (slot - boxW) / 2;
            const prevEnd = i === 0 ? (r === 0 ? LEFT : LEFT + 6) : LEFT + 12 + (i - 1) * slot + (slot - boxW) / 2 + boxW;
            shapes.push({ kind: 'line', x1: prevEnd, y1: cy, x2: x, y2: cy, width: 1.6 });
            shapes.push({ kind: 'rect', x, y: y + 6, w: boxW, h: BOX_H, width: st.group.sense > 0 ? 1.4 : 2.6 });
            const forward = st.group.sense > 0;
            // The ends sit outside the box, above the wire they join.
            text(x - 2, cy - 4, forward ? 'S' : 'F', 10, 'end', true);
            text(x + boxW + 2, cy - 4, forward ? 'F' : 'S', 10, 'start', true);
            text(x + boxW / 2, y + 4 + 13, `${groupLabel(st.group)} · pole ${st.group.pole}`, 10.5, 'middle', true);
            const ax = 10;
            shapes.push(
              forward
                ? { kind: 'arrow', x1: x + ax, y: y + 27, x2: x + boxW - ax }
                : { kind: 'arrow', x1: x + boxW - ax, y: y + 27, x2: x + ax },
            );
            text(x + boxW / 2, y + 4 + 38, forward ? 'forward' : 'reversed', 9);
          });
          const last = rowSteps.length - 1;
          const lastEnd = LEFT + 12 + last * slot + (slot - boxW) / 2 + boxW;
          if (r < rows - 1) {
            // Carry on to the next row: down, back to the left, into its first box.
            const ny = y + ROW + BOX_H / 2 + 6;
            shapes.push({ kind: 'line', x1: lastEnd, y1: cy, x2: lastEnd + 8, y2: cy, width: 1.6 });
            shapes.push({ kind: 'line', x1: lastEnd + 8, y1: cy, x2: lastEnd + 8, y2: cy + BOX_H / 2 + 8, width: 1.6 });
            shapes.push({ kind: 'line', x1: lastEnd + 8, y1: cy + BOX_H / 2 + 8, x2: LEFT + 6, y2: cy + BOX_H / 2 + 8, width: 1.6 });
            shapes.push({ kind: 'line', x1: LEFT + 6, y1: cy + BOX_H / 2 + 8, x2: LEFT + 6, y2: ny, width: 1.6 });
          } else {
            finishY = cy;
            shapes.push({ kind: 'line', x1: lastEnd, y1: cy, x2: RIGHT, y2: cy, width: 1.6 });
          }
          y += ROW;
        }
        text(LEFT - 4, startY - 6, `${ph}-${c.index}`, 9, 'end');
        mids.push({ start: startY, finish: finishY });
      });
      const firstMid = mids[0]?.start ?? top + BOX_H / 2;
      const lastStart = mids[mids.length - 1]?.start ?? firstMid;
      const firstFinish = mids[0]?.finish ?? firstMid;
      const lastFinish = mids[mids.length - 1]?.finish ?? firstMid;
      // Buses joining the circuits' starts and finishes, with the leads.
      shapes.push({ kind: 'line', x1: LEFT, y1: firstMid, x2: LEFT, y2: lastStart, width: 2.4 });
      shapes.push({ kind: 'line', x1: RIGHT, y1: firstFinish, x2: RIGHT, y2: lastFinish, width: 2.4 });
      const leadY = (firstMid + lastStart) / 2;
      const finY = (firstFinish + lastFinish) / 2;
      shapes.push({ kind: 'line', x1: 40, y1: leadY, x2: LEFT, y2: leadY, width: 2.4 });
      shapes.push({ kind: 'circle', cx: 40, cy: leadY, r: 5, filled: true });
      text(30, leadY + 4, section.startLead ?? 'start', 13, 'end', true);
      shapes.push({ kind: 'line', x1: RIGHT, y1: finY, x2: DIAGRAM_WIDTH - 40, y2: finY, width: 2.4 });
      shapes.push({ kind: 'circle', cx: DIAGRAM_WIDTH - 40, cy: finY, r: 5, filled: section.finishLead !== null });
      text(DIAGRAM_WIDTH - 30, finY + 4, section.finishLead ?? '', 13, 'start', true);
      if (section.finishLead === null)
        text(DIAGRAM_WIDTH - 40, finY + 20, leads.connection === 'star' ? 'to star point' : 'inside', 9, 'middle');
      y += 6;
    }
    shapes.push({ kind: 'line', x1: 8, y1: y, x2: DIAGRAM_WIDTH - 8, y2: y, width: 0.6, dashed: true });
    y += 6;
  }

  // Terminal joints.
  y += 10;
  text(
    8,
    y + 12,
    `${leads.connection === 'star' ? 'Star (Y)' : 'Delta (Δ)'} — ${leads.leads} leads — ${leads.standard}`,
    13,
    'start',
    true,
  );
  y += 44;
  for (const line of leads.lines) {
    joint(shapes, y, line.line, line.leads, 'line');
    y += 30;
  }
  for (const j of leads.joints.filter((k) => k.role !== 'line')) {
    joint(shapes, y, j.role === 'star point' ? 'Star point' : 'Delta corner', j.ends, j.where);
    y += 30;
  }
  return { width: DIAGRAM_WIDTH, height: y + 8, shapes };
}

function joint(shapes: Shape[], y: number, label: string, ends: string[], note: string): void {
  shapes.push({ kind: 'text', x: 8, y: y + 5, text: label, size: 12, anchor: 'start', bold: true });
  const x0 = 150;
  const step = Math.min(120, (DIAGRAM_WIDTH - x0 - 170) / Math.max(1, ends.length - 1 || 1));
  const xs = ends.map((_, i) => x0 + i * step);
  const xl = xs[xs.length - 1] ?? x0;
  if (ends.length > 1) shapes.push({ kind: 'line', x1: x0, y1: y, x2: xl, y2: y, width: 3 });
  ends.forEach((e, i) => {
    const x = xs[i] ?? x0;
    shapes.push({ kind: 'circle', cx: x, cy: y, r: 4.5, filled: true });
    shapes.push({ kind: 'text', x, y: y - 8, text: e, size: 11, anchor: 'middle', bold: true });
  });
  shapes.push({ kind: 'text', x: xl + 24, y: y + 4, text: note === 'line' ? 'to the supply line' : note, size: 10, anchor: 'start' });
}
