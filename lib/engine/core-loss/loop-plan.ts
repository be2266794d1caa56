/**
 * Planning a core-loss (loop) test from the core on the as-found sheet: back-iron section, mean path, iron
 * mass, then for the shop's test density the loop turns on the available supply, the test voltage for those
 * turns, the density the supply actually gives, and the current and apparent power to expect.
 * Formulas and sources are in the files this composes (back-iron-section, magnetic-path, iron-mass,
 * loop-emf, loop-current).
 */
import { fail, ok, type EngineResult } from '../result';
import { backIronSection, type BackIronSection } from './back-iron-section';
import { checkCoreRing, type CoreRing } from './core-ring';
import { backIronMassKg, SILICON_STEEL_DENSITY_KG_PER_M3, teethMassKg } from './iron-mass';
import { loopCurrentA } from './loop-current';
import { loopFluxDensityT, loopTurnsFor, loopVoltageV } from './loop-emf';
import { meanMagneticPathM } from './magnetic-path';

/**
 * 1.3 T (about 84 kilolines/in²) in the back iron: loop tests are commonly run at 1.0–1.5 T, near the
 * working density of a motor's back iron [common practice, from memory]. Configurable (shop setting).
 */
export const DEFAULT_LOOP_TEST_FLUX_DENSITY_T = 1.3;

export interface LoopPlanInput {
  ring: CoreRing;
  /** Target peak density in the back iron, T. */
  testFluxDensityT: number;
  frequencyHz: number;
  /** The supply the shop has for the test, V rms. */
  supplyVoltageV: number;
  /** Turns the shop will use; when absent, the fewest that keep the density at or below the target. */
  turns?: number;
  /** Assumed rms field strength at the test density, A/m. */
  fieldStrengthAPerM: number;
  steelDensityKgPerM3?: number;
}

export interface LoopPlan {
  section: BackIronSection;
  meanPathM: number;
  backIronMassKg: number;
  teethMassKg: number;
  coreMassKg: number;
  steelDensityKgPerM3: number;
  turns: number;
  /** Whether the turns were chosen by the plan (true) or given by the shop (false). */
  turnsSuggested: boolean;
  /** Volts per turn at the target density. */
  voltsPerTurn: number;
  /** Voltage for the chosen turns at exactly the target density. */
  voltageAtTargetV: number;
  /** Density the available supply drives with the chosen turns. */
  fluxDensityAtSupplyT: number;
  /** Expected current at the target density from N·I = H·l_m. */
  currentA: number;
  /** Loop ampere-turns N·I. */
  ampereTurns: number;
  /** Apparent power at the target density, E·I, VA. */
  apparentPowerVA: number;
  fieldStrengthAPerM: number;
}

const positive = (v: number): boolean => Number.isFinite(v) && v > 0;

/** The loop-test plan for a core, or an error naming the input to fix. */
export function loopTestPlan(input: LoopPlanInput): EngineResult<LoopPlan> {
  const checked = checkCoreRing(input.ring);
  if (!checked.ok) return checked;
  const need: [number, string, string][] = [
    [input.testFluxDensityT, 'testFluxDensityT', 'test flux density'],
    [input.frequencyHz, 'frequencyHz', 'test frequency'],
    [input.supplyVoltageV, 'supplyVoltageV', 'supply voltage'],
    [input.fieldStrengthAPerM, 'fieldStrengthAPerM', 'field strength'],
  ];
  for (const [v, field, what] of need)
    if (!positive(v)) return fail('invalid-input', `The ${what} must be more than zero (got ${v}).`, `Enter the ${what}.`, field);
  if (input.turns !== undefined && !(Number.isInteger(input.turns) && input.turns >= 1))
    return fail(
      'invalid-input',
      `Loop turns must be a whole number of at least 1 (got ${input.turns}).`,
      'Enter the turns of the test loop.',
      'turns',
    );
  const rho = input.steelDensityKgPerM3 ?? SILICON_STEEL_DENSITY_KG_PER_M3;
  const r = input.ring;
  const section = backIronSection(r);
  const meanPathM = meanMagneticPathM(r.outsideDiameterM, section.depthM);
  const yokeKg = backIronMassKg(section.areaM2, meanPathM, rho);
  const teethKg = teethMassKg({ ...r, netIronLengthM: section.netIronLengthM }, rho);
  const turns = input.turns ?? loopTurnsFor(input.supplyVoltageV, input.frequencyHz, input.testFluxDensityT, section.areaM2);
  const voltageAtTargetV = loopVoltageV(input.frequencyHz, turns, input.testFluxDensityT, section.areaM2);
  const currentA = loopCurrentA(input.fieldStrengthAPerM, meanPathM, turns);
  const plan: LoopPlan = {
    section,
    meanPathM,
    backIronMassKg: yokeKg,
    teethMassKg: teethKg,
    coreMassKg: yokeKg + teethKg,
    steelDensityKgPerM3: rho,
    turns,
    turnsSuggested: input.turns === undefined,
    voltsPerTurn: loopVoltageV(input.frequencyHz, 1, input.testFluxDensityT, section.areaM2),
    voltageAtTargetV,
    fluxDensityAtSupplyT: loopFluxDensityT(input.supplyVoltageV, input.frequencyHz, turns, section.areaM2),
    currentA,
    ampereTurns: currentA * turns,
    apparentPowerVA: voltageAtTargetV * currentA,
    fieldStrengthAPerM: input.fieldStrengthAPerM,
  };
  const numbers = [section.areaM2, meanPathM, yokeKg, teethKg, voltageAtTargetV, plan.fluxDensityAtSupplyT, currentA];
  return numbers.every(Number.isFinite)
    ? ok(plan)
    : fail('non-finite-result', 'The loop-test plan did not come out as finite numbers.', 'Check the core dimensions.');
}
