/**
 * Lead markings and terminal connections for a three-phase winding, by one of two open conventions:
 * - IEC 60034-8 terminal markings: phase windings U, V, W; the start of a winding is 1, its finish 2
 *   (U1–U2); a second section of the same phase is U5–U6 [from memory: IEC 60034-8 clause on windings in
 *   sections; verify against the standard's figures before relying on 12-lead IEC markings]; three
 *   terminals only: U, V, W [from memory].
 * - NEMA MG 1 Part 2 lead numbering: phase 1 T1–T4, phase 2 T2–T5, phase 3 T3–T6; a second section
 *   T7–T10, T8–T11, T9–T12; three leads T1, T2, T3 [common practice, NEMA MG 1 Part 2 connection figures].
 *
 * Delta joins the finish of each phase to the start of the one before it in the marking order (U1 with
 * W2, V1 with U2, W1 with V2; T1 with T6, T2 with T4, T3 with T5), so the line leads come out in the
 * marking's own sequence. 12 leads bring out two sections per phase (halves of its parallel circuits),
 * joined here in parallel for the approved voltage; the series arrangement is for twice the voltage and is
 * not part of this plan.
 */
import type { Phase } from '../winding-layout';

/** Which open convention marks the leads. */
export type LeadConvention = 'iec' | 'nema';
/** Leads brought out of the motor. */
export type LeadCount = 3 | 6 | 12;

/** The standard each convention comes from, as printed on the drawing. */
export const LEAD_STANDARD: Record<LeadConvention, string> = {
  iec: 'IEC 60034-8 terminal markings',
  nema: 'NEMA MG 1 Part 2 lead numbering',
};

/** One section of a phase winding (all its circuits, or half of them for 12 leads) and its two ends. */
export interface PhaseSection {
  phase: Phase;
  section: 1 | 2;
  /** Circuit numbers (1 … a) of the phase in this section, joined in parallel. */
  circuits: number[];
  /** Lead marking of the start and finish, or null where the end stays inside the motor. */
  startLead: string | null;
  finishLead: string | null;
}

/** One supply line and the leads joined to it. */
export interface LineConnection {
  line: 'L1' | 'L2' | 'L3';
  leads: string[];
}

/** One joint of ends: at the terminal box (leads), or inside the motor (ends that are not brought out). */
export interface Joint {
  where: 'terminal box' | 'inside the motor';
  ends: string[];
  /** What the joint is: the star point, or the corner of a delta. */
  role: 'star point' | 'delta corner' | 'line';
}

/** The whole lead plan. */
export interface LeadPlan {
  convention: LeadConvention;
  standard: string;
  leads: LeadCount;
  connection: 'star' | 'delta';
  sections: PhaseSection[];
  lines: LineConnection[];
  joints: Joint[];
}

const PHASES: readonly Phase[] = ['A', 'B', 'C'];
const IEC_LETTER: Record<Phase, string> = { A: 'U', B: 'V', C: 'W' };
const NEMA_INDEX: Record<Phase, number> = { A: 1, B: 2, C: 3 };
/** Delta: the phase whose finish joins this phase's start (A's start with C's finish, and so on). */
const BEFORE: Record<Phase, Phase> = { A: 'C', B: 'A', C: 'B' };
const LINE: Record<Phase, LineConnection['line']> = { A: 'L1', B: 'L2', C: 'L3' };

/** The marking of one end of one section, by convention. */
export function leadMark(convention: LeadConvention, phase: Phase, section: 1 | 2, end: 'start' | 'finish'): string {
  if (convention === 'iec') return `${IEC_LETTER[phase]}${section === 1 ? (end === 'start' ? 1 : 2) : end === 'start' ? 5 : 6}`;
  const k = NEMA_INDEX[phase];
  return `T${(section === 1 ? k : k + 6) + (end === 'start' ? 0 : 3)}`;
}

/** Lead count 12 needs an even number of circuits (two equal sections per phase). */
export const leadCountsFor = (parallelPaths: number): LeadCount[] => (parallelPaths % 2 === 0 ? [3, 6, 12] : [3, 6]);

/** Name of an end that is not brought out. */
const inner = (phase: Phase, end: 'start' | 'finish'): string => `phase ${phase} ${end}`;

/**
 * The lead plan for a connection, circuit count, convention and lead count. 12 leads with an odd circuit
 * count fall back to 6 (the caller offers only leadCountsFor).
 */
export function leadPlan(convention: LeadConvention, leads: LeadCount, connection: 'star' | 'delta', parallelPaths: number): LeadPlan {
  const count: LeadCount = leads === 12 && parallelPaths % 2 !== 0 ? 6 : leads;
  const all = Array.from({ length: parallelPaths }, (_, i) => i + 1);
  const sections: PhaseSection[] = [];
  for (const ph of PHASES) {
    if (count === 12) {
      const half = parallelPaths / 2;
      sections.push({
        phase: ph,
        section: 1,
        circuits: all.slice(0, half),
        startLead: leadMark(convention, ph, 1, 'start'),
        finishLead: leadMark(convention, ph, 1, 'finish'),
      });
      sections.push({
        phase: ph,
        section: 2,
        circuits: all.slice(half),
        startLead: leadMark(convention, ph, 2, 'start'),
        finishLead: leadMark(convention, ph, 2, 'finish'),
      });
    } else if (count === 6) {
      sections.push({
        phase: ph,
        section: 1,
        circuits: all,
        startLead: leadMark(convention, ph, 1, 'start'),
        finishLead: leadMark(convention, ph, 1, 'finish'),
      });
    } else {
      const lead = convention === 'iec' ? IEC_LETTER[ph] : `T${NEMA_INDEX[ph]}`;
      sections.push({ phase: ph, section: 1, circuits: all, startLead: lead, finishLead: null });
    }
  }
  const lines: LineConnection[] = [];
  const joints: Joint[] = [];
  const ends = (ph: Phase, end: 'start' | 'finish'): string[] =>
    sections.filter((s) => s.phase === ph).map((s) => (end === 'start' ? s.startLead : s.finishLead) ?? inner(ph, end));
  if (count === 3) {
    for (const ph of PHASES) lines.push({ line: LINE[ph], leads: ends(ph, 'start') });
    if (connection === 'star')
      joints.push({ where: 'inside the motor', role: 'star point', ends: PHASES.map((ph) => inner(ph, 'finish')) });
    else
      for (const ph of PHASES)
        joints.push({
          where: 'inside the motor',
          role: 'delta corner',
          ends: [`lead ${ends(ph, 'start').join('')}`, inner(BEFORE[ph], 'finish')],
        });
  } else if (connection === 'star') {
    for (const ph of PHASES) lines.push({ line: LINE[ph], leads: ends(ph, 'start') });
    for (const section of count === 12 ? ([1, 2] as const) : ([1] as const))
      joints.push({ where: 'terminal box', role: 'star point', ends: PHASES.map((ph) => leadMark(convention, ph, section, 'finish')) });
  } else {
    for (const ph of PHASES) lines.push({ line: LINE[ph], leads: [...ends(ph, 'start'), ...ends(BEFORE[ph], 'finish')] });
  }
  if (count !== 3) for (const l of lines) if (l.leads.length > 1) joints.push({ where: 'terminal box', role: 'line', ends: l.leads });
  return { convention, standard: LEAD_STANDARD[convention], leads: count, connection, sections, lines, joints };
}
