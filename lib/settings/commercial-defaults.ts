/**
 * What a new shop quotes with before an administrator sets its own figures: the invented demo shop's
 * (US dollars, a 7.5 % sales tax on the total). Every figure is the shop's to change in the settings.
 */
import type { CurrencyCode } from '@/lib/quotes/money';
import type { TaxMode } from '@/lib/quotes/estimate-totals';

export interface CommercialSettings {
  currency: CurrencyCode;
  taxMode: TaxMode;
  defaultTaxRateBp: number;
  labourRateMinor: number;
  copperPricePerKgMinor: number;
  copperAllowanceBp: number;
  insulationAllowanceBp: number;
  varnishAllowanceBp: number;
  quoteValidityDays: number;
  quoteTerms: string;
  warrantyDays: number;
}

export const DEFAULT_QUOTE_TERMS =
  'Prices are for the work and parts listed, for the motor as inspected. If stripping the winding or ' +
  'dismantling shows further damage (core, shaft, housing), we stop and quote the extra work before doing it. ' +
  'Payment within 30 days of invoice. Motors not collected within 60 days of completion may be charged storage. ' +
  'Repaired windings carry our repair warranty from the date of shipment when the motor is installed, protected ' +
  'and run within its nameplate rating.';

export const DEFAULT_COMMERCIAL_SETTINGS: CommercialSettings = {
  currency: 'USD',
  taxMode: 'ON_TOTAL',
  defaultTaxRateBp: 750,
  labourRateMinor: 9500,
  copperPricePerKgMinor: 1450,
  copperAllowanceBp: 1000,
  insulationAllowanceBp: 1500,
  varnishAllowanceBp: 800,
  quoteValidityDays: 30,
  quoteTerms: DEFAULT_QUOTE_TERMS,
  warrantyDays: 365,
};
