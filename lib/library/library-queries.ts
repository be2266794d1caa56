/**
 * The winding library: every data sheet ever saved, searched on the copied, indexed columns of
 * WindingSheet (slots, poles, bore, core length, output, voltage, manufacturer/model), never on the JSON.
 * Lengths arrive in millimetres (the page converts the user's unit at the edge).
 */
import { db, type Prisma } from '@/lib/db/client';
import { windingSheetSchema, type WindingSheet } from '@/lib/as-found/winding-sheet-schema';

/** A search in stored units. Ranges are inclusive. */
export interface LibrarySearch {
  slots?: number;
  poles?: number;
  boreMm?: { min: number; max: number };
  coreLengthMm?: { min: number; max: number };
  outputKw?: { min: number; max: number };
  lineVoltageV?: { min: number; max: number };
  /** Part of the manufacturer or model, any case. */
  text?: string;
  /** Rank by closeness to these (bore first, then core length). */
  target?: { boreMm?: number; coreLengthMm?: number };
}

/** Rows returned per search; the page says when there were more. */
export const LIBRARY_PAGE = 50;
/** Candidates fetched before ranking by closeness. */
const CANDIDATES = 200;

export function libraryWhere(s: LibrarySearch): Prisma.WindingSheetWhereInput {
  const and: Prisma.WindingSheetWhereInput[] = [];
  if (s.slots !== undefined) and.push({ slots: s.slots });
  if (s.poles !== undefined) and.push({ poles: s.poles });
  if (s.boreMm) and.push({ boreMm: { gte: s.boreMm.min, lte: s.boreMm.max } });
  if (s.coreLengthMm) and.push({ coreLengthMm: { gte: s.coreLengthMm.min, lte: s.coreLengthMm.max } });
  if (s.outputKw) and.push({ outputKw: { gte: s.outputKw.min, lte: s.outputKw.max } });
  if (s.lineVoltageV) and.push({ lineVoltageV: { gte: s.lineVoltageV.min, lte: s.lineVoltageV.max } });
  if (s.text) {
    const contains = { contains: s.text, mode: 'insensitive' as const };
    and.push({ OR: [{ manufacturer: contains }, { model: contains }] });
  }
  return { AND: and };
}

export interface LibraryRow {
  id: string;
  jobNumber: number;
  revision: number;
  slots: number;
  poles: number;
  boreMm: number;
  coreLengthMm: number;
  lineVoltageV: number;
  frequencyHz: number;
  outputKw: number | null;
  manufacturer: string | null;
  model: string | null;
  updatedAt: Date;
}

/** Matching sheets, closest bore and core length first; `more` when the search matched more than shown. */
export async function searchLibrary(s: LibrarySearch): Promise<{ rows: LibraryRow[]; more: boolean }> {
  const found = await db().windingSheet.findMany({
    where: libraryWhere(s),
    orderBy: { updatedAt: 'desc' },
    take: CANDIDATES + 1,
    select: {
      id: true,
      revision: true,
      slots: true,
      poles: true,
      boreMm: true,
      coreLengthMm: true,
      lineVoltageV: true,
      frequencyHz: true,
      outputKw: true,
      manufacturer: true,
      model: true,
      updatedAt: true,
      job: { select: { number: true } },
    },
  });
  const t = s.target ?? {};
  const distance = (r: { boreMm: number; coreLengthMm: number }): number =>
    (t.boreMm !== undefined ? Math.abs(r.boreMm - t.boreMm) / t.boreMm : 0) +
    (t.coreLengthMm !== undefined ? Math.abs(r.coreLengthMm - t.coreLengthMm) / t.coreLengthMm / 4 : 0);
  const ranked = found.slice(0, CANDIDATES).sort((a, b) => distance(a) - distance(b));
  return {
    rows: ranked.slice(0, LIBRARY_PAGE).map(({ job, ...r }) => ({ ...r, jobNumber: job.number })),
    more: found.length > LIBRARY_PAGE,
  };
}

/** Full sheets for side-by-side comparison (at most 3), in the order asked. */
export async function getLibrarySheets(
  ids: string[],
): Promise<{ id: string; jobNumber: number; revision: number; manufacturer: string | null; model: string | null; sheet: WindingSheet }[]> {
  if (ids.length === 0) return [];
  const rows = await db().windingSheet.findMany({
    where: { id: { in: ids.slice(0, 3) } },
    select: { id: true, revision: true, data: true, manufacturer: true, model: true, job: { select: { number: true } } },
  });
  const out = [];
  for (const id of ids) {
    const r = rows.find((x) => x.id === id);
    if (!r) continue;
    const parsed = windingSheetSchema.safeParse(r.data);
    if (parsed.success)
      out.push({
        id: r.id,
        jobNumber: r.job.number,
        revision: r.revision,
        manufacturer: r.manufacturer,
        model: r.model,
        sheet: parsed.data,
      });
  }
  return out;
}
