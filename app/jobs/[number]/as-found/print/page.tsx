import Link from 'next/link';
import { analyseSheet } from '@/lib/engine/analyse-sheet';
import { mmToInches } from '@/lib/engine/units';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { sheetFindings } from '@/lib/engine/sheet-findings';
import { getAsFoundSheet, getJobForSheet } from '@/lib/as-found/as-found-queries';
import { fmt } from '@/lib/presentation/format';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { PrintButton } from '../_parts/print-button';
import { SlotDiagram } from '../_parts/slot-diagram';
import '../sheet.css';
import { loadJobRoute } from '@/lib/jobs/job-route';
import { jobRoutes } from '@/lib/routes';
import { spanLabel, spansLabel, layoutLabel } from '@/lib/engine/notation';
import { kgToLb } from '@/lib/engine/units';

export async function generateMetadata({ params }: { params: Promise<{ number: string }> }) {
  return { title: `Data sheet print · job ${(await params).number}` };
}

/** A length in mm with inches beside it, as the bench uses both. */
const len = (mm: number | undefined, digits = 2): string =>
  mm === undefined ? '—' : `${fmt.num(mm, digits)} mm (${fmt.num(mmToInches(mm), 3)} in)`;

function Rows({ rows }: { rows: [string, string][] }) {
  return (
    <table>
      <tbody>
        {rows.map(([k, v]) => (
          <tr key={k}>
            <th scope="row">{k}</th>
            <td>{v}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function sheetRows(s: WindingSheet) {
  const c = s.core;
  const w = s.winding;
  const core: [string, string][] = [
    ['Bore', len(c.boreMm)],
    ['Core length', len(c.coreLengthMm)],
    ['Outside diameter', len(c.outsideDiameterMm)],
    ['Slots', String(c.slots)],
    ['Slot depth', len(c.slotDepthMm)],
    ['Slot width top / bottom', `${len(c.slotWidthTopMm)} / ${len(c.slotWidthBottomMm)}`],
    ['Slot opening', len(c.slotOpeningMm)],
    ['Tooth width', len(c.toothWidthMm)],
    ['Stacking factor', String(c.stackingFactor)],
    ['Vent ducts', c.ventDucts ? `${c.ventDucts} × ${len(c.ventDuctWidthMm)}` : 'none'],
    ['Rotor slots', c.rotorSlots === undefined ? '—' : String(c.rotorSlots)],
    ['Air gap', len(c.airGapMm, 3)],
  ];
  const winding: [string, string][] = [
    ['Layout', `${w.layers === 2 ? 'Double' : 'Single'}-layer ${w.style}${w.singleLayerCoiling ? `, ${w.singleLayerCoiling}-coiled` : ''}`],
    ['Spans', w.spans.map((y) => `${spanLabel(y)} (${y})`).join(', ')],
    ['Turns per coil', w.turnsPerCoil.join(' / ')],
    ['Coils/group × groups', `${w.coilsPerGroup ?? '—'} × ${w.groups ?? '—'}`],
    ['Parallel circuits', String(w.parallelPaths)],
    ['Connection', w.connection === 'star' ? 'Star (Y)' : 'Delta (Δ)'],
    ['Leads', `${w.leads ?? '—'}${w.leadMarkings ? ` · ${w.leadMarkings}` : ''}`],
    [
      'Wires in hand',
      s.wires.map((x) => `${x.count} × ${x.standard === 'awg' ? `AWG ${x.size}` : `${x.size} mm`} grade ${x.enamelGrade}`).join(' + '),
    ],
    ['Mean turn length', len(w.meanTurnLengthMm, 0)],
    ['Coil extension', len(w.coilExtensionMm, 0)],
    [
      'Copper weight',
      w.copperWeightKg === undefined ? '—' : `${fmt.num(w.copperWeightKg, 2)} kg (${fmt.num(kgToLb(w.copperWeightKg), 2)} lb)`,
    ],
    [
      'Insulation',
      `Class ${s.insulation.thermalClass} · liner ${s.insulation.slotLiner ?? '—'} · wedges ${s.insulation.wedges ?? '—'} · varnish ${s.insulation.varnish ?? '—'}`,
    ],
    [
      'Supply',
      `${fmt.num(s.supply.lineVoltageV, 0, 'V')} · ${fmt.num(s.supply.frequencyHz, 0, 'Hz')} · ${s.supply.poles} poles · ${fmt.num(s.supply.ratedCurrentA, 1, 'A')} · ${fmt.power(s.supply.ratedOutputKw)}`,
    ],
    [
      'Resistance',
      s.resistance
        ? `${s.resistance.readings.map((r) => fmt.num(r, 4)).join(' / ')} Ω ${s.resistance.between} at ${s.resistance.temperatureC} °C`
        : '—',
    ],
  ];
  return { core, winding };
}

export default async function SheetPrintPage({ params }: { params: Promise<{ number: string }> }) {
  const { job } = await loadJobRoute(params, getJobForSheet);
  const saved = await getAsFoundSheet(job.id);
  const back = (
    <p className="no-print row">
      <Link href={jobRoutes(job.number).asFound}>← Back to the sheet</Link>
      {saved && <PrintButton />}
    </p>
  );
  if (!saved)
    return (
      <>
        {back}
        <h1>As-found data sheet · job {job.number}</h1>
        <p className="notice warn">No data sheet has been saved for this job yet; drafts are not printed.</p>
      </>
    );
  const s = saved.sheet;
  const a = analyseSheet(s);
  const findings = a.ok ? sheetFindings(s, a.value) : [];
  const rows = sheetRows(s);
  const m = job.motor;
  return (
    <div className="print-sheet">
      {back}
      <h1>As-found winding data · job {job.number}</h1>
      <p className="small">
        {job.customer.company} · {m.manufacturer} {m.model ?? ''} · S/N {m.serial ?? '—'} · frame {m.frame ?? '—'} · status{' '}
        {STATUS_LABELS[job.status]} · revision {saved.revision} saved {fmt.dateTime(saved.updatedAt)}
      </p>
      <div className="cols">
        <section>
          <h2>Core</h2>
          <Rows rows={rows.core} />
        </section>
        <section>
          <h2>Winding</h2>
          <Rows rows={rows.winding} />
        </section>
      </div>
      {s.winding.jumperNotes && (
        <p className="small">
          <strong>Jumpers:</strong> {s.winding.jumperNotes}
        </p>
      )}
      {s.notes && (
        <p className="small">
          <strong>Notes:</strong> {s.notes}
        </p>
      )}
      {a.ok ? (
        <div className="diagram-box">
          <SlotDiagram
            table={a.value.winding.layout}
            caption={`${layoutLabel(s.winding)}, span${s.winding.spans.length > 1 ? 's' : ''} ${spansLabel(s.winding.spans)}`}
            id="print-diagram"
          />
          <section>
            <h2>Analysis</h2>
            <Rows
              rows={[
                ['Winding factor k_w1', a.value.winding.windingFactor.toFixed(4)],
                ['Series turns/phase', fmt.num(a.value.winding.seriesTurnsPerPhase, 1)],
                ['Parallel circuits possible', a.value.winding.parallelPaths.allowed.join(', ')],
                ...(a.value.winding.flux
                  ? ([
                      [
                        'Gap B avg / peak',
                        `${a.value.winding.flux.gapAverage.tesla.toFixed(3)} / ${a.value.winding.flux.gapPeak.tesla.toFixed(3)} T`,
                      ],
                      [
                        'Teeth / yoke',
                        `${a.value.winding.flux.toothMax.tesla.toFixed(3)} / ${a.value.winding.flux.yoke.tesla.toFixed(3)} T (${a.value.winding.flux.toothMax.kilolinesPerIn2.toFixed(1)} / ${a.value.winding.flux.yoke.kilolinesPerIn2.toFixed(1)} kl/in²)`,
                      ],
                    ] as [string, string][])
                  : []),
                [
                  'Current density',
                  a.value.currentDensity
                    ? `${a.value.currentDensity.ampsPerMm2.toFixed(2)} A/mm² · ${a.value.currentDensity.circularMilsPerAmp.toFixed(0)} CM/A`
                    : '—',
                ],
                [
                  'Slot fill',
                  `${(a.value.slotFill.bareCopperOverGross * 100).toFixed(1)} % bare/gross · ${(a.value.slotFill.insulatedOverGross * 100).toFixed(1)} % insulated/gross`,
                ],
                [
                  'R phase 20 °C pred./meas.',
                  a.value.resistance
                    ? `${a.value.resistance.predictedPhaseOhm20.toFixed(4)} / ${a.value.resistance.measured ? `${a.value.resistance.measured.phaseOhm20.toFixed(4)} Ω (${a.value.resistance.measured.differencePercent.toFixed(1)} %)` : '—'}`
                    : '—',
                ],
              ]}
            />
            {findings.length > 0 && (
              <ul className="findings">
                {findings.map((f) => (
                  <li key={f.id} className={`finding ${f.severity}`}>
                    <strong>{f.severity === 'problem' ? 'Problem' : f.severity === 'check' ? 'Check' : 'Note'}:</strong> {f.message}{' '}
                    <em>Check: {f.check}</em>
                  </li>
                ))}
              </ul>
            )}
          </section>
        </div>
      ) : (
        <p className="notice warn">The engine could not analyse this sheet: {a.error.message}</p>
      )}
      <p className="caution">
        Rewind from this record only after checking it against the stripped stator. Any change from the as-found winding is a redesign and
        needs review and approval by a qualified person. Discharge and ground windings after resistance or insulation tests. Follow local
        codes and the manufacturer’s data.
      </p>
    </div>
  );
}
