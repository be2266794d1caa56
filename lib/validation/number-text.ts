/**
 * Numbers as people type them. A decimal comma is read as a decimal point ("15,5" → 15.5), never dropped
 * (which would read 155). A comma that could be a thousands separator ("1,500": 1.5 or 1500?) or a mix of
 * comma and point is refused as typed, so the field's schema names it instead of storing a guess.
 */
const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const DECIMAL_COMMA = /^[+-]?\d*,\d+$/;
const AMBIGUOUS_COMMA = /^[+-]?\d{1,3}(,\d{3})+$/;

/** Blank → '', a readable number → the number, anything else → the trimmed text as typed. */
export function parseDecimal(text: string): number | string {
  const t = text.trim();
  if (t === '') return '';
  if (PLAIN.test(t)) return Number(t);
  if (DECIMAL_COMMA.test(t) && !AMBIGUOUS_COMMA.test(t)) return Number(t.replace(',', '.'));
  return t;
}

/** The message for text parseDecimal could not read, in words. */
export function numberTextMessage(label: string, text: string): string {
  return AMBIGUOUS_COMMA.test(text.trim())
    ? `${label}: "${text.trim()}" could be read two ways. Write it without a thousands comma (1500) or with a decimal point (1.5).`
    : `${label} must be a number.`;
}
