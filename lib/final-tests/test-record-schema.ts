/**
 * Final electrical tests of a repaired motor: one schema for the form (react-hook-form through zodResolver:
 * `useForm<TestRecordFormInput, unknown, TestRecordForm>`), the server action, and the JSON stored in
 * TestRecord.data. Every reading is optional on its own (a winder may save the IR test before the run
 * test), but a reading that is given brings the ones it needs with it (a megohm reading needs its
 * temperature). Units are metric with the unit in the name; the screens show imperial beside them.
 */
import { z } from 'zod';
import { optionalNumber, optionalText, requiredNumber } from '../validation/fields';

import { INSULATION_CLASSES } from '@/lib/jobs/motor-schema';
export { INSULATION_CLASSES };
/** Random-wound (round wire) or form-wound (pre-formed coils). */
export const WINDING_KINDS = ['random', 'form'] as const;
/** Which IEEE 43 minimum applies (see lib/engine/insulation-resistance.ts IrMinimumCategory). */
export const IR_CATEGORIES = ['random-wound', 'form-wound', 'older'] as const;
export const HIPOT_CASES = ['new', 'repeat', 'reconditioned'] as const;
export const HIPOT_PRACTICES = ['nema', 'iec'] as const;
export const HIPOT_KINDS = ['ac', 'dc'] as const;
export const RESULTS = ['pass', 'fail'] as const;
export const RESISTANCE_BETWEEN = ['line-to-line', 'phase'] as const;
/** Phase names on the sheet; line-to-line readings are the pairs A–B, B–C, C–A. */
export const PHASE_NAMES = ['A', 'B', 'C'] as const;
export const LEAD_PAIRS = ['A–B', 'B–C', 'C–A'] as const;

const blank = (v: unknown): unknown => (v === '' || v === null ? undefined : v);
const optionalEnum = <T extends readonly [string, ...string[]]>(values: T, message: string) =>
  z.preprocess(blank, z.enum(values, { error: message }).optional());
const serial = optionalText(60);

/** Temperatures a winding is tested at, °C. */
const temperature = (label: string) => optionalNumber({ label, min: -40, max: 250, unit: '°C' });

/** Where the rating judged against came from: the nameplate as received, or an approved redesign. */
export const RATING_SOURCES = ['nameplate', 'redesign', 'entered'] as const;

/**
 * What the verdicts are judged against: the rating the motor leaves with (the approved redesign's when there
 * is one, else the nameplate), the insulation class and winding kind. The rating fields come from the
 * records; the server sets `ratingSource` and `redesignRevision` itself on save.
 */
export const testBasisSchema = z.object({
  ratedVoltageV: requiredNumber({ label: 'Rated voltage', positive: true, max: 15_000, unit: 'V' }),
  ratedOutputKw: optionalNumber({ label: 'Rated output', positive: true, max: 100_000, unit: 'kW' }),
  frequencyHz: optionalNumber({ label: 'Rated frequency', positive: true, max: 400, unit: 'Hz' }),
  poles: optionalNumber({ label: 'Poles', int: true, min: 2, max: 128 }),
  ratedCurrentA: optionalNumber({ label: 'Rated current', positive: true, max: 20_000, unit: 'A' }),
  ratedSpeedRpm: optionalNumber({ label: 'Rated speed', positive: true, max: 24_000, unit: 'rpm' }),
  connection: optionalText(40),
  ratingSource: optionalEnum(RATING_SOURCES, 'The rating comes from the nameplate or an approved redesign.'),
  redesignRevision: optionalNumber({ label: 'Redesign revision', int: true, positive: true, max: 100_000 }),
  insulationClass: z.preprocess(blank, z.enum(INSULATION_CLASSES, { error: 'Pick the insulation class (A, B, F or H).' })),
  windingKind: z.enum(WINDING_KINDS, { error: 'Pick random-wound or form-wound.' }),
  irCategory: z.enum(IR_CATEGORIES, { error: 'Pick which IEEE 43 minimum applies.' }),
});

/** Insulation resistance to ground at 1 and 10 minutes (IEEE 43). */
export const irSectionSchema = z.object({
  testVoltageV: optionalNumber({ label: 'Test voltage', positive: true, max: 15_000, unit: 'V DC' }),
  temperatureC: temperature('Winding temperature'),
  ir1MinMOhm: optionalNumber({ label: 'IR at 1 minute', min: 0, max: 1e7, unit: 'MΩ' }),
  ir10MinMOhm: optionalNumber({ label: 'IR at 10 minutes', min: 0, max: 1e7, unit: 'MΩ' }),
  instrumentSerial: serial,
});

/** High-potential test, winding to frame. */
export const hipotSectionSchema = z.object({
  case: z.enum(HIPOT_CASES, { error: 'Pick the case: new winding, repeat test or reconditioned.' }),
  practice: z.enum(HIPOT_PRACTICES, { error: 'Pick NEMA or IEC practice.' }),
  kind: z.enum(HIPOT_KINDS, { error: 'Pick AC or DC.' }),
  appliedV: optionalNumber({ label: 'Applied voltage', positive: true, max: 100_000, unit: 'V' }),
  durationS: optionalNumber({ label: 'Duration', positive: true, max: 3600, unit: 's' }),
  leakageMa: optionalNumber({ label: 'Leakage current', min: 0, max: 1000, unit: 'mA' }),
  result: optionalEnum(RESULTS, 'Result is pass or fail.'),
  /** Why the level or time was deliberately below the rule (customer's instruction, repeat test...). */
  reducedReason: optionalText(300),
  instrumentSerial: serial,
});

const surgePhaseSchema = z.object({
  result: optionalEnum(RESULTS, 'Result is pass or fail.'),
  notes: optionalText(300),
});

/** Surge comparison, one result per phase. */
export const surgeSectionSchema = z.object({
  testVoltageV: optionalNumber({ label: 'Surge test voltage', positive: true, max: 100_000, unit: 'V' }),
  phases: z.tuple([surgePhaseSchema, surgePhaseSchema, surgePhaseSchema]),
  instrumentSerial: serial,
});

const ohms = (i: number) => optionalNumber({ label: `Reading ${i}`, positive: true, max: 1e6, unit: 'Ω' });

/** Winding DC resistance, corrected to a reference temperature. */
export const resistanceSectionSchema = z.object({
  between: z.enum(RESISTANCE_BETWEEN, { error: 'Readings are line-to-line or per phase.' }),
  readings: z.tuple([ohms(1), ohms(2), ohms(3)]),
  temperatureC: temperature('Winding temperature'),
  referenceTemperatureC: requiredNumber({ label: 'Reference temperature', min: -40, max: 250, unit: '°C' }),
  instrumentSerial: serial,
});

const amps = (phase: string) => optionalNumber({ label: `Current, phase ${phase}`, min: 0, max: 100_000, unit: 'A' });

/** Run test (usually uncoupled, no load). */
export const runSectionSchema = z.object({
  voltageV: optionalNumber({ label: 'Supply voltage', positive: true, max: 15_000, unit: 'V' }),
  currentsA: z.tuple([amps('A'), amps('B'), amps('C')]),
  speedRpm: optionalNumber({ label: 'Speed', positive: true, max: 100_000, unit: 'rpm' }),
  vibrationMmS: optionalNumber({ label: 'Vibration', min: 0, max: 1000, unit: 'mm/s' }),
  vibrationLimitMmS: optionalNumber({ label: 'Vibration limit', positive: true, max: 1000, unit: 'mm/s' }),
  bearingDeC: temperature('Drive-end bearing temperature'),
  bearingOdeC: temperature('Opposite-end bearing temperature'),
  result: optionalEnum(RESULTS, 'Result is pass or fail.'),
  notes: optionalText(1000),
  instrumentSerial: serial,
});

/** Cross-field rules: a reading brings with it what it needs to be judged. All problems are reported at once. */
function completeness(d: TestData, ctx: z.RefinementCtx): void {
  const need = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message });
  const { ir, hipot, resistance, run } = d;
  if (ir.ir1MinMOhm !== undefined || ir.ir10MinMOhm !== undefined) {
    if (ir.temperatureC === undefined) need(['ir', 'temperatureC'], 'Give the winding temperature: IR is corrected to 40 °C.');
    if (ir.testVoltageV === undefined) need(['ir', 'testVoltageV'], 'Give the megohmmeter test voltage.');
  }
  if (ir.ir10MinMOhm !== undefined && ir.ir1MinMOhm === undefined)
    need(['ir', 'ir1MinMOhm'], 'Give the 1-minute reading too: PI = IR 10 min / IR 1 min.');
  if (ir.ir1MinMOhm === 0 && ir.ir10MinMOhm !== undefined)
    need(['ir', 'ir1MinMOhm'], 'A 1-minute reading of 0 MΩ cannot give a PI: the winding is grounded.');
  if (hipot.result !== undefined && hipot.appliedV === undefined) need(['hipot', 'appliedV'], 'Give the voltage applied.');
  if (hipot.appliedV !== undefined && hipot.result === undefined) need(['hipot', 'result'], 'Say whether the winding held the voltage.');
  const given = resistance.readings.filter((r) => r !== undefined).length;
  if (given > 0) {
    resistance.readings.forEach((r, i) => {
      if (r === undefined) need(['resistance', 'readings', i], 'Give all three readings.');
    });
    if (resistance.temperatureC === undefined)
      need(['resistance', 'temperatureC'], 'Give the winding temperature the readings were taken at.');
  }
  if (hipot.appliedV !== undefined && hipot.durationS === undefined) need(['hipot', 'durationS'], 'Give how long the voltage was held.');
  // An induction motor cannot run above synchronous speed on its own supply: a higher reading is a
  // misread (or a driven/inverter run, which the notes must say).
  const sync = synchronousRpm(d.basis.frequencyHz, d.basis.poles);
  if (run.speedRpm !== undefined && sync !== undefined && run.speedRpm > sync && !run.notes) {
    need(
      ['run', 'speedRpm'],
      `Speed ${run.speedRpm} rpm is above the synchronous ${sync} rpm of a ${d.basis.poles}-pole motor at ${d.basis.frequencyHz} Hz: an induction motor cannot run faster on its own supply. Check the reading, or say why in the run notes.`,
    );
  }
  const measured = [run.voltageV, run.speedRpm, run.vibrationMmS, ...run.currentsA].some((v) => v !== undefined);
  if (measured && run.result === undefined) need(['run', 'result'], 'Say whether the motor passed the run test.');
}

/** Synchronous speed 120·f/p, rpm (rounded to 0.1 rpm), or undefined without frequency and poles. */
export function synchronousRpm(frequencyHz: number | undefined, poles: number | undefined): number | undefined {
  return frequencyHz !== undefined && poles !== undefined ? Math.round((1200 * frequencyHz) / poles) / 10 : undefined;
}

const testDataShape = z.object({
  basis: testBasisSchema,
  ir: irSectionSchema,
  hipot: hipotSectionSchema,
  surge: surgeSectionSchema,
  resistance: resistanceSectionSchema,
  run: runSectionSchema,
  notes: optionalText(2000),
});
type TestData = z.output<typeof testDataShape>;

/** The sections stored in TestRecord.data. */
export const testDataSchema = testDataShape.superRefine(completeness);
export type TestDataInput = z.input<typeof testDataSchema>;
export type TestDataValues = z.output<typeof testDataSchema>;

/** A date and time from <input type="datetime-local"> (the shop's wall-clock time in its time zone; read as an instant on save). */
export const testedAtSchema = z
  .string({ error: 'Give the date and time of the tests.' })
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2})?$/, 'Give the date and time as YYYY-MM-DD HH:MM.')
  .refine((s) => {
    // Date.parse rolls 30 February over into March: compare the parsed date with what was typed.
    const t = Date.parse(`${s}Z`);
    return !Number.isNaN(t) && new Date(t).toISOString().slice(0, 16) === s.slice(0, 16);
  }, 'That date does not exist.');

/**
 * The form and the save action: the record's sections plus who tested and when, and what the form was
 * loaded from. `recordId` + `version` edit the current record (refused when stale); without them a new
 * record (a retest) is added after `previousSequence`, refused if someone added one meanwhile.
 */
export const testRecordFormSchema = z.object({
  jobId: z.uuid('The job is not valid.'),
  recordId: z.preprocess(blank, z.uuid().optional()),
  version: z.preprocess(blank, z.number().int().positive().optional()),
  previousSequence: z.number().int().min(0),
  testedAt: testedAtSchema,
  testedById: z.uuid('Pick who tested from the list.'),
  data: testDataSchema,
});
export type TestRecordFormInput = z.input<typeof testRecordFormSchema>;
export type TestRecordForm = z.output<typeof testRecordFormSchema>;

/** Every instrument serial named in a record, trimmed and without repeats (copied to a column for tracing). */
export function instrumentSerials(d: TestDataValues): string[] {
  const all = [
    d.ir.instrumentSerial,
    d.hipot.instrumentSerial,
    d.surge.instrumentSerial,
    d.resistance.instrumentSerial,
    d.run.instrumentSerial,
  ];
  return [...new Set(all.filter((s): s is string => !!s))];
}
