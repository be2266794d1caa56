/**
 * Between stored lines (integers) and the estimate form (text as typed), and the form's live totals: lines
 * that do not read yet count as zero, so the totals move as the user types without ever guessing.
 */
import { basisPointsToPercent, formatScaled, formatScaledShort, parseScaled, percentToBasisPoints } from './decimal-input';
import { estimateTotals, type EstimateTotals, type TaxMode } from './estimate-totals';
import { minorExponent, type CurrencyCode } from './money';
import type { EstimateLine, EstimateLineInput } from './quote-schema';

export function lineToForm(l: EstimateLine, currency: CurrencyCode): EstimateLineInput {
  return {
    kind: l.kind,
    description: l.description,
    reference: l.reference ?? '',
    quantity: formatScaledShort(l.quantityMilli, 3),
    unit: l.unit,
    unitPrice: formatScaled(l.unitPriceMinor, minorExponent(currency)),
    taxRate: basisPointsToPercent(l.taxRateBp),
  };
}

export function liveTotals(
  lines: readonly Partial<EstimateLineInput>[],
  discount: string,
  currency: CurrencyCode,
  taxMode: TaxMode,
): EstimateTotals {
  const exp = minorExponent(currency);
  const priced = lines.map((l) => ({
    quantityMilli: parseScaled(l.quantity ?? '', 3) ?? 0,
    unitPriceMinor: parseScaled(l.unitPrice ?? '', exp) ?? 0,
    taxRateBp: percentToBasisPoints(l.taxRate ?? '') ?? 0,
  }));
  // Out-of-range entries are refused on save; the live view caps them so the arithmetic stays exact.
  const safe = priced.map((p) => ({
    quantityMilli: Math.min(p.quantityMilli, 10_000_000),
    unitPriceMinor: Math.min(p.unitPriceMinor, 1_000_000 * 10 ** exp),
    taxRateBp: Math.min(p.taxRateBp, 10_000),
  }));
  return estimateTotals(safe, { currency, taxMode, discountBp: Math.min(percentToBasisPoints(discount) ?? 0, 10_000) });
}
