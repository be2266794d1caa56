/**
 * The totals of an estimate, the same in the browser (recomputed as lines change) and on the server (stored
 * when the quote is sent). Order of operations, each step rounded to the minor unit by roundToCurrency:
 *   1. line net      = quantity × unit price
 *   2. discount      = subtotal × discount rate, shared over the lines in proportion to their net
 *                      (dinero's allocate: the shares always add up to the discount exactly)
 *   3. tax, as the shop has configured it:
 *      PER_LINE  each line's tax = its discounted net × its rate, rounded per line;
 *      ON_TOTAL  tax per rate = (Σ discounted net at that rate) × rate, rounded once per rate, then shared
 *                over that rate's lines for display (allocate again).
 * So in both modes the lines' gross amounts add up to the total to the cent.
 */
import { allocateMinor, sumMinor, timesBasisPoints, timesMilli, type CurrencyCode } from './money';

export type TaxMode = 'PER_LINE' | 'ON_TOTAL';
export const TAX_MODES: readonly TaxMode[] = ['ON_TOTAL', 'PER_LINE'];

/** What the totals need of a line. */
export interface PricedLine {
  /** Thousandths of the unit (hours, kg, pieces): 2.5 h → 2500. */
  quantityMilli: number;
  unitPriceMinor: number;
  /** Basis points: 7.5 % → 750. */
  taxRateBp: number;
}

export interface LineTotals {
  netMinor: number;
  discountMinor: number;
  taxMinor: number;
  /** net − discount + tax. */
  grossMinor: number;
}

export interface TaxBand {
  rateBp: number;
  baseMinor: number;
  taxMinor: number;
}

export interface EstimateTotals {
  lines: LineTotals[];
  subtotalMinor: number;
  discountMinor: number;
  taxMinor: number;
  totalMinor: number;
  /** Tax by rate, lowest rate first (what the quote prints under the lines). */
  bands: TaxBand[];
}

export interface TotalsRules {
  currency: CurrencyCode;
  taxMode: TaxMode;
  /** Discount on the whole estimate, basis points. */
  discountBp: number;
}

export function estimateTotals(lines: readonly PricedLine[], rules: TotalsRules): EstimateTotals {
  const code = rules.currency;
  const net = lines.map((l) => timesMilli(l.unitPriceMinor, l.quantityMilli, code));
  const subtotalMinor = sumMinor(net, code);
  const discountMinor = timesBasisPoints(subtotalMinor, rules.discountBp, code);
  const lineDiscount = allocateMinor(discountMinor, net, code);
  const taxable = net.map((n, i) => n - (lineDiscount[i] ?? 0));

  const rates = [...new Set(lines.map((l) => l.taxRateBp))].sort((a, b) => a - b);
  const lineTax = new Array<number>(lines.length).fill(0);
  const bands: TaxBand[] = rates.map((rateBp) => {
    const idx = lines.flatMap((l, i) => (l.taxRateBp === rateBp ? [i] : []));
    const baseMinor = sumMinor(
      idx.map((i) => taxable[i] ?? 0),
      code,
    );
    if (rules.taxMode === 'PER_LINE') {
      for (const i of idx) lineTax[i] = timesBasisPoints(taxable[i] ?? 0, rateBp, code);
    } else {
      const shares = allocateMinor(
        timesBasisPoints(baseMinor, rateBp, code),
        idx.map((i) => taxable[i] ?? 0),
        code,
      );
      idx.forEach((i, k) => {
        lineTax[i] = shares[k] ?? 0;
      });
    }
    return {
      rateBp,
      baseMinor,
      taxMinor: sumMinor(
        idx.map((i) => lineTax[i] ?? 0),
        code,
      ),
    };
  });

  const taxMinor = sumMinor(lineTax, code);
  return {
    lines: net.map((n, i) => ({
      netMinor: n,
      discountMinor: lineDiscount[i] ?? 0,
      taxMinor: lineTax[i] ?? 0,
      grossMinor: (taxable[i] ?? 0) + (lineTax[i] ?? 0),
    })),
    subtotalMinor,
    discountMinor,
    taxMinor,
    totalMinor: subtotalMinor - discountMinor + taxMinor,
    bands,
  };
}
