/**
 * Copper in a three-phase winding, per wire size: every turn of every coil is made of all the wires in
 * hand, so one conductor runs Σ turns × MLT = 3 · N_ph · a · MLT (N_ph series turns per phase, a parallel
 * paths), and each size in hand contributes count × that length of its own area (copperMassKg).
 * Check [derived], example A (36 slots, double layer, 14 turns per coil, a = 1, MLT 560 mm, 2 × 0.85 mm):
 * N_ph = 168, conductor 282.24 m, wire 564.48 m, copper 2.8476 kg.
 */
import { copperMassKg } from './copper';
import { fail, ok, type EngineResult } from './result';

export interface WindingCopperInput {
  seriesTurnsPerPhase: number;
  parallelPaths: number;
  meanTurnLengthMm: number;
  /** Each size in hand: label, bare area of one wire, how many of it in hand. */
  wires: readonly { label: string; areaMm2: number; count: number }[];
}

export interface WindingCopperLine {
  label: string;
  count: number;
  /** Length of this size in the winding (count × conductor length), m. */
  lengthM: number;
  copperKg: number;
}

export interface WindingCopper {
  conductorLengthM: number;
  lines: WindingCopperLine[];
  copperKg: number;
}

export function windingCopper(input: WindingCopperInput): EngineResult<WindingCopper> {
  const { seriesTurnsPerPhase, parallelPaths, meanTurnLengthMm, wires } = input;
  for (const [field, v] of [
    ['seriesTurnsPerPhase', seriesTurnsPerPhase],
    ['parallelPaths', parallelPaths],
    ['meanTurnLengthMm', meanTurnLengthMm],
  ] as const) {
    if (!(v > 0) || !Number.isFinite(v))
      return fail(
        'invalid-input',
        `${field} must be a positive number.`,
        'Fill in the winding data (turns, circuits and mean turn length).',
        field,
      );
  }
  if (wires.length === 0 || wires.some((w) => !(w.count > 0) || !(w.areaMm2 > 0) || !Number.isFinite(w.areaMm2)))
    return fail('invalid-input', 'Every wire in hand needs a positive count and area.', 'Check the wires in hand.', 'wires');
  const conductorLengthM = (3 * seriesTurnsPerPhase * parallelPaths * meanTurnLengthMm) / 1000;
  const lines = wires.map((w) => {
    const lengthM = w.count * conductorLengthM;
    return { label: w.label, count: w.count, lengthM, copperKg: copperMassKg(lengthM, w.areaMm2) };
  });
  return ok({ conductorLengthM, lines, copperKg: lines.reduce((t, l) => t + l.copperKg, 0) });
}
