/**
 * The commercial settings form: money typed in the shop's currency, rates in percent, days. The same schema
 * checks the form (zodResolver) and the server action; prices are read with the chosen currency's decimals.
 */
import { z } from 'zod';
import { CURRENCY_CODES, minorExponent, type CurrencyCode } from '@/lib/quotes/money';
import { TAX_MODES } from '@/lib/quotes/estimate-totals';
import { MAX_PRICE_MAJOR, percentText, plainText } from '@/lib/quotes/money-fields';
import { parseScaled } from '@/lib/quotes/decimal-input';
import type { CommercialSettings } from './commercial-defaults';

const days = (label: string, min: number, max: number) =>
  z.coerce
    .number({ error: `${label} must be a whole number of days.` })
    .int(`${label} must be a whole number of days.`)
    .min(min, `${label}: at least ${min}.`)
    .max(max, `${label}: at most ${max}.`);

const PRICE_FIELDS = ['labourRate', 'copperPricePerKg'] as const;

export const commercialSettingsSchema = z
  .object({
    version: z.number().int().min(0),
    currency: z.enum(CURRENCY_CODES as [CurrencyCode, ...CurrencyCode[]], 'Choose a currency from the list.'),
    taxMode: z.enum(TAX_MODES as ['ON_TOTAL', 'PER_LINE'], 'Choose how tax is worked out.'),
    defaultTaxRate: percentText('Tax rate'),
    labourRate: z.string().max(24),
    copperPricePerKg: z.string().max(24),
    copperAllowance: percentText('Copper allowance'),
    insulationAllowance: percentText('Insulation allowance', 200),
    varnishAllowance: percentText('Varnish allowance', 200),
    quoteValidityDays: days('Quote validity', 1, 365),
    quoteTerms: plainText(4000, 'Terms'),
    warrantyDays: days('Warranty period', 0, 3650),
  })
  .transform((v, ctx): { version: number; settings: CommercialSettings } => {
    const exp = minorExponent(v.currency);
    const price: Record<(typeof PRICE_FIELDS)[number], number> = { labourRate: 0, copperPricePerKg: 0 };
    for (const f of PRICE_FIELDS) {
      const n = parseScaled(v[f], exp);
      if (n === null || n > MAX_PRICE_MAJOR * 10 ** exp) {
        ctx.addIssue({
          code: 'custom',
          path: [f],
          message: `Enter an amount in ${v.currency} with at most ${exp} decimal place${exp === 1 ? '' : 's'}, up to ${MAX_PRICE_MAJOR.toLocaleString('en-US')}.`,
        });
      } else price[f] = n;
    }
    return {
      version: v.version,
      settings: {
        currency: v.currency,
        taxMode: v.taxMode,
        defaultTaxRateBp: v.defaultTaxRate,
        labourRateMinor: price.labourRate,
        copperPricePerKgMinor: price.copperPricePerKg,
        copperAllowanceBp: v.copperAllowance,
        insulationAllowanceBp: v.insulationAllowance,
        varnishAllowanceBp: v.varnishAllowance,
        quoteValidityDays: v.quoteValidityDays,
        quoteTerms: v.quoteTerms,
        warrantyDays: v.warrantyDays,
      },
    };
  });

export type CommercialSettingsInput = z.input<typeof commercialSettingsSchema>;
