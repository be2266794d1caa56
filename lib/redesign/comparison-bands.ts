/**
 * The comparison bands of the redesign screen: for each quantity the allowed range, the as-found value and
 * each pinned candidate's value on one scale, with the numbers (SI first, imperial beside) for the table.
 * Pure data for the SVG (app/jobs/[number]/redesign/comparison-bands.tsx).
 */
import type { Candidate, RedesignLimits, RedesignSearch } from '@/lib/engine/redesign/types';
import { ampsPerMm2ToCmilPerAmp, teslaToKilolinesPerIn2 } from '@/lib/engine/units';

/** The as-found flux densities, T (from the analysis of the as-found winding). */
export interface OriginalFlux {
  gapPeakT: number;
  toothT: number;
  yokeT: number;
}

export interface Band {
  key: 'gap' | 'tooth' | 'yoke' | 'currentDensity' | 'slotFill' | 'harmonics';
  label: string;
  /** Scale of the band (same units as the values). */
  domain: [number, number];
  /** Allowed range. */
  allowed: [number, number];
  original: number;
  /** One value per pinned candidate, in pin order. */
  values: number[];
  /** Units of the plotted values, for the axis ends. */
  unit: string;
  /** "1.234 T (79.6 kl/in²)" for the original and each candidate. */
  originalText: string;
  texts: string[];
  allowedText: string;
  /** Why the allowed range looks the way it does, when it needs saying. */
  note?: string;
}

const pad = (lo: number, hi: number, values: number[]): [number, number] => {
  const min = Math.min(lo, ...values);
  const max = Math.max(hi, ...values);
  const m = (max - min) * 0.08 || 0.05;
  return [Math.max(0, min - m), max + m];
};

const tesla = (t: number): string => `${t.toFixed(3)} T (${teslaToKilolinesPerIn2(t).toFixed(1)} kl/in²)`;

/** The six bands for the pinned candidates (one or two). */
export function comparisonBands(
  pinned: readonly Candidate[],
  search: Pick<RedesignSearch, 'originalBasis'>,
  limits: RedesignLimits,
  flux: OriginalFlux | null,
  originalHarmonic: number,
  poleRatio: number,
): Band[] {
  const bands: Band[] = [];
  const density = (key: 'gap' | 'tooth' | 'yoke', label: string, t0: number | null): void => {
    const lim = limits[key];
    const lo = 1 - lim.under;
    const hi = 1 + lim.over;
    const values = pinned.map((c) => c.ratios[key]);
    const scale = t0 ?? 1;
    const text = (r: number): string =>
      t0 === null
        ? `${(r * 100).toFixed(1)} % of the original`
        : `${tesla(t0 * r)} · ${r >= 1 ? '+' : '−'}${Math.abs((r - 1) * 100).toFixed(1)} %`;
    bands.push({
      key,
      label,
      domain: pad(
        lo * scale,
        hi * scale,
        values.map((v) => v * scale),
      ),
      allowed: [lo * scale, hi * scale],
      original: scale,
      values: values.map((v) => v * scale),
      unit: t0 === null ? '× original' : 'T',
      originalText: text(1),
      texts: values.map(text),
      allowedText: `${(lo * 100).toFixed(0)}–${(hi * 100).toFixed(0)} % of the original`,
      ...(key === 'yoke' && poleRatio > 1
        ? {
            note: `More poles: the back-iron density falls to about ${(100 / poleRatio).toFixed(0)} % of the original at the kept gap density. That fall is forced and costs nothing in the ranking.`,
          }
        : {}),
    });
  };
  density('gap', 'Air-gap flux density (peak)', flux?.gapPeakT ?? null);
  density('tooth', 'Tooth flux density', flux?.toothT ?? null);
  density('yoke', 'Back-iron (yoke) flux density', flux?.yokeT ?? null);

  const j0 = search.originalBasis.currentDensityAPerMm2;
  const jHi = 1 + limits.currentDensityRise;
  const jScale = j0 ?? 1;
  const jAllowedHi = j0 === null ? jHi : Math.min(jHi * j0, limits.currentDensityMaxAPerMm2);
  const jValues = pinned.map((c) => c.currentDensity.ratio * jScale);
  const jText = (j: number): string =>
    j0 === null
      ? `${((j / jScale) * 100).toFixed(1)} % of the original`
      : `${j.toFixed(2)} A/mm² (${ampsPerMm2ToCmilPerAmp(j).toFixed(0)} CM/A)`;
  bands.push({
    key: 'currentDensity',
    label: 'Current density',
    domain: pad(0, jAllowedHi, [...jValues, jScale]),
    allowed: [0, jAllowedHi],
    original: jScale,
    values: jValues,
    unit: j0 === null ? '× original' : 'A/mm²',
    originalText: jText(jScale),
    texts: jValues.map(jText),
    allowedText: j0 === null ? `up to ${(jHi * 100).toFixed(0)} % of the original` : `up to ${jAllowedHi.toFixed(2)} A/mm²`,
    note: 'A lower current density is never penalised.',
  });

  const fillLimit = search.originalBasis.slotFillLimit;
  const fills = pinned.map((c) => c.slotFill);
  bands.push({
    key: 'slotFill',
    label: 'Slot fill (insulated wire / gross slot area)',
    domain: pad(0, fillLimit, [...fills, search.originalBasis.slotFill]),
    allowed: [0, fillLimit],
    original: search.originalBasis.slotFill,
    values: fills,
    unit: '%',
    originalText: `${(search.originalBasis.slotFill * 100).toFixed(1)} %`,
    texts: fills.map((f) => `${(f * 100).toFixed(1)} %`),
    allowedText: `up to ${(fillLimit * 100).toFixed(1)} %`,
  });

  const hLimit = Math.max(limits.harmonicKwMax, originalHarmonic);
  const hs = pinned.map((c) => Math.max(c.harmonics.kw5, c.harmonics.kw7));
  bands.push({
    key: 'harmonics',
    label: 'Harmonic content: larger of k_w5 and k_w7',
    domain: pad(0, hLimit, [...hs, originalHarmonic]),
    allowed: [0, hLimit],
    original: originalHarmonic,
    values: hs,
    unit: '',
    originalText: originalHarmonic.toFixed(3),
    texts: pinned.map(
      (c, i) =>
        `${(hs[i] ?? 0).toFixed(3)} (k_w5 ${c.harmonics.kw5.toFixed(3)}, k_w7 ${c.harmonics.kw7.toFixed(3)}; MMF harmonic content ${(c.harmonics.mmfDistortion * 100).toFixed(1)} %)`,
    ),
    allowedText: `up to ${hLimit.toFixed(3)}`,
  });
  return bands;
}
