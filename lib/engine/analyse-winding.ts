/**
 * One call for everything the engine can say about one winding on one core and supply: layout, winding
 * factors per phase to order 49 with the closed-form cross-check, balance, parallel paths, MMF spectrum
 * and waveform, series turns, flux per pole and flux densities.
 */
import {
  closedFormFactors,
  concentricPitchFactor,
  distributionFactor,
  slotsPerPolePerPhase,
  type SlotsPerPolePerPhase,
} from './closed-form';
import { fluxAnalysis, seriesTurnsPerPhase, type CoreGeometry, type FluxAnalysis, type FluxLimits } from './flux';
import { mmfSpectrum, mmfWaveform, type MmfPoint, type MmfSpectrum } from './mmf-spectrum';
import { allowedParallelPaths, type ParallelPathAnalysis } from './parallel-paths';
import { DEFAULT_BALANCE_TOLERANCE, phaseBalance, type BalanceTolerance, type PhaseBalance } from './phase-balance';
import { fail, ok, type EngineResult } from './result';
import { harmonicWindingFactors, SlotStar, type HarmonicWindingFactor } from './slot-star';
import { windingLayout, type SlotTable, type WindingSpec } from './winding-layout';

/** One winding on one core and supply. */
export interface AnalyseWindingInput {
  winding: WindingSpec;
  supply: { lineVoltageV: number; frequencyHz: number };
  /** Without a core the flux part is left out. */
  core?: CoreGeometry;
  options?: {
    /** Highest electrical order, 1 … 99; default 49. */
    maxOrder?: number;
    limits?: FluxLimits;
    balanceTolerance?: BalanceTolerance;
    /** E/V_ph for the flux (default 1, E = V_ph). */
    emfFraction?: number;
  };
}

/** Closed form beside the slot-star sum at one odd order. */
export interface ClosedFormCheck {
  order: number;
  /** Closed-form factors (signed); kd and kp are absent for double-layer concentric groups, whose formula is one sum. */
  kd?: number;
  kp?: number;
  kw: number;
  slotStarKw: number;
  difference: number;
}

/** Everything analyseWinding finds. */
export interface WindingAnalysis {
  layout: SlotTable;
  q: SlotsPerPolePerPhase;
  fractional: boolean;
  polePitchSlots: number;
  slotAngleDeg: number;
  windingFactor: number;
  factors: HarmonicWindingFactor[];
  /**
   * Closed forms at odd whole orders, for standard layouts only: empty for a slot table from the winder and for
   * double-layer concentric groups whose coils do not share a centre line.
   */
  closedForm: { checks: ClosedFormCheck[]; maxDifference: number };
  balance: PhaseBalance;
  parallelPaths: ParallelPathAnalysis & { requested: number; requestedAllowed: boolean };
  mmf: MmfSpectrum;
  waveform: MmfPoint[];
  seriesTurnsPerPhase: number;
  flux: FluxAnalysis | null;
  warnings: string[];
}

function closedFormChecks(spec: WindingSpec, layout: SlotTable, factors: HarmonicWindingFactor[]): ClosedFormCheck[] {
  if (layout.source !== 'standard') return [];
  const { slots, poles } = spec;
  const tau = slots / poles;
  const { z } = slotsPerPolePerPhase(slots, poles);
  // The concentric group formula needs coils on one centre line: spans stepping by exactly 2.
  const sorted = [...spec.spans].sort((x, y) => y - x);
  const nested = sorted.every((y, i) => i === 0 || (sorted[i - 1] ?? 0) - y === 2);
  if (spec.layers === 2 && spec.style === 'concentric' && !nested) return [];
  const checks: ClosedFormCheck[] = [];
  for (const f of factors) {
    if (!Number.isInteger(f.order) || f.order % 2 === 0) continue;
    let c: { kd?: number; kp?: number; kw: number } | null;
    // Single layer: k_w = k_d whatever the end-turn shape [derived, docs/engineering/winding-factor.md].
    if (spec.layers === 1) c = { kd: distributionFactor(z, f.order), kp: 1, kw: distributionFactor(z, f.order) };
    else if (spec.style === 'concentric') c = { kw: concentricPitchFactor(spec.spans, spec.turnsPerCoil, tau, f.order) };
    else c = closedFormFactors(slots, poles, spec.spans[0] ?? 0, f.order);
    if (c) checks.push({ order: f.order, ...c, slotStarKw: f.kw, difference: Math.abs(Math.abs(c.kw) - f.kw) });
  }
  return checks;
}

/**
 * Analyses one winding. Errors (EngineResult) for input that cannot describe a winding; findings about a
 * winding that exists (unbalance, paths that would circulate current, high densities) come back as warnings.
 */
export function analyseWinding(input: AnalyseWindingInput): EngineResult<WindingAnalysis> {
  const spec = input.winding;
  const maxOrder = input.options?.maxOrder ?? 49;
  if (!(Number.isInteger(maxOrder) && maxOrder >= 1 && maxOrder <= 99))
    return fail(
      'invalid-input',
      `Highest order ${maxOrder} must be a whole number from 1 to 99.`,
      'Use 49 unless you need more.',
      'options.maxOrder',
    );
  if (!(Number.isFinite(input.supply.frequencyHz) && input.supply.frequencyHz > 0))
    return fail('invalid-input', 'The frequency must be more than zero.', 'Enter 50 or 60 Hz.', 'supply.frequencyHz');
  const built = windingLayout(spec);
  if (!built.ok) return built;
  const layout = built.value;
  const a = spec.parallelPaths;
  if (!(Number.isInteger(a) && a >= 1 && a <= layout.sides.length))
    return fail(
      'invalid-input',
      `Parallel paths must be a whole number from 1 up, not ${a}.`,
      'Count the circuits per phase.',
      'winding.parallelPaths',
    );
  if (spec.connection !== 'star' && spec.connection !== 'delta')
    return fail('invalid-input', 'Connection must be star or delta.', 'Star (Y) or delta (Δ).', 'winding.connection');

  const star = new SlotStar(layout);
  const p = spec.poles / 2;
  const q = slotsPerPolePerPhase(spec.slots, spec.poles);
  const factors = harmonicWindingFactors(layout, maxOrder, star);
  const working = factors.find((f) => f.mechanicalOrder === p);
  const windingFactor = working?.kw ?? 0;
  const checks = closedFormChecks(spec, layout, factors);
  const balance = phaseBalance(star.phasors(p), input.options?.balanceTolerance ?? DEFAULT_BALANCE_TOLERANCE);
  const paths = allowedParallelPaths(layout);
  const nPh = seriesTurnsPerPhase(layout, a);
  const warnings: string[] = [];
  if (q.d !== 1)
    warnings.push(`Fractional-slot winding (q = ${q.z}/${q.d}): it carries even or sub-harmonic orders; flag it for engineer review.`);
  if (balance.verdict !== 'balanced') warnings.push(...balance.reasons);
  if (!paths.allowed.includes(a))
    warnings.push(`${a} parallel path(s) would not carry identical voltages in this layout (allowed: ${paths.allowed.join(', ')}).`);

  let flux: FluxAnalysis | null = null;
  if (input.core) {
    if (input.core.slots !== spec.slots)
      return fail(
        'invalid-input',
        `The core has ${input.core.slots} slots but the winding ${spec.slots}.`,
        'Use one slot count.',
        'core.slots',
      );
    const r = fluxAnalysis({
      core: input.core,
      poles: spec.poles,
      lineVoltageV: input.supply.lineVoltageV,
      frequencyHz: input.supply.frequencyHz,
      connection: spec.connection,
      seriesTurnsPerPhase: nPh,
      windingFactor,
      ...(input.options?.emfFraction !== undefined ? { emfFraction: input.options.emfFraction } : {}),
      ...(input.options?.limits ? { limits: input.options.limits } : {}),
    });
    if (!r.ok) return r;
    flux = r.value;
    for (const [name, d] of [
      ['Gap (peak)', flux.gapPeak],
      ['Tooth', flux.toothMax],
      ['Yoke', flux.yoke],
    ] as const)
      if (d.verdict === 'high' || d.verdict === 'above-conservative')
        warnings.push(
          `${name} flux density ${d.tesla.toFixed(3)} T is ${d.verdict === 'high' ? 'above the typical range' : 'above the conservative limit'}.`,
        );
  }

  const analysis: WindingAnalysis = {
    layout,
    q,
    fractional: q.d !== 1,
    polePitchSlots: spec.slots / spec.poles,
    slotAngleDeg: (180 * spec.poles) / spec.slots,
    windingFactor,
    factors,
    closedForm: { checks, maxDifference: checks.reduce((m, c) => Math.max(m, c.difference), 0) },
    balance,
    parallelPaths: { ...paths, requested: a, requestedAllowed: paths.allowed.includes(a) },
    mmf: mmfSpectrum(layout, input.supply, maxOrder, star),
    waveform: mmfWaveform(layout, 0, star),
    seriesTurnsPerPhase: nPh,
    flux,
    warnings,
  };
  return isAllFinite(analysis)
    ? ok(analysis)
    : fail(
        'non-finite-result',
        'Part of the winding analysis did not come out as a finite number.',
        'Check the inputs for zero or missing values.',
      );
}

/** The engine's promise, checked on whole results: no NaN or Infinity anywhere in `value`. */
export function isAllFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  if (Array.isArray(value)) {
    for (const v of value) if (!isAllFinite(v)) return false;
    return true;
  }
  const record = value as Record<string, unknown>;
  for (const k in record) if (!isAllFinite(record[k])) return false;
  return true;
}
