/**
 * Everything the job sheet prints, gathered once and formatted once into plain strings. The PDF and the
 * print view both render this object and nothing else, so the two always show the same numbers.
 */
import { db } from '@/lib/db/client';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { CONNECTION_LABELS } from '@/lib/jobs/motor-schema';
import { getAsFoundSheet } from '@/lib/as-found/as-found-queries';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { listTestRecords } from '@/lib/final-tests/record-queries';
import { readingSections, type ReadingSection } from '@/lib/final-tests/readings';
import { judgeTestRecord, type OverallVerdict, type SectionJudgement } from '@/lib/final-tests/verdicts';
import { temperatureText } from '@/lib/final-tests/display';
import { mmToInches } from '@/lib/engine/units';
import { fmt } from '@/lib/presentation/format';
import { getApprovedRedesignSummary, type ApprovedRedesignSummary } from './redesign-summary';
import { lossStatementForJob, type LossStatementResult } from '@/lib/losses/loss-statement-source';
import { CLOSING_STATEMENT, SAFETY_NOTICES, type SafetyNotice } from './safety-notices';
import { shopDetails, type ShopDetails } from './shop-details';
import { contentHash, sheetIssueFor } from './sheet-issue';
import { loadGateDecisions } from '@/lib/jobs/gate-facts';
import { ratingSentence } from '@/lib/final-tests/readings';
import type { JobStatus } from '@/lib/db/generated/enums';
import { spansLabel, layoutLabel } from '@/lib/engine/notation';

export interface Row {
  label: string;
  value: string;
}

export interface JobSheetTests {
  sequence: number;
  /** What the verdicts were judged against, in one line. */
  basis: string;
  /** "judged for the as-repaired rating 460 V 60 Hz, redesign revision 1" (or the nameplate rating). */
  judgedFor: string;
  testedAt: string;
  testedBy: string;
  instruments: string;
  verdict: OverallVerdict;
  /** Why a record without a failure is still not a full pass (a reduced-level test). */
  qualifiers: string[];
  sections: SectionJudgement[];
  readings: ReadingSection[];
  notes: string | null;
  earlier: { sequence: number; testedAt: string; verdict: OverallVerdict }[];
}

export interface JobSheetData {
  shop: ShopDetails;
  job: { id: string; number: number; status: string; shipped: boolean; rows: Row[] };
  customer: Row[];
  nameplate: Row[];
  /** What was done to the winding, in one sentence the records support. */
  statementOfWork: string;
  /** The nameplate the motor leaves with, when a redesign changed it. */
  asRepaired: Row[] | null;
  /** Engineers' written decisions that released a shop-path gate. */
  decisions: Row[];
  asFound: { revision: number; updatedAt: string; rows: Row[] } | null;
  redesign: (Omit<ApprovedRedesignSummary, 'approvedAt'> & { approvedAt: string }) | null;
  tests: JobSheetTests | null;
  /** What the rewind did to copper loss and efficiency (lib/losses). */
  losses: LossStatementResult;
  notices: readonly SafetyNotice[];
  closing: string;
  /** Lines for handwritten signatures and dates. */
  signatures: readonly string[];
  /** The issue of this sheet: 1 for the first, up by one each time what it prints changes (sheet-issue.ts). */
  revision: number;
  /** When this issue was first produced. */
  revisionDate: string;
}

export const SIGNATURE_LINES = [
  'Tested by (name, initials)',
  'Checked by (qualified person)',
  'Released by',
  'Received by (customer)',
] as const;

const mmIn = (mm: number | undefined, digits = 1) =>
  mm === undefined ? '—' : `${fmt.num(mm, digits, 'mm')} (${mmToInches(mm).toFixed(3)} in)`;
const dash = (v: string | null | undefined) => (v && v.trim() ? v : '—');

function asFoundRows(s: WindingSheet): Row[] {
  const w = s.winding;
  const spans = spansLabel(w.spans);
  const wires = s.wires
    .map((x) => `${x.count} × ${x.standard === 'awg' ? `AWG ${x.size}` : `${x.size} mm`} (grade ${x.enamelGrade})`)
    .join(' + ');
  const rows: Row[] = [
    {
      label: 'Core',
      value: `${s.core.slots} slots · bore ${mmIn(s.core.boreMm)} · length ${mmIn(s.core.coreLengthMm)} · OD ${mmIn(s.core.outsideDiameterMm)}`,
    },
    {
      label: 'Winding',
      value: `${layoutLabel(w)} · span ${spans} · ${w.turnsPerCoil.join(', ')} turns per coil · ${w.parallelPaths} path(s) · ${w.connection}`,
    },
    { label: 'Wire', value: wires },
    { label: 'Insulation', value: `class ${s.insulation.thermalClass}${s.insulation.varnish ? ` · ${s.insulation.varnish}` : ''}` },
    {
      label: 'Supply',
      value: `${fmt.num(s.supply.lineVoltageV, 0, 'V')} · ${fmt.num(s.supply.frequencyHz, 0, 'Hz')} · ${s.supply.poles} poles`,
    },
  ];
  if (w.meanTurnLengthMm !== undefined) rows.push({ label: 'Mean turn', value: mmIn(w.meanTurnLengthMm, 0) });
  if (s.resistance) {
    rows.push({
      label: 'Resistance as found',
      value: `${s.resistance.readings.map((r) => `${Number(r.toPrecision(4))} Ω`).join(' / ')} ${s.resistance.between} at ${temperatureText(s.resistance.temperatureC)}`,
    });
  }
  return rows;
}

const WOUND: JobStatus[] = ['TESTING', 'READY', 'SHIPPED'];

/**
 * What was done, only as far as the records show it: the approved redesign, else the as-found data, else
 * nothing; "rewound" only once the job has left the winding bench.
 */
export function statementOfWork(
  status: JobStatus,
  heldFrom: JobStatus | null,
  redesign: { revision: number; approvedBy: string; approvedAt: string } | null,
  hasAsFound: boolean,
  keptOriginal: string | null,
): string {
  if (status === 'RETURNED_UNREPAIRED') return 'Returned unrepaired: the winding was not rewound.';
  const stage = status === 'ON_HOLD' ? heldFrom : status;
  const done = stage !== null && WOUND.includes(stage);
  const verb = done ? 'Rewound' : stage === 'WINDING' ? 'Being rewound' : 'To be rewound';
  const kept = keptOriginal ? ` The original winding was kept although another supply was asked for: ${keptOriginal}` : '';
  if (redesign) return `${verb} to redesign revision ${redesign.revision} approved by ${redesign.approvedBy} on ${redesign.approvedAt}.`;
  if (hasAsFound) return `${verb} to the as-found winding data.${kept}`;
  return 'No winding data recorded.';
}

/** The job sheet of a job, or null when there is no such job. */
export async function loadJobSheet(number: number): Promise<JobSheetData | null> {
  const job = await db().job.findUnique({
    where: { number },
    include: { customer: { include: { contacts: true } }, motor: true, assignee: { select: { name: true } } },
  });
  if (!job) return null;
  const [sheet, records, redesign, decisions, losses] = await Promise.all([
    getAsFoundSheet(job.id),
    listTestRecords(job.id),
    getApprovedRedesignSummary(job.id),
    loadGateDecisions(db(), job.id),
    lossStatementForJob(job.id),
  ]);
  const m = job.motor;
  const contact = job.customer.contacts[0];
  const current = records[0];
  let tests: JobSheetTests | null = null;
  if (current) {
    const j = judgeTestRecord(current.data);
    tests = {
      sequence: current.sequence,
      basis: (readingSections(current.data, j).find((r) => r.key === 'basis')?.rows ?? [])
        .filter((r) => r.label !== 'Rating')
        .map((r) => `${r.label} ${r.value}`)
        .join('; '),
      judgedFor: ratingSentence(current.data.basis),
      testedAt: fmt.dateTime(current.testedAt),
      testedBy: current.testedBy?.name ?? '—',
      instruments: current.instrumentSerials.join(', ') || '—',
      verdict: current.verdict,
      qualifiers: j.qualifiers,
      sections: j.sections,
      readings: readingSections(current.data, j),
      notes: current.data.notes ?? null,
      earlier: records.slice(1).map((r) => ({ sequence: r.sequence, testedAt: fmt.dateTime(r.testedAt), verdict: r.verdict })),
    };
  }
  const approvedAt = redesign ? fmt.date(redesign.approvedAt) : '';
  const kept = decisions.find((d) => d.kind === 'keep-original-winding');
  const content: Omit<JobSheetData, 'revision' | 'revisionDate'> = {
    shop: shopDetails(),
    job: {
      id: job.id,
      number: job.number,
      status: STATUS_LABELS[job.status],
      shipped: job.status === 'SHIPPED',
      rows: [
        { label: 'Job', value: String(job.number) },
        { label: 'Status', value: STATUS_LABELS[job.status] },
        { label: 'Received', value: fmt.date(job.receivedAt) },
        { label: 'Promised', value: fmt.day(job.promisedAt) },
        { label: 'Customer PO', value: dash(job.customerPo) },
        { label: 'Reported fault', value: dash(job.reportedFault) },
        { label: 'Assigned to', value: dash(job.assignee?.name) },
      ],
    },
    customer: [
      { label: 'Company', value: job.customer.company },
      { label: 'Contact', value: dash(contact?.name) },
      { label: 'Phone', value: dash(job.customer.phone) },
      { label: 'Email', value: dash(job.customer.email) },
      { label: 'Address', value: dash(job.customer.address) },
    ],
    nameplate: [
      { label: 'Motor', value: `${m.manufacturer} ${m.model ?? ''}`.trim() },
      { label: 'Serial / frame', value: `${dash(m.serial)} / ${dash(m.frame)}` },
      { label: 'Output', value: fmt.power(m.outputKw) },
      {
        label: 'Voltage',
        value: `${fmt.num(m.ratedVoltageV, 0, 'V')}${m.connection ? ` · ${CONNECTION_LABELS[m.connection as keyof typeof CONNECTION_LABELS] ?? m.connection}` : ''}`,
      },
      { label: 'Current', value: fmt.num(m.currentA, 1, 'A') },
      { label: 'Supply', value: `${m.phases} phase · ${fmt.num(m.frequencyHz, 0, 'Hz')}` },
      { label: 'Speed', value: fmt.num(m.speedRpm, 0, 'rpm') },
      { label: 'Insulation / duty / SF', value: `class ${dash(m.insulationClass)} · ${dash(m.duty)} · SF ${m.serviceFactor ?? '—'}` },
      { label: 'Enclosure', value: dash(m.enclosure) },
      { label: 'Bearings', value: `DE ${dash(m.bearingDriveEnd)} · ODE ${dash(m.bearingOppositeEnd)}` },
    ],
    statementOfWork: statementOfWork(
      job.status,
      job.heldFrom,
      redesign ? { revision: redesign.revision, approvedBy: redesign.approvedBy, approvedAt } : null,
      sheet !== null,
      kept?.reason ?? null,
    ),
    asRepaired: redesign ? redesign.proposedNameplate : null,
    decisions: decisions.map((d) => ({
      label: d.kind === 'ready-override' ? 'Released to Ready without a passing test' : 'Original winding kept',
      value: `${d.reason} (${d.by}, ${fmt.date(d.at)}${d.kind === 'ready-override' ? `, ${d.recordSequence === null ? 'no test record' : `test record #${d.recordSequence}`}` : ''})`,
    })),
    asFound: sheet ? { revision: sheet.revision, updatedAt: fmt.date(sheet.updatedAt), rows: asFoundRows(sheet.sheet) } : null,
    redesign: redesign ? { ...redesign, approvedAt } : null,
    tests,
    losses,
    notices: SAFETY_NOTICES,
    closing: CLOSING_STATEMENT,
    signatures: SIGNATURE_LINES,
  };
  const issue = await sheetIssueFor(job.id, contentHash(content));
  return { ...content, revision: issue.issue, revisionDate: fmt.date(issue.issuedAt) };
}
