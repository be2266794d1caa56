/**
 * Nameplate data tables: NEMA locked-rotor code letters, insulation thermal classes, duty types and
 * efficiency classes, with the few small functions that use them.
 */
import { fail, finiteOr, ok, type EngineResult } from './result';
import type { ThermalClass } from './winding-sheet';

/** NEMA locked-rotor code letters (MG 1 10.37.2); I, O and Q are not used. */
export type CodeLetter = 'A' | 'B' | 'C' | 'D' | 'E' | 'F' | 'G' | 'H' | 'J' | 'K' | 'L' | 'M' | 'N' | 'P' | 'R' | 'S' | 'T' | 'U' | 'V';

/** A code letter's locked-rotor kVA/hp range. */
export interface KvaPerHpRange {
  /** Lower bound, kVA/hp, included. */
  minKvaPerHp: number;
  /** Upper bound, kVA/hp, not included; null for V (22.4 and up). */
  maxKvaPerHp: number | null;
}

/**
 * Locked-rotor kVA per horsepower by code letter (NEMA MG 1 10.37.2): A below 3.15, B 3.15–3.55 … U 20.0–22.4,
 * V 22.4 and up; each range includes its lower bound and stops short of the upper one.
 */
export const CODE_LETTER_UPPER_BOUNDS: Readonly<Record<CodeLetter, number | null>> = {
  A: 3.15,
  B: 3.55,
  C: 4.0,
  D: 4.5,
  E: 5.0,
  F: 5.6,
  G: 6.3,
  H: 7.1,
  J: 8.0,
  K: 9.0,
  L: 10.0,
  M: 11.2,
  N: 12.5,
  P: 14.0,
  R: 16.0,
  S: 18.0,
  T: 20.0,
  U: 22.4,
  V: null,
};

/** Code letters in ascending kVA/hp order. */
export const CODE_LETTERS = Object.keys(CODE_LETTER_UPPER_BOUNDS) as CodeLetter[];

/** The kVA/hp range of a code letter (NEMA MG 1 10.37.2); the lower bound is the previous letter's upper. */
export function codeLetterRange(letter: CodeLetter): KvaPerHpRange {
  const i = CODE_LETTERS.indexOf(letter);
  const previous = i > 0 ? CODE_LETTERS[i - 1] : undefined;
  return {
    minKvaPerHp: previous ? (CODE_LETTER_UPPER_BOUNDS[previous] ?? 0) : 0,
    maxKvaPerHp: CODE_LETTER_UPPER_BOUNDS[letter],
  };
}

/** The code letter whose range holds a locked-rotor kVA/hp (NEMA MG 1 10.37.2). */
export function codeLetterForKvaPerHp(kvaPerHp: number): EngineResult<CodeLetter> {
  if (!(kvaPerHp >= 0) || !Number.isFinite(kvaPerHp)) {
    return fail('invalid-input', 'Locked-rotor kVA/hp must be zero or a positive number.', 'Check the inputs.', 'kvaPerHp');
  }
  const letter = CODE_LETTERS.find((l) => {
    const upper = CODE_LETTER_UPPER_BOUNDS[l];
    return upper === null || kvaPerHp < upper;
  });
  return ok(letter ?? 'V');
}

/** Locked-rotor kVA per hp of a three-phase motor: √3·V_line·I_LR/(1000·hp). */
export function lockedRotorKvaPerHp(lockedRotorCurrentA: number, lineVoltageV: number, hp: number): EngineResult<number> {
  return finiteOr((Math.sqrt(3) * lineVoltageV * lockedRotorCurrentA) / (1000 * hp), (v) => v, 'Locked-rotor kVA/hp');
}

/**
 * Locked-rotor line current range a code letter allows, A: I = kVA/hp·1000·hp/(√3·V_line) at each end
 * (NEMA MG 1 10.37.2); maxA is null for V.
 */
export function lockedRotorCurrentRangeA(letter: CodeLetter, hp: number, lineVoltageV: number): { minA: number; maxA: number | null } {
  const { minKvaPerHp, maxKvaPerHp } = codeLetterRange(letter);
  const amps = (kvaPerHp: number): number => (kvaPerHp * 1000 * hp) / (Math.sqrt(3) * lineVoltageV);
  return { minA: amps(minKvaPerHp), maxA: maxKvaPerHp === null ? null : amps(maxKvaPerHp) };
}

/** Insulation thermal classes handled (IEC 60085 letters). */
export type InsulationClass = ThermalClass;

/** Thermal class temperature, °C: A 105, B 130, F 155, H 180 (IEC 60085; NEMA MG 1). */
export const INSULATION_CLASS_TEMP_C: Readonly<Record<InsulationClass, number>> = { A: 105, B: 130, F: 155, H: 180 };

/** IEC 60034-1 duty types. */
export type DutyType = 'S1' | 'S2' | 'S3' | 'S4' | 'S5' | 'S6' | 'S7' | 'S8' | 'S9' | 'S10';

/** Duty types of IEC 60034-1, labels in our own words [from memory]. */
export const DUTY_TYPES: Readonly<Record<DutyType, string>> = {
  S1: 'Continuous running',
  S2: 'Short-time',
  S3: 'Intermittent periodic',
  S4: 'Intermittent periodic with starting',
  S5: 'Intermittent periodic with electric braking',
  S6: 'Continuous operation, periodic loading',
  S7: 'Continuous operation, periodic, with electric braking',
  S8: 'Continuous operation, periodic, with related load and speed changes',
  S9: 'Non-periodic load and speed variations',
  S10: 'Discrete constant loads and speeds',
};

/** IEC 60034-30-1 efficiency classes. */
export type EfficiencyClass = 'IE1' | 'IE2' | 'IE3' | 'IE4' | 'IE5';

/** Efficiency classes of IEC 60034-30-1 and their common names [from memory]. */
export const EFFICIENCY_CLASSES: Readonly<Record<EfficiencyClass, string>> = {
  IE1: 'Standard efficiency',
  IE2: 'High efficiency',
  IE3: 'Premium efficiency',
  IE4: 'Super premium efficiency',
  IE5: 'Ultra premium efficiency',
};
