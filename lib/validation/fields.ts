/**
 * Field builders shared by the entity schemas. HTML inputs give strings (or NaN from valueAsNumber); these
 * turn "" / NaN / null into "not given" so optional fields stay optional and messages stay in trade words.
 */
import { z } from 'zod';
import { noNul } from './safe-text';
import { numberTextMessage, parseDecimal } from './number-text';

const blankToUndefined = (v: unknown): unknown => (v === '' || v === null || (typeof v === 'number' && Number.isNaN(v)) ? undefined : v);

const toNumber = (v: unknown): unknown => {
  const b = blankToUndefined(v);
  if (typeof b === 'string') {
    const n = parseDecimal(b);
    return n === '' ? undefined : n;
  }
  return b;
};

interface NumberRule {
  min?: number;
  max?: number;
  /** min is exclusive (a value must be greater than min). */
  positive?: boolean;
  int?: boolean;
  label: string;
  unit?: string;
}

function numberSchema({ min, max, positive, int, label, unit }: NumberRule) {
  const u = unit ? ` ${unit}` : '';
  let s = z.number({
    error: (issue) => (typeof issue.input === 'string' ? numberTextMessage(label, issue.input) : `${label} must be a number.`),
  });
  if (int) s = s.int(`${label} must be a whole number.`);
  if (positive) s = s.positive(`${label} must be greater than zero.`);
  if (min !== undefined) s = s.min(min, `${label} must be at least ${min}${u}.`);
  if (max !== undefined) s = s.max(max, `${label} must be at most ${max}${u}.`);
  return s;
}

export const optionalNumber = (rule: NumberRule) => z.preprocess(toNumber, numberSchema(rule).optional());

export const requiredNumber = (rule: NumberRule) =>
  z
    .preprocess(toNumber, numberSchema(rule).optional())
    .refine((v) => v !== undefined, `${rule.label} is required.`)
    .transform((v) => v as number);

export const optionalText = (max = 200) =>
  z
    .preprocess((v) => (typeof v === 'string' ? v.trim() : v), noNul(z.string().max(max, `At most ${max} characters.`)))
    .optional()
    .transform((v) => (v ? v : undefined));

export const requiredText = (label: string, max = 200) =>
  z.preprocess(
    (v) => (typeof v === 'string' ? v.trim() : v),
    noNul(
      z
        .string({ error: `${label} is required.` })
        .min(1, `${label} is required.`)
        .max(max, `At most ${max} characters.`),
    ),
  );

/** An email address, length checked first so the format pattern never runs on a huge string. */
export const boundedEmail = z
  .string({ error: 'Enter an email address like name@example.com.' })
  .max(254, 'An email address has at most 254 characters.')
  .pipe(z.email('Enter an email address like name@example.com.'));

export const optionalEmail = z
  .preprocess((v) => (typeof v === 'string' ? v.trim() : v), z.union([z.literal(''), boundedEmail]))
  .optional()
  .transform((v) => (v ? v : undefined));

/** A calendar date from an <input type="date"> (YYYY-MM-DD), or nothing. */
export const optionalDate = z.preprocess(blankToUndefined, z.iso.date('Enter a date as YYYY-MM-DD.').optional());

export const uuid = (label: string) => z.uuid(`${label} is not valid.`);
