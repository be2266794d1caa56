/**
 * Typed decimals ("125.50", "2,5", "7.25 %") to scaled integers by string arithmetic, never through a
 * float: 0.1 + 0.2 must not turn a price into 0.30000000000000004. Used by the estimate form and schema.
 */

/** Scaled integer of `text` with exactly `decimals` places, or null when it is not a plain decimal or has more places. */
export function parseScaled(text: string, decimals: number): number | null {
  const t = text.trim().replace(/\s+/g, '').replace(',', '.');
  const m = /^(\d{1,12})(?:\.(\d*))?$/.exec(t) ?? /^()\.(\d+)$/.exec(t);
  if (!m) return null;
  const whole = m[1] || '0';
  const frac = m[2] ?? '';
  if (frac.length > decimals) return null;
  const n = Number(whole + frac.padEnd(decimals, '0'));
  return Number.isSafeInteger(n) ? n : null;
}

/** A scaled integer back to text with `decimals` places, trailing zeros kept ("2.500" for 2500 at 3). */
export function formatScaled(value: number, decimals: number): string {
  const neg = value < 0;
  const digits = String(Math.abs(value)).padStart(decimals + 1, '0');
  const text = decimals === 0 ? digits : `${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`;
  return neg ? `-${text}` : text;
}

/** Like formatScaled but without trailing zeros after the point ("2.5", "3"). */
export function formatScaledShort(value: number, decimals: number): string {
  const t = formatScaled(value, decimals);
  return t.includes('.') ? t.replace(/0+$/, '').replace(/\.$/, '') : t;
}

/** Percent with up to two decimals → basis points ("7.25" → 725). */
export const percentToBasisPoints = (text: string): number | null => parseScaled(text.replace('%', ''), 2);
export const basisPointsToPercent = (bp: number): string => formatScaledShort(bp, 2);
