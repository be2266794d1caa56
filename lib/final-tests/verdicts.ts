/**
 * Judges a test record: each section against its rule, and the record as a whole. Pure (no React, Next or
 * Prisma): the form calls it as the winder types, the server calls it on save to set the stored verdict,
 * and the job sheet prints what it returns, so the three always agree. The rules themselves live in the
 * engine (IEEE 43 IR/PI, hipot levels, AR100 unbalance); this module only composes them.
 */
import { HIPOT_DURATION_S, HIPOT_OVER_LEVEL_WARNING, hipotTestVoltage, judgeHipotApplication, type HipotLevels } from '@/lib/engine/hipot';
import {
  insulationResistanceVerdict,
  irCorrectedTo40C,
  irTestVoltageDc,
  polarizationIndexVerdict,
  type IrTestVoltage,
} from '@/lib/engine/insulation-resistance';
import { correctResistanceOhm, resistanceUnbalanceVerdict } from '@/lib/engine/resistance';
import { kwToHp } from '@/lib/engine/units';
import type { Verdict } from '@/lib/engine/verdict';
import { PHASE_NAMES, synchronousRpm, type TestDataValues } from '@/lib/final-tests/test-record-schema';

/**
 * A check passes, fails, cannot be judged yet because a reading is missing, was a deliberately reduced
 * test (recorded with its reason, never a plain pass), or is recorded but not judged (no limit applies).
 */
export type CheckStatus = 'pass' | 'fail' | 'missing' | 'reduced' | 'recorded';
export type SectionStatus = 'pass' | 'fail' | 'incomplete' | 'reduced';
export type OverallVerdict = 'PASS' | 'FAIL' | 'INCOMPLETE';
export type SectionKey = 'ir' | 'hipot' | 'surge' | 'resistance' | 'run';

export interface Check {
  key: string;
  label: string;
  status: CheckStatus;
  /** The engine's verdict (value, limit, rule) when the check compares a number with a limit. */
  verdict?: Verdict;
  /** The rule in words when there is no numeric verdict (e.g. an operator's pass/fail). */
  rule?: string;
}

export interface SectionJudgement {
  key: SectionKey;
  title: string;
  status: SectionStatus;
  checks: Check[];
  /** Cautions that do not change the verdict but the tester must see. */
  warnings: string[];
}

export interface TestJudgement {
  sections: SectionJudgement[];
  overall: OverallVerdict;
  /** Why a record with no failure is still not a pass, e.g. "reduced-level hipot test (customer's instruction)". */
  qualifiers: string[];
  /** Derived numbers the screens and the sheet print beside the readings. */
  derived: {
    ir40MOhm?: number;
    polarizationIndex?: number;
    irTestVoltage?: IrTestVoltage;
    hipotLevels?: HipotLevels;
    correctedOhm?: number[];
    unbalanceFraction?: number;
  };
}

export const SECTION_TITLES: Readonly<Record<SectionKey, string>> = {
  ir: 'Insulation resistance and polarization index',
  hipot: 'High-potential test',
  surge: 'Surge comparison',
  resistance: 'Winding resistance',
  run: 'Run test',
};

/**
 * Default vibration limit, mm/s: 0.15 in/s (3.8 mm/s), the unfiltered limit NEMA MG 1 Part 7 sets for
 * standard machines [from memory: NEMA MG 1 Part 7]. Editable per record: contracts and IEC 60034-14
 * grades differ, and the limit must be in the same measure (peak or rms) as the reading.
 */
export const DEFAULT_VIBRATION_LIMIT_MM_S = 3.8;

/** A section fails on any failed check, is incomplete while a reading is missing, reduced on a reduced test. */
const sectionStatus = (checks: readonly Check[]): SectionStatus => {
  const judged = checks.filter((c) => c.status !== 'recorded');
  if (judged.some((c) => c.status === 'fail')) return 'fail';
  if (judged.some((c) => c.status === 'missing')) return 'incomplete';
  if (judged.some((c) => c.status === 'reduced')) return 'reduced';
  return 'pass';
};

const fromVerdict = (key: string, label: string, v: Verdict): Check => ({ key, label, status: v.pass ? 'pass' : 'fail', verdict: v });
const missing = (key: string, label: string, rule?: string): Check => ({ key, label, status: 'missing', ...(rule ? { rule } : {}) });
const operator = (key: string, label: string, result: 'pass' | 'fail' | undefined, rule: string): Check =>
  result === undefined ? missing(key, label, rule) : { key, label, status: result, rule };

/**
 * Overall verdict: FAIL when any section fails, PASS only when every section passes, otherwise INCOMPLETE
 * (a motor is not ready to ship on a partly recorded set of tests, nor on a reduced-level test without an
 * engineer's written release) [our rule].
 */
export function overallVerdict(statuses: readonly SectionStatus[]): OverallVerdict {
  if (statuses.some((s) => s === 'fail')) return 'FAIL';
  return statuses.length > 0 && statuses.every((s) => s === 'pass') ? 'PASS' : 'INCOMPLETE';
}

function judgeIr(d: TestDataValues, derived: TestJudgement['derived']): SectionJudgement {
  const { ir, basis } = d;
  const checks: Check[] = [];
  const warnings: string[] = [];
  derived.irTestVoltage = irTestVoltageDc(basis.ratedVoltageV);
  if (ir.ir1MinMOhm !== undefined && ir.temperatureC !== undefined) {
    derived.ir40MOhm = irCorrectedTo40C(ir.ir1MinMOhm, ir.temperatureC);
    const v = insulationResistanceVerdict({
      ir1MinMOhm: ir.ir1MinMOhm,
      temperatureC: ir.temperatureC,
      category: basis.irCategory,
      ratedLineVoltageV: basis.ratedVoltageV,
    });
    checks.push(v.ok ? fromVerdict('ir', 'IR 1 min at 40 °C', v.value) : missing('ir', 'IR 1 min at 40 °C', v.error.message));
  } else checks.push(missing('ir', 'IR 1 min at 40 °C'));
  if (ir.ir1MinMOhm !== undefined && ir.ir10MinMOhm !== undefined && ir.temperatureC !== undefined && ir.ir1MinMOhm > 0) {
    const v = polarizationIndexVerdict({
      ir1MinMOhm: ir.ir1MinMOhm,
      ir10MinMOhm: ir.ir10MinMOhm,
      temperatureC: ir.temperatureC,
      insulationClass: basis.insulationClass,
    });
    if (v.ok) derived.polarizationIndex = v.value.value;
    checks.push(v.ok ? fromVerdict('pi', 'Polarization index', v.value) : missing('pi', 'Polarization index', v.error.message));
  } else checks.push(missing('pi', 'Polarization index'));
  const tv = derived.irTestVoltage;
  if (ir.testVoltageV !== undefined && (ir.testVoltageV < tv.minV || ir.testVoltageV > tv.maxV)) {
    warnings.push(
      `Test voltage ${ir.testVoltageV} V DC is outside the recommended ${tv.minV === tv.maxV ? `${tv.minV} V` : `${tv.minV}–${tv.maxV} V`} (${tv.rule}).`,
    );
  }
  return { key: 'ir', title: SECTION_TITLES.ir, status: sectionStatus(checks), checks, warnings };
}

/** The hipot check's label and rule line. */
export const HIPOT_RULE_TEXT = `Hipot: the proposed level (−0 %) for ${HIPOT_DURATION_S} s, no breakdown (NEMA MG 1; IEC 60034-1).`;

function judgeHipot(d: TestDataValues, irStatus: SectionStatus, derived: TestJudgement['derived']): SectionJudgement {
  const { hipot, basis } = d;
  const warnings: string[] = [];
  const levels = hipotTestVoltage({
    ratedVoltageV: basis.ratedVoltageV,
    case: hipot.case,
    practice: hipot.practice,
    ...(basis.ratedOutputKw === undefined ? {} : { ratedOutputHp: kwToHp(basis.ratedOutputKw) }),
  });
  if (levels.ok) derived.hipotLevels = levels.value;
  const checks: Check[] = [];
  const label = 'Proposed level held for the test time';
  if (!levels.ok) checks.push(missing('hipot', label, levels.error.message));
  else {
    const proposed = hipot.kind === 'ac' ? levels.value.acV : levels.value.dcV;
    const j = judgeHipotApplication({
      proposedV: proposed,
      appliedV: hipot.appliedV,
      durationS: hipot.durationS,
      held: hipot.result === undefined ? undefined : hipot.result === 'pass',
      reducedReason: hipot.reducedReason,
    });
    const what =
      hipot.appliedV === undefined
        ? ''
        : `${hipot.appliedV} V ${hipot.kind.toUpperCase()}${hipot.durationS === undefined ? '' : ` for ${hipot.durationS} s`} against the proposed ${proposed} V ${hipot.kind.toUpperCase()} for ${HIPOT_DURATION_S} s`;
    if (j.outcome === 'missing') checks.push(missing('hipot', label, HIPOT_RULE_TEXT));
    else if (j.outcome === 'pass') checks.push({ key: 'hipot', label, status: 'pass', rule: `${what}. ${HIPOT_RULE_TEXT}` });
    else if (j.outcome === 'reduced') {
      checks.push({
        key: 'hipot',
        label: `Reduced-level test (${hipot.reducedReason})`,
        status: 'reduced',
        rule: `${what}: ${j.reasons.join('; ')}. Not the standard's test, so not a pass.`,
      });
    } else {
      const advice = hipot.result === 'fail' ? '' : ' If the level or time was reduced on purpose, give the reason.';
      checks.push({
        key: 'hipot',
        label: hipot.result === 'fail' ? 'Winding broke down' : label,
        status: 'fail',
        rule: `${what}${what ? ': ' : ''}${j.reasons.join('; ')}.${advice}`,
      });
    }
    if (j.overLevel && hipot.appliedV !== undefined) {
      warnings.push(
        `Applied ${hipot.appliedV} V ${hipot.kind.toUpperCase()} is more than ${HIPOT_OVER_LEVEL_WARNING * 100} % above the proposed ${proposed} V: the winding was stressed beyond the rule; say why in the notes.`,
      );
    }
  }
  checks.push(
    hipot.leakageMa === undefined
      ? { key: 'leakage', label: 'Leakage current', status: 'recorded', rule: 'Not recorded; no limit applies.' }
      : {
          key: 'leakage',
          label: 'Leakage current',
          status: 'recorded',
          rule: 'Recorded, not judged: no published limit applies to it alone.',
        },
  );
  if (hipot.result !== undefined && irStatus !== 'pass') {
    warnings.push('Hipot recorded without a satisfactory IR and PI: hipot only after satisfactory IR/PI on a clean, dry winding.');
  }
  return { key: 'hipot', title: SECTION_TITLES.hipot, status: sectionStatus(checks), checks, warnings };
}

function judgeSurge(d: TestDataValues, betweenLabels: readonly string[]): SectionJudgement {
  // The rule line states what the operator judged; a failed phase says what a failure means, never "match".
  const checks = d.surge.phases.map((p, i) =>
    operator(
      `surge-${i}`,
      `Phase ${betweenLabels[i] ?? i + 1}`,
      p.result,
      p.result === 'fail'
        ? 'Surge comparison: waveforms differ, a sign of turn-to-turn, coil-to-coil or phase weakness.'
        : p.result === 'pass'
          ? 'Surge comparison: waveforms match, no sign of turn-to-turn weakness.'
          : 'Surge comparison: the phase waveforms must match.',
    ),
  );
  return { key: 'surge', title: SECTION_TITLES.surge, status: sectionStatus(checks), checks, warnings: [] };
}

function judgeResistance(d: TestDataValues, derived: TestJudgement['derived']): SectionJudgement {
  const { resistance, basis } = d;
  const readings = resistance.readings.filter((r): r is number => r !== undefined);
  let check: Check = missing('unbalance', 'Resistance unbalance');
  if (readings.length === 3 && resistance.temperatureC !== undefined) {
    const from = resistance.temperatureC;
    derived.correctedOhm = readings.map((r) => correctResistanceOhm(r, from, resistance.referenceTemperatureC));
    const v = resistanceUnbalanceVerdict(derived.correctedOhm, basis.windingKind);
    if (v.ok) derived.unbalanceFraction = v.value.value;
    check = v.ok
      ? fromVerdict('unbalance', 'Resistance unbalance', v.value)
      : missing('unbalance', 'Resistance unbalance', v.error.message);
  }
  return { key: 'resistance', title: SECTION_TITLES.resistance, status: sectionStatus([check]), checks: [check], warnings: [] };
}

function judgeRun(d: TestDataValues): SectionJudgement {
  const { run, basis } = d;
  const checks: Check[] = [operator('run', 'Ran smoothly, no unusual noise or heating', run.result, 'Run test: operator’s judgement.')];
  const limit = run.vibrationLimitMmS;
  if (run.vibrationMmS === undefined) checks.push(missing('vibration', 'Vibration'));
  else if (limit !== undefined) {
    checks.push(
      fromVerdict('vibration', 'Vibration', {
        pass: run.vibrationMmS <= limit,
        value: run.vibrationMmS,
        limit,
        // The 0.15 in/s default is recalled [from memory: NEMA MG 1 Part 7]; the sheet names the standard.
        rule: `Vibration ≤ ${limit} mm/s (${limit === DEFAULT_VIBRATION_LIMIT_MM_S ? 'NEMA MG 1 Part 7, 0.15 in/s, standard machines' : 'limit set on this record'})`,
      }),
    );
  } else
    checks.push({
      key: 'vibration',
      label: 'Vibration',
      status: 'recorded',
      rule: 'Recorded, not judged: no vibration limit set on this record.',
    });
  // No-load current and speed against the rating the motor leaves with [common practice]: an uncoupled
  // motor draws less than its full-load current and runs between its rated and synchronous speeds.
  const currents = run.currentsA.filter((c): c is number => c !== undefined);
  if (basis.ratedCurrentA !== undefined && currents.length > 0) {
    const highest = Math.max(...currents);
    checks.push(
      fromVerdict('current', 'No-load current below rated current', {
        pass: highest <= basis.ratedCurrentA,
        value: highest,
        limit: basis.ratedCurrentA,
        rule: 'Uncoupled, the highest phase current stays below the rated full-load current (shop practice).',
      }),
    );
  }
  const sync = synchronousRpm(basis.frequencyHz, basis.poles);
  if (run.speedRpm !== undefined && sync !== undefined) {
    const low = basis.ratedSpeedRpm ?? 0;
    checks.push(
      fromVerdict('speed', 'No-load speed', {
        pass: run.speedRpm >= low && run.speedRpm <= sync,
        value: run.speedRpm,
        limit: sync,
        rule: `Uncoupled, between the rated ${basis.ratedSpeedRpm === undefined ? '—' : `${basis.ratedSpeedRpm} rpm`} and the synchronous ${sync} rpm (${basis.poles} poles at ${basis.frequencyHz} Hz).`,
      }),
    );
  }
  return { key: 'run', title: SECTION_TITLES.run, status: sectionStatus(checks), checks, warnings: [] };
}

/** Judges every section and the whole record. */
export function judgeTestRecord(d: TestDataValues): TestJudgement {
  const derived: TestJudgement['derived'] = {};
  const ir = judgeIr(d, derived);
  const sections = [ir, judgeHipot(d, ir.status, derived), judgeSurge(d, PHASE_NAMES), judgeResistance(d, derived), judgeRun(d)];
  const qualifiers = sections.flatMap((s) =>
    s.checks.filter((c) => c.status === 'reduced').map((c) => `${s.title}: ${c.label.charAt(0).toLowerCase()}${c.label.slice(1)}`),
  );
  return { sections, overall: overallVerdict(sections.map((s) => s.status)), qualifiers, derived };
}
