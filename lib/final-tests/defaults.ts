/**
 * What a new test record starts with: the basis of the verdicts (rated voltage, insulation class, random
 * or form wound) from the motor's nameplate and the as-found winding sheet, and for a retest the previous
 * record's basis and instruments. The winder can change every default; the hints say where each came from.
 */
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { INSULATION_CLASSES, type TestDataInput, type TestDataValues } from '@/lib/final-tests/test-record-schema';
import { DEFAULT_VIBRATION_LIMIT_MM_S } from './verdicts';
import { ratingSourceText, type AsRepairedRating } from './test-rating';

export interface MotorBasis {
  /** The rating the motor leaves with (approved redesign, else nameplate as received). */
  rating: AsRepairedRating;
  insulationClass: string | null;
}

/** Where each default came from, shown beside the fields. */
export interface BasisSources {
  ratedVoltageV: string;
  insulationClass: string;
  windingKind: string;
  practice: string;
  rating: string;
}

type InsulationClass = (typeof INSULATION_CLASSES)[number];
const asClass = (v: string | null | undefined): InsulationClass | undefined =>
  INSULATION_CLASSES.find((c) => c === v?.trim().toUpperCase());

/** Windings of 1000 V and more are form-wound in most shops; below that, random-wound [common practice]. */
export const FORM_WOUND_FROM_V = 1000;

/**
 * Basis defaults. Rated voltage and class: nameplate first (it is the rating the motor goes back to
 * work at), then the as-found sheet. Winding kind: an as-found sheet lists round magnet wire (AWG or
 * metric sizes), i.e. a random winding, below 1000 V; otherwise by voltage. The IEEE 43 minimum follows:
 * random-wound or below 1 kV → 5 MΩ, else form-wound 100 MΩ. Hipot practice: NEMA for 60 Hz motors, IEC
 * for 50 Hz [our choice; the shop's own practice governs].
 */
export function basisDefaults(
  motor: MotorBasis,
  sheet: WindingSheet | null,
): { basis: TestDataInput['basis']; practice: 'nema' | 'iec'; sources: BasisSources } {
  const r = motor.rating;
  const volts = r.ratedVoltageV ?? sheet?.supply.lineVoltageV;
  const plateClass = asClass(motor.insulationClass);
  const sheetClass = sheet ? asClass(sheet.insulation.thermalClass) : undefined;
  const insulationClass = plateClass ?? sheetClass;
  const windingKind = volts !== undefined && volts >= FORM_WOUND_FROM_V ? 'form' : 'random';
  const hz = r.frequencyHz ?? sheet?.supply.frequencyHz;
  const practice = hz === 50 ? 'iec' : 'nema';
  const blankIfNone = <T>(v: T | undefined): T | '' => (v === undefined ? '' : v);
  return {
    basis: {
      ratedVoltageV: volts ?? '',
      ratedOutputKw: r.outputKw ?? sheet?.supply.ratedOutputKw ?? '',
      frequencyHz: blankIfNone(hz),
      poles: blankIfNone(r.poles ?? sheet?.supply.poles),
      ratedCurrentA: blankIfNone(r.ratedCurrentA),
      ratedSpeedRpm: blankIfNone(r.ratedSpeedRpm),
      connection: r.connection ?? '',
      ratingSource: r.source,
      ...(r.redesignRevision === undefined ? {} : { redesignRevision: r.redesignRevision }),
      insulationClass: insulationClass ?? '',
      windingKind,
      irCategory: windingKind === 'random' ? 'random-wound' : 'form-wound',
    },
    practice,
    sources: {
      ratedVoltageV:
        r.ratedVoltageV !== undefined
          ? ratingSourceText(r)
          : volts !== undefined
            ? 'from the as-found sheet'
            : 'not on the nameplate: enter it',
      rating: ratingSourceText(r),
      insulationClass: plateClass ? 'from the nameplate' : sheetClass ? 'from the as-found sheet' : 'not recorded: pick it',
      windingKind: `${sheet ? 'round wire on the as-found sheet, ' : ''}${windingKind === 'random' ? 'below' : 'at or above'} ${FORM_WOUND_FROM_V} V`,
      practice: hz === 50 ? '50 Hz motor: IEC practice' : '60 Hz motor: NEMA practice',
    },
  };
}

const empty3 = <T>(v: T): [T, T, T] => [v, v, v];

/**
 * Values for a new record's form. A retest starts from the previous record's basis, hipot practice and
 * instrument serials, with the hipot case set to "repeat" (80 %): the winding has already seen a full test.
 */
export function newRecordDefaults(motor: MotorBasis, sheet: WindingSheet | null, previous: TestDataValues | null): TestDataInput {
  const { basis, practice } = basisDefaults(motor, sheet);
  return {
    // A retest keeps the previous class and winding kind, but the rating is always the current one (a
    // redesign approved since the last record changes what the motor is judged for).
    basis: previous
      ? {
          ...basis,
          insulationClass: previous.basis.insulationClass,
          windingKind: previous.basis.windingKind,
          irCategory: previous.basis.irCategory,
        }
      : basis,
    ir: { testVoltageV: '', temperatureC: '', ir1MinMOhm: '', ir10MinMOhm: '', instrumentSerial: previous?.ir.instrumentSerial ?? '' },
    hipot: {
      case: previous ? 'repeat' : 'new',
      practice: previous?.hipot.practice ?? practice,
      kind: previous?.hipot.kind ?? 'dc',
      appliedV: '',
      durationS: 60,
      leakageMa: '',
      result: '',
      instrumentSerial: previous?.hipot.instrumentSerial ?? '',
    },
    surge: {
      testVoltageV: '',
      phases: empty3({ result: '', notes: '' }).map((p) => ({ ...p })) as TestDataInput['surge']['phases'],
      instrumentSerial: previous?.surge.instrumentSerial ?? '',
    },
    resistance: {
      between: previous?.resistance.between ?? sheet?.resistance?.between ?? 'line-to-line',
      readings: empty3(''),
      temperatureC: '',
      referenceTemperatureC: previous?.resistance.referenceTemperatureC ?? 25,
      instrumentSerial: previous?.resistance.instrumentSerial ?? '',
    },
    run: {
      voltageV: '',
      currentsA: empty3(''),
      speedRpm: '',
      vibrationMmS: '',
      vibrationLimitMmS: previous?.run.vibrationLimitMmS ?? DEFAULT_VIBRATION_LIMIT_MM_S,
      bearingDeC: '',
      bearingOdeC: '',
      result: '',
      notes: '',
      instrumentSerial: previous?.run.instrumentSerial ?? '',
    },
    notes: '',
  };
}

/** A saved record as form values: numbers stay numbers, absent values become empty inputs. */
export function recordToFormData(d: TestDataValues): TestDataInput {
  const e = <T>(v: T | undefined): T | '' => (v === undefined ? '' : v);
  return {
    basis: {
      ...d.basis,
      ratedOutputKw: e(d.basis.ratedOutputKw),
      frequencyHz: e(d.basis.frequencyHz),
      poles: e(d.basis.poles),
      ratedCurrentA: e(d.basis.ratedCurrentA),
      ratedSpeedRpm: e(d.basis.ratedSpeedRpm),
      connection: e(d.basis.connection),
    },
    ir: {
      testVoltageV: e(d.ir.testVoltageV),
      temperatureC: e(d.ir.temperatureC),
      ir1MinMOhm: e(d.ir.ir1MinMOhm),
      ir10MinMOhm: e(d.ir.ir10MinMOhm),
      instrumentSerial: e(d.ir.instrumentSerial),
    },
    hipot: {
      ...d.hipot,
      appliedV: e(d.hipot.appliedV),
      durationS: e(d.hipot.durationS),
      leakageMa: e(d.hipot.leakageMa),
      result: e(d.hipot.result),
      instrumentSerial: e(d.hipot.instrumentSerial),
    },
    surge: {
      testVoltageV: e(d.surge.testVoltageV),
      phases: d.surge.phases.map((p) => ({ result: e(p.result), notes: e(p.notes) })) as TestDataInput['surge']['phases'],
      instrumentSerial: e(d.surge.instrumentSerial),
    },
    resistance: {
      ...d.resistance,
      readings: d.resistance.readings.map(e) as TestDataInput['resistance']['readings'],
      temperatureC: e(d.resistance.temperatureC),
      instrumentSerial: e(d.resistance.instrumentSerial),
    },
    run: {
      ...d.run,
      voltageV: e(d.run.voltageV),
      currentsA: d.run.currentsA.map(e) as TestDataInput['run']['currentsA'],
      speedRpm: e(d.run.speedRpm),
      vibrationMmS: e(d.run.vibrationMmS),
      vibrationLimitMmS: e(d.run.vibrationLimitMmS),
      bearingDeC: e(d.run.bearingDeC),
      bearingOdeC: e(d.run.bearingOdeC),
      result: e(d.run.result),
      notes: e(d.run.notes),
      instrumentSerial: e(d.run.instrumentSerial),
    },
    notes: e(d.notes),
  };
}
