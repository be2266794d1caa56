/**
 * Wire to draw from stock for a winding: every turn of every coil is made of all the wires in hand, so each
 * size needs count × Σ(turns × MLT) metres; its copper mass is that length × bare area × 8890 kg/m³
 * (IEC 60028). The allowance for leads, jumpers and waste is added on top as a fraction (a shop setting).
 * Enamel mass is not counted: it is a few per cent of the copper and the allowance covers it.
 * Check [derived]: example A, 36 coils × 14 turns × 0.56 m, 2 × 0.85 mm → 282.24 m of conductor,
 * 564.48 m of wire, 2.848 kg of copper.
 */
import { COPPER_DENSITY_KG_PER_M3 } from '../copper';
import { fail, ok, type EngineResult } from '../result';
import { mmToM } from '../units';

/** Allowance for leads, jumpers and waste when the shop has set none: 10 % [common practice, from memory]. */
export const DEFAULT_WIRE_ALLOWANCE = 0.1;
/** The allowance a shop may set, as a fraction. */
export const WIRE_ALLOWANCE_RANGE = { min: 0, max: 1 } as const;

/** One coil as the draw needs it. */
export interface CoilTurns {
  turns: number;
  meanTurnLengthMm: number;
}

/** One wire size of the conductor. */
export interface WirePart {
  label: string;
  count: number;
  areaMm2: number;
}

/** What to draw of one size. */
export interface WireDrawLine {
  label: string;
  count: number;
  /** Wire length of this size in the winding, m. */
  lengthM: number;
  copperKg: number;
  /** With the allowance. */
  drawKg: number;
  drawLengthM: number;
}

/** The draw for a whole winding. */
export interface WireDraw {
  /** Σ turns × MLT over every coil: one conductor's length, m. */
  conductorLengthM: number;
  allowance: number;
  lines: WireDrawLine[];
  copperKg: number;
  drawKg: number;
}

/** Wire per size for the coils of a winding, with the allowance (fraction, 0 … 1). */
export function wireDraw(coils: CoilTurns[], parts: WirePart[], allowance: number): EngineResult<WireDraw> {
  if (!Number.isFinite(allowance) || allowance < WIRE_ALLOWANCE_RANGE.min || allowance > WIRE_ALLOWANCE_RANGE.max)
    return fail(
      'invalid-input',
      `The wire allowance must be from 0 to 100 %, not ${allowance * 100} %.`,
      'Set the allowance for leads and waste on the stock page.',
      'wireAllowance',
    );
  if (coils.length === 0 || coils.some((c) => !(c.turns > 0) || !(c.meanTurnLengthMm > 0) || !Number.isFinite(c.meanTurnLengthMm)))
    return fail(
      'invalid-input',
      'Every coil needs positive turns and a positive mean turn length.',
      'Check the winding and the core.',
      'winding',
    );
  if (parts.length === 0 || parts.some((p) => !(p.count > 0) || !(p.areaMm2 > 0) || !Number.isFinite(p.areaMm2)))
    return fail('invalid-input', 'Every wire in hand needs a positive count and area.', 'Check the wires in hand.', 'wires');
  const conductorLengthM = coils.reduce((t, c) => t + c.turns * mmToM(c.meanTurnLengthMm), 0);
  const lines = parts.map((p) => {
    const lengthM = p.count * conductorLengthM;
    const copperKg = lengthM * p.areaMm2 * 1e-6 * COPPER_DENSITY_KG_PER_M3;
    return {
      label: p.label,
      count: p.count,
      lengthM,
      copperKg,
      drawKg: copperKg * (1 + allowance),
      drawLengthM: lengthM * (1 + allowance),
    };
  });
  const copperKg = lines.reduce((t, l) => t + l.copperKg, 0);
  return ok({ conductorLengthM, allowance, lines, copperKg, drawKg: copperKg * (1 + allowance) });
}
