import { describe, expect, it } from 'vitest';
import {
  buildStandardLayout,
  checkSlotTable,
  slotRow,
  usualSingleLayerSpans,
  windingLayout,
  type CoilSide,
  type SlotTable,
  type WindingSpec,
} from '@/lib/engine/winding-layout';
import { errorOf, lap, layoutOf, singleLayer, value } from '../../support/fixtures/winding-fixtures';

describe('the standard layout builder rejects what cannot be wound', () => {
  it.each([
    { name: 'span equal to the slot count', spec: lap(36, 4, 36), code: 'span-too-large', field: 'winding.spans.0' },
    { name: 'span above the slot count', spec: lap(36, 4, 40), code: 'span-too-large', field: 'winding.spans.0' },
    { name: 'span of zero', spec: lap(36, 4, 0), code: 'invalid-input', field: 'winding.spans.0' },
    { name: 'negative span', spec: lap(36, 4, -3), code: 'invalid-input', field: 'winding.spans.0' },
    { name: 'fractional span', spec: lap(36, 4, 7.5), code: 'invalid-input', field: 'winding.spans.0' },
    { name: '35 slots at 4 poles', spec: lap(35, 4, 7), code: 'unbalanced-layout', field: 'core.slots' },
    { name: '32 slots at 4 poles', spec: lap(32, 4, 7), code: 'unbalanced-layout', field: 'core.slots' },
    { name: 'zero slots', spec: lap(0, 4, 7), code: 'invalid-input', field: 'core.slots' },
    { name: 'negative slots', spec: lap(-36, 4, 7), code: 'invalid-input', field: 'core.slots' },
    { name: 'odd poles', spec: lap(36, 5, 7), code: 'invalid-input', field: 'supply.poles' },
    { name: 'zero poles', spec: lap(36, 0, 7), code: 'invalid-input', field: 'supply.poles' },
    { name: 'zero turns', spec: lap(36, 4, 7, { turnsPerCoil: [0] }), code: 'invalid-input', field: 'winding.turnsPerCoil.0' },
    {
      name: 'turns list shorter than spans',
      spec: lap(36, 4, 7, { style: 'concentric', spans: [11, 9, 7], turnsPerCoil: [10] }),
      code: 'invalid-input',
      field: 'winding.turnsPerCoil',
    },
    {
      name: 'lap with two spans',
      spec: lap(36, 4, 7, { spans: [7, 8], turnsPerCoil: [1, 1] }),
      code: 'invalid-input',
      field: 'winding.spans',
    },
    { name: 'single layer with fractional q', spec: singleLayer(30, 4, [7]), code: 'not-applicable', field: 'winding.layers' },
    {
      name: 'whole-coiled single layer with odd q',
      spec: singleLayer(36, 4, [8], 'whole'),
      code: 'not-applicable',
      field: 'winding.singleLayerCoiling',
    },
    {
      name: 'concentric spans that miss the return belt',
      spec: singleLayer(48, 4, [13, 11, 9, 7]),
      code: 'invalid-input',
      field: 'winding.spans',
    },
    { name: 'concentric group of the wrong size', spec: singleLayer(36, 4, [11, 9]), code: 'invalid-input', field: 'winding.spans' },
    {
      name: 'double-layer concentric on a fractional winding',
      spec: lap(30, 4, 7, { style: 'concentric', spans: [9, 7, 5], turnsPerCoil: [1, 1, 1] }),
      code: 'not-applicable',
      field: 'winding.spans',
    },
  ])('$name → $code at $field', ({ spec, code, field }) => {
    const e = errorOf(buildStandardLayout(spec));
    expect(e.code).toBe(code);
    expect(e.field).toBe(field);
    expect(e.message.length).toBeGreaterThan(10);
    expect(e.hint.length).toBeGreaterThan(5);
  });

  it('suggests the usual nested spans when a single-layer group misses its belt', () => {
    expect(errorOf(buildStandardLayout(singleLayer(48, 4, [13, 11, 9, 7]))).hint).toContain('15, 13, 11, 9');
  });
});

/** Every slot layer holds exactly one coil side, and each phase has a third of the coils. */
function expectFullAndEven(t: SlotTable): void {
  const seen = new Set(t.sides.map((s) => `${s.slot}/${s.layer}`));
  expect(seen.size).toBe(t.sides.length);
  expect(t.sides.length).toBe(t.slots * t.layers);
  for (const ph of ['A', 'B', 'C'] as const) expect(t.sides.filter((s) => s.phase === ph).length).toBe(t.sides.length / 3);
  const coils = new Map<number, CoilSide[]>();
  for (const s of t.sides) coils.set(s.coil ?? -1, [...(coils.get(s.coil ?? -1) ?? []), s]);
  for (const pair of coils.values()) {
    expect(pair).toHaveLength(2);
    expect(pair[0]?.phase).toBe(pair[1]?.phase);
    expect((pair[0]?.polarity ?? 0) + (pair[1]?.polarity ?? 0)).toBe(0);
  }
}

describe('standard layouts fill every slot layer once and share coils evenly between phases', () => {
  it.each([
    ['36/4 lap 1–8', lap(36, 4, 7)],
    ['30/4 lap (q = 5/2)', lap(30, 4, 7)],
    ['27/4 lap (q = 9/4)', lap(27, 4, 6)],
    ['42/4 lap (q = 7/2)', lap(42, 4, 9)],
    ['36/4 double-layer concentric 9, 7, 5', lap(36, 4, 7, { style: 'concentric', spans: [9, 7, 5], turnsPerCoil: [10, 10, 10] })],
    ['36/4 single-layer concentric', singleLayer(36, 4, [11, 9, 7])],
    ['48/4 single-layer whole-coiled', singleLayer(48, 4, [11, 9], 'whole')],
    ['24/4 single-layer whole-coiled lap 1–6', singleLayer(24, 4, [5], 'whole')],
  ] as [string, WindingSpec][])('%s', (_name, spec) => expectFullAndEven(layoutOf(spec)));

  it('lays out 36/4 in the 60° belt order A, c, B, a, C, b of three slots each', () => {
    const top = slotRow(layoutOf(lap(36, 4, 7)), 1).join('');
    expect(top).toBe('AAAcccBBBaaaCCCbbb'.repeat(2));
    // The bottom layer is the top layer moved on by the span.
    const bottom = slotRow(layoutOf(lap(36, 4, 7)), 2).join('');
    expect(bottom).toBe(
      [...top]
        .map((_, i) => top[(i - 7 + 36) % 36])
        .map((c) => (c === c?.toUpperCase() ? c?.toLowerCase() : c?.toUpperCase()))
        .join(''),
    );
  });

  it('alternates belts of 3 and 2 slots for 30/4 (q = 5/2)', () => {
    expect(slotRow(layoutOf(lap(30, 4, 7)), 1).join('')).toBe('AAAccBBBaaCCCbb'.repeat(2));
  });

  it('gives the usual nested single-layer spans: 36/4 half-coiled 11, 9, 7; 48/4 whole-coiled 11, 9', () => {
    expect(usualSingleLayerSpans(3, false)).toEqual([11, 9, 7]);
    expect(usualSingleLayerSpans(4, true)).toEqual([11, 9]);
  });

  it('accepts concentric spans in any order (nests them outside first)', () => {
    expect(layoutOf(singleLayer(36, 4, [7, 11, 9])).sides).toEqual(layoutOf(singleLayer(36, 4, [11, 9, 7])).sides);
  });
});

describe('slot tables drawn by the winder', () => {
  const standard = layoutOf(lap(36, 4, 7));
  const table = (sides: CoilSide[]): SlotTable => ({ ...standard, source: 'explicit', sides });

  it('takes a correct table as it is', () => {
    const t = value(windingLayout({ ...lap(36, 4, 7), slotTable: standard.sides }));
    expect(t.source).toBe('explicit');
    expect(t.sides).toEqual(standard.sides);
  });

  it.each([
    {
      name: 'slot beyond the core',
      change: (s: CoilSide[]) => s.map((x, i) => (i === 3 ? { ...x, slot: 37 } : x)),
      field: 'winding.slotTable.3.slot',
    },
    {
      name: 'two sides in one slot layer',
      change: (s: CoilSide[]) => s.map((x, i) => (i === 2 ? { ...x, slot: s[0]?.slot ?? 1, layer: s[0]?.layer ?? 1 } : x)),
      field: 'winding.slotTable.2.slot',
    },
    {
      name: 'zero turns',
      change: (s: CoilSide[]) => s.map((x, i) => (i === 5 ? { ...x, turns: 0 } : x)),
      field: 'winding.slotTable.5.turns',
    },
    { name: 'a phase missing', change: (s: CoilSide[]) => s.filter((x) => x.phase !== 'C'), field: 'winding.slotTable' },
    { name: 'a coil with one side', change: (s: CoilSide[]) => s.slice(1), field: 'winding.slotTable' },
    {
      name: 'coil numbers on some sides only',
      change: (s: CoilSide[]) =>
        s.map((x, i) => (i === 0 ? { slot: x.slot, layer: x.layer, phase: x.phase, polarity: x.polarity, turns: x.turns } : x)),
      field: 'winding.slotTable',
    },
  ])('rejects $name at $field', ({ change, field }) => {
    const e = errorOf(checkSlotTable(table(change(standard.sides))));
    expect(e.code === 'invalid-input' || e.code === 'unbalanced-layout').toBe(true);
    expect(e.field).toBe(field);
  });

  it('rejects layer 2 in a single-layer table', () => {
    expect(errorOf(checkSlotTable({ ...table(standard.sides), layers: 1 })).field).toMatch(/^winding\.slotTable\.\d+\.layer$/);
  });
});
