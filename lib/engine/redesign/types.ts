/**
 * Types of the redesign search: a customer's new supply for an existing core, the shop's limits and wire
 * stock, and the ranked candidate windings the search returns. Pure data (JSON-safe), so a request and a
 * chosen candidate can be stored as the approved snapshot unchanged.
 */
import type { EnamelGrade } from '../enamel-build';
import type { CoreGeometry } from '../flux';
import type { Layer, WindingSpec } from '../winding-layout';
import type { WireStandard } from '../wire';

/** One wire size the shop has on hand. */
export interface StockWire {
  standard: WireStandard;
  /** AWG gauge label ("18") or metric nominal diameter ("0.85"), as wire.ts names it. */
  size: string;
  enamelGrade: EnamelGrade;
  /** "AWG 18" or "0.850 mm". */
  label: string;
  bareMm: number;
  /** Typical insulated diameter for the grade (enamel-build.ts approximation). */
  overallMm: number;
  areaMm2: number;
  /** Kilograms on hand and free for this job (stock less what other approved redesigns reserve); null: not counted. */
  onHandKg?: number | null;
}

/** How far one density may move from the original, as fractions (0.05 = +5 %). */
export interface DensityChangeLimit {
  over: number;
  under: number;
}

/** The shop's limits for a redesign (ShopSettings holds the defaults). */
export interface RedesignLimits {
  gap: DensityChangeLimit;
  tooth: DensityChangeLimit;
  yoke: DensityChangeLimit;
  /** Largest rise of current density over the original, fraction (0.05 = +5 %). */
  currentDensityRise: number;
  /** Largest current density at all, A/mm² (used when the rated current is known). */
  currentDensityMaxAPerMm2: number;
  /** Largest insulated-wire fill of the gross slot area, fraction (or the original's fill, if higher). */
  slotFillMax: number;
  /** Most wires in hand in one conductor. */
  maxStrandsInHand: number;
  /** Most different sizes in one conductor, 1–3. */
  maxWireSizes: 1 | 2 | 3;
  /** Largest ratio of diameters mixed in one conductor (e.g. 1.3). */
  mixedSizeRatioMax: number;
  /** Thinnest bare wire the shop likes to wind, mm (or the as-found wire, if thinner); thinner wire is penalised. */
  minWireBareMm: number;
  /** Largest k_w5 and k_w7 (or the as-found winding's own, if higher); windings above it are rejected. */
  harmonicKwMax: number;
}

/** The winding as found, on its core, with what the search needs from the data sheet (metres inside). */
export interface RedesignOriginal {
  winding: WindingSpec;
  supply: { lineVoltageV: number; frequencyHz: number };
  core: CoreGeometry;
  grossSlotAreaMm2: number;
  /** Wires in hand as found (label, diameters, area, count). */
  wires: {
    label: string;
    standard?: WireStandard;
    size?: string;
    enamelGrade: EnamelGrade;
    bareMm: number;
    overallMm: number;
    areaMm2: number;
    count: number;
  }[];
  meanTurnLengthMm?: number;
  ratedCurrentA?: number;
  ratedOutputKw?: number;
  ratedSpeedRpm?: number;
}

/** What the customer needs, and the options the engineer allows. */
export interface RedesignTarget {
  lineVoltageV: number;
  frequencyHz: number;
  poles: number;
  /** 'either' lets the search try both. */
  connection: 'star' | 'delta' | 'either';
  /**
   * Lap spans to try ("1–8" is 7). Empty: keep the original span, or, when the poles or layers change, the
   * usual short-pitched spans from about 2/3 to the full pole pitch.
   */
  spans: number[];
  /** 'keep' the original layers and style, or rewind as a double-layer lap winding (concentric to lap). */
  layers: 'keep' | 'double-lap';
  /** Parallel circuits to try; empty: every count the layout allows, up to 8. */
  parallelPaths: number[];
  /** Over-pitched spans (longer than the pole pitch) are evaluated only when the engineer asks for them. */
  allowOverPitch: boolean;
}

/** The full request as stored with a redesign revision. */
export interface RedesignRequest {
  target: RedesignTarget;
  limits: RedesignLimits;
}

/** Wires in hand of one conductor: sizes from stock and their counts, thickest first. */
export interface WireSet {
  parts: { wire: StockWire; count: number }[];
  /** "2 × 0.850 mm + 1 × 0.800 mm". */
  label: string;
  areaMm2: number;
  /** Σ count·(π/4)·d_overall². */
  insulatedAreaMm2: number;
  strands: number;
}

/** Ratios new/old of the densities (gap and tooth scale with Φ·P_new/P_old, yoke with Φ). */
export interface DensityRatios {
  flux: number;
  gap: number;
  tooth: number;
  yoke: number;
}

/** One line of a candidate's winder-effort points (ranking.ts). */
export interface EffortItem {
  what: string;
  points: number;
}

/** Wire a candidate needs from stock, per size, and whether the stock holds it. */
export interface WireNeed {
  label: string;
  /** Copper mass wound into the stator (no allowance for leads and waste), kg. */
  kg: number;
  /** Free on hand, kg (null: the stock page does not count this size). */
  onHandKg: number | null;
  short: boolean;
}

/** One winding that meets every limit. */
export interface Candidate {
  /** Stable identity: the same candidate has the same key in every search (used to choose and approve). */
  key: string;
  rank: number;
  winding: WindingSpec;
  wires: WireSet;
  seriesTurnsPerPhase: number;
  windingFactor: number;
  fractional: boolean;
  /** k_w5, k_w7 and the MMF harmonic content √Σ(relative amplitude²) over orders ≠ 1 up to 49. */
  harmonics: { kw5: number; kw7: number; mmfDistortion: number };
  /** Orders below the working wave or even orders a fractional-slot layout carries (relative amplitude). */
  subHarmonics: { order: number; relativeAmplitude: number }[];
  ratios: DensityRatios;
  /** J_new/J_old with the expected current; absolute J when the rated current is known. */
  currentDensity: { ratio: number; aPerMm2: number | null };
  conductorsPerSlot: number;
  /** Insulated wire area over the gross slot area. */
  slotFill: number;
  /** Span over the new pole pitch (turn-weighted mean span / τ). */
  pitch: number;
  /** A double-layer span longer than the pole pitch: only when asked for, ranked after every other, with a caution. */
  overPitched: boolean;
  /** The as-found layout and wires in hand, re-turned or reconnected: ranked first when inside the limits. */
  keepsAsFoundWire: boolean;
  /** What differs from the original, in the winder's words. */
  changes: string[];
  /**
   * Unforced move from the original: max(|gap − 1|, |tooth − 1|, yoke term) + max(0, J ratio − 1). The yoke
   * term ignores a fall when the poles increase (forced); a falling current density is never counted.
   */
  closeness: number;
  /** Winder-effort points (ranking.ts RANKING_POINTS), itemised. */
  effort: EffortItem[];
  /** closeness in 5 % steps (ranking.ts) plus the effort points: lower ranks higher within a tier. */
  score: number;
  /** Wire needed per size against the stock on hand. */
  wireNeeds: WireNeed[];
}

/** A family of windings (layout, connection, circuits) the search gave up on, and why. */
export interface RejectedFamily {
  family: string;
  /** The binding constraint, with its numbers. */
  reason: string;
  /** Which limit binds: the screen groups by it. */
  binding?: 'flux' | 'slot-fill' | 'strands' | 'stock-sizes' | 'circuits' | 'harmonics' | 'span' | 'layout' | 'current-density' | 'stock';
}

/** What became of the as-found winding's wires on the new supply (always evaluated). */
export interface AsFoundCheck {
  /** Key of the best feasible as-found-wire candidate, or null. */
  key: string | null;
  /** Why the as-found wires cannot be kept, with numbers (null when a candidate keeps them). */
  reason: string | null;
}

/** Everything the search found. */
export interface RedesignSearch {
  candidates: Candidate[];
  rejected: RejectedFamily[];
  /** Families (layout × connection × circuits) examined, turn counts checked and wire combinations looked at. */
  familiesTried: number;
  turnsChecked: number;
  wireSetsConsidered: number;
  asFound: AsFoundCheck;
  /** Spans requested that do not suit the pole count, and what was done about it. */
  spanNotes: string[];
  /** Ratios that hold for every candidate (from the supply change alone). */
  expected: ExpectedRating;
  /** The original's own figures for comparison. */
  originalBasis: {
    seriesTurnsPerPhase: number;
    windingFactor: number;
    conductorAreaMm2: number;
    conductorsPerSlot: number;
    slotFill: number;
    /** The fill limit applied: the shop limit, or the original's own fill when that is higher (it was wound). */
    slotFillLimit: number;
    currentDensityAPerMm2: number | null;
  };
}

/** Rating the new winding is expected to carry, from the stated assumptions. */
export interface ExpectedRating {
  synchronousRpmOld: number;
  synchronousRpmNew: number;
  /** n_s,new/n_s,old. */
  speedRatio: number;
  /** P_new/P_old = speed ratio (torque kept: same flux density and current density in the same core). */
  powerRatio: number;
  /** I_line,new/I_line,old = power ratio × V_old/V_new (power scales with V·I; efficiency and power factor kept). */
  lineCurrentRatio: number;
  /** Torque kept. */
  torqueRatio: number;
  assumptions: string[];
}

/** A layout family: layers, style, spans and the figures that do not depend on turns or circuits. */
export interface LayoutFamily {
  layers: Layer;
  style: 'lap' | 'concentric';
  singleLayerCoiling?: 'whole' | 'half';
  spans: number[];
  windingFactor: number;
  allowedPaths: number[];
  fractional: boolean;
  harmonics: { kw5: number; kw7: number; mmfDistortion: number };
  /** Coil sides' turns per slot when every coil has one turn (Z_s = this × N_c). */
  sidesPerSlot: number;
  /** Coils per phase, C. */
  coilsPerPhase: number;
  /** Turn-weighted mean span, slots (end-turn length scales with it). */
  meanSpan: number;
  /** Mean span over the pole pitch; over 1 is over-pitched (double layer only). */
  pitch: number;
  overPitched: boolean;
  /** The as-found layout (poles, layers, style and spans unchanged). */
  asFoundLayout: boolean;
  subHarmonics: { order: number; relativeAmplitude: number }[];
}
