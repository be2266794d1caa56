/**
 * Flux per pole and the flux densities it sets up in the gap, the teeth and the back iron (yoke), from
 * E = 4.44·f·N_ph·k_w1·Φ (docs/engineering/flux-density.md). Lengths in metres, flux in webers, densities in tesla with
 * kilolines per square inch alongside.
 */
import { fail, ok, type EngineResult } from './result';
import { teslaToKilolinesPerIn2 } from './units';
import type { SlotTable } from './winding-layout';

/** The 4.44 of E = 4.44·f·N·k_w·Φ is √2·π = 4.4429 (rms of a sinusoid of peak 2πf·N·k_w·Φ). */
export const EMF_CONSTANT = Math.SQRT2 * Math.PI;

/** Stator core dimensions, metres. */
export interface CoreGeometry {
  boreM: number;
  coreLengthM: number;
  outsideDiameterM: number;
  slots: number;
  slotDepthM: number;
  /** Tooth width at the point to check (1/3 height from the narrow end, or the narrowest for a safe check). */
  toothWidthM: number;
  /** Stacking factor k_fe, 0 < k_fe ≤ 1. */
  stackingFactor: number;
  ventDucts?: number;
  ventDuctWidthM?: number;
}

/** A range of flux density, tesla. */
export interface FluxRange {
  low: number;
  high: number;
}

/** Typical range and, where the sources give one, a conservative range. */
export interface FluxLimit {
  typical: FluxRange;
  conservative?: FluxRange;
}

/** Limits for each density checked. */
export interface FluxLimits {
  gapAverage: FluxLimit;
  gapPeak: FluxLimit;
  tooth: FluxLimit;
  yoke: FluxLimit;
}

/**
 * Typical ranges for 50/60 Hz induction motors, tesla. [from memory: Pyrhönen et al., *Design of Rotating
 * Electrical Machines*, Table 6.3; Sawhney, *A Course in Electrical Machine Design*] Not checked against
 * the books: keep them configurable, and treat old-vs-new ratios as the primary check.
 */
export const DEFAULT_FLUX_LIMITS: FluxLimits = {
  gapAverage: { typical: { low: 0.3, high: 0.6 } },
  gapPeak: { typical: { low: 0.7, high: 0.9 } },
  tooth: { typical: { low: 1.4, high: 2.1 }, conservative: { low: 1.4, high: 1.7 } },
  yoke: { typical: { low: 1.4, high: 1.7 }, conservative: { low: 1.2, high: 1.5 } },
};

/** 'high' above the typical range, 'above-conservative' inside it but above the conservative one. */
export type FluxVerdict = 'low' | 'ok' | 'above-conservative' | 'high';

/** One density in tesla and kilolines/in², labelled, judged against its limit. */
export interface FluxDensity {
  kind: 'average' | 'peak' | 'max';
  tesla: number;
  kilolinesPerIn2: number;
  verdict: FluxVerdict;
  limit: FluxLimit;
}

/** Judges a density against a limit: above typical high → high; above conservative high → above-conservative; below the lower of the lows → low. */
export function judgeFlux(tesla: number, limit: FluxLimit): FluxVerdict {
  if (tesla > limit.typical.high) return 'high';
  if (limit.conservative && tesla > limit.conservative.high) return 'above-conservative';
  if (tesla < Math.min(limit.typical.low, limit.conservative?.low ?? Infinity)) return 'low';
  return 'ok';
}

/**
 * Series turns per phase from the layout: N_ph = Σ turns of the phase's coils / a (coil sides count half a
 * coil each), the mean of the three phases. Equals (S/3)·N_c/a double layer, (S/6)·N_c/a single layer.
 */
export function seriesTurnsPerPhase(table: SlotTable, parallelPaths: number): number {
  const sideTurns = table.sides.reduce((sum, s) => sum + s.turns, 0);
  return sideTurns / 2 / 3 / parallelPaths;
}

/** N_ph = S·Z_s/(6a) with Z_s conductors per slot: (S/3)·N_c/a double layer, (S/6)·N_c/a single (docs/engineering/flux-density.md). */
export const seriesTurnsFromCoils = (slots: number, layers: 1 | 2, turnsPerCoil: number, parallelPaths: number): number =>
  (slots * layers * turnsPerCoil) / (6 * parallelPaths);

/** Phase voltage: star V_line/√3, delta V_line (docs/engineering/flux-density.md). */
export const phaseVoltage = (lineVoltageV: number, connection: 'star' | 'delta'): number =>
  connection === 'star' ? lineVoltageV / Math.sqrt(3) : lineVoltageV;

/** Φ = E / (4.44·f·N_ph·k_w1), E the air-gap EMF (docs/engineering/flux-density.md). Inputs validated and positive. */
export const fluxPerPoleWb = (emfV: number, frequencyHz: number, seriesTurnsPerPhase: number, windingFactor: number): number =>
  emfV / (EMF_CONSTANT * frequencyHz * seriesTurnsPerPhase * windingFactor);

/** Net iron length: (L − ducts·duct width)·k_fe. */
export const netIronLengthM = (core: CoreGeometry): number =>
  (core.coreLengthM - (core.ventDucts ?? 0) * (core.ventDuctWidthM ?? 0)) * core.stackingFactor;

/** Densities in tesla with the slot pitch and back-iron depth used. */
export interface FluxDensities {
  gapAverageT: number;
  gapPeakT: number;
  toothMaxT: number;
  yokeT: number;
  /** Slot pitch at the bore τ_s = πD/S. */
  slotPitchM: number;
  /** Back-iron depth d_y = (D_o − D)/2 − slot depth. */
  yokeDepthM: number;
}

/**
 * Gap B_avg = Φ·P/(πDL); B_peak = (π/2)·B_avg (sinusoidal field); tooth B_max = B_peak·τ_s·L/(w_t·L_fe)
 * (= B_peak·τ_s/(w_t·k_fe) without vent ducts); yoke B = Φ/(2·d_y·L_fe) (docs/engineering/flux-density.md). Inputs validated.
 */
export function fluxDensities(core: CoreGeometry, poles: number, fluxWb: number): FluxDensities {
  const gapAverageT = (fluxWb * poles) / (Math.PI * core.boreM * core.coreLengthM);
  const gapPeakT = (Math.PI / 2) * gapAverageT;
  const slotPitchM = (Math.PI * core.boreM) / core.slots;
  const iron = netIronLengthM(core);
  const toothMaxT = (gapPeakT * slotPitchM * core.coreLengthM) / (core.toothWidthM * iron);
  const yokeDepthM = (core.outsideDiameterM - core.boreM) / 2 - core.slotDepthM;
  const yokeT = fluxWb / (2 * yokeDepthM * iron);
  return { gapAverageT, gapPeakT, toothMaxT, yokeT, slotPitchM, yokeDepthM };
}

/** What the flux calculation needs; turns and winding factor come from the layout. */
export interface FluxInput {
  core: CoreGeometry;
  poles: number;
  lineVoltageV: number;
  frequencyHz: number;
  connection: 'star' | 'delta';
  seriesTurnsPerPhase: number;
  windingFactor: number;
  /** E/V_ph; 1 takes E = V_ph. About 0.95–0.98 at full load [common practice]. */
  emfFraction?: number;
  limits?: FluxLimits;
}

/** Flux per pole and the judged densities. */
export interface FluxAnalysis {
  phaseVoltageV: number;
  emfV: number;
  fluxPerPoleWb: number;
  slotPitchM: number;
  yokeDepthM: number;
  gapAverage: FluxDensity;
  gapPeak: FluxDensity;
  toothMax: FluxDensity;
  yoke: FluxDensity;
  remarks: string[];
}

const positive = (v: number): boolean => Number.isFinite(v) && v > 0;

function checkFluxInput(i: FluxInput): EngineResult<null> {
  const c = i.core;
  const need: [number, string, string][] = [
    [c.boreM, 'core.boreMm', 'bore'],
    [c.coreLengthM, 'core.coreLengthMm', 'core length'],
    [c.outsideDiameterM, 'core.outsideDiameterMm', 'core outside diameter'],
    [c.slots, 'core.slots', 'slot count'],
    [c.slotDepthM, 'core.slotDepthMm', 'slot depth'],
    [c.toothWidthM, 'core.toothWidthMm', 'tooth width'],
    [i.poles, 'supply.poles', 'pole count'],
    [i.lineVoltageV, 'supply.lineVoltageV', 'line voltage'],
    [i.frequencyHz, 'supply.frequencyHz', 'frequency'],
    [i.seriesTurnsPerPhase, 'winding.turnsPerCoil', 'series turns per phase'],
    [i.windingFactor, 'winding.spans', 'winding factor'],
  ];
  for (const [v, field, what] of need)
    if (!positive(v)) return fail('invalid-input', `The ${what} must be more than zero (got ${v}).`, `Enter the ${what}.`, field);
  if (!(c.stackingFactor > 0 && c.stackingFactor <= 1))
    return fail(
      'invalid-input',
      `Stacking factor must be above 0 and at most 1 (got ${c.stackingFactor}).`,
      'Typical laminations stack at 0.93–0.97.',
      'core.stackingFactor',
    );
  if (i.emfFraction !== undefined && !(i.emfFraction > 0 && i.emfFraction <= 1.2))
    return fail(
      'invalid-input',
      `EMF fraction ${i.emfFraction} is out of range.`,
      'Use 1 for E = V_ph, or 0.95–0.98 for the air-gap EMF at full load.',
      'emfFraction',
    );
  if (!(netIronLengthM(c) > 0))
    return fail(
      'invalid-input',
      'The vent ducts take up the whole core length.',
      'Check the number and width of the vent ducts.',
      'core.ventDucts',
    );
  if (!((c.outsideDiameterM - c.boreM) / 2 - c.slotDepthM > 0))
    return fail(
      'invalid-input',
      'No back iron is left: (outside diameter − bore)/2 − slot depth is not above zero.',
      'Check the bore, outside diameter and slot depth.',
      'core.slotDepthMm',
    );
  return ok(null);
}

/** Flux per pole and gap, tooth and yoke densities judged against configurable limits (docs/engineering/flux-density.md). */
export function fluxAnalysis(input: FluxInput): EngineResult<FluxAnalysis> {
  const checked = checkFluxInput(input);
  if (!checked.ok) return checked;
  const limits = input.limits ?? DEFAULT_FLUX_LIMITS;
  const phaseVoltageV = phaseVoltage(input.lineVoltageV, input.connection);
  const emfV = phaseVoltageV * (input.emfFraction ?? 1);
  const phi = fluxPerPoleWb(emfV, input.frequencyHz, input.seriesTurnsPerPhase, input.windingFactor);
  const d = fluxDensities(input.core, input.poles, phi);
  const density = (kind: FluxDensity['kind'], tesla: number, limit: FluxLimit): FluxDensity => ({
    kind,
    tesla,
    kilolinesPerIn2: teslaToKilolinesPerIn2(tesla),
    verdict: judgeFlux(tesla, limit),
    limit,
  });
  const values = [phi, d.gapAverageT, d.gapPeakT, d.toothMaxT, d.yokeT];
  if (!values.every(Number.isFinite))
    return fail('non-finite-result', 'The flux calculation did not give a finite result.', 'Check the core dimensions and the supply.');
  const remarks =
    input.emfFraction === undefined || input.emfFraction === 1
      ? // The 0.95–0.98 figure is [common practice]; printed as shop practice.
        ['E taken equal to V_ph; the air-gap EMF is about 0.95–0.98·V_ph at full load (shop practice), which ratios ignore.']
      : [];
  return ok({
    phaseVoltageV,
    emfV,
    fluxPerPoleWb: phi,
    slotPitchM: d.slotPitchM,
    yokeDepthM: d.yokeDepthM,
    gapAverage: density('average', d.gapAverageT, limits.gapAverage),
    gapPeak: density('peak', d.gapPeakT, limits.gapPeak),
    toothMax: density('max', d.toothMaxT, limits.tooth),
    yoke: density('max', d.yokeT, limits.yoke),
    remarks,
  });
}
