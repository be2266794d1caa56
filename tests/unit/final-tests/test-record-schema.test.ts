import { describe, expect, it } from 'vitest';
import { instrumentSerials, testDataSchema, testRecordFormSchema } from '@/lib/final-tests/test-record-schema';
import { basisDefaults, newRecordDefaults, recordToFormData } from '@/lib/final-tests/defaults';
import { liveJudgement } from '@/lib/final-tests/live-judgement';
import { asRepairedRating } from '@/lib/final-tests/test-rating';
import { PASSING, record } from '../../support/fixtures/final-test-fixtures';

const plate = (ratedVoltageV: number, insulationClass: string | null, outputKw: number | null, frequencyHz: number) => ({
  rating: asRepairedRating({ ratedVoltageV, frequencyHz, outputKw, speedRpm: null, currentA: null, connection: null }, null),
  insulationClass,
});

const paths = (r: ReturnType<typeof testDataSchema.safeParse>) => (r.success ? [] : r.error.issues.map((i) => i.path.join('.')));

describe('test record schema', () => {
  it('accepts an empty set of readings (tests are recorded as they are done)', () => {
    const empty = newRecordDefaults(plate(460, 'F', 3.7, 60), null, null);
    const r = testDataSchema.safeParse(empty);
    expect(r.success).toBe(true);
  });

  it.each([
    [
      'an IR reading without its temperature and test voltage',
      (d: typeof PASSING) => {
        d.ir.temperatureC = '';
        d.ir.testVoltageV = '';
      },
      ['ir.temperatureC', 'ir.testVoltageV'],
    ],
    [
      'a 10-minute reading without the 1-minute one',
      (d: typeof PASSING) => {
        d.ir.ir1MinMOhm = '';
      },
      ['ir.ir1MinMOhm'],
    ],
    [
      'a hipot result without the voltage applied',
      (d: typeof PASSING) => {
        d.hipot.appliedV = '';
      },
      ['hipot.appliedV'],
    ],
    [
      'two resistance readings of three',
      (d: typeof PASSING) => {
        d.resistance.readings = [1, '', 1];
      },
      ['resistance.readings.1'],
    ],
    [
      'run measurements without a result',
      (d: typeof PASSING) => {
        d.run.result = '';
      },
      ['run.result'],
    ],
    [
      'a negative megohm reading',
      (d: typeof PASSING) => {
        d.ir.ir1MinMOhm = -3;
      },
      ['ir.ir1MinMOhm'],
    ],
    [
      'text in a number field',
      (d: typeof PASSING) => {
        d.run.speedRpm = 'fast';
      },
      ['run.speedRpm'],
    ],
  ])('refuses %s, naming the field', (_n, patch, expected) => {
    const d = structuredClone(PASSING);
    patch(d);
    expect(paths(testDataSchema.safeParse(d))).toEqual(expect.arrayContaining(expected));
  });

  it('accepts a decimal comma as typed on many shop keyboards', () => {
    const d = structuredClone(PASSING);
    d.run.vibrationMmS = '1,8';
    expect(testDataSchema.parse(d).run.vibrationMmS).toBe(1.8);
  });

  it('takes a datetime-local time and refuses an impossible one', () => {
    const base = { jobId: crypto.randomUUID(), previousSequence: 0, testedById: crypto.randomUUID(), data: PASSING };
    expect(testRecordFormSchema.safeParse({ ...base, testedAt: '2026-12-01T14:30' }).success).toBe(true);
    expect(testRecordFormSchema.safeParse({ ...base, testedAt: '2026-02-30T14:30' }).success).toBe(false);
  });

  it('lists each instrument serial once', () => {
    expect(
      instrumentSerials(
        record((d) => {
          d.run.instrumentSerial = 'MEG-1001';
        }),
      ),
    ).toEqual(['MEG-1001', 'HP-77', 'SG-5', 'LR-2']);
  });

  it('round-trips a saved record through the form values', () => {
    const saved = record((d) => {
      d.ir.ir10MinMOhm = '';
      d.notes = 'retest after re-varnish';
    });
    expect(testDataSchema.parse(recordToFormData(saved))).toEqual(saved);
  });
});

describe('defaults from the nameplate and the as-found sheet', () => {
  it('takes voltage and class from the nameplate, random-wound below 1000 V, NEMA at 60 Hz', () => {
    const { basis, practice } = basisDefaults(plate(460, 'f', 3.7, 60), null);
    expect(basis).toMatchObject({ ratedVoltageV: 460, insulationClass: 'F', windingKind: 'random', irCategory: 'random-wound' });
    expect(practice).toBe('nema');
  });

  it('uses form-wound and the 100 MΩ category at 4160 V, IEC at 50 Hz', () => {
    const { basis, practice } = basisDefaults(plate(4160, null, null, 50), null);
    expect(basis).toMatchObject({ windingKind: 'form', irCategory: 'form-wound', insulationClass: '' });
    expect(practice).toBe('iec');
  });

  it('starts a retest from the previous basis with the 80 % repeat hipot', () => {
    const prev = record((d) => {
      d.basis.insulationClass = 'H';
    });
    const next = newRecordDefaults(plate(460, 'F', 3.7, 60), null, prev);
    expect(next.basis.insulationClass).toBe('H');
    expect(next.hipot.case).toBe('repeat');
    expect(next.ir.instrumentSerial).toBe('MEG-1001');
  });
});

describe('live verdicts while typing', () => {
  it('judges the sections that can be read and ignores a half-typed field', () => {
    const d = structuredClone(PASSING);
    d.run.vibrationMmS = '1.';
    d.resistance.readings = [2.858, 'x', 2.855];
    const j = liveJudgement(d)!;
    expect(j.sections.find((s) => s.key === 'ir')?.status).toBe('pass');
    expect(j.sections.find((s) => s.key === 'resistance')?.status).toBe('incomplete');
    expect(j.overall).toBe('INCOMPLETE');
  });

  it('waits for the basis before judging', () => {
    const d = structuredClone(PASSING);
    d.basis.ratedVoltageV = '';
    expect(liveJudgement(d)).toBeNull();
  });
});

describe('impossible readings are refused with a field error (issue 9)', () => {
  const rated = (d: typeof PASSING) => {
    d.basis.frequencyHz = 60;
    d.basis.poles = 4;
  };
  it('refuses a speed above synchronous without a note (120·60/4 = 1800 rpm)', () => {
    const d = structuredClone(PASSING);
    rated(d);
    d.run.speedRpm = 1850;
    const r = testDataSchema.safeParse(d);
    expect(paths(r)).toContain('run.speedRpm');
    expect(r.success ? '' : r.error.issues.map((i) => i.message).join(' ')).toContain('above the synchronous 1800 rpm');
    d.run.notes = 'Run on the test-bay inverter at 62 Hz.';
    expect(testDataSchema.safeParse(d).success).toBe(true);
  });
  it.each([
    [
      'a winding temperature below −40 °C',
      (d: typeof PASSING) => {
        d.ir.temperatureC = -80;
      },
      'ir.temperatureC',
    ],
    [
      'a bearing temperature above 250 °C',
      (d: typeof PASSING) => {
        d.run.bearingDeC = 400;
      },
      'run.bearingDeC',
    ],
    [
      'a negative phase current',
      (d: typeof PASSING) => {
        d.run.currentsA = [-1, 3, 3];
      },
      'run.currentsA.0',
    ],
    [
      'a hipot voltage without its duration',
      (d: typeof PASSING) => {
        d.hipot.durationS = '';
      },
      'hipot.durationS',
    ],
  ])('refuses %s', (_n, patch, path) => {
    const d = structuredClone(PASSING);
    patch(d);
    expect(paths(testDataSchema.safeParse(d))).toContain(path);
  });
});

describe('defaults follow the as-repaired rating', () => {
  it('takes 460 V 60 Hz from an approved redesign of a 400 V 50 Hz motor, and says so', () => {
    const rating = asRepairedRating(
      { ratedVoltageV: 400, frequencyHz: 50, speedRpm: 1460, currentA: 21, outputKw: 11, connection: 'delta' },
      {
        revision: 1,
        nameplate: { lineVoltageV: 460, connection: 'star', frequencyHz: 60, poles: 4, speedRpm: 1752, currentA: 18.4, outputKw: 11 },
      },
    );
    const { basis, practice, sources } = basisDefaults({ rating, insulationClass: 'F' }, null);
    expect(basis).toMatchObject({
      ratedVoltageV: 460,
      frequencyHz: 60,
      poles: 4,
      ratedCurrentA: 18.4,
      ratingSource: 'redesign',
      redesignRevision: 1,
    });
    expect(practice).toBe('nema');
    expect(sources.rating).toBe('from the approved redesign, revision 1');
  });
});
