/**
 * Money for estimates and quotes: amounts are integers in the currency's minor unit (cents), every
 * calculation goes through dinero.js, and every rounding is one named function (`roundToCurrency`:
 * half away from zero, the usual commercial rounding [common practice]). dinero's BigInt calculator is
 * used because a product such as subtotal × tax rate or an allocation share can pass 2^53 long before an
 * amount does; the API speaks safe-integer numbers. Pure: runs in the browser (live totals) and on the
 * server (stored totals), so both agree to the cent.
 */
import { AUD, CAD, CHF, EUR, GBP, JPY, NZD, SEK, USD, ZAR } from 'dinero.js/bigint/currencies';
import { add, allocate, dinero, halfAwayFromZero, multiply, toDecimal, toSnapshot, transformScale, type Dinero } from 'dinero.js/bigint';

/** Currencies a shop may choose; each carries its minor-unit exponent (JPY has none). */
export const CURRENCIES = { USD, EUR, GBP, CAD, AUD, NZD, CHF, SEK, ZAR, JPY } as const;
export type CurrencyCode = keyof typeof CURRENCIES;
export const CURRENCY_CODES = Object.keys(CURRENCIES) as CurrencyCode[];

export const isCurrencyCode = (v: string): v is CurrencyCode => Object.hasOwn(CURRENCIES, v);

type Money = Dinero<bigint>;

/** Minor units per major unit, as the exponent: 2 for cents, 0 for yen. */
export const minorExponent = (code: CurrencyCode): number => Number(CURRENCIES[code].exponent);

const money = (minor: number, code: CurrencyCode): Money => dinero({ amount: BigInt(minor), currency: CURRENCIES[code] });

/** Back to whole minor units, half away from zero: the one rounding every money step uses. */
function roundToCurrency(d: Money, code: CurrencyCode): Money {
  return transformScale(d, BigInt(minorExponent(code)), halfAwayFromZero);
}

/** The minor units of an amount at the currency's scale, as a number (every total here is a safe integer). */
function toMinor(d: Money, code: CurrencyCode): number {
  const n = Number(toSnapshot(roundToCurrency(d, code)).amount);
  if (!Number.isSafeInteger(n)) throw new RangeError('An amount is beyond what an estimate can hold.');
  return n;
}

/** amount × quantity, where quantity is in thousandths (2.5 h → 2500), rounded to the minor unit. */
export function timesMilli(minor: number, quantityMilli: number, code: CurrencyCode): number {
  return toMinor(multiply(money(minor, code), { amount: BigInt(quantityMilli), scale: 3n }), code);
}

/** amount × rate, where rate is in basis points (7.5 % → 750), rounded to the minor unit. */
export function timesBasisPoints(minor: number, rateBp: number, code: CurrencyCode): number {
  return toMinor(multiply(money(minor, code), { amount: BigInt(rateBp), scale: 4n }), code);
}

export function sumMinor(values: readonly number[], code: CurrencyCode): number {
  return toMinor(
    values.reduce((acc, v) => add(acc, money(v, code)), money(0, code)),
    code,
  );
}

/** Shares `minor` over `weights` in proportion; the shares always add up to `minor` exactly (dinero's allocate). */
export function allocateMinor(minor: number, weights: readonly number[], code: CurrencyCode): number[] {
  if (weights.length === 0) return [];
  if (minor === 0 || weights.every((w) => w === 0)) return weights.map(() => 0);
  return allocate(
    money(minor, code),
    weights.map((w) => BigInt(w)),
  ).map((d) => toMinor(d, code));
}

/** "$1,234.50": Intl formats the exact decimal string, so no float ever touches the amount. */
export function formatMoney(minor: number, code: CurrencyCode, locale = 'en-US'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency: code }).format(decimalText(minor, code) as `${number}`);
}

/** "1234.50" without symbol, for CSV and form fields. */
export const decimalText = (minor: number, code: CurrencyCode): string => toDecimal(money(minor, code));
