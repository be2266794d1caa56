import { testDataSchema, type TestDataInput, type TestDataValues } from '@/lib/final-tests/test-record-schema';

/**
 * A complete, passing record for a 460 V, class F, random-wound motor. Values chosen so each check sits
 * clearly inside its limit (the engine's own tests cover the edges of the rules).
 */
export const PASSING: TestDataInput = {
  basis: { ratedVoltageV: 460, ratedOutputKw: 3.7, insulationClass: 'F', windingKind: 'random', irCategory: 'random-wound' },
  ir: { testVoltageV: 500, temperatureC: 20, ir1MinMOhm: 1000, ir10MinMOhm: 3000, instrumentSerial: 'MEG-1001' },
  hipot: { case: 'new', practice: 'nema', kind: 'dc', appliedV: 3264, durationS: 60, leakageMa: 0.004, result: 'pass', instrumentSerial: 'HP-77' },
  surge: { testVoltageV: 2000, phases: [{ result: 'pass' }, { result: 'pass' }, { result: 'pass', notes: 'clean overlay' }], instrumentSerial: 'SG-5' },
  resistance: { between: 'line-to-line', readings: [2.858, 2.861, 2.855], temperatureC: 20, referenceTemperatureC: 25, instrumentSerial: 'LR-2' },
  run: { voltageV: 460, currentsA: [2.9, 3.0, 2.95], speedRpm: 1797, vibrationMmS: 1.2, vibrationLimitMmS: 3.8, bearingDeC: 38, bearingOdeC: 35, result: 'pass', instrumentSerial: 'VB-9' },
};

export function record(patch: (d: TestDataInput) => void = () => {}): TestDataValues {
  const d = structuredClone(PASSING);
  patch(d);
  return testDataSchema.parse(d);
}
