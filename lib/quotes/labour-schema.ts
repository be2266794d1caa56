/** Labour booked against a job: who, which task, how many hours, which day. */
import { z } from 'zod';
import { plainText, scaledText } from './money-fields';

export const labourBookingSchema = z.object({
  jobId: z.uuid('That job is not valid.'),
  personId: z.uuid('Choose who did the work.'),
  task: plainText(120, 'Task', true),
  // Hours in thousandths, from 0.01 h to a 24 h day.
  hours: scaledText('Hours', 3, 10, 24_000, 'h'),
  workedOn: z.iso.date('Enter the day as YYYY-MM-DD.'),
});
export type LabourBookingInput = z.input<typeof labourBookingSchema>;
