/**
 * The winding data sheet as the engine reads it: the engine owns this shape, and the as-found schema
 * (lib/as-found/winding-sheet-schema.ts) checks user input into it. Lengths in mm, unit in every name.
 */
/** Insulation thermal classes (IEC 60085 letters): A 105, B 130, F 155, H 180 °C. The one list of them. */
export const THERMAL_CLASSES = ['A', 'B', 'F', 'H'] as const;
export type ThermalClass = (typeof THERMAL_CLASSES)[number];
/** How a wire size is given: AWG gauge or metric nominal bare diameter. */
export const WIRE_STANDARDS = ['awg', 'metric'] as const;
export type WireStandard = (typeof WIRE_STANDARDS)[number];

export interface CoreData {
  boreMm: number;
  coreLengthMm: number;
  outsideDiameterMm: number;
  slots: number;
  slotDepthMm: number;
  slotWidthTopMm: number;
  slotWidthBottomMm: number;
  slotOpeningMm?: number | undefined;
  toothWidthMm: number;
  stackingFactor: number;
  ventDucts?: number | undefined;
  ventDuctWidthMm?: number | undefined;
  rotorSlots?: number | undefined;
  airGapMm?: number | undefined;
}

/** One coil side of a winder's slot table. */
export interface CoilSideData {
  slot: number;
  layer: 1 | 2;
  phase: 'A' | 'B' | 'C';
  polarity: 1 | -1;
  turns: number;
  coil?: number | undefined;
}

export interface WindingData {
  layers: 1 | 2;
  style: 'lap' | 'concentric';
  singleLayerCoiling?: 'whole' | 'half' | undefined;
  /** Coil spans in slot pitches ("1–8" is 7); one per coil of a concentric group. */
  spans: number[];
  turnsPerCoil: number[];
  coilsPerGroup?: number | undefined;
  groups?: number | undefined;
  parallelPaths: number;
  connection: 'star' | 'delta';
  leads?: number | undefined;
  leadMarkings?: string | undefined;
  jumperNotes?: string | undefined;
  slotTable?: CoilSideData[] | undefined;
  meanTurnLengthMm?: number | undefined;
  coilExtensionMm?: number | undefined;
  copperWeightKg?: number | undefined;
}

/** One wire size in hand: AWG as written ("18", "4/0") or the metric nominal bare diameter in mm. */
export interface WireData {
  standard: WireStandard;
  size: string;
  count: number;
  enamelGrade: 1 | 2 | 3;
}

export interface InsulationData {
  thermalClass: ThermalClass;
  slotLiner?: string | undefined;
  wedges?: string | undefined;
  varnish?: string | undefined;
}

export interface SupplyData {
  lineVoltageV: number;
  frequencyHz: number;
  poles: number;
  ratedCurrentA?: number | undefined;
  ratedOutputKw?: number | undefined;
}

export interface ResistanceData {
  readings: [number, number, number];
  temperatureC: number;
  between: 'line-to-line' | 'phase';
}

/** A whole winding data sheet. */
export interface WindingSheetData {
  core: CoreData;
  winding: WindingData;
  wires: WireData[];
  insulation: InsulationData;
  supply: SupplyData;
  resistance?: ResistanceData | undefined;
  notes?: string | undefined;
}
