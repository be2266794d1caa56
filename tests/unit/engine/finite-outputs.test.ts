/**
 * The engine's promises, checked on random input: plain functions give finite numbers for finite positive
 * inputs, and EngineResult functions never throw and never hand out NaN or Infinity inside an ok result.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { currentDensity, currentDensityChecked } from '@/lib/engine/current-density';
import { enamelIncreaseMm } from '@/lib/engine/enamel-build';
import { hipotTestVoltage } from '@/lib/engine/hipot';
import {
  insulationResistanceVerdict,
  irCorrectedTo40C,
  polarizationIndex,
  polarizationIndexVerdict,
} from '@/lib/engine/insulation-resistance';
import { codeLetterForKvaPerHp, lockedRotorKvaPerHp } from '@/lib/engine/nameplate';
import {
  compareResistance,
  correctResistanceOhm,
  lineToLineFromPhaseOhm,
  phaseResistance,
  phaseResistanceOhm,
  resistanceUnbalance,
  resistanceUnbalanceVerdict,
} from '@/lib/engine/resistance';
import type { EngineResult } from '@/lib/engine/result';
import { grossSlotAreaMm2, netSlotAreaMm2, slotFill } from '@/lib/engine/slot-fill';
import { polesFromSpeed, slip, synchronousSpeedRpm, torqueNm } from '@/lib/engine/speed';
import {
  awgResistanceOhmPer1000ft,
  nearestAwgForAreaMm2,
  nearestMetricForDiameterMm,
  wireBareAreaMm2,
  wireBareDiameterMm,
  wireOverallDiameterMm,
} from '@/lib/engine/wire';

/** True when every number anywhere inside the value is finite. */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

const expectSound = (r: EngineResult<unknown>): void => {
  if (r.ok) expect(allFinite(r.value)).toBe(true);
  else expect(r.error.message.length).toBeGreaterThan(0);
};

const pos = fc.double({ min: 1e-3, max: 1e4, noNaN: true });
const count = fc.integer({ min: 1, max: 50 });
const temp = fc.double({ min: -40, max: 250, noNaN: true });
const anyNumber = fc.oneof(fc.double(), fc.constantFrom(0, -1, Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY));
const grade = fc.constantFrom(1 as const, 2 as const, 3 as const);
const standard = fc.constantFrom('awg' as const, 'metric' as const);

describe('finite outputs for finite positive inputs', () => {
  it('resistance, current density and slot fill stay finite', () => {
    fc.assert(
      fc.property(count, count, pos, count, pos, count, temp, (c, n, mlt, a, area, s, t) => {
        const r = phaseResistanceOhm({
          coilsPerPhase: c,
          turnsPerCoil: n,
          meanTurnLengthM: mlt,
          parallelPaths: a,
          strands: [{ areaMm2: area, count: s }],
          temperatureC: t,
        });
        expect(Number.isFinite(r)).toBe(true);
        expect(Number.isFinite(lineToLineFromPhaseOhm(r, 'delta'))).toBe(true);
        expect(Number.isFinite(correctResistanceOhm(r, t, 75))).toBe(true);
        expect(Number.isFinite(compareResistance(r, mlt))).toBe(true);
        expect(allFinite(currentDensity({ lineCurrentA: mlt, connection: 'delta', parallelPaths: a, conductorAreaPerTurnMm2: area }))).toBe(
          true,
        );
        expect(
          allFinite(
            slotFill({
              conductorsPerSlot: n,
              strands: [{ bareDiameterMm: area, overallDiameterMm: area * 1.1, count: s }],
              grossSlotAreaMm2: mlt,
              netSlotAreaMm2: mlt / 2,
            }),
          ),
        ).toBe(true);
        expect(allFinite(resistanceUnbalance([r, mlt, area]))).toBe(true);
      }),
    );
  });

  it('speed, torque, insulation and enamel formulas stay finite', () => {
    fc.assert(
      fc.property(pos, pos, count, temp, (x, y, poles, t) => {
        expect(Number.isFinite(synchronousSpeedRpm(x, poles))).toBe(true);
        expect(Number.isFinite(slip(x, y))).toBe(true);
        expect(Number.isFinite(torqueNm(x, y))).toBe(true);
        expect(Number.isFinite(irCorrectedTo40C(x, t))).toBe(true);
        expect(Number.isFinite(polarizationIndex(x, y))).toBe(true);
        expect(Number.isFinite(enamelIncreaseMm(x, 2))).toBe(true);
      }),
    );
  });
});

describe('EngineResult functions never throw on random input', () => {
  it('wire lookups', () => {
    fc.assert(
      fc.property(standard, fc.string(), grade, anyNumber, (std, size, g, x) => {
        const w = { standard: std, size, enamelGrade: g };
        expectSound(wireBareDiameterMm(w));
        expectSound(wireBareAreaMm2(w));
        expectSound(wireOverallDiameterMm(w));
        expectSound(nearestAwgForAreaMm2(x));
        expectSound(nearestMetricForDiameterMm(x));
        expectSound(awgResistanceOhmPer1000ft(size));
        expectSound(awgResistanceOhmPer1000ft(x));
      }),
    );
  });

  it('resistance, current density and slot geometry', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, anyNumber, anyNumber, anyNumber, fc.boolean(), (a, b, c, d, e, round) => {
        expectSound(
          phaseResistance({
            coilsPerPhase: a,
            turnsPerCoil: b,
            meanTurnLengthM: c,
            parallelPaths: d,
            strands: [{ areaMm2: e, count: a }],
            temperatureC: b,
          }),
        );
        expectSound(currentDensityChecked({ lineCurrentA: a, connection: 'star', parallelPaths: b, conductorAreaPerTurnMm2: c }));
        expectSound(grossSlotAreaMm2({ depthMm: a, topWidthMm: b, bottomWidthMm: c, roundBottom: round }));
        expectSound(
          netSlotAreaMm2({ depthMm: a, topWidthMm: b, bottomWidthMm: c, roundBottom: round }, { linerThicknessMm: d, wedgeDepthMm: e }),
        );
        expectSound(resistanceUnbalanceVerdict([a, b, c], 'random'));
      }),
    );
  });

  it('speed, nameplate and test rules', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, anyNumber, (a, b, c) => {
        expectSound(polesFromSpeed(a, b));
        expectSound(codeLetterForKvaPerHp(a));
        expectSound(lockedRotorKvaPerHp(a, b, c));
        expectSound(insulationResistanceVerdict({ ir1MinMOhm: a, temperatureC: b, category: 'older', ratedLineVoltageV: c }));
        expectSound(polarizationIndexVerdict({ ir1MinMOhm: a, ir10MinMOhm: b, temperatureC: c, insulationClass: 'B' }));
        expectSound(hipotTestVoltage({ ratedVoltageV: a, case: 'repeat', practice: 'iec', ratedOutputHp: b }));
      }),
    );
  });
});
