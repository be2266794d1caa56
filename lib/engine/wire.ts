/**
 * Wire sizes as the shop names them (AWG gauge or metric nominal diameter, plus enamel grade) and the
 * numbers the engine needs from them: bare diameter, bare area, insulated diameter, resistance.
 *
 * AWG: ASTM B258 formula diameters are used for every calculation; the published diameter rounded to
 * 0.1 mil is carried alongside for display (see awg.ts). Metric: IEC 60317-0-1 nominal diameters on the
 * R20/R40 series [from memory] (see metric-wire.ts). Insulated diameters are a typical-build
 * approximation (see enamel-build.ts).
 */
import {
  AWG_MAX_N,
  AWG_MIN_N,
  awgFormulaDiameterMm,
  awgFormulaDiameterMils,
  awgLabel,
  awgNumberForDiameterMm,
  awgPublishedDiameterMils,
  parseAwg,
} from './awg';
import { typicalOverallDiameterMm, type EnamelGrade } from './enamel-build';
import { METRIC_NOMINAL_SIZES, metricLabel, parseMetricSize, type RenardSeries } from './metric-wire';
import { fail, finiteOr, ok, type EngineResult } from './result';
import { mm2ToCircularMils, mmToInches, M_PER_FOOT } from './units';
import { COPPER_RESISTIVITY_20C_OHM_MM2_PER_M } from './copper';

/** Enamel grade 1/2/3 (IEC grade, or AWG single/heavy/triple build). */
export type { EnamelGrade } from './enamel-build';
/** How the size is named: AWG gauge (ASTM B258) or metric nominal diameter (IEC 60317-0-1). */
export type WireStandard = 'awg' | 'metric';

/** A wire as written on a job sheet. */
export interface WireSize {
  standard: WireStandard;
  /** AWG gauge label ("18", "4/0") or metric nominal bare diameter in mm ("0.85"). */
  size: string;
  /** 1/2/3: IEC grade, or AWG single/heavy/triple build. */
  enamelGrade: EnamelGrade;
}

/** One row of a wire select box. */
export interface WireTableRow {
  standard: WireStandard;
  /** Value to store in WireSize.size. */
  size: string;
  /** Text to show: "AWG 18", "0.850 mm". */
  label: string;
  bareMm: number;
  bareIn: number;
  areaMm2: number;
  circularMils: number;
}

/** An AWG row: formula values (ASTM B258) with the published rounded diameter alongside. */
export interface AwgTableRow extends WireTableRow {
  standard: 'awg';
  /** Gauge number, 4/0 = −3. */
  n: number;
  /** Published diameter rounded to 0.1 mil (ASTM B258 Table), inches; bareIn holds the formula value. */
  bareInPublished: number;
}

/** A metric row: nominal diameter and its Renard series [from memory]. */
export interface MetricTableRow extends WireTableRow {
  standard: 'metric';
  series: RenardSeries;
}

/** A nearest-size lookup: the size found and how far it is from what was asked, as a fraction. */
export interface NearestWire<Row extends WireTableRow> {
  row: Row;
  /** (found − asked)/asked, in area for AWG lookups and in diameter for metric lookups. */
  difference: number;
}

/** Error message tails for 'unknown-wire', pinned by the tests. */
export const UNKNOWN_AWG_MESSAGE = 'is not an AWG size between 4/0 and 44.';
export const UNKNOWN_METRIC_MESSAGE = 'is not a nominal metric wire diameter between 0.050 and 5.000 mm.';

const areaMm2 = (dMm: number): number => (Math.PI / 4) * dMm * dMm;

function awgRow(n: number): AwgTableRow {
  const bareMm = awgFormulaDiameterMm(n);
  const mils = awgFormulaDiameterMils(n);
  return {
    standard: 'awg',
    size: awgLabel(n),
    label: `AWG ${awgLabel(n)}`,
    n,
    bareMm,
    bareIn: mils / 1000,
    bareInPublished: Math.round((awgPublishedDiameterMils(n) ?? mils) * 1e4) / 1e7,
    areaMm2: areaMm2(bareMm),
    circularMils: mils * mils,
  };
}

const AWG_ROWS: readonly AwgTableRow[] = Array.from({ length: AWG_MAX_N - AWG_MIN_N + 1 }, (_, i) => awgRow(AWG_MIN_N + i));

const METRIC_ROWS: readonly MetricTableRow[] = METRIC_NOMINAL_SIZES.map(({ diameterMm, series }) => ({
  standard: 'metric',
  size: String(diameterMm),
  label: `${metricLabel(diameterMm)} mm`,
  series,
  bareMm: diameterMm,
  bareIn: mmToInches(diameterMm),
  areaMm2: areaMm2(diameterMm),
  circularMils: mm2ToCircularMils(areaMm2(diameterMm)),
}));

/** AWG 4/0 to 44, thickest first, for select boxes (formula values; published diameter alongside). */
export const listAwgSizes = (): readonly AwgTableRow[] => AWG_ROWS;

/** Metric nominal diameters 0.050 to 5.000 mm, ascending [from memory: IEC 60317-0-1 R20/R40]. */
export const listMetricSizes = (): readonly MetricTableRow[] => METRIC_ROWS;

function unknownWire(w: Pick<WireSize, 'standard' | 'size'>): EngineResult<never> {
  const awg = w.standard === 'awg';
  return fail(
    'unknown-wire',
    `"${w.size}" ${awg ? UNKNOWN_AWG_MESSAGE : UNKNOWN_METRIC_MESSAGE}`,
    awg
      ? 'Pick a gauge from the list (4/0, 3/0, 2/0, 1/0, 1 … 44).'
      : 'Pick a nominal diameter from the list, or measure the bare wire and choose the nearest size.',
    'size',
  );
}

/** The table row for a wire size, or an 'unknown-wire' error. */
export function findWire(w: Pick<WireSize, 'standard' | 'size'>): EngineResult<AwgTableRow | MetricTableRow> {
  if (w.standard === 'awg') {
    const n = parseAwg(w.size);
    const row = n === null ? undefined : AWG_ROWS[n - AWG_MIN_N];
    return row ? ok(row) : unknownWire(w);
  }
  const m = parseMetricSize(w.size);
  const row = m && METRIC_ROWS.find((r) => r.bareMm === m.diameterMm);
  return row ? ok(row) : unknownWire(w);
}

/** Bare conductor diameter, mm (AWG: ASTM B258 formula; metric: the nominal diameter). */
export function wireBareDiameterMm(w: WireSize): EngineResult<number> {
  const found = findWire(w);
  return found.ok ? ok(found.value.bareMm) : found;
}

/** Bare conductor area, mm² = (π/4)·d². */
export function wireBareAreaMm2(w: WireSize): EngineResult<number> {
  const found = findWire(w);
  return found.ok ? ok(found.value.areaMm2) : found;
}

/**
 * Typical insulated (overall) diameter, mm = bare + enamel increase for the grade. APPROXIMATION fitted to
 * "grade 2 ≈ 5–8 % over bare for 0.5–1.6 mm" [derived from IS 13730-0-1]; see enamel-build.ts.
 */
export function wireOverallDiameterMm(w: WireSize): EngineResult<number> {
  const found = findWire(w);
  return found.ok ? ok(typicalOverallDiameterMm(found.value.bareMm, w.enamelGrade)) : found;
}

/** Nearest AWG size by area, judged on a log scale (the gauge is logarithmic): |ln(A_found/A)| smallest. */
export function nearestAwgForAreaMm2(areaMm2Asked: number): EngineResult<NearestWire<AwgTableRow>> {
  if (!(areaMm2Asked > 0) || !Number.isFinite(areaMm2Asked)) {
    return fail('invalid-input', 'The conductor area must be a positive number.', 'Enter the area in mm².', 'area');
  }
  // Gauge number is linear in log(diameter), so rounding the continuous gauge is nearest on a log scale.
  const continuous = awgNumberForDiameterMm(Math.sqrt((4 * areaMm2Asked) / Math.PI));
  const n = Math.min(AWG_MAX_N, Math.max(AWG_MIN_N, Math.round(continuous)));
  const row = AWG_ROWS[n - AWG_MIN_N];
  return row
    ? finiteOr(row.areaMm2 / areaMm2Asked - 1, (difference) => ({ row, difference }), 'Area difference')
    : fail('non-finite-result', 'No AWG size found.', 'Check the area.', 'area');
}

/** Nearest metric nominal diameter, judged on a log scale: |ln(d_found/d)| smallest. */
export function nearestMetricForDiameterMm(diameterMm: number): EngineResult<NearestWire<MetricTableRow>> {
  if (!(diameterMm > 0) || !Number.isFinite(diameterMm)) {
    return fail('invalid-input', 'The diameter must be a positive number.', 'Enter the bare diameter in mm.', 'diameter');
  }
  let best: MetricTableRow | undefined;
  for (const row of METRIC_ROWS) {
    if (!best || Math.abs(Math.log(row.bareMm / diameterMm)) < Math.abs(Math.log(best.bareMm / diameterMm))) {
      best = row;
    }
  }
  return best
    ? finiteOr(best.bareMm / diameterMm - 1, (difference) => ({ row: best, difference }), 'Diameter difference')
    : fail('non-finite-result', 'No metric size found.', 'Check the diameter.', 'diameter');
}

/**
 * DC resistance of one AWG conductor, Ω per 1000 ft at 20 °C: R = ρ20·304.8 m / A, with ρ20 = 1/58 Ω·mm²/m
 * (IEC 60028, annealed copper) and A from the ASTM B258 formula diameter. AWG 18 → 6.385.
 */
export function awgResistanceOhmPer1000ft(gauge: string | number): EngineResult<number> {
  const found = findWire({ standard: 'awg', size: String(gauge) });
  if (!found.ok) return found;
  return finiteOr((COPPER_RESISTIVITY_20C_OHM_MM2_PER_M * 1000 * M_PER_FOOT) / found.value.areaMm2, (r) => r, 'Resistance per 1000 ft');
}
