/**
 * The winder's bench pack, assembled from a winding and its core: coil groups round the stator, the
 * circuits and jumpers, the leads, the wire to draw, the coil dimensions, insulation, cautions and approval,
 * all formatted once into plain strings (metric first, imperial beside). The print view and the PDF render
 * this object and nothing else. Pure: the loader (bench-pack-data.ts) reads the database.
 */
import { coilDimensions, type CoilDimensions, type OldCoils } from '@/lib/engine/bench/coil-dimensions';
import { groupLabel, type CoilGroup } from '@/lib/engine/bench/coil-groups';
import { connectionPlan, type ConnectionPlan, type GroupEnd } from '@/lib/engine/bench/connection-plan';
import { leadCountsFor, leadPlan, type LeadConvention, type LeadCount, type LeadPlan } from '@/lib/engine/bench/lead-markings';
import { wireDraw } from '@/lib/engine/bench/wire-draw';
import { spanLabel, spansLabel, layoutLabel } from '@/lib/engine/notation';
import { kgToLb, mmToInches, mToFeet } from '@/lib/engine/units';
import { windingLayout, type Phase, type WindingSpec } from '@/lib/engine/winding-layout';
import { fmt } from '@/lib/presentation/format';

export interface Row {
  label: string;
  value: string;
}

/** One wire size in hand with what it weighs and what the stock holds. */
export interface BenchWire {
  label: string;
  enamelGrade: number;
  count: number;
  areaMm2: number;
  /** Stock on hand, kg; null when the size is not in the stock list or has no quantity. */
  onHandKg: number | null;
}

/** What the pack is made from. */
export type BenchBasis =
  | {
      kind: 'redesign';
      revision: number;
      approvedBy: string;
      approvedAt: Date;
      note: string;
      current: boolean;
      currentRevision: number | null;
    }
  | { kind: 'original'; sheetRevision: number; savedAt: Date; approvedRedesignRevision: number | null };

export interface BenchPackInput {
  job: { number: number; customer: string; motor: string };
  basis: BenchBasis;
  supply: { lineVoltageV: number; frequencyHz: number };
  winding: WindingSpec;
  core: { boreMm: number; coreLengthMm: number; slotDepthMm: number; slots: number };
  oldCoils?: OldCoils;
  wires: BenchWire[];
  insulation: Row[];
  /** Cautions particular to this winding (the redesign's), before the bench cautions. */
  cautions: string[];
  wireAllowance: number;
  marking: LeadConvention;
  leads: LeadCount;
}

/** One row of the group table. */
export interface GroupRow {
  number: number;
  label: string;
  phase: Phase;
  pole: number;
  coils: number;
  slots: string;
  spans: string;
  turns: string;
  sense: 'forward' | 'reversed';
  senseText: string;
}

/** One circuit in words: its lead ends and every group in the order current passes through it. */
export interface CircuitLine {
  phase: Phase;
  index: number;
  section: 1 | 2;
  startLead: string;
  finishLead: string;
  /** "S·A1·F → F·A2·S": each group written entry end first. */
  path: string;
  jumpers: string[];
  turns: number;
}

export interface BenchPackData {
  input: BenchPackInput;
  title: string;
  summary: Row[];
  plan: ConnectionPlan;
  groups: GroupRow[];
  poleConnectionText: string;
  circuits: CircuitLine[];
  leadPlan: LeadPlan;
  leadCounts: LeadCount[];
  /** Where each phase section's finish goes when it is not a lead (3 leads): "star point", "to lead V". */
  leadText: { lines: string[]; joints: string[] };
  wire: { rows: { label: string; values: string[] }[]; allowanceText: string; totalText: string };
  coilDims: CoilDimensions;
  coilRows: { label: string; values: string[] }[];
  coilNote: string;
  insulation: Row[];
  cautions: string[];
  approval: Row[];
}

const end = (e: GroupEnd): string => (e === 'start' ? 'S' : 'F');
const mmIn = (mm: number): string => `${fmt.num(mm, 0, 'mm')} (${fmt.num(mmToInches(mm), 1, 'in')})`;
const kgLb = (kg: number): string => `${fmt.num(kg, 2, 'kg')} (${fmt.num(kgToLb(kg), 2, 'lb')})`;
const spanText = (y: number): string => `${spanLabel(y)} (${y} slot pitches)`;

/** Words for the pole connection the layout needs. */
export function poleConnectionText(plan: ConnectionPlan): string {
  const perPhase = plan.groups.byPhase.A.length;
  if (perPhase === 1) return 'One group per phase: no jumpers between groups.';
  if (plan.poleConnection === 'alternate')
    return 'Alternate-pole connection: neighbouring groups of a phase are reversed. Join finish to finish, then start to start, and so on along the circuit (arrows on the diagram alternate).';
  if (plan.poleConnection === 'consecutive')
    return 'Consecutive-pole connection: every group of a phase is forward. Join the finish of each group to the start of the next (arrows on the diagram all point the same way).';
  return 'Mixed senses: follow the S and F marks of each group on the diagram exactly.';
}

/** Builds the pack; an error string when the winding cannot be traced or connected. */
export function buildBenchPack(input: BenchPackInput): { ok: true; value: BenchPackData } | { ok: false; reason: string } {
  const w = input.winding;
  const layout = windingLayout(w);
  if (!layout.ok) return { ok: false, reason: `${layout.error.message} ${layout.error.hint}` };
  const planned = connectionPlan(layout.value, w.parallelPaths, w.connection);
  if (!planned.ok) return { ok: false, reason: `${planned.error.message} ${planned.error.hint}` };
  const plan = planned.value;
  const leadCounts = leadCountsFor(w.parallelPaths);
  const leads = leadPlan(input.marking, leadCounts.includes(input.leads) ? input.leads : 6, w.connection, w.parallelPaths);

  const dims = coilDimensions(input.core, w.spans, w.turnsPerCoil, input.oldCoils);
  if (!dims.ok) return { ok: false, reason: `${dims.error.message} ${dims.error.hint}` };
  const allCoils = plan.groups.groups.flatMap((g) => g.coils);
  const perCoil = coilDimensions(
    input.core,
    allCoils.map((c) => c.span),
    allCoils.map((c) => c.turns),
    input.oldCoils,
  );
  if (!perCoil.ok) return { ok: false, reason: `${perCoil.error.message} ${perCoil.error.hint}` };
  const draw = wireDraw(
    perCoil.value.coils.map((c) => ({ turns: c.turns, meanTurnLengthMm: c.meanTurnLengthMm })),
    input.wires.map((x) => ({ label: x.label, count: x.count, areaMm2: x.areaMm2 })),
    input.wireAllowance,
  );
  if (!draw.ok) return { ok: false, reason: `${draw.error.message} ${draw.error.hint}` };

  const groups: GroupRow[] = plan.groups.groups.map((g: CoilGroup) => ({
    number: g.number,
    label: groupLabel(g),
    phase: g.phase,
    pole: g.pole,
    coils: g.coils.length,
    slots: g.coils.map((c) => `${c.startSlot}→${c.finishSlot}`).join(', '),
    spans: spansLabel([...new Set(g.coils.map((c) => c.span))]),
    turns: g.coils.map((c) => c.turns).join('/'),
    sense: g.sense > 0 ? 'forward' : 'reversed',
    senseText: g.sense > 0 ? '→ forward (in at S)' : '← reversed (in at F)',
  }));

  const circuits: CircuitLine[] = [];
  for (const s of leads.sections)
    for (const k of s.circuits) {
      const c = plan.circuits[s.phase][k - 1];
      if (!c) continue;
      const finishLead = s.finishLead ?? finishInside(leads, s.phase);
      circuits.push({
        phase: s.phase,
        index: k,
        section: s.section,
        startLead: s.startLead ?? `phase ${s.phase} start`,
        finishLead,
        path: c.steps.map((st) => `${end(st.enter)}·${groupLabel(st.group)}·${end(st.leave)}`).join(' → '),
        jumpers: c.jumpers.map((j) => `${end(j.from.end)} of ${j.from.label} to ${end(j.to.end)} of ${j.to.label}`),
        turns: c.turns,
      });
    }

  const leadText = {
    lines: leads.lines.map((l) => `${l.line}: ${l.leads.join(' + ')}`),
    joints: leads.joints
      .filter((j) => j.role !== 'line')
      .map((j) => `${j.role === 'star point' ? 'Star point' : 'Delta corner'} (${j.where}): ${j.ends.join(' + ')}`),
  };

  const wireRows = draw.value.lines.map((l, i) => {
    const x = input.wires[i];
    const onHand = x?.onHandKg ?? null;
    const short = onHand !== null && onHand < l.drawKg;
    return {
      label: `${l.count} × ${l.label}${x ? `, grade ${x.enamelGrade}` : ''}`,
      values: [
        `${fmt.num(l.lengthM, 0, 'm')} (${fmt.num(mToFeet(l.lengthM), 0, 'ft')})`,
        kgLb(l.copperKg),
        kgLb(l.drawKg),
        onHand === null ? 'not in the stock list' : `${kgLb(onHand)}${short ? ' — NOT ENOUGH' : ' — enough'}`,
      ],
    };
  });
  const pct = fmt.num(input.wireAllowance * 100, 1, '%');

  const coilRows = dims.value.coils.map((c) => ({
    label: `Span ${spanText(c.span)}, ${c.turns} turns`,
    values: [mmIn(c.straightLengthMm), mmIn(c.endExtensionMm), mmIn(c.pitchMm), mmIn(c.meanTurnLengthMm)],
  }));
  const coilNote =
    dims.value.basis === 'scaled-from-old-coils'
      ? `Estimated from the old coils' mean turn length, scaled with the span; straight part ${dims.value.straightExtensionMm} mm beyond the core at each end (shop practice). Check against an old coil before winding the set.`
      : `Estimated from the core: coil pitch at mid-slot = π × (bore + slot depth) × span / slots; each end a straight part of ${dims.value.straightExtensionMm} mm (shop practice) and a half-round loop across the pitch. Check against an old coil before winding the set.`;

  const conn = w.connection === 'star' ? 'star (Y)' : 'delta (Δ)';
  const summary: Row[] = [
    {
      label: 'Supply',
      value: `${fmt.num(input.supply.lineVoltageV, 0, 'V')} ${fmt.num(input.supply.frequencyHz, 0, 'Hz')}, ${w.poles} poles, ${conn}`,
    },
    {
      label: 'Slots, layers',
      value: `${w.slots} slots, ${layoutLabel(w)}${w.singleLayerCoiling ? `, ${w.singleLayerCoiling}-coiled` : ''}`,
    },
    { label: 'Coil span', value: w.spans.map(spanText).join(', ') },
    { label: 'Turns per coil', value: w.turnsPerCoil.join(' / ') },
    { label: 'Wires in hand', value: input.wires.map((x) => `${x.count} × ${x.label}`).join(' + ') },
    {
      label: 'Groups',
      value: `${plan.groups.groups.length} groups, ${plan.groups.byPhase.A.length} per phase, ${plan.groups.byPhase.A[0]?.coils.length ?? 0} coil(s) per group${new Set(plan.groups.groups.map((g) => g.coils.length)).size > 1 ? ' (sizes vary: see the table)' : ''}`,
    },
    { label: 'Parallel circuits', value: `${w.parallelPaths} per phase, ${conn}` },
    { label: 'Leads', value: `${leads.leads} leads, ${leads.standard}` },
  ];

  const b = input.basis;
  const approval: Row[] =
    b.kind === 'redesign'
      ? [
          {
            label: 'Approved redesign',
            value: `revision ${b.revision}${b.current ? ' (current)' : ` — SUPERSEDED by revision ${b.currentRevision ?? '?'}: do not wind from this one`}`,
          },
          { label: 'Approved by', value: `${b.approvedBy}, ${fmt.dateTime(b.approvedAt)}` },
          { label: 'Approval note', value: b.note || '—' },
        ]
      : [
          {
            label: 'Basis',
            value: `Rewind to the original: as-found data sheet, revision ${b.sheetRevision}, saved ${fmt.dateTime(b.savedAt)}`,
          },
          ...(b.approvedRedesignRevision
            ? [
                {
                  label: 'Caution',
                  value: `Redesign revision ${b.approvedRedesignRevision} is approved for this job: wind from its bench pack unless the engineer says otherwise.`,
                },
              ]
            : []),
        ];

  const cautions = [
    ...input.cautions,
    'Coil dimensions are estimates: wind one coil, try it in the core against an old coil, and adjust the former before winding the set.',
    'Check each group’s S and F marks and the arrows before joining; a reversed group unbalances the phase. Check polarity and measure the three phase resistances before the final connection.',
    `Connect the supply lines to the leads as listed (${leads.lines.map((l) => `${l.line} to ${l.leads[0]}`).join(', ')}) and check the direction of rotation uncoupled before the motor drives its load.`,
    'Insulation-resistance and high-voltage tests can kill: trained people only, in a barricaded area; discharge and ground the winding after DC tests.',
    'Local codes and regulations, the manufacturer’s data and licensed or qualified practice govern this repair.',
  ];

  return {
    ok: true,
    value: {
      input,
      title: `Bench pack · job ${input.job.number}${b.kind === 'redesign' ? ` · redesign revision ${b.revision}` : ' · rewind to the original'}`,
      summary,
      plan,
      groups,
      poleConnectionText: poleConnectionText(plan),
      circuits,
      leadPlan: leads,
      leadCounts,
      leadText,
      wire: {
        rows: wireRows,
        allowanceText: `Copper weight of the winding plus ${pct} for leads, jumpers and waste (${input.wireAllowance === 0.1 ? 'shop practice' : 'this shop’s setting'}).`,
        totalText: `Total: ${kgLb(draw.value.copperKg)} in the winding, draw ${kgLb(draw.value.drawKg)}.`,
      },
      coilDims: dims.value,
      coilRows,
      coilNote,
      insulation: input.insulation,
      cautions,
      approval,
    },
  };
}

/** Where a phase's finish goes when it is not brought out (3 leads). */
function finishInside(leads: LeadPlan, phase: Phase): string {
  const name = `phase ${phase} finish`;
  const joint = leads.joints.find((j) => j.ends.includes(name));
  if (!joint) return 'inside';
  if (joint.role === 'star point') return 'star point';
  const other = joint.ends.find((e) => e !== name);
  return other ? `to ${other}` : 'inside';
}
