/**
 * The findings on a winding data sheet: the one set of checks the live analysis, the print view and the
 * command line all show (each finding says what looks wrong and what to check), so no rule is judged twice
 * in different words. What a winder wants before the old coils go in the scrap bin. Pure: takes a checked sheet and its engine analysis (lib/engine/analyse-sheet.ts)
 * and repeats none of the engine's calculations, only compares what the winder counted against them.
 */
import { COPPER_DENSITY_KG_PER_M3 } from './copper';
import type { SheetAnalysis } from './analyse-sheet';
import type { WindingSheetData as WindingSheet } from './winding-sheet';

export type FindingSeverity = 'problem' | 'check' | 'note';

/** One finding: a stable id (tests and screen), what was found, and what to check. */
export interface SheetFinding {
  id: string;
  severity: FindingSeverity;
  message: string;
  check: string;
}

/**
 * Largest gap between measured and predicted phase resistance (both at 20 °C) taken as agreement, percent.
 * The prediction rests on a measured mean turn length, which is rarely better than ±5–10 % [common practice,
 * from memory]: configurable, and the message shows the figure used.
 */
export const RESISTANCE_AGREEMENT_PERCENT = 10;
/** Weighed copper includes leads, jumpers and sleeving: only a gap above this is reported, percent [common practice]. */
export const COPPER_WEIGHT_AGREEMENT_PERCENT = 25;
/** Lead counts of three-phase stators: 3 (one voltage), 6 (star-delta or two-voltage delta), 9 and 12 (two-voltage) [common practice]. */
export const USUAL_LEAD_COUNTS = [3, 6, 9, 12] as const;

export interface FindingOptions {
  resistanceAgreementPercent?: number;
}

/** Coil groups: one per pole per phase (3P), or one per pole pair per phase (3P/2) when single-layer half-coiled. */
export const expectedGroups = (poles: number, layers: 1 | 2, coiling?: 'whole' | 'half'): number =>
  layers === 1 && coiling !== 'whole' ? (3 * poles) / 2 : 3 * poles;

const pct = (v: number): string => `${v > 0 ? '+' : ''}${v.toFixed(1)} %`;

function countChecks(sheet: WindingSheet, a: SheetAnalysis): SheetFinding[] {
  const out: SheetFinding[] = [];
  const { slots } = sheet.core;
  const { poles } = sheet.supply;
  const w = sheet.winding;
  const groups = expectedGroups(poles, w.layers, w.singleLayerCoiling);
  const layoutCoils = a.winding.layout.sides.length / 2;
  if (w.coilsPerGroup !== undefined && w.groups !== undefined && w.coilsPerGroup * w.groups !== layoutCoils)
    out.push({
      id: 'coil-count',
      severity: 'problem',
      message: `${w.groups} groups × ${w.coilsPerGroup} coils = ${w.coilsPerGroup * w.groups} coils, but a ${w.layers === 2 ? 'double' : 'single'}-layer winding in ${slots} slots has ${layoutCoils} (${w.layers === 2 ? 'one per slot' : 'one per two slots'}).`,
      check: 'Count the groups round the stator and the coils in one group again, and check the layer count (coil sides per slot).',
    });
  if (w.groups !== undefined && w.groups !== groups)
    out.push({
      id: 'groups-poles',
      severity: 'problem',
      message: `${w.groups} groups do not match ${poles} poles: expected ${groups} (${w.layers === 1 && w.singleLayerCoiling !== 'whole' ? '3 × P/2, single-layer half-coiled' : '3 × P, one group per pole per phase'}).`,
      check:
        'Check the pole count (nameplate speed) and count the groups again; a consequent-pole (half-coiled) winding has half as many groups.',
    });
  const q = slots / (3 * poles);
  if (w.coilsPerGroup !== undefined && w.style === 'concentric' && w.coilsPerGroup !== w.spans.length)
    out.push({
      id: 'coils-per-group',
      severity: 'problem',
      message: `${w.coilsPerGroup} coils per group but ${w.spans.length} span(s) given for the concentric group.`,
      check: 'Give one span and one turns figure for each coil of a group, outside coil first.',
    });
  else if (w.coilsPerGroup !== undefined && w.style === 'lap' && w.layers === 2 && Number.isInteger(q) && w.coilsPerGroup !== q)
    out.push({
      id: 'coils-per-group',
      severity: 'check',
      message: `${w.coilsPerGroup} coils per group, but ${slots} slots and ${poles} poles give q = ${q} slots per pole per phase (a double-layer lap group normally has q coils).`,
      check: 'Count the coils between two jumpers again; unequal groups point to a special or fractional layout.',
    });
  if (w.leads !== undefined && !(USUAL_LEAD_COUNTS as readonly number[]).includes(w.leads))
    out.push({
      id: 'leads',
      severity: 'check',
      message: `${w.leads} leads is unusual for a three-phase stator (usually ${USUAL_LEAD_COUNTS.join(', ')}).`,
      check: 'Count the leads at the terminal box and note any thermal-protector or heater leads separately.',
    });
  return out;
}

function layoutChecks(a: SheetAnalysis): SheetFinding[] {
  const out: SheetFinding[] = [];
  const p = a.winding.parallelPaths;
  if (!p.requestedAllowed)
    out.push({
      id: 'parallel-paths',
      severity: 'problem',
      message: `${p.requested} parallel circuit(s) are not possible in this layout: the circuits would not carry equal voltages and current would circulate between them. Possible: ${p.allowed.join(', ')}.`,
      check: 'Count the circuits at the lead ends and follow the jumpers again; then check the slot count, poles and layers.',
    });
  if (a.winding.balance.verdict !== 'balanced')
    out.push({
      id: 'unbalanced',
      severity: 'problem',
      message: `The layout is not balanced: ${a.winding.balance.reasons.join(' ')}`,
      check: 'Check the spans, the slot count and the pole count; mark where each phase starts before stripping.',
    });
  if (a.winding.fractional)
    out.push({
      id: 'fractional',
      severity: 'note',
      message: `Fractional-slot winding (q = ${a.winding.q.z}/${a.winding.q.d}): groups are not all the same size and the field has extra harmonic orders.`,
      check: 'Record the group sequence (e.g. 3-3-2-3-3-2) in the jumper notes; an engineer should review it.',
    });
  return out;
}

function resistanceChecks(sheet: WindingSheet, a: SheetAnalysis, limit: number): SheetFinding[] {
  const out: SheetFinding[] = [];
  const m = a.resistance?.measured;
  if (!m) return out;
  if (Math.abs(m.differencePercent) > limit) {
    const turns = sheet.winding.turnsPerCoil;
    const implied = turns.map((n) => Math.round(n * (1 + m.differencePercent / 100)));
    out.push({
      id: 'resistance-turns',
      severity: 'problem',
      message: `Measured resistance is ${pct(m.differencePercent)} from the resistance predicted by the turns, wire and mean turn length (agreement within ±${limit} % expected). If the wire and mean turn length are right, the readings suggest about ${implied.join('/')} turns per coil, not ${turns.join('/')}.`,
      check:
        'Recount the turns of one coil; check the wire size and wires in hand, the parallel circuits, star or delta, whether the readings are line-to-line or per phase, and the mean turn length.',
    });
  }
  if (!m.unbalance.pass)
    out.push({
      id: 'resistance-unbalance',
      severity: 'check',
      message: `Resistance readings differ by ${(m.unbalance.value * 100).toFixed(2)} % (limit ${(m.unbalance.limit * 100).toFixed(0)} %, ${m.unbalance.rule}).`,
      check:
        'Re-measure with clean lead ends at one temperature; a real unbalance points to a shorted turn, a bad joint or unequal circuits.',
    });
  return out;
}

function ratingChecks(sheet: WindingSheet, a: SheetAnalysis): SheetFinding[] {
  const out: SheetFinding[] = [];
  const f = a.winding.flux;
  if (f)
    for (const [name, d] of [
      ['Air-gap (peak)', f.gapPeak],
      ['Tooth', f.toothMax],
      ['Back-iron (yoke)', f.yoke],
    ] as const) {
      if (d.verdict === 'high' || d.verdict === 'above-conservative')
        out.push({
          id: `flux-${d === f.gapPeak ? 'gap' : d === f.toothMax ? 'tooth' : 'yoke'}`,
          severity: d.verdict === 'high' ? 'problem' : 'check',
          message: `${name} flux density ${d.tesla.toFixed(2)} T (${d.kilolinesPerIn2.toFixed(1)} kilolines/in²) is ${d.verdict === 'high' ? `above the typical ${d.limit.typical.high} T` : `above the conservative ${d.limit.conservative?.high ?? d.limit.typical.high} T`}.`,
          check:
            'Check turns per coil, span, parallel circuits, star/delta and the supply; then the core dimensions (bore, length, tooth width, slot depth, outside diameter).',
        });
    }
  const j = a.currentDensity;
  const jMax = j ? Math.max(...j.typical.map((t) => t.maxAPerMm2)) : 0;
  if (j && j.ampsPerMm2 > jMax)
    out.push({
      id: 'current-density',
      severity: 'check',
      message: `Current density ${j.ampsPerMm2.toFixed(1)} A/mm² (${j.circularMilsPerAmp.toFixed(0)} CM/A) at nameplate current is above ${jMax} A/mm².`,
      check: 'Check the wire size, wires in hand and parallel circuits, and the nameplate current.',
    });
  if (a.slotFill.insulatedOverGross > a.slotFill.handInsertionLimit.high)
    out.push({
      id: 'slot-fill',
      severity: 'check',
      message: `Insulated wire fills ${(a.slotFill.insulatedOverGross * 100).toFixed(0)} % of the gross slot area, above the ${(a.slotFill.handInsertionLimit.high * 100).toFixed(0)} % hand insertion allows.`,
      check: 'Check the slot dimensions, the wire size and wires in hand, and the turns per coil.',
    });
  const weighed = sheet.winding.copperWeightKg;
  const mlt = sheet.winding.meanTurnLengthMm;
  if (weighed !== undefined && mlt !== undefined) {
    const coilTurns = a.winding.layout.sides.reduce((s, x) => s + x.turns, 0) / 2;
    const predicted = coilTurns * (mlt / 1000) * (a.conductorAreaPerTurnMm2 * 1e-6) * COPPER_DENSITY_KG_PER_M3;
    const diff = ((weighed - predicted) / predicted) * 100;
    if (Math.abs(diff) > COPPER_WEIGHT_AGREEMENT_PERCENT)
      out.push({
        id: 'copper-weight',
        severity: 'note',
        message: `Weighed copper ${weighed} kg is ${pct(diff)} from the ${predicted.toFixed(2)} kg the turns, wire and mean turn length give.`,
        check: 'Weighed copper includes leads and jumpers; a large gap suggests a wrong wire size, wires in hand or turns.',
      });
  }
  return out;
}

/** Every finding, problems first. */
export function sheetFindings(sheet: WindingSheet, analysis: SheetAnalysis, options: FindingOptions = {}): SheetFinding[] {
  const order: Record<FindingSeverity, number> = { problem: 0, check: 1, note: 2 };
  return [
    ...countChecks(sheet, analysis),
    ...layoutChecks(analysis),
    ...resistanceChecks(sheet, analysis, options.resistanceAgreementPercent ?? RESISTANCE_AGREEMENT_PERCENT),
    ...ratingChecks(sheet, analysis),
  ].sort((x, y) => order[x.severity] - order[y.severity]);
}
