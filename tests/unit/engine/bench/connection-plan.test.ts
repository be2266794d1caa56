import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coilGroups, groupLabel } from '@/lib/engine/bench/coil-groups';
import { connectionPlan, type ConnectionPlan } from '@/lib/engine/bench/connection-plan';
import { allowedParallelPaths } from '@/lib/engine/parallel-paths';
import { SlotStar } from '@/lib/engine/slot-star';
import type { SlotTable, WindingSpec } from '@/lib/engine/winding-layout';
import { errorOf, lap, layoutOf, singleLayer, value } from '../../../support/fixtures/winding-fixtures';

const concentricDouble = (slots: number, poles: number, spans: number[]): WindingSpec => ({
  ...lap(slots, poles, spans[0] ?? 1),
  style: 'concentric',
  spans,
  turnsPerCoil: spans.map((_, i) => 10 + i),
});

/** Every coil of the layout, by number, from its sides. */
const layoutCoils = (t: SlotTable): number[] => [...new Set(t.sides.map((s) => s.coil ?? 0))].sort((a, b) => a - b);
const planCoils = (p: ConnectionPlan): number[] =>
  (['A', 'B', 'C'] as const)
    .flatMap((ph) => p.circuits[ph].flatMap((c) => c.steps.flatMap((s) => s.group.coils.map((k) => k.coil))))
    .sort((a, b) => a - b);

/** Checks every plan must pass against the engine's own layout and slot star. */
function expectSound(t: SlotTable, plan: ConnectionPlan, a: number): void {
  // Every coil of the layout appears exactly once in the circuits [derived: a winding is one continuous set of coils].
  expect(planCoils(plan)).toEqual(layoutCoils(t));
  const star = new SlotStar(t).phasors(t.poles / 2);
  for (const ph of ['A', 'B', 'C'] as const) {
    const circuits = plan.circuits[ph];
    expect(circuits).toHaveLength(a);
    const ref = circuits[0];
    if (!ref) throw new Error('no circuit');
    const m = Math.hypot(ref.phasor.re, ref.phasor.im);
    for (const c of circuits) {
      // Parallel circuits carry equal turns and identical phasors [derived, reference §3].
      expect(c.turns).toBe(ref.turns);
      expect(Math.hypot(c.phasor.re - ref.phasor.re, c.phasor.im - ref.phasor.im)).toBeLessThanOrEqual(1e-9 * m);
    }
    // The circuits together are the phase's slot-star sum (reference §1, [derived]).
    const sum = circuits.reduce((z, c) => ({ re: z.re + c.phasor.re, im: z.im + c.phasor.im }), { re: 0, im: 0 });
    expect(sum.re).toBeCloseTo(star[ph].re, 6);
    expect(sum.im).toBeCloseTo(star[ph].im, 6);
  }
}

describe('coil groups read from the layout (belt order A+, C−, B+, A−, C+, B−: reference §1, [derived])', () => {
  it('36 slots 4 poles lap 1–8: twelve groups of three coils round the stator, alternating sense', () => {
    const g = value(coilGroups(layoutOf(lap(36, 4, 7))));
    expect(g.groups.map((x) => `${groupLabel(x)}${x.sense > 0 ? '+' : '−'}`)).toEqual([
      'A1+',
      'C1−',
      'B1+',
      'A2−',
      'C2+',
      'B2−',
      'A3+',
      'C3−',
      'B3+',
      'A4−',
      'C4+',
      'B4−',
    ]);
    const a1 = g.byPhase.A[0];
    expect(a1?.coils.map((c) => [c.startSlot, c.finishSlot, c.span])).toEqual([
      [1, 8, 7],
      [2, 9, 7],
      [3, 10, 7],
    ]);
    expect(a1?.coils.every((c) => c.startLayer === 1 && c.finishLayer === 2)).toBe(true);
    expect(g.groups.map((x) => x.pole)).toEqual([1, 1, 1, 2, 2, 2, 3, 3, 3, 4, 4, 4]);
  });

  it('30 slots 4 poles (q = 5/2) lap: groups of 3 and 2 coils alternate', () => {
    const g = value(coilGroups(layoutOf(lap(30, 4, 7))));
    expect(g.byPhase.A.map((x) => x.coils.length)).toEqual([3, 2, 3, 2]);
    expect(g.groups).toHaveLength(12);
  });

  it('single-layer half-coiled concentric 36/4 (spans 11, 9, 7): one group per pole pair, all alike, nested coils', () => {
    const g = value(coilGroups(layoutOf(singleLayer(36, 4, [11, 9, 7]))));
    expect(g.byPhase.A.map((x) => x.sense)).toEqual([1, 1]);
    expect(g.byPhase.A[0]?.coils.map((c) => [c.startSlot, c.finishSlot, c.span])).toEqual([
      [1, 12, 11],
      [2, 11, 9],
      [3, 10, 7],
    ]);
  });

  it('single-layer 24/2 concentric: an outer span beyond half the bore keeps its own span (15)', () => {
    const g = value(coilGroups(layoutOf(singleLayer(24, 2, [15, 13, 11, 9]))));
    expect(g.byPhase.A[0]?.coils.map((c) => c.span)).toEqual([15, 13, 11, 9]);
  });

  it('double-layer concentric 36/4 (spans 9, 7, 5): nested groups, as many as poles per phase', () => {
    const g = value(coilGroups(layoutOf(concentricDouble(36, 4, [9, 7, 5]))));
    expect(g.byPhase.B).toHaveLength(4);
    expect(g.byPhase.A[0]?.coils.map((c) => [c.startSlot, c.finishSlot])).toEqual([
      [1, 10],
      [2, 9],
      [3, 8],
    ]);
  });

  it('refuses a slot table without coil numbers', () => {
    const t = layoutOf(lap(12, 2, 5));
    const bare: SlotTable = { ...t, source: 'explicit', sides: t.sides.map(({ coil: _coil, ...s }) => s) };
    expect(errorOf(coilGroups(bare)).code).toBe('not-applicable');
  });
});

describe('series and parallel connection of the groups', () => {
  it('36/4 lap, 1 circuit: alternate-pole connection, finish to finish then start to start', () => {
    const p = value(connectionPlan(layoutOf(lap(36, 4, 7)), 1, 'star'));
    expect(p.poleConnection).toBe('alternate');
    expect(p.circuits.A[0]?.jumpers.map((j) => `${j.from.end} ${j.from.label} → ${j.to.end} ${j.to.label}`)).toEqual([
      'finish A1 → finish A2',
      'start A2 → start A3',
      'finish A3 → finish A4',
    ]);
  });

  it('36/4 lap, 2 circuits: neighbouring pairs A1–A2 and A3–A4', () => {
    const p = value(connectionPlan(layoutOf(lap(36, 4, 7)), 2, 'delta'));
    expect(p.circuits.A.map((c) => c.steps.map((s) => groupLabel(s.group)))).toEqual([
      ['A1', 'A2'],
      ['A3', 'A4'],
    ]);
    expect(p.circuits.A[1]?.steps.map((s) => s.enter)).toEqual(['start', 'finish']);
  });

  it('single-layer half-coiled: consecutive-pole connection, finish to start', () => {
    const p = value(connectionPlan(layoutOf(singleLayer(36, 4, [11, 9, 7])), 1, 'star'));
    expect(p.poleConnection).toBe('consecutive');
    expect(p.circuits.A[0]?.jumpers.map((j) => `${j.from.end} ${j.from.label} → ${j.to.end} ${j.to.label}`)).toEqual([
      'finish A1 → start A2',
    ]);
  });

  it('refuses 3 circuits on 36/4 (the layout allows 1, 2, 4: reference §3)', () => {
    expect(errorOf(connectionPlan(layoutOf(lap(36, 4, 7)), 3, 'star')).code).toBe('parallel-paths-not-allowed');
  });

  // Lap and concentric, single and double layer, 1–4 circuits, star and delta; each checked against the
  // engine's layout, its slot star, and its own parallel-path analysis (reference §3, [derived]).
  const layouts: [string, WindingSpec][] = [
    ['lap 36/4 1–8', lap(36, 4, 7)],
    ['lap 48/4 1–11', lap(48, 4, 10)],
    ['lap 36/6 1–6', lap(36, 6, 5)],
    ['lap 72/8 1–9', lap(72, 8, 8)],
    ['lap 30/4 (q = 5/2) 1–8', lap(30, 4, 7)],
    ['concentric double-layer 36/4 9/7/5', concentricDouble(36, 4, [9, 7, 5])],
    ['concentric single-layer half-coiled 72/8 11/9/7', singleLayer(72, 8, [11, 9, 7])],
    ['concentric single-layer whole-coiled 48/4 11/9', singleLayer(48, 4, [11, 9], 'whole')],
  ];
  describe.each(layouts)('%s', (_name, spec) => {
    const t = layoutOf(spec);
    const allowed = allowedParallelPaths(t).allowed;
    it.each([1, 2, 3, 4].flatMap((a) => (['star', 'delta'] as const).map((c) => [a, c] as const)))(
      '%i circuit(s), %s: planned exactly when the layout allows it',
      (a, conn) => {
        const r = connectionPlan(t, a, conn);
        expect(r.ok).toBe(allowed.includes(a));
        if (r.ok) {
          expect(r.value.connection).toBe(conn);
          expectSound(t, r.value, a);
        }
      },
    );
  });
});

describe('properties (fast-check)', () => {
  const combos: [number, number][] = [
    [24, 4],
    [36, 4],
    [36, 6],
    [48, 4],
    [48, 8],
    [54, 6],
    [72, 4],
    [72, 8],
    [30, 4],
    [42, 4],
    [60, 8],
  ];
  it('every coil appears exactly once; every circuit has equal turns and identical phasors', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...combos),
        fc.integer({ min: 0, max: 100 }),
        fc.integer({ min: 1, max: 60 }),
        fc.constantFrom('star' as const, 'delta' as const),
        fc.integer({ min: 0, max: 3 }),
        (sp, spanPick, turns, conn, pathPick) => {
          const [slots, poles] = sp;
          const tau = Math.floor(slots / poles);
          const span = Math.max(1, tau - (spanPick % Math.max(1, Math.ceil(tau / 2))));
          const t = layoutOf(lap(slots, poles, span, { turnsPerCoil: [turns] }));
          const allowed = allowedParallelPaths(t).allowed.filter((a) => a <= 4);
          const a = allowed[pathPick % allowed.length] ?? 1;
          const plan = value(connectionPlan(t, a, conn));
          expectSound(t, plan, a);
          expect(plan.groups.groups.reduce((n, g) => n + g.coils.length, 0)).toBe(t.sides.length / 2);
        },
      ),
      { numRuns: 80 },
    );
  });
});
