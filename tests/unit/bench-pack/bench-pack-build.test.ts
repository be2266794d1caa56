import { describe, expect, it } from 'vitest';
import { buildBenchPack, type BenchPackInput } from '@/lib/bench-pack/bench-pack-build';
import { connectionDiagram } from '@/lib/bench-pack/connection-diagram';
import type { WindingSpec } from '@/lib/engine/winding-layout';

const LAP: WindingSpec = {
  slots: 36,
  poles: 4,
  layers: 2,
  style: 'lap',
  spans: [7],
  turnsPerCoil: [14],
  parallelPaths: 1,
  connection: 'star',
};

function input(over: Partial<BenchPackInput> = {}): BenchPackInput {
  return {
    job: { number: 1, customer: 'C', motor: 'M' },
    basis: {
      kind: 'redesign',
      revision: 2,
      approvedBy: 'E',
      approvedAt: new Date('2026-11-30T10:00:00Z'),
      note: 'ok',
      current: true,
      currentRevision: 2,
    },
    supply: { lineVoltageV: 400, frequencyHz: 50 },
    winding: LAP,
    core: { boreMm: 150, coreLengthMm: 120, slotDepthMm: 20, slots: 36 },
    oldCoils: { spans: [7], turnsPerCoil: [14], meanTurnLengthMm: 560 },
    wires: [{ label: '0.850 mm', enamelGrade: 2, count: 2, areaMm2: (Math.PI / 4) * 0.85 ** 2, onHandKg: 3 }],
    insulation: [],
    cautions: ['Redesign caution.'],
    wireAllowance: 0.1,
    marking: 'iec',
    leads: 6,
    ...over,
  };
}

function built(over: Partial<BenchPackInput> = {}) {
  const r = buildBenchPack(input(over));
  if (!r.ok) throw new Error(r.reason);
  return r.value;
}

describe('the bench pack, assembled', () => {
  it('example A wound as found: 2.85 kg of copper, 3.13 kg to draw, and 3 kg on hand is not enough [derived]', () => {
    const d = built();
    expect(d.wire.rows[0]?.values[1]).toMatch(/^2\.85 kg/);
    expect(d.wire.rows[0]?.values[2]).toMatch(/^3\.13 kg/);
    expect(d.wire.rows[0]?.values[3]).toContain('NOT ENOUGH');
    expect(built({ wires: [{ ...input().wires[0]!, onHandKg: 10 }] }).wire.rows[0]?.values[3]).toContain('enough');
    expect(d.coilRows[0]?.values[3]).toMatch(/^560 mm/);
  });

  it('a superseded revision says so in the approval block', () => {
    const d = built({
      basis: { kind: 'redesign', revision: 1, approvedBy: 'E', approvedAt: new Date(), note: '', current: false, currentRevision: 3 },
    });
    expect(d.approval[0]?.value).toContain('SUPERSEDED by revision 3');
  });

  it('12 leads are offered only for an even circuit count; one circuit falls back to 6', () => {
    expect(built({ leads: 12 }).leadPlan.leads).toBe(6);
    expect(built({ leads: 12, winding: { ...LAP, parallelPaths: 2 } }).leadPlan.leads).toBe(12);
  });

  it('3 leads in delta: each phase finish is joined inside to the next lead', () => {
    const d = built({ leads: 3, winding: { ...LAP, connection: 'delta' } });
    expect(d.circuits.map((c) => `${c.startLead}…${c.finishLead}`)).toEqual(['U…to lead V', 'V…to lead W', 'W…to lead U']);
  });

  it('refuses a circuit count the layout does not allow, in words', () => {
    const r = buildBenchPack(input({ winding: { ...LAP, parallelPaths: 3 } }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/cannot be shared among 3 parallel circuits/);
  });

  it('the diagram draws every group once, with its S and F ends and an arrow', () => {
    const d = built({ winding: { ...LAP, parallelPaths: 2 } });
    const shapes = connectionDiagram(d.plan, d.leadPlan).shapes;
    const labels = shapes.flatMap((s) => (s.kind === 'text' && /· pole/.test(s.text) ? [s.text.split(' ')[0]] : []));
    expect(labels.sort()).toEqual(d.groups.map((g) => g.label).sort());
    expect(shapes.filter((s) => s.kind === 'arrow')).toHaveLength(d.groups.length);
    expect(shapes.filter((s) => s.kind === 'text' && s.text === 'reversed')).toHaveLength(
      d.groups.filter((g) => g.sense === 'reversed').length,
    );
  });
});
