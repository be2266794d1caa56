/**
 * Money for estimates and quotes: amounts are integers in the currency's minor unit (cents), every
 * calculation goes through dinero.js, and every rounding is one named function (`roundToCurrency`:
 * half away from zero, the usual commercial rounding [common practice]). Pure: runs in the browser (live
 * totals) and on the server (stored totals), so both agree to the cent.
 */
import { CAD, CHF, EUR, GBP, JPY, USD, AUD, NZD, SEK, ZAR } from 'dinero.js/currencies';
import { add, dinero, halfAwayFromZero, multiply, toDecimal, toSnapshot, transformScale, type Dinero, type DineroCurrency } from 'dinero.js';

/** Currencies a shop may choose; each carries its minor-unit exponent (JPY has none). */
export const CURRENCIES = { USD, EUR, GBP, CAD, AUD, NZD, CHF, SEK, ZAR, JPY } as const;
export type CurrencyCode = keyof typeof CURRENCIES;
export const CURRENCY_CODES = Object.keys(CURRENCIES) as CurrencyCode[];

export const isCurrencyCode = (v: string): v is CurrencyCode => Object.hasOwn(CURRENCIES, v);

export type Money = Dinero<number>;

export const currencyOf = (code: CurrencyCode): DineroCurrency<number> => CURRENCIES[code];

/** Minor units per major unit, as the exponent: 2 for cents, 0 for yen. */
export const minorExponent = (code: CurrencyCode): number => CURRENCIES[code].exponent;

export const money = (minor: number, code: CurrencyCode): Money => dinero({ amount: minor, currency: currencyOf(code) });

/** Back to whole minor units, half away from zero: the one rounding every money step uses. */
export function roundToCurrency(d: Money, code: CurrencyCode): Money {
  return transformScale(d, minorExponent(code), halfAwayFromZero);
}

/** The integer minor units of an amount already at the currency's scale. */
export function toMinor(d: Money, code: CurrencyCode): number {
  const rounded = roundToCurrency(d, code);
  return toSnapshot(rounded).amount;
}

/** amount × quantity, where quantity is in thousandths (2.5 h → 2500), rounded to the minor unit. */
export function timesMilli(minor: number, quantityMilli: number, code: CurrencyCode): number {
  return toMinor(multiply(money(minor, code), { amount: quantityMilli, scale: 3 }), code);
}

/** amount × rate, where rate is in basis points (7.5 % → 750), rounded to the minor unit. */
export function timesBasisPoints(minor: number, rateBp: number, code: CurrencyCode): number {
  return toMinor(multiply(money(minor, code), { amount: rateBp, scale: 4 }), code);
}

export function sumMinor(values: readonly number[], code: CurrencyCode): number {
  return toSnapshot(values.reduce((acc, v) => add(acc, money(v, code)), money(0, code))).amount;
}

/** "$1,234.50": Intl formats the exact decimal string, so no float ever touches the amount. */
export function formatMoney(minor: number, code: CurrencyCode, locale = 'en-US'): string {
  const decimal = toDecimal(money(minor, code));
  return new Intl.NumberFormat(locale, { style: 'currency', currency: code }).format(decimal as `${number}`);
}

/** "1234.50" without symbol, for CSV and form fields. */
export const decimalText = (minor: number, code: CurrencyCode): string => toDecimal(money(minor, code));
