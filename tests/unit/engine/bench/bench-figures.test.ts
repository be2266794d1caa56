import { describe, expect, it } from 'vitest';
import { coilDimensions } from '@/lib/engine/bench/coil-dimensions';
import { leadCountsFor, leadMark, leadPlan } from '@/lib/engine/bench/lead-markings';
import { wireDraw } from '@/lib/engine/bench/wire-draw';
import { errorOf, value } from '../../../support/fixtures/winding-fixtures';

describe('lead markings', () => {
  // IEC 60034-8: start 1, finish 2 of U, V, W; NEMA MG 1 Part 2: T1–T4, T2–T5, T3–T6 (and T7–T10 … for 12 leads).
  it.each([
    ['iec', 'A', 1, 'start', 'U1'],
    ['iec', 'B', 1, 'finish', 'V2'],
    ['iec', 'C', 2, 'start', 'W5'],
    ['iec', 'A', 2, 'finish', 'U6'],
    ['nema', 'A', 1, 'start', 'T1'],
    ['nema', 'A', 1, 'finish', 'T4'],
    ['nema', 'C', 1, 'finish', 'T6'],
    ['nema', 'B', 2, 'start', 'T8'],
    ['nema', 'C', 2, 'finish', 'T12'],
  ] as const)('%s phase %s section %i %s → %s', (conv, ph, sec, end, mark) => {
    expect(leadMark(conv, ph, sec, end)).toBe(mark);
  });

  it('6-lead star joins the finishes: U2 V2 W2 (IEC 60034-8), T4 T5 T6 (NEMA MG 1 Part 2)', () => {
    expect(leadPlan('iec', 6, 'star', 1).joints).toEqual([{ where: 'terminal box', role: 'star point', ends: ['U2', 'V2', 'W2'] }]);
    const n = leadPlan('nema', 6, 'star', 1);
    expect(n.lines.map((l) => l.leads)).toEqual([['T1'], ['T2'], ['T3']]);
    expect(n.joints[0]?.ends).toEqual(['T4', 'T5', 'T6']);
  });

  it('6-lead delta: L1 U1+W2, L2 V1+U2, L3 W1+V2; NEMA L1 T1+T6, L2 T2+T4, L3 T3+T5', () => {
    expect(leadPlan('iec', 6, 'delta', 2).lines.map((l) => l.leads)).toEqual([
      ['U1', 'W2'],
      ['V1', 'U2'],
      ['W1', 'V2'],
    ]);
    expect(leadPlan('nema', 6, 'delta', 2).lines.map((l) => l.leads)).toEqual([
      ['T1', 'T6'],
      ['T2', 'T4'],
      ['T3', 'T5'],
    ]);
  });

  it('12-lead NEMA, sections in parallel: star L1 T1+T7 with star points T4-T5-T6 and T10-T11-T12; delta L1 T1 T7 T6 T12', () => {
    const y = leadPlan('nema', 12, 'star', 2);
    expect(y.lines[0]?.leads).toEqual(['T1', 'T7']);
    expect(y.joints.filter((j) => j.role === 'star point').map((j) => j.ends)).toEqual([
      ['T4', 'T5', 'T6'],
      ['T10', 'T11', 'T12'],
    ]);
    expect(leadPlan('nema', 12, 'delta', 4).lines.map((l) => l.leads)).toEqual([
      ['T1', 'T7', 'T6', 'T12'],
      ['T2', 'T8', 'T4', 'T10'],
      ['T3', 'T9', 'T5', 'T11'],
    ]);
    expect(y.sections.filter((s) => s.phase === 'A').map((s) => s.circuits)).toEqual([[1], [2]]);
  });

  it('12 leads need an even circuit count; with one circuit the plan falls back to 6', () => {
    expect(leadCountsFor(1)).toEqual([3, 6]);
    expect(leadCountsFor(4)).toEqual([3, 6, 12]);
    expect(leadPlan('iec', 12, 'star', 1).leads).toBe(6);
  });

  it('3 leads: star point and delta corners made inside the motor', () => {
    const y = leadPlan('nema', 3, 'star', 1);
    expect(y.lines.map((l) => l.leads)).toEqual([['T1'], ['T2'], ['T3']]);
    expect(y.joints).toEqual([
      { where: 'inside the motor', role: 'star point', ends: ['phase A finish', 'phase B finish', 'phase C finish'] },
    ]);
    expect(leadPlan('iec', 3, 'delta', 1).joints.map((j) => j.ends)).toEqual([
      ['lead U', 'phase C finish'],
      ['lead V', 'phase A finish'],
      ['lead W', 'phase B finish'],
    ]);
  });
});

describe('coil dimensions', () => {
  const core = { boreMm: 150, coreLengthMm: 120, slotDepthMm: 20, slots: 36 };
  it('from the core [derived]: 36 slots, D 150, h 20, L 120, span 7 → pitch 103.85 mm, MLT 614.2 mm, extension 63.9 mm', () => {
    const d = value(coilDimensions(core, [7], [14]));
    expect(d.basis).toBe('from-core');
    const c = d.coils[0];
    // w = π·170·7/36 = 103.847; MLT = 2·(120 + 24) + π·103.847 = 614.25; extension 12 + 51.92.
    expect(c?.pitchMm).toBeCloseTo(103.847, 2);
    expect(c?.meanTurnLengthMm).toBeCloseTo(614.25, 1);
    expect(c?.endExtensionMm).toBeCloseTo(63.92, 1);
    expect(c?.straightLengthMm).toBe(144);
  });

  it('scaled from the old coils [derived]: old MLT 560 mm at span 7; the same span keeps 560, span 8 gives 605.71 mm', () => {
    const old = { meanTurnLengthMm: 560, spans: [7], turnsPerCoil: [14] };
    expect(value(coilDimensions(core, [7], [14], old)).meanTurnLengthMm).toBeCloseTo(560, 6);
    const d = value(coilDimensions(core, [8], [12], old));
    expect(d.basis).toBe('scaled-from-old-coils');
    expect(d.meanTurnLengthMm).toBeCloseTo(240 + 2 * 160 * (8 / 7), 6);
  });

  it('concentric: each coil its own length, the turn-weighted mean in between', () => {
    const d = value(coilDimensions(core, [11, 9, 7], [10, 10, 10]));
    const [a, b, c] = d.coils.map((x) => x.meanTurnLengthMm);
    expect(a).toBeGreaterThan(b ?? 0);
    expect(b).toBeGreaterThan(c ?? 0);
    expect(d.meanTurnLengthMm).toBeCloseTo(b ?? 0, 6);
  });

  it('refuses a core without length', () => {
    expect(errorOf(coilDimensions({ ...core, coreLengthMm: 0 }, [7], [14])).code).toBe('invalid-input');
  });
});

describe('wire to draw', () => {
  it('example A [derived]: 36 coils × 14 turns × 0.56 m, 2 × 0.85 mm → 564.48 m of wire, 2.848 kg copper, 3.132 kg with 10 %', () => {
    const coils = Array.from({ length: 36 }, () => ({ turns: 14, meanTurnLengthMm: 560 }));
    const area = (Math.PI / 4) * 0.85 ** 2;
    const d = value(wireDraw(coils, [{ label: '0.850 mm', count: 2, areaMm2: area }], 0.1));
    expect(d.conductorLengthM).toBeCloseTo(282.24, 6);
    expect(d.lines[0]?.lengthM).toBeCloseTo(564.48, 6);
    expect(d.copperKg).toBeCloseTo(2.8476, 3);
    expect(d.drawKg).toBeCloseTo(2.8476 * 1.1, 3);
  });

  it('two sizes in hand: each drawn by its own count and area', () => {
    const d = value(
      wireDraw(
        [{ turns: 10, meanTurnLengthMm: 1000 }],
        [
          { label: 'a', count: 2, areaMm2: 1 },
          { label: 'b', count: 1, areaMm2: 0.5 },
        ],
        0,
      ),
    );
    // 10 m per conductor: a 20 m × 1 mm², b 10 m × 0.5 mm² → 8890·(20 + 5)·1e-6 kg [derived].
    expect(d.lines.map((l) => l.copperKg)).toEqual([8890 * 20e-6, 8890 * 5e-6].map((x) => expect.closeTo(x, 9)));
  });

  it('refuses an allowance outside 0–100 %', () => {
    expect(errorOf(wireDraw([{ turns: 1, meanTurnLengthMm: 1 }], [{ label: 'a', count: 1, areaMm2: 1 }], 1.5)).field).toBe('wireAllowance');
  });
});
