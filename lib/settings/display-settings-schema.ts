import { z } from 'zod';
import { DATE_FORMATS, isTimeZone } from '@/lib/presentation/format';

/** The shop's time zone (blank: the server's) and date format, set by an administrator. */
export const displaySettingsSchema = z.object({
  version: z.coerce.number().int().min(0),
  timeZone: z
    .string()
    .trim()
    .max(64)
    .refine((v) => v === '' || isTimeZone(v), 'Choose a time zone from the list, e.g. Europe/London or America/Chicago.')
    .transform((v) => (v === '' ? null : v)),
  dateFormat: z.enum(DATE_FORMATS, 'Choose a date format.'),
});
export type DisplaySettingsInput = z.input<typeof displaySettingsSchema>;
