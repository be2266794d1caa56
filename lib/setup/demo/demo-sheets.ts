/**
 * Invented as-found winding sheets for the demo jobs that are past inspection, so the winding library,
 * redesign and job sheets have data on a fresh start. Cores are scaled from the rating with rough
 * proportions chosen for the demo (not design rules): bore grows with output, the winding is sized for an
 * air-gap average of about 0.48 T, wire for about 4.5 A/mm².
 */
import { closedFormFactors } from '@/lib/engine/closed-form';
import { listMetricSizes } from '@/lib/engine/wire';
import { phaseResistanceOhm } from '@/lib/engine/resistance';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';

interface DemoRating {
  kw: number;
  volts: number;
  hz: number;
  poles: number;
  connection: string;
  amps: number;
}

/** Slots, span and back-iron depth as a fraction of the bore (which keeps the yoke near 1.1–1.4 T). */
const LAYOUT: Record<number, { slots: number; span: number; yokeRatio: number }> = {
  2: { slots: 24, span: 10, yokeRatio: 0.29 },
  4: { slots: 36, span: 7, yokeRatio: 0.155 },
  6: { slots: 36, span: 5, yokeRatio: 0.105 },
  8: { slots: 48, span: 5, yokeRatio: 0.09 },
};
/** Insulated copper over gross slot area the demo slots are sized for (hand insertion). */
const DEMO_FILL = 0.5;

const round = (v: number, step: number) => Math.round(v / step) * step;

export function demoSheet(r: DemoRating): WindingSheet {
  const lay = LAYOUT[r.poles] ?? LAYOUT[4]!;
  const bore = round(80 * (r.kw / 0.75) ** 0.3, 1);
  const length = round(bore * 0.8, 1);
  const slotPitch = (Math.PI * bore) / lay.slots;
  const widthTop = round(slotPitch * 0.5, 0.1);
  const widthBottom = round(slotPitch * 0.7, 0.1);
  const connection = r.connection === 'star' ? 'star' : 'delta';
  const vph = connection === 'star' ? r.volts / Math.sqrt(3) : r.volts;
  const kw1 = closedFormFactors(lay.slots, r.poles, lay.span, 1)?.kw ?? 0.9;
  const flux = (0.48 * Math.PI * (bore / 1000) * (length / 1000)) / r.poles;
  const nph = vph / (4.44 * r.hz * kw1 * flux);
  const turns = Math.max(1, Math.round((nph * 3) / lay.slots));
  const iph = connection === 'star' ? r.amps : r.amps / Math.sqrt(3);
  const area = iph / 4.5;
  const sizes = listMetricSizes().filter((s) => s.bareMm >= 0.5 && s.bareMm <= 1.4);
  let strands = 1;
  let size = sizes[sizes.length - 1]!;
  for (strands = 1; strands <= 12; strands++) {
    const fit = sizes.find((s) => s.areaMm2 * strands >= area);
    if (fit) {
      size = fit;
      break;
    }
  }
  // The slot is made deep enough for the copper at the demo fill; the core outside diameter follows.
  const insulatedArea = 2 * turns * strands * (Math.PI / 4) * (size.bareMm * 1.07) ** 2;
  const depth = round(insulatedArea / DEMO_FILL / ((widthTop + widthBottom) / 2), 0.5);
  const od = round(bore + 2 * (depth + bore * lay.yokeRatio), 1);
  const mlt = round(2 * length + 2.6 * ((Math.PI * (bore + depth) * lay.span) / lay.slots) + 40, 5);
  const rph = phaseResistanceOhm({
    coilsPerPhase: lay.slots / 3,
    turnsPerCoil: turns,
    meanTurnLengthM: mlt / 1000,
    parallelPaths: 1,
    strands: [{ areaMm2: size.areaMm2, count: strands }],
    temperatureC: 21,
  });
  const ll = connection === 'star' ? 2 * rph : (2 / 3) * rph;
  const reading = (f: number) => Number((ll * f).toPrecision(4));
  return {
    core: {
      boreMm: bore,
      coreLengthMm: length,
      outsideDiameterMm: od,
      slots: lay.slots,
      slotDepthMm: depth,
      slotWidthTopMm: widthTop,
      slotWidthBottomMm: widthBottom,
      toothWidthMm: round(slotPitch * 0.5, 0.1),
      stackingFactor: 0.95,
    },
    winding: {
      layers: 2,
      style: 'lap',
      spans: [lay.span],
      turnsPerCoil: [turns],
      parallelPaths: 1,
      connection,
      meanTurnLengthMm: mlt,
      leads: 6,
    },
    wires: [{ standard: 'metric', size: size.size, count: strands, enamelGrade: 2 }],
    insulation: { thermalClass: r.kw > 10 ? 'F' : 'B', slotLiner: 'NMN 0.25 mm', wedges: 'Fibreglass', varnish: 'Polyester, dip and bake' },
    supply: { lineVoltageV: r.volts, frequencyHz: r.hz, poles: r.poles, ratedCurrentA: r.amps, ratedOutputKw: r.kw },
    resistance: { readings: [reading(1), reading(1.004), reading(0.997)], temperatureC: 21, between: 'line-to-line' },
    notes: 'Demo sheet: invented data for the demo shop.',
  };
}
