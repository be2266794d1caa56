/** Reads of the shop's commercial settings: the stored row, or the defaults when none was saved yet. */
import { db } from '@/lib/db/client';
import { isCurrencyCode } from '@/lib/quotes/money';
import { DEFAULT_COMMERCIAL_SETTINGS, type CommercialSettings } from './commercial-defaults';
import { SHOP_SETTINGS_ID } from './settings-queries';

export async function getCommercialSettings(): Promise<{ settings: CommercialSettings; version: number }> {
  const row = await db().commercialSettings.findUnique({ where: { id: SHOP_SETTINGS_ID } });
  if (!row) return { settings: DEFAULT_COMMERCIAL_SETTINGS, version: 0 };
  return {
    version: row.version,
    settings: {
      currency: isCurrencyCode(row.currency) ? row.currency : DEFAULT_COMMERCIAL_SETTINGS.currency,
      taxMode: row.taxMode === 'PER_LINE' ? 'PER_LINE' : 'ON_TOTAL',
      defaultTaxRateBp: row.defaultTaxRateBp,
      labourRateMinor: row.labourRateMinor,
      copperPricePerKgMinor: row.copperPricePerKgMinor,
      copperAllowanceBp: row.copperAllowanceBp,
      insulationAllowanceBp: row.insulationAllowanceBp,
      varnishAllowanceBp: row.varnishAllowanceBp,
      quoteValidityDays: row.quoteValidityDays,
      quoteTerms: row.quoteTerms,
      warrantyDays: row.warrantyDays,
    },
  };
}
