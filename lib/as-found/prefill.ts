/**
 * A new sheet starts from the job's nameplate: supply (voltage, frequency, poles from the rated speed,
 * current, output), the connection when the plate states a plain star or delta, and the thermal class.
 */
import { polesFromSpeed } from '@/lib/engine/speed';
import { emptySheetForm, type SheetFormValues } from './as-found-form';

/** The nameplate fields the sheet uses (as stored on Motor, SI units). */
export interface NameplateForSheet {
  ratedVoltageV: number | null;
  frequencyHz: number | null;
  speedRpm: number | null;
  currentA: number | null;
  outputKw: number | null;
  connection: string | null;
  insulationClass: string | null;
}

const show = (v: number | null): string => (v === null || !Number.isFinite(v) ? '' : String(v));

/** Supply, connection and class from the nameplate, over `base` (a blank form by default). */
export function prefillFromNameplate(plate: NameplateForSheet, base: SheetFormValues = emptySheetForm()): SheetFormValues {
  const poles = plate.frequencyHz && plate.speedRpm ? polesFromSpeed(plate.frequencyHz, plate.speedRpm) : null;
  const cls = (plate.insulationClass ?? '').trim().toUpperCase();
  return {
    ...base,
    supply: {
      lineVoltageV: show(plate.ratedVoltageV),
      frequencyHz: show(plate.frequencyHz),
      poles: poles?.ok ? String(poles.value) : '',
      ratedCurrentA: show(plate.currentA),
      // Output to 3 decimals: a 15 hp plate is stored as 11.1855 kW.
      ratedOutputKw: plate.outputKw === null ? '' : String(Math.round(plate.outputKw * 1000) / 1000),
    },
    winding: {
      ...base.winding,
      connection: plate.connection === 'star' || plate.connection === 'delta' ? plate.connection : base.winding.connection,
    },
    insulation: {
      ...base.insulation,
      thermalClass: cls === 'A' || cls === 'B' || cls === 'F' || cls === 'H' ? cls : base.insulation.thermalClass,
    },
  };
}
