/**
 * Slot area and slot fill for round wire.
 *
 * Slot shape: a trapezoid from the top (bore side, under the wedge) to the bottom (yoke side), optionally
 * with a semicircular bottom whose diameter is the bottom width. Dimensions are those of the usable slot,
 * below the tooth tips.
 */
import { fail, finiteOr, type EngineResult } from './result';

/** Usable slot outline, mm. */
export interface SlotShape {
  /** Depth from the top of the usable slot to its deepest point, mm (includes the round bottom). */
  depthMm: number;
  /** Width at the top (bore side), mm. */
  topWidthMm: number;
  /** Width at the bottom (yoke side), mm; with a round bottom, the diameter of the semicircle. */
  bottomWidthMm: number;
  roundBottom?: boolean;
}

/** Insulation that takes slot area away from the wire, mm. */
export interface SlotInsulation {
  /** Slot liner (cell) thickness, mm, on the sides and bottom. */
  linerThicknessMm: number;
  /** Depth taken by the wedge (top stick) and its closure, mm, across the top width. */
  wedgeDepthMm: number;
  /** Separator between layers of a double-layer winding, mm (0 or absent for single layer). */
  separatorThicknessMm?: number;
}

const invalid = (field: string, message: string): EngineResult<never> =>
  fail('invalid-input', message, 'Measure the slot again and check the units (mm).', field);

function checkShape(s: SlotShape): EngineResult<never> | null {
  const { depthMm, topWidthMm, bottomWidthMm } = s;
  for (const [field, v] of [
    ['depthMm', depthMm],
    ['topWidthMm', topWidthMm],
    ['bottomWidthMm', bottomWidthMm],
  ] as const) {
    if (!(v > 0) || !Number.isFinite(v)) return invalid(field, `${field} must be a positive number.`);
  }
  if (s.roundBottom && bottomWidthMm / 2 > depthMm) {
    return invalid('depthMm', 'The slot is shallower than the radius of its round bottom.');
  }
  return null;
}

/** Straight-sided depth: the full depth, less the radius when the bottom is round. */
const straightDepthMm = (s: SlotShape): number => (s.roundBottom ? s.depthMm - s.bottomWidthMm / 2 : s.depthMm);

/**
 * Gross slot area, mm²: trapezoid h·(b_top + b_bottom)/2 over the straight depth h, plus π·r²/2 for a
 * round bottom of radius r = b_bottom/2 [derived: plane geometry].
 */
export function grossSlotAreaMm2(s: SlotShape): EngineResult<number> {
  const bad = checkShape(s);
  if (bad) return bad;
  const h = straightDepthMm(s);
  const r = s.bottomWidthMm / 2;
  const area = (h * (s.topWidthMm + s.bottomWidthMm)) / 2 + (s.roundBottom ? (Math.PI * r * r) / 2 : 0);
  return finiteOr(area, (a) => a, 'Slot area');
}

/**
 * Net slot area, mm², left for the wires: gross − wedge depth × top width − liner thickness × lined
 * perimeter (both sides below the wedge plus the flat or round bottom) − separator thickness × the width at
 * mid-depth. A thin-wall approximation [derived], good while the liner is thin against the slot width.
 */
export function netSlotAreaMm2(s: SlotShape, ins: SlotInsulation): EngineResult<number> {
  const gross = grossSlotAreaMm2(s);
  if (!gross.ok) return gross;
  const t = ins.linerThicknessMm;
  const w = ins.wedgeDepthMm;
  const sep = ins.separatorThicknessMm ?? 0;
  for (const [field, v] of [
    ['linerThicknessMm', t],
    ['wedgeDepthMm', w],
    ['separatorThicknessMm', sep],
  ] as const) {
    if (!(v >= 0) || !Number.isFinite(v)) return invalid(field, `${field} must be zero or a positive number.`);
  }
  const h = straightDepthMm(s);
  if (w >= h) return invalid('wedgeDepthMm', 'The wedge is as deep as the straight part of the slot.');
  const flare = (s.bottomWidthMm - s.topWidthMm) / 2;
  const sideLengthMm = (Math.hypot(h, flare) * (h - w)) / h;
  const bottomLengthMm = s.roundBottom ? (Math.PI * s.bottomWidthMm) / 2 : s.bottomWidthMm;
  const midWidthMm = (s.topWidthMm + s.bottomWidthMm) / 2;
  const net = gross.value - w * s.topWidthMm - t * (2 * sideLengthMm + bottomLengthMm) - sep * midWidthMm;
  if (!(net > 0)) return invalid('linerThicknessMm', 'The insulation leaves no room for wire in this slot.');
  return finiteOr(net, (a) => a, 'Net slot area');
}

/** What sits in one slot, and the slot areas to divide by. */
export interface SlotFillInput {
  /** Conductors (turn sides) per slot, Z_s: double layer 2·N_c, single layer N_c. */
  conductorsPerSlot: number;
  /** Wires in hand making up one conductor; several sizes may be mixed. */
  strands: readonly { bareDiameterMm: number; overallDiameterMm: number; count: number }[];
  grossSlotAreaMm2: number;
  netSlotAreaMm2: number;
}

/** Slot fill by both definitions, as fractions. */
export interface SlotFill {
  /** Bare copper fill: Z_s·Σ count·(π/4)·d_bare² ÷ gross slot area (a copper space factor). */
  bareCopperOverGross: number;
  /**
   * Insulated wire fill: Z_s·Σ count·(π/4)·d_overall² ÷ net slot area (area of the enamelled wire's circle,
   * over the area left after liner, wedge and separator). The usual shop measure for hand insertion.
   */
  insulatedOverNet: number;
}

/**
 * Both slot-fill definitions (see SlotFill): bare copper / gross, and insulated wire / net.
 * Expects finite positive areas.
 */
export function slotFill(input: SlotFillInput): SlotFill {
  const circles = (pick: (s: SlotFillInput['strands'][number]) => number): number =>
    input.conductorsPerSlot * input.strands.reduce((sum, s) => sum + s.count * (Math.PI / 4) * pick(s) ** 2, 0);
  return {
    bareCopperOverGross: circles((s) => s.bareDiameterMm) / input.grossSlotAreaMm2,
    insulatedOverNet: circles((s) => s.overallDiameterMm) / input.netSlotAreaMm2,
  };
}

/**
 * Typical upper limit of insulated-over-net fill for hand insertion of round wire: 0.65–0.75
 * [common practice, from memory]. Keep it configurable per shop.
 */
export const HAND_INSERTION_FILL_LIMIT = { low: 0.65, high: 0.75 } as const;
