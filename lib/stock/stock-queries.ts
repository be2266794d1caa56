/** Reads of the wire stock: rows for the stock page, and the same as engine StockWires for the search. */
import { db } from '@/lib/db/client';
import type { EnamelGrade } from '@/lib/engine/enamel-build';
import { stockWire } from '@/lib/engine/redesign/from-sheet';
import type { StockWire } from '@/lib/engine/redesign/types';

export interface StockRowView {
  id: string;
  standard: 'awg' | 'metric';
  size: string;
  enamelGrade: EnamelGrade;
  quantityKg: number | null;
  note: string | null;
  wire: StockWire | null;
  /** Wire set aside for approved redesigns, not yet released. */
  reservations: { jobId: string; jobNumber: number; revision: number; kg: number; at: Date }[];
  reservedKg: number;
}

const grade = (g: number): EnamelGrade => (g === 1 || g === 3 ? g : 2);

/** Every stock row, thickest first, with its looked-up diameters (null if the tables no longer know it). */
export async function listStock(): Promise<StockRowView[]> {
  const rows = await db().wireStock.findMany({
    orderBy: [{ bareMm: 'desc' }, { standard: 'asc' }, { enamelGrade: 'asc' }],
    include: {
      reservations: {
        where: { releasedAt: null },
        orderBy: { createdAt: 'asc' },
        include: { redesign: { select: { jobId: true, revision: true, job: { select: { number: true } } } } },
      },
    },
  });
  return rows.map((r) => {
    const standard = r.standard === 'awg' ? 'awg' : 'metric';
    const w = stockWire({ standard, size: r.size, enamelGrade: grade(r.enamelGrade) });
    const reservations = r.reservations.map((x) => ({
      jobId: x.redesign.jobId,
      jobNumber: x.redesign.job.number,
      revision: x.redesign.revision,
      kg: x.kg,
      at: x.createdAt,
    }));
    return {
      id: r.id,
      standard,
      size: r.size,
      enamelGrade: grade(r.enamelGrade),
      quantityKg: r.quantityKg,
      note: r.note,
      wire: w.ok ? w.value : null,
      reservations,
      reservedKg: reservations.reduce((sum, x) => sum + x.kg, 0),
    };
  });
}

/**
 * The stock as the redesign search takes it, with the kilograms free for a job: on hand less what approved
 * redesigns of OTHER jobs hold (the job's own reservation is released when its next revision is approved).
 * Null when the row does not count its kilograms.
 */
export async function listStockWires(forJobId?: string): Promise<StockWire[]> {
  return (await listStock()).flatMap((r) => {
    if (!r.wire) return [];
    const held = r.reservations.filter((x) => x.jobId !== forJobId).reduce((sum, x) => sum + x.kg, 0);
    return [{ ...r.wire, onHandKg: r.quantityKg === null ? null : Math.max(0, r.quantityKg - held) }];
  });
}

/** The stock row id of a size, to reserve it. */
export const stockKey = (w: Pick<StockWire, 'standard' | 'size' | 'enamelGrade'>): string => `${w.standard}|${w.size}|${w.enamelGrade}`;
