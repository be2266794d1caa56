/**
 * How test values are written on the screens and the job sheet: metric first, imperial beside it where
 * the trade uses both (°F for temperatures, in/s for vibration), and verdicts as words with a symbol so
 * they never rely on colour alone. One module, so the form, the print view and the PDF agree digit for digit.
 */
import { celsiusToFahrenheit, mmToInches } from '@/lib/engine/units';
import { fmt } from '@/lib/presentation/format';
import type { Check, CheckStatus, OverallVerdict, SectionStatus } from './verdicts';

/** Vibration velocity mm/s → in/s: the same length conversion, 1 in = 25.4 mm exactly. */
export const mmPerSecondToInchesPerSecond = (mmS: number): number => mmToInches(mmS);

/** "75 °C (167 °F)"; °F to one decimal. */
export function temperatureText(c: number | undefined | null): string {
  if (c === undefined || c === null || !Number.isFinite(c)) return '—';
  return `${fmt.num(c, 1, '°C')} (${fmt.num(celsiusToFahrenheit(c), 1, '°F')})`;
}

/** "2.8 mm/s (0.110 in/s)"; in/s to three decimals, as vibration meters show it. */
export function velocityText(mmS: number | undefined | null): string {
  if (mmS === undefined || mmS === null || !Number.isFinite(mmS)) return '—';
  return `${fmt.num(mmS, 2, 'mm/s')} (${mmPerSecondToInchesPerSecond(mmS).toFixed(3)} in/s)`;
}

/** Megohms with sensible digits: 0.85 MΩ, 12.4 MΩ, 2,400 MΩ. */
export function megohmText(v: number | undefined | null): string {
  if (v === undefined || v === null || !Number.isFinite(v)) return '—';
  return fmt.num(v, v < 10 ? 2 : v < 1000 ? 1 : 0, 'MΩ');
}

/** Ohms to four significant figures (a bridge reads to about that). */
export function ohmText(v: number | undefined | null): string {
  if (v === undefined || v === null || !Number.isFinite(v)) return '—';
  return `${Number(v.toPrecision(4))} Ω`;
}

/** Leakage current in mA, with µA beside it below 1 mA (DC leakage is usually read in µA). */
export function leakageText(mA: number | undefined | null): string {
  if (mA === undefined || mA === null || !Number.isFinite(mA)) return '—';
  return mA < 1 ? `${fmt.num(mA, 4, 'mA')} (${fmt.num(mA * 1000, 1, 'µA')})` : fmt.num(mA, 2, 'mA');
}

/** A fraction as a percentage, e.g. 0.0123 → "1.23 %". */
export const percentText = (fraction: number | undefined | null, digits = 2): string =>
  fraction === undefined || fraction === null || !Number.isFinite(fraction) ? '—' : `${(fraction * 100).toFixed(digits)} %`;

/** Words and a symbol for a check's or section's status (never colour alone). */
export function statusText(s: CheckStatus | SectionStatus): string {
  switch (s) {
    case 'pass':
      return '✓ Pass';
    case 'fail':
      return '⚠ FAIL';
    case 'missing':
      return '… Not recorded';
    case 'incomplete':
      return '… Incomplete';
    case 'reduced':
      return '◐ Reduced-level test, not a pass';
    case 'recorded':
      return '· Recorded, not judged';
  }
}

/** The overall verdict in words; a record held back only by a reduced-level test says so. */
export function overallText(v: OverallVerdict, qualifiers: readonly string[] = []): string {
  if (v === 'PASS') return '✓ PASS';
  if (v === 'FAIL') return '⚠ FAIL';
  return qualifiers.length ? `◐ NOT A FULL PASS (${qualifiers.join('; ')})` : '… INCOMPLETE';
}

/** A check's value against its limit in the check's own unit, e.g. "250 MΩ (minimum 5 MΩ)". */
export function checkValueText(check: Check): string {
  const v = check.verdict;
  if (!v) return '';
  switch (check.key) {
    case 'ir':
      return `${megohmText(v.value)} (minimum ${megohmText(v.limit)})`;
    case 'pi':
      return `${v.value.toFixed(2)} (minimum ${v.limit.toFixed(1)})`;
    case 'unbalance':
      return `${percentText(v.value)} (limit ${percentText(v.limit, 0)})`;
    case 'vibration':
      return `${velocityText(v.value)} (limit ${velocityText(v.limit)})`;
    case 'current':
      return `${fmt.num(v.value, 2, 'A')} (rated ${fmt.num(v.limit, 1, 'A')})`;
    case 'speed':
      return `${fmt.num(v.value, 0, 'rpm')} (synchronous ${fmt.num(v.limit, 0, 'rpm')})`;
    default:
      return `${v.value} (limit ${v.limit})`;
  }
}
