/**
 * What a rewind does to stator copper loss and to efficiency: each winding's resistance (predicted from its
 * turns, wire and mean turn length, or measured) brought from 20 °C to the class's specified temperature
 * (reference-temperature.ts, IEEE 112), its I²R loss at its rated current (copper-loss.ts), the change in
 * watts and, with a nameplate efficiency, in efficiency points (efficiency-change.ts) with every other loss
 * unchanged except the core-loss change from the loop tests when measured. A rise above the shop's limit is
 * a finding with what to check.
 *
 * Default limit: +5 % stator I²R [common practice: a rewind to the original data should land within a few
 * percent of the original resistance, the spread of mean turn length and wire tolerance; configurable].
 */
import type { Connection } from '../resistance';
import { statorCopperLossW } from './copper-loss';
import { efficiencyAfterLossChange, type EfficiencyChange } from './efficiency-change';
import { resistanceAtSpecifiedTemperatureOhm, SPECIFIED_TEMPERATURE_C, type ThermalClass } from './reference-temperature';

export const DEFAULT_COPPER_LOSS_RISE_LIMIT = 0.05;

export interface WindingForLoss {
  /** Where the resistance comes from, in words (e.g. "as-found data sheet, revision 3, predicted"). */
  source: string;
  phaseOhm20: number;
  connection: Connection;
  lineCurrentA: number;
}

export interface WindingLoss extends WindingForLoss {
  phaseOhmAtReference: number;
  copperLossW: number;
}

export interface RewindLossInput {
  thermalClass: ThermalClass;
  before: WindingForLoss;
  after: WindingForLoss;
  /** Rated output after the rewind, kW, and the nameplate efficiency (fraction), for the efficiency change. */
  outputKw?: number | undefined;
  efficiency?: number | undefined;
  /** Core-loss change at the working density from the loop tests, W (loss-at-rating.ts), when measured. */
  coreLossChangeW?: number | undefined;
  limitFraction?: number;
}

export interface RewindLosses {
  referenceTemperatureC: number;
  thermalClass: ThermalClass;
  before: WindingLoss;
  after: WindingLoss;
  copperChangeW: number;
  copperChangeFraction: number;
  coreLossChangeW: number | null;
  efficiency: EfficiencyChange | null;
  limitFraction: number;
  /** Set when the copper loss rises by more than the limit: what to check. */
  finding: string | null;
}

function windingLoss(w: WindingForLoss, thermalClass: ThermalClass): WindingLoss {
  const phaseOhmAtReference = resistanceAtSpecifiedTemperatureOhm(w.phaseOhm20, thermalClass);
  return { ...w, phaseOhmAtReference, copperLossW: statorCopperLossW(w.lineCurrentA, phaseOhmAtReference, w.connection) };
}

const usable = (w: WindingForLoss): boolean => [w.phaseOhm20, w.lineCurrentA].every((v) => Number.isFinite(v) && v > 0);

/** The before/after copper loss, its change, the efficiency change and the finding; null without usable data. */
export function rewindLosses(input: RewindLossInput): RewindLosses | null {
  if (!usable(input.before) || !usable(input.after)) return null;
  const limitFraction = input.limitFraction ?? DEFAULT_COPPER_LOSS_RISE_LIMIT;
  const before = windingLoss(input.before, input.thermalClass);
  const after = windingLoss(input.after, input.thermalClass);
  const copperChangeW = after.copperLossW - before.copperLossW;
  const copperChangeFraction = copperChangeW / before.copperLossW;
  const coreLossChangeW = input.coreLossChangeW !== undefined && Number.isFinite(input.coreLossChangeW) ? input.coreLossChangeW : null;
  const efficiency =
    input.outputKw !== undefined && input.efficiency !== undefined
      ? efficiencyAfterLossChange(input.outputKw * 1000, input.efficiency, copperChangeW + (coreLossChangeW ?? 0))
      : null;
  const finding =
    copperChangeFraction > limitFraction
      ? `The rewind raises stator copper loss by ${(copperChangeFraction * 100).toFixed(1)} % (${copperChangeW.toFixed(1)} W), more than the shop's limit of ${(limitFraction * 100).toFixed(1)} %. Check the wire size (copper area per turn: less copper than the original raises the resistance), the turns per coil and the mean turn length against the original data before winding.`
      : null;
  return {
    referenceTemperatureC: SPECIFIED_TEMPERATURE_C[input.thermalClass],
    thermalClass: input.thermalClass,
    before,
    after,
    copperChangeW,
    copperChangeFraction,
    coreLossChangeW,
    efficiency,
    limitFraction,
    finding,
  };
}
