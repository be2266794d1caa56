import { z } from 'zod';
import { optionalEmail, optionalText, requiredText } from '../validation/fields';

/** A customer as the front desk enters it at intake or on the customer form. */
export const customerSchema = z.object({
  company: requiredText('Company', 120),
  contactName: optionalText(120),
  phone: optionalText(40),
  email: optionalEmail,
  address: optionalText(400),
  notes: optionalText(2000),
});

export type CustomerInput = z.input<typeof customerSchema>;
export type Customer = z.output<typeof customerSchema>;
