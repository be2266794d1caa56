/**
 * The original winding beside a chosen candidate: every figure the engineer approves and the winder winds
 * from, formatted with units (metric first, imperial beside it) and marked where it leaves its range, plus
 * the expected rating, the proposed supplementary nameplate and the cautions. JSON-safe: this is what an
 * approval freezes.
 */
import { analyseWinding } from '../analyse-winding';
import { DEFAULT_FLUX_LIMITS, judgeFlux, type FluxLimit } from '../flux';
import { lineToLineFromPhaseOhm, phaseResistanceOhm } from '../resistance';
import { fail, ok, type EngineResult } from '../result';
import { torqueNm } from '../speed';
import { ampsPerMm2ToCmilPerAmp, kwToHp, mm2ToCircularMils, mmToInches, nmToLbfFt, teslaToKilolinesPerIn2 } from '../units';
import { harmonicSummary, meanSpan } from './families';
import { partsLabel } from './wire-sets';
import { redesignWarnings, type RedesignWarning } from './warnings';
import type { Candidate, ExpectedRating, RedesignOriginal, RedesignRequest, RedesignSearch } from './types';
import { spansLabel, layoutLabel } from '../notation';

/** 'out' when the value leaves its range (the screen shows a symbol and words, not colour alone). */
export type RowStatus = 'ok' | 'out' | 'info';

/** One line of the side-by-side table. */
export interface ComparisonRow {
  key: string;
  group: 'winding' | 'magnetic' | 'copper' | 'rating';
  label: string;
  original: string;
  candidate: string;
  values: { original: number | null; candidate: number | null };
  /** candidate/original where that means something. */
  ratio: number | null;
  status: RowStatus;
  originalStatus: RowStatus;
  /** The range or rule the status was judged against, or why it is out. */
  note?: string;
}

/** Data for a supplementary nameplate. */
export interface ProposedNameplate {
  lineVoltageV: number;
  connection: 'star' | 'delta';
  frequencyHz: number;
  poles: number;
  synchronousRpm: number;
  /** Estimated, same slip fraction as the original plate; null without the original speed. */
  speedRpm: number | null;
  currentA: number | null;
  outputKw: number | null;
  outputHp: number | null;
  torqueNm: number | null;
  notes: string[];
}

/** Everything shown and frozen for one candidate. */
export interface RedesignReport {
  candidate: Candidate;
  rows: ComparisonRow[];
  expected: ExpectedRating;
  nameplate: ProposedNameplate;
  warnings: RedesignWarning[];
}

const num = (v: number, d: number): string => (Number.isFinite(v) ? v.toFixed(d) : '—');
const tesla = (t: number): string => `${num(t, 3)} T (${num(teslaToKilolinesPerIn2(t), 1)} kl/in²)`;
const pct = (f: number): string => `${num(f * 100, 1)} %`;
const limitText = (over: number, under: number): string => `limit +${num(over * 100, 0)} % / −${num(under * 100, 0)} % of the original`;

function fluxStatus(t: number, limit: FluxLimit): { status: RowStatus; note?: string } {
  const v = judgeFlux(t, limit);
  // Typical ranges are recalled [from memory] (see lib/engine/flux.ts); the note shows the band used.
  if (v === 'high') return { status: 'out', note: `above the typical ${limit.typical.low}–${limit.typical.high} T` };
  if (v === 'above-conservative') return { status: 'ok', note: `above the conservative ${limit.conservative?.high} T` };
  return { status: 'ok' };
}

/** Builds the comparison, expected rating, nameplate and cautions for one candidate. */
export function redesignReport(
  original: RedesignOriginal,
  request: RedesignRequest,
  search: RedesignSearch,
  candidate: Candidate,
): EngineResult<RedesignReport> {
  const ow = original.winding;
  const { limits, target } = request;
  const oldA = analyseWinding({ winding: ow, supply: original.supply, core: original.core });
  if (!oldA.ok) return oldA;
  const newA = analyseWinding({
    winding: candidate.winding,
    supply: { lineVoltageV: target.lineVoltageV, frequencyHz: target.frequencyHz },
  });
  if (!newA.ok) return newA;
  const oldFlux = oldA.value.flux;
  if (!oldFlux)
    return fail('invalid-input', 'The as-found core gives no flux figures.', 'Complete the core dimensions on the sheet.', 'core');
  const oh = harmonicSummary(oldA.value);
  const e = search.expected;
  const b = search.originalBasis;
  const rows: ComparisonRow[] = [];
  const row = (
    r: Omit<ComparisonRow, 'status' | 'originalStatus' | 'ratio' | 'values'> &
      Partial<Pick<ComparisonRow, 'status' | 'originalStatus' | 'ratio' | 'values'>>,
  ): void => {
    rows.push({ status: 'info', originalStatus: 'info', ratio: null, values: { original: null, candidate: null }, ...r });
  };
  const nums = (o: number | null, c: number | null) => ({ values: { original: o, candidate: c }, ratio: o && c !== null ? c / o : null });

  // Winding
  const cw = candidate.winding;
  row({
    key: 'supply',
    group: 'winding',
    label: 'Supply',
    original: `${original.supply.lineVoltageV} V ${original.supply.frequencyHz} Hz, ${ow.poles} poles`,
    candidate: `${target.lineVoltageV} V ${target.frequencyHz} Hz, ${cw.poles} poles`,
  });
  row({
    key: 'turns',
    group: 'winding',
    label: 'Turns per coil',
    original: ow.turnsPerCoil.join(' / '),
    candidate: cw.turnsPerCoil.join(' / '),
    ...nums(ow.turnsPerCoil[0] ?? null, cw.turnsPerCoil[0] ?? null),
  });
  row({ key: 'connection', group: 'winding', label: 'Connection', original: ow.connection, candidate: cw.connection });
  row({
    key: 'circuits',
    group: 'winding',
    label: 'Parallel circuits',
    original: String(ow.parallelPaths),
    candidate: String(cw.parallelPaths),
    ...nums(ow.parallelPaths, cw.parallelPaths),
  });
  row({ key: 'layout', group: 'winding', label: 'Layers and style', original: `${layoutLabel(ow)}`, candidate: `${layoutLabel(cw)}` });
  row({ key: 'span', group: 'winding', label: 'Coil span (slots)', original: spansLabel(ow.spans), candidate: spansLabel(cw.spans) });
  row({
    key: 'wires',
    group: 'winding',
    label: 'Wires in hand',
    original: partsLabel(original.wires.map((w) => ({ wire: w, count: w.count }))),
    candidate: candidate.wires.label,
  });
  row({
    key: 'seriesTurns',
    group: 'winding',
    label: 'Series turns per phase',
    original: num(b.seriesTurnsPerPhase, 1),
    candidate: num(candidate.seriesTurnsPerPhase, 1),
    ...nums(b.seriesTurnsPerPhase, candidate.seriesTurnsPerPhase),
  });
  row({
    key: 'kw1',
    group: 'winding',
    label: 'Winding factor k_w1',
    original: num(b.windingFactor, 4),
    candidate: num(candidate.windingFactor, 4),
    ...nums(b.windingFactor, candidate.windingFactor),
  });
  row({
    key: 'kw5',
    group: 'winding',
    label: 'k_w5 / k_w7',
    original: `${num(oh.kw5, 4)} / ${num(oh.kw7, 4)}`,
    candidate: `${num(candidate.harmonics.kw5, 4)} / ${num(candidate.harmonics.kw7, 4)}`,
  });
  row({
    key: 'mmf',
    group: 'winding',
    label: 'MMF harmonic content (orders ≠ 1, to 49)',
    original: pct(oh.mmfDistortion),
    candidate: pct(candidate.harmonics.mmfDistortion),
    ...nums(oh.mmfDistortion, candidate.harmonics.mmfDistortion),
    ...(candidate.fractional
      ? { status: 'out' as const, note: 'fractional slot: even or sub-harmonic orders present, engineer review' }
      : {}),
  });

  // Magnetic
  const r = candidate.ratios;
  row({
    key: 'flux',
    group: 'magnetic',
    label: 'Flux per pole',
    original: `${num(oldFlux.fluxPerPoleWb * 1000, 3)} mWb`,
    candidate: `${num(oldFlux.fluxPerPoleWb * r.flux * 1000, 3)} mWb`,
    values: { original: oldFlux.fluxPerPoleWb, candidate: oldFlux.fluxPerPoleWb * r.flux },
    ratio: r.flux,
  });
  const dens = [
    ['gapAverage', 'Gap flux density (average)', oldFlux.gapAverage.tesla, r.gap, limits.gap, DEFAULT_FLUX_LIMITS.gapAverage],
    ['gapPeak', 'Gap flux density (peak)', oldFlux.gapPeak.tesla, r.gap, limits.gap, DEFAULT_FLUX_LIMITS.gapPeak],
    ['tooth', 'Tooth flux density (max)', oldFlux.toothMax.tesla, r.tooth, limits.tooth, DEFAULT_FLUX_LIMITS.tooth],
    ['yoke', 'Yoke (back-iron) flux density', oldFlux.yoke.tesla, r.yoke, limits.yoke, DEFAULT_FLUX_LIMITS.yoke],
  ] as const;
  for (const [key, label, t0, ratio, lim, abs] of dens) {
    const t1 = t0 * ratio;
    const outOfChange = ratio > 1 + lim.over + 1e-12 || ratio < 1 - lim.under - 1e-12;
    const absNew = fluxStatus(t1, abs);
    const absOld = fluxStatus(t0, abs);
    row({
      key,
      group: 'magnetic',
      label,
      original: tesla(t0),
      candidate: tesla(t1),
      values: { original: t0, candidate: t1 },
      ratio,
      status: outOfChange || absNew.status === 'out' ? 'out' : 'ok',
      originalStatus: absOld.status,
      note: [limitText(lim.over, lim.under), absNew.note].filter(Boolean).join('; '),
    });
  }

  // Copper
  const jOld = b.currentDensityAPerMm2;
  const jNew = candidate.currentDensity.aPerMm2;
  const jOut =
    candidate.currentDensity.ratio > 1 + limits.currentDensityRise + 1e-12 ||
    (jNew !== null && jNew > limits.currentDensityMaxAPerMm2 + 1e-12);
  row({
    key: 'area',
    group: 'copper',
    label: 'Copper area per turn',
    original: `${num(b.conductorAreaMm2, 3)} mm² (${num(mm2ToCircularMils(b.conductorAreaMm2), 0)} CM)`,
    candidate: `${num(candidate.wires.areaMm2, 3)} mm² (${num(mm2ToCircularMils(candidate.wires.areaMm2), 0)} CM)`,
    ...nums(b.conductorAreaMm2, candidate.wires.areaMm2),
  });
  row({
    key: 'currentDensity',
    group: 'copper',
    label: 'Current density',
    original: jOld === null ? '— (no rated current on the sheet)' : `${num(jOld, 2)} A/mm² (${num(ampsPerMm2ToCmilPerAmp(jOld), 0)} CM/A)`,
    candidate:
      jNew === null
        ? `${num(candidate.currentDensity.ratio * 100, 1)} % of the original`
        : `${num(jNew, 2)} A/mm² (${num(ampsPerMm2ToCmilPerAmp(jNew), 0)} CM/A)`,
    values: { original: jOld, candidate: jNew },
    ratio: candidate.currentDensity.ratio,
    status: jOut ? 'out' : 'ok',
    originalStatus: jOld !== null && jOld > limits.currentDensityMaxAPerMm2 ? 'out' : 'ok',
    note: `limit +${num(limits.currentDensityRise * 100, 0)} % of the original and ${limits.currentDensityMaxAPerMm2} A/mm² at most`,
  });
  row({
    key: 'conductorsPerSlot',
    group: 'copper',
    label: 'Conductors per slot',
    original: String(b.conductorsPerSlot),
    candidate: String(candidate.conductorsPerSlot),
    ...nums(b.conductorsPerSlot, candidate.conductorsPerSlot),
  });
  row({
    key: 'slotFill',
    group: 'copper',
    label: 'Slot fill (insulated wire / gross slot area)',
    original: pct(b.slotFill),
    candidate: pct(candidate.slotFill),
    ...nums(b.slotFill, candidate.slotFill),
    status: candidate.slotFill > Math.max(limits.slotFillMax, b.slotFill) + 1e-12 ? 'out' : 'ok',
    originalStatus: b.slotFill > limits.slotFillMax ? 'out' : 'ok',
    note:
      b.slotFill > limits.slotFillMax
        ? `shop limit ${pct(limits.slotFillMax)}; the original already fills ${pct(b.slotFill)}, so the new winding may fill as much, never more — check the slot dimensions on the sheet`
        : `limit ${pct(limits.slotFillMax)}`,
  });
  const mlt = meanTurnLengths(original, candidate);
  if (mlt) {
    row({
      key: 'mlt',
      group: 'copper',
      label: 'Mean turn length (estimated for a new span)',
      original: `${num(mlt.oldMm, 0)} mm (${num(mmToInches(mlt.oldMm), 1)} in)`,
      candidate: `${num(mlt.newMm, 0)} mm (${num(mmToInches(mlt.newMm), 1)} in)`,
      ...nums(mlt.oldMm, mlt.newMm),
      note: 'end turns scaled with the mean span',
    });
    const rOld = phaseResistanceOhm({
      coilsPerPhase: oldA.value.layout.sides.length / 6,
      turnsPerCoil: (b.seriesTurnsPerPhase * ow.parallelPaths) / (oldA.value.layout.sides.length / 6),
      meanTurnLengthM: mlt.oldMm / 1000,
      parallelPaths: ow.parallelPaths,
      strands: [{ areaMm2: b.conductorAreaMm2, count: 1 }],
      temperatureC: 20,
    });
    const coils = newA.value.layout.sides.length / 6;
    const rNew = phaseResistanceOhm({
      coilsPerPhase: coils,
      turnsPerCoil: cw.turnsPerCoil[0] ?? 0,
      meanTurnLengthM: mlt.newMm / 1000,
      parallelPaths: cw.parallelPaths,
      strands: [{ areaMm2: candidate.wires.areaMm2, count: 1 }],
      temperatureC: 20,
    });
    row({
      key: 'resistance',
      group: 'copper',
      label: 'Predicted resistance at 20 °C, phase (line-to-line)',
      original: `${num(rOld, 4)} Ω (${num(lineToLineFromPhaseOhm(rOld, ow.connection), 4)} Ω)`,
      candidate: `${num(rNew, 4)} Ω (${num(lineToLineFromPhaseOhm(rNew, cw.connection), 4)} Ω)`,
      ...nums(rOld, rNew),
    });
  }

  // Rating
  const plate = proposeNameplate(original, request, candidate, e);
  row({
    key: 'syncSpeed',
    group: 'rating',
    label: 'Synchronous speed',
    original: `${num(e.synchronousRpmOld, 0)} rpm`,
    candidate: `${num(e.synchronousRpmNew, 0)} rpm`,
    ...nums(e.synchronousRpmOld, e.synchronousRpmNew),
  });
  if (original.ratedSpeedRpm && plate.speedRpm)
    row({
      key: 'speed',
      group: 'rating',
      label: 'Rated speed (same slip)',
      original: `${num(original.ratedSpeedRpm, 0)} rpm`,
      candidate: `${num(plate.speedRpm, 0)} rpm`,
      ...nums(original.ratedSpeedRpm, plate.speedRpm),
    });
  row({
    key: 'current',
    group: 'rating',
    label: 'Expected line current',
    original: original.ratedCurrentA ? `${num(original.ratedCurrentA, 1)} A` : '—',
    candidate: plate.currentA ? `${num(plate.currentA, 1)} A` : `${num(e.lineCurrentRatio * 100, 1)} % of the original`,
    values: { original: original.ratedCurrentA ?? null, candidate: plate.currentA },
    ratio: e.lineCurrentRatio,
  });
  row({
    key: 'power',
    group: 'rating',
    label: 'Expected output',
    original: original.ratedOutputKw ? `${num(original.ratedOutputKw, 2)} kW (${num(kwToHp(original.ratedOutputKw), 1)} hp)` : '—',
    candidate: plate.outputKw
      ? `${num(plate.outputKw, 2)} kW (${num(kwToHp(plate.outputKw), 1)} hp)`
      : `${num(e.powerRatio * 100, 1)} % of the original`,
    values: { original: original.ratedOutputKw ?? null, candidate: plate.outputKw },
    ratio: e.powerRatio,
  });
  const tOld = original.ratedOutputKw && original.ratedSpeedRpm ? torqueNm(original.ratedOutputKw, original.ratedSpeedRpm) : null;
  row({
    key: 'torque',
    group: 'rating',
    label: 'Expected torque',
    original: tOld ? `${num(tOld, 1)} N·m (${num(nmToLbfFt(tOld), 1)} lbf·ft)` : '—',
    candidate: plate.torqueNm
      ? `${num(plate.torqueNm, 1)} N·m (${num(nmToLbfFt(plate.torqueNm), 1)} lbf·ft)`
      : `${num(e.torqueRatio * 100, 0)} % of the original`,
    values: { original: tOld, candidate: plate.torqueNm },
    ratio: e.torqueRatio,
  });

  return ok({ candidate, rows, expected: e, nameplate: plate, warnings: redesignWarnings(original, target, candidate) });
}

/** MLT of the original and, end turns scaled with the mean span, of the candidate [derived approximation]. */
function meanTurnLengths(original: RedesignOriginal, candidate: Candidate): { oldMm: number; newMm: number } | null {
  const m = original.meanTurnLengthMm;
  if (m === undefined) return null;
  const coreMm = original.core.coreLengthM * 1000;
  const endOld = (m - 2 * coreMm) / 2;
  if (!(endOld > 0)) return { oldMm: m, newMm: m };
  const ow = original.winding;
  const scale = meanSpan(candidate.winding.spans, candidate.winding.turnsPerCoil) / meanSpan(ow.spans, ow.turnsPerCoil);
  return { oldMm: m, newMm: 2 * coreMm + 2 * endOld * scale };
}

/** New nameplate data from the expected rating (estimates to be confirmed by the final test). */
export function proposeNameplate(
  original: RedesignOriginal,
  request: RedesignRequest,
  candidate: Candidate,
  e: ExpectedRating,
): ProposedNameplate {
  const t = request.target;
  const slipOld = original.ratedSpeedRpm ? (e.synchronousRpmOld - original.ratedSpeedRpm) / e.synchronousRpmOld : null;
  const speedRpm = slipOld !== null && slipOld >= 0 && slipOld < 0.2 ? e.synchronousRpmNew * (1 - slipOld) : null;
  const outputKw = original.ratedOutputKw ? original.ratedOutputKw * e.powerRatio : null;
  return {
    lineVoltageV: t.lineVoltageV,
    connection: candidate.winding.connection,
    frequencyHz: t.frequencyHz,
    poles: candidate.winding.poles,
    synchronousRpm: e.synchronousRpmNew,
    speedRpm,
    currentA: original.ratedCurrentA ? original.ratedCurrentA * e.lineCurrentRatio : null,
    outputKw,
    outputHp: outputKw === null ? null : kwToHp(outputKw),
    torqueNm: outputKw !== null && speedRpm ? torqueNm(outputKw, speedRpm) : null,
    notes: [
      'Estimated from the original rating with the stated assumptions; confirm current and speed at the final run test before the plate is stamped.',
      'Fit as a supplementary plate beside the original; do not remove the original plate.',
    ],
  };
}
