import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { copperMassKg } from '@/lib/engine/copper';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { windingCopper } from '@/lib/engine/winding-copper';
import { kgToBuyMilli, rewindMaterialLines } from '@/lib/quotes/rewind-material';
import { DEFAULT_COMMERCIAL_SETTINGS } from '@/lib/settings/commercial-defaults';
import { timesBasisPoints, timesMilli } from '@/lib/quotes/money';
import { EXAMPLE_A_SHEET } from '../../support/fixtures/winding-fixtures';

const value = <T>(r: { ok: true; value: T } | { ok: false; error: { message: string } }): T => {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

describe('copper in the winding', () => {
  it('copper mass of 564.48 m of 0.85 mm wire is 2.8476 kg (IEC 60028 density 8890 kg/m³) [derived]', () => {
    expect(copperMassKg(564.48, (Math.PI / 4) * 0.85 ** 2)).toBeCloseTo(2.8476, 4);
  });

  it('example A from its data sheet: 282.24 m of conductor, 2 × 0.85 mm in hand → 2.8476 kg [derived]', () => {
    const a = value(analyseSheet(EXAMPLE_A_SHEET));
    const c = value(
      windingCopper({
        seriesTurnsPerPhase: a.winding.seriesTurnsPerPhase,
        parallelPaths: 1,
        meanTurnLengthMm: 560,
        wires: a.wires.map((w) => ({ label: w.size, areaMm2: w.areaMm2, count: w.count })),
      }),
    );
    expect(a.winding.seriesTurnsPerPhase).toBe(168);
    expect(c.conductorLengthM).toBeCloseTo(282.24, 6);
    expect(c.lines[0]?.lengthM).toBeCloseTo(564.48, 6);
    expect(c.copperKg).toBeCloseTo(2.8476, 4);
  });

  it('every size’s copper is the engine’s copper mass of its length, and parallel paths carry the same copper per turn', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2000 }),
        fc.integer({ min: 1, max: 8 }),
        fc.double({ min: 50, max: 3000, noNaN: true }),
        fc.array(fc.record({ areaMm2: fc.double({ min: 0.01, max: 10, noNaN: true }), count: fc.integer({ min: 1, max: 10 }) }), {
          minLength: 1,
          maxLength: 3,
        }),
        (nph, a, mlt, wires) => {
          const c = value(
            windingCopper({
              seriesTurnsPerPhase: nph,
              parallelPaths: a,
              meanTurnLengthMm: mlt,
              wires: wires.map((w) => ({ ...w, label: 'w' })),
            }),
          );
          c.lines.forEach((l, i) =>
            expect(l.copperKg).toBeCloseTo(copperMassKg((wires[i]!.count * 3 * nph * a * mlt) / 1000, wires[i]!.areaMm2), 9),
          );
        },
      ),
    );
  });

  it('refuses a winding without a mean turn length instead of returning zero copper', () => {
    const r = windingCopper({
      seriesTurnsPerPhase: 168,
      parallelPaths: 1,
      meanTurnLengthMm: 0,
      wires: [{ label: 'x', areaMm2: 1, count: 1 }],
    });
    expect(r.ok).toBe(false);
  });
});

describe('rewind material lines', () => {
  const s = DEFAULT_COMMERCIAL_SETTINGS; // USD 14.50/kg, 10 % copper allowance, 15 % insulation, 8 % varnish
  const copper = value(
    windingCopper({
      seriesTurnsPerPhase: 168,
      parallelPaths: 1,
      meanTurnLengthMm: 560,
      wires: [{ label: '0.850 mm', areaMm2: (Math.PI / 4) * 0.85 ** 2, count: 2 }],
    }),
  );

  it('buys the copper plus the allowance, rounded up to the gram: 2.8476 kg × 1.1 = 3.133 kg', () => {
    expect(kgToBuyMilli(2.8476, 1000)).toBe(3133);
    expect(kgToBuyMilli(1, 0)).toBe(1000);
  });

  it('prices wire per kg, then insulation and varnish as shares of the copper cost', () => {
    const lines = rewindMaterialLines(copper, 'as-found sheet, revision 1', s);
    expect(lines.map((l) => [l.unit, l.quantityMilli])).toEqual([
      ['kg', 3133],
      ['lot', 1000],
      ['lot', 1000],
    ]);
    const copperCost = timesMilli(s.copperPricePerKgMinor, 3133, 'USD'); // 14.50 × 3.133 = 45.4285 → 45.43
    expect(copperCost).toBe(4543);
    expect(lines[1]?.unitPriceMinor).toBe(timesBasisPoints(4543, 1500, 'USD')); // 6.81
    expect(lines[2]?.unitPriceMinor).toBe(timesBasisPoints(4543, 800, 'USD')); // 3.63
    expect(lines.every((l) => l.kind === 'REWIND' && l.reference === 'as-found sheet, revision 1')).toBe(true);
    expect(lines[0]?.description).toContain('2.848 kg');
  });

  it('leaves out an allowance the shop set to zero', () => {
    expect(rewindMaterialLines(copper, 'x', { ...s, insulationAllowanceBp: 0, varnishAllowanceBp: 0 })).toHaveLength(1);
  });
});
