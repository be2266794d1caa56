/**
 * Schemas of the estimate and quote actions. Money, quantities and rates are typed as decimal text and
 * turned into integers here (prices with the quote's currency decimals), so the form keeps what was typed
 * and the server never sees a float.
 */
import { z } from 'zod';
import { CURRENCY_CODES, minorExponent, type CurrencyCode } from './money';
import { MAX_PRICE_MAJOR, MAX_QUANTITY, percentText, plainText, scaledText } from './money-fields';
import { parseScaled } from './decimal-input';

export const LINE_KINDS = ['LABOUR', 'MATERIAL', 'PART', 'SERVICE', 'REWIND'] as const;
export type LineKind = (typeof LINE_KINDS)[number];

export const LINE_KIND_LABELS: Record<LineKind, string> = {
  LABOUR: 'Labour',
  MATERIAL: 'Material',
  PART: 'Part',
  SERVICE: 'Outside service',
  REWIND: 'Rewind material',
};

/** What the "who / designation" column means for each kind of line. */
export const REFERENCE_LABELS: Record<LineKind, string> = {
  LABOUR: 'Person or trade',
  MATERIAL: 'Grade or specification',
  PART: 'Designation (e.g. bearing 6309-2Z-C3)',
  SERVICE: 'Supplier',
  REWIND: 'Source',
};

/** Most lines on one estimate. */
export const MAX_LINES = 200;

const lineSchema = z.object({
  kind: z.enum(LINE_KINDS, 'Choose the kind of line.'),
  description: plainText(200, 'Description', true),
  reference: plainText(120, 'Reference'),
  quantity: scaledText('Quantity', 3, 1, MAX_QUANTITY * 1000),
  unit: plainText(12, 'Unit', true),
  unitPrice: z.string({ error: 'Unit price is required.' }).max(24, 'Unit price: at most 24 characters.'),
  taxRate: percentText('Tax rate'),
});

/** One line as stored (integers only). */
export interface EstimateLine {
  kind: LineKind;
  description: string;
  reference: string | null;
  quantityMilli: number;
  unit: string;
  unitPriceMinor: number;
  taxRateBp: number;
}

/** Reads a unit price typed in `currency`, or an error message. */
export function unitPriceMinor(text: string, currency: CurrencyCode): number | string {
  const exp = minorExponent(currency);
  const n = parseScaled(text, exp);
  if (n === null)
    return text.trim() === ''
      ? 'Unit price is required.'
      : `Unit price must be an amount in ${currency} with at most ${exp} decimal place${exp === 1 ? '' : 's'}.`;
  if (n > MAX_PRICE_MAJOR * 10 ** exp) return `Unit price must be at most ${MAX_PRICE_MAJOR.toLocaleString('en-US')} ${currency}.`;
  return n;
}

export const estimateSaveSchema = z
  .object({
    quoteId: z.uuid('That estimate is not valid.'),
    version: z.number().int().min(1),
    /** The currency the form priced in: must be the quote's (checked by the write). */
    currency: z.enum(CURRENCY_CODES as [CurrencyCode, ...CurrencyCode[]]),
    discount: percentText('Discount'),
    notes: plainText(2000, 'Notes'),
    lines: z.array(lineSchema).max(MAX_LINES, `At most ${MAX_LINES} lines on one estimate.`),
  })
  .transform((v, ctx) => {
    const lines: EstimateLine[] = v.lines.map((l, i) => {
      const price = unitPriceMinor(l.unitPrice, v.currency);
      if (typeof price === 'string') ctx.addIssue({ code: 'custom', path: ['lines', i, 'unitPrice'], message: price });
      return {
        kind: l.kind,
        description: l.description,
        reference: l.reference || null,
        quantityMilli: l.quantity,
        unit: l.unit,
        unitPriceMinor: typeof price === 'number' ? price : 0,
        taxRateBp: l.taxRate,
      };
    });
    return { quoteId: v.quoteId, version: v.version, currency: v.currency, discountBp: v.discount, notes: v.notes || null, lines };
  });

export type EstimateSaveInput = z.input<typeof estimateSaveSchema>;
export type EstimateLineInput = EstimateSaveInput['lines'][number];
export type EstimateSave = z.output<typeof estimateSaveSchema>;

export const quoteRefSchema = z.object({ quoteId: z.uuid('That quote is not valid.'), version: z.number().int().min(1) });
export const startQuoteSchema = z.object({ jobId: z.uuid('That job is not valid.') });

export const DECISION_METHODS = ['PHONE', 'EMAIL', 'SIGNED_COPY'] as const;
export const DECISION_METHOD_LABELS: Record<(typeof DECISION_METHODS)[number], string> = {
  PHONE: 'By phone',
  EMAIL: 'By email',
  SIGNED_COPY: 'Signed copy of the quote',
};

export const decisionSchema = z.object({
  quoteId: z.uuid('That quote is not valid.'),
  version: z.number().int().min(1),
  decision: z.enum(['ACCEPTED', 'DECLINED'], 'Choose accepted or declined.'),
  decidedBy: plainText(120, 'Who decided', true),
  decidedOn: z.iso.date('Enter the date as YYYY-MM-DD.'),
  method: z.enum(DECISION_METHODS, 'Choose how the customer told you.'),
  customerOrderNumber: plainText(60, 'Customer order number'),
  note: plainText(1000, 'Note'),
});
export type DecisionInput = z.input<typeof decisionSchema>;

/** Route segment /jobs/[number]/quote/[revision]. */
export const quoteRevisionParamSchema = z.coerce.number().int().min(1).max(10_000);
