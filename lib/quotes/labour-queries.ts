/**
 * Labour booked on a job beside the labour the quote allowed: the estimate is the accepted quote's labour
 * lines (or else the latest sent one's, or else the draft's), the actual is every booking.
 */
import { db } from '@/lib/db/client';

export interface LabourComparison {
  bookings: { id: string; personName: string; task: string; hoursMilli: number; workedOn: Date }[];
  actualMilli: number;
  estimateMilli: number | null;
  /** Which quote the estimate comes from, in words. */
  estimateSource: string | null;
}

export async function labourComparison(jobId: string): Promise<LabourComparison> {
  const [bookings, quotes] = await Promise.all([
    db().labourBooking.findMany({
      where: { jobId },
      orderBy: [{ workedOn: 'asc' }, { createdAt: 'asc' }],
      select: { id: true, personName: true, task: true, hoursMilli: true, workedOn: true },
    }),
    db().quote.findMany({
      where: { jobId },
      orderBy: { revision: 'desc' },
      select: { revision: true, status: true, lines: { where: { kind: 'LABOUR', unit: 'h' }, select: { quantityMilli: true } } },
    }),
  ]);
  const basis = quotes.find((q) => q.status === 'ACCEPTED') ?? quotes.find((q) => q.status !== 'DRAFT') ?? quotes[0];
  return {
    bookings,
    actualMilli: bookings.reduce((t, b) => t + b.hoursMilli, 0),
    estimateMilli: basis ? basis.lines.reduce((t, l) => t + l.quantityMilli, 0) : null,
    estimateSource: basis ? `revision ${basis.revision} (${basis.status.toLowerCase()})` : null,
  };
}
