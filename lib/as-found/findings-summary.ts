/**
 * The one-line summary of the live analysis for the strip that stays in view while a winder types on a
 * tablet (the full analysis sits in a drawer there): how many findings of each severity, the first one,
 * and the figures a winder watches (air-gap density, current density, slot fill).
 */
import type { LiveAnalysis } from './live-analysis';
import type { FindingSeverity } from '@/lib/engine/sheet-findings';

export interface FindingsSummary {
  /** e.g. "1 problem, 2 checks", "No inconsistencies found", "12 fields to fill in". */
  headline: string;
  tone: 'bad' | 'warn' | 'ok' | 'pending';
  /** The most serious finding's message, when there is one. */
  first: string | null;
  /** Short figures, each with its unit. */
  figures: string[];
}

const ORDER: FindingSeverity[] = ['problem', 'check', 'note'];
const plural = (n: number, one: string) => `${n} ${one}${n === 1 ? '' : 's'}`;

export function findingsSummary(live: LiveAnalysis): FindingsSummary {
  const a = live.full;
  const figures: string[] = [];
  if (a?.winding.flux) figures.push(`gap ${a.winding.flux.gapAverage.tesla.toFixed(2)} T`);
  if (a?.currentDensity) figures.push(`${a.currentDensity.ampsPerMm2.toFixed(1)} A/mm²`);
  if (a) figures.push(`fill ${(a.slotFill.insulatedOverGross * 100).toFixed(0)} %`);
  if (live.winding) figures.push(`kw1 ${live.winding.windingFactor.toFixed(3)}`);

  if (live.findings.length > 0) {
    const counts = ORDER.map((s) => [s, live.findings.filter((f) => f.severity === s).length] as const).filter(([, n]) => n > 0);
    const sorted = [...live.findings].sort((x, y) => ORDER.indexOf(x.severity) - ORDER.indexOf(y.severity));
    return {
      headline: counts.map(([s, n]) => plural(n, s)).join(', '),
      tone: counts.some(([s]) => s === 'problem') ? 'bad' : 'warn',
      first: sorted[0]?.message ?? null,
      figures,
    };
  }
  if (live.engineError) return { headline: 'The analysis cannot run', tone: 'bad', first: live.engineError.message, figures };
  if (!a)
    return {
      headline: live.issues.length ? `${plural(live.issues.length, 'field')} to fill in for the full analysis` : 'Analysis pending',
      tone: 'pending',
      first: live.issues[0]?.message ?? null,
      figures,
    };
  return { headline: 'No inconsistencies found', tone: 'ok', first: null, figures };
}
