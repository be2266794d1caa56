/**
 * zod fields for money, quantities and rates typed as decimal text. They stay text through the form (so
 * what the user typed is kept exactly) and become scaled integers in one place, `parseScaled`.
 */
import { z } from 'zod';
import { parseScaled } from './decimal-input';

/** Text without NUL or control characters, trimmed and bounded (every free-text commercial field). */
export const plainText = (max: number, label: string, required = false) =>
  z
    .string({ error: `${label} must be text.` })
    .max(max * 4, `At most ${max} characters.`)
    .transform((v) => v.trim())
    .refine((v) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(v), `${label}: remove the control characters (such as NUL).`)
    .refine((v) => v.length <= max, `At most ${max} characters.`)
    .refine((v) => !required || v.length > 0, `${label} is required.`);

/** A decimal typed as text with at most `decimals` places, from `min` to `max` (both in scaled units). */
export const scaledText = (label: string, decimals: number, min: number, max: number, unit = '') =>
  z
    .string({ error: `${label} is required.` })
    .max(24, `${label}: at most 24 characters.`)
    .transform((v, ctx) => {
      const n = parseScaled(v, decimals);
      const u = unit ? ` ${unit}` : '';
      if (n === null) {
        ctx.addIssue({
          code: 'custom',
          message:
            v.trim() === ''
              ? `${label} is required.`
              : `${label} must be a number with at most ${decimals} decimal place${decimals === 1 ? '' : 's'}.`,
        });
        return z.NEVER;
      }
      if (n < min || n > max) {
        ctx.addIssue({ code: 'custom', message: `${label} must be from ${min / 10 ** decimals} to ${max / 10 ** decimals}${u}.` });
        return z.NEVER;
      }
      return n;
    });

/** Largest unit price or shop rate, in major units: keeps every product a safe integer in dinero. */
export const MAX_PRICE_MAJOR = 1_000_000;
/** Largest quantity on a line (hours, kg, pieces). */
export const MAX_QUANTITY = 10_000;

export const priceText = (label: string, exponent: number) => scaledText(label, exponent, 0, MAX_PRICE_MAJOR * 10 ** exponent);
export const percentText = (label: string, maxPercent = 100) => scaledText(label, 2, 0, maxPercent * 100, '%');
