/**
 * Reads what a bench pack needs: the approved redesign revision (current, or ?rev=N) with the as-found
 * sheet revision it was made from, or, for a rewind to the original, the as-found sheet itself; the wire
 * stock on hand; the shop's bench-pack settings. Then builds the pack (bench-pack-build.ts).
 */
import { db } from '@/lib/db/client';
import type { OldCoils } from '@/lib/engine/bench/coil-dimensions';
import type { LeadCount } from '@/lib/engine/bench/lead-markings';
import { windingInputFromSheet } from '@/lib/engine/analyse-sheet';
import { INSULATION_CLASS_TEMP_C } from '@/lib/engine/nameplate';
import { mToMm } from '@/lib/engine/units';
import { stockWire } from '@/lib/engine/redesign/from-sheet';
import { listRedesigns } from '@/lib/redesign/redesign-queries';
import type { BenchPackQuery } from '@/lib/bench-pack/bench-pack-schema';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { getAsFoundSheet, getSheetRevision } from '@/lib/as-found/as-found-queries';
import { listStock, type StockRowView } from '@/lib/stock/stock-queries';
import { buildBenchPack, type BenchPackData, type BenchWire, type Row } from './bench-pack-build';
import { getBenchPackSettings } from './bench-settings';

export type BenchPackResult =
  | { ok: true; value: BenchPackData; options: { marking: 'iec' | 'nema'; leads: LeadCount; paper: 'a4' | 'letter' } }
  | { ok: false; status: 404 | 409; reason: string; job: { number: number } | null };

function insulationRows(sheet: WindingSheet | null): Row[] {
  if (!sheet) return [{ label: 'Insulation', value: 'Not recorded: ask the engineer before winding.' }];
  const i = sheet.insulation;
  return [
    { label: 'Thermal class', value: `${i.thermalClass} (${INSULATION_CLASS_TEMP_C[i.thermalClass]} °C) or better, as found` },
    { label: 'Slot liner', value: i.slotLiner || '—' },
    { label: 'Wedges', value: i.wedges || '—' },
    { label: 'Varnish', value: i.varnish || '—' },
  ];
}

const onHand = (stock: StockRowView[], w: { standard: string; size: string; enamelGrade: number }): number | null =>
  stock.find((r) => r.standard === w.standard && r.wire?.size === w.size && r.enamelGrade === w.enamelGrade)?.quantityKg ?? null;

function oldCoilsOf(sheet: WindingSheet | null): OldCoils | undefined {
  if (!sheet) return undefined;
  const w = sheet.winding;
  return {
    spans: w.spans,
    turnsPerCoil: w.turnsPerCoil,
    ...(w.meanTurnLengthMm !== undefined ? { meanTurnLengthMm: w.meanTurnLengthMm } : {}),
    ...(w.coilExtensionMm !== undefined ? { coilExtensionMm: w.coilExtensionMm } : {}),
  };
}

const coreOf = (sheet: WindingSheet) => ({
  boreMm: sheet.core.boreMm,
  coreLengthMm: sheet.core.coreLengthMm,
  slotDepthMm: sheet.core.slotDepthMm,
  slots: sheet.core.slots,
});

/** The bench pack of a job, or why there is none. */
export async function loadBenchPack(jobNumber: number, q: BenchPackQuery): Promise<BenchPackResult> {
  const job = await db().job.findUnique({
    where: { number: jobNumber },
    select: {
      id: true,
      number: true,
      customer: { select: { company: true } },
      motor: { select: { manufacturer: true, model: true, serial: true, frame: true } },
    },
  });
  if (!job) return { ok: false, status: 404, reason: 'No such job.', job: null };
  const [settings, stock, revisions, current] = await Promise.all([
    getBenchPackSettings(),
    listStock(),
    listRedesigns(job.id),
    getAsFoundSheet(job.id),
  ]);
  const marking = q.marking ?? settings.leadConvention;
  const leads: LeadCount = q.leads ?? 6;
  const paper = q.paper ?? 'a4';
  const header = {
    number: job.number,
    customer: job.customer.company,
    motor: `${job.motor.manufacturer} ${job.motor.model ?? ''} · S/N ${job.motor.serial ?? '—'} · frame ${job.motor.frame ?? '—'}`.replace(
      /\s+/g,
      ' ',
    ),
  };
  const approved = revisions.filter((r) => r.status === 'APPROVED' && r.snapshot);
  const common = { job: header, wireAllowance: settings.wireAllowance, marking, leads };
  const refuse = (status: 404 | 409, reason: string): BenchPackResult => ({ ok: false, status, reason, job: { number: job.number } });

  if (q.basis !== 'original' && (approved.length > 0 || q.rev)) {
    const r = q.rev ? approved.find((x) => x.revision === q.rev) : approved[0];
    const snap = r?.snapshot;
    if (!r || !snap)
      return refuse(
        404,
        q.rev
          ? `Revision ${q.rev} is not an approved revision. Wind only from an approved revision.`
          : 'No approved redesign for this job.',
      );
    const sheet = await getSheetRevision(job.id, snap.sheet.revision);
    const c = snap.report.candidate;
    const o = snap.original;
    const built = buildBenchPack({
      ...common,
      basis: {
        kind: 'redesign',
        revision: r.revision,
        approvedBy: snap.approval.byName,
        approvedAt: new Date(snap.approval.at),
        note: snap.approval.note,
        current: approved[0]?.revision === r.revision,
        currentRevision: approved[0]?.revision ?? null,
      },
      supply: { lineVoltageV: snap.request.target.lineVoltageV, frequencyHz: snap.request.target.frequencyHz },
      winding: c.winding,
      core: sheet
        ? coreOf(sheet)
        : {
            boreMm: mToMm(o.core.boreM),
            coreLengthMm: mToMm(o.core.coreLengthM),
            slotDepthMm: mToMm(o.core.slotDepthM),
            slots: o.core.slots,
          },
      oldCoils: oldCoilsOf(sheet) ?? {
        spans: o.winding.spans,
        turnsPerCoil: o.winding.turnsPerCoil,
        ...(o.meanTurnLengthMm !== undefined ? { meanTurnLengthMm: o.meanTurnLengthMm } : {}),
      },
      wires: c.wires.parts.map((p): BenchWire => ({
        label: p.wire.label,
        enamelGrade: p.wire.enamelGrade,
        count: p.count,
        areaMm2: p.wire.areaMm2,
        onHandKg: onHand(stock, p.wire),
      })),
      insulation: insulationRows(sheet),
      cautions: snap.report.warnings.map((x) => x.text),
    });
    return built.ok ? { ok: true, value: built.value, options: { marking, leads, paper } } : refuse(409, built.reason);
  }

  if (!current) return refuse(404, 'This job has no approved redesign and no as-found data sheet: record the winding first.');
  const sheet = current.sheet;
  const wires: BenchWire[] = [];
  for (const w of sheet.wires) {
    const s = stockWire(w);
    if (!s.ok) return refuse(409, `${s.error.message} ${s.error.hint}`);
    wires.push({
      label: s.value.label,
      enamelGrade: w.enamelGrade,
      count: w.count,
      areaMm2: s.value.areaMm2,
      onHandKg: onHand(stock, { standard: w.standard, size: s.value.size, enamelGrade: w.enamelGrade }),
    });
  }
  const old = oldCoilsOf(sheet);
  const built = buildBenchPack({
    ...common,
    basis: {
      kind: 'original',
      sheetRevision: current.revision,
      savedAt: current.updatedAt,
      approvedRedesignRevision: approved[0]?.revision ?? null,
    },
    supply: { lineVoltageV: sheet.supply.lineVoltageV, frequencyHz: sheet.supply.frequencyHz },
    winding: windingInputFromSheet(sheet).winding,
    core: coreOf(sheet),
    ...(old ? { oldCoils: old } : {}),
    wires,
    insulation: insulationRows(sheet),
    cautions: [],
  });
  return built.ok ? { ok: true, value: built.value, options: { marking, leads, paper } } : refuse(409, built.reason);
}
