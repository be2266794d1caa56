/**
 * A test record's readings as label/value rows per section, every value with its unit (and °F, in/s
 * beside °C, mm/s). The tests screen, the print view and the PDF all print these rows, so the numbers on
 * the customer's sheet are the numbers the winder saved.
 */
import { fmt } from '@/lib/presentation/format';
import { LEAD_PAIRS, PHASE_NAMES, type TestDataValues } from '@/lib/final-tests/test-record-schema';
import { leakageText, megohmText, ohmText, percentText, temperatureText, velocityText } from './display';
import { SECTION_TITLES, type SectionKey, type TestJudgement } from './verdicts';

export interface ReadingRow {
  label: string;
  value: string;
}

export interface ReadingSection {
  key: SectionKey | 'basis';
  title: string;
  rows: ReadingRow[];
}

const v = (x: number | undefined, digits: number, unit: string) => fmt.num(x, digits, unit);
const result = (r: 'pass' | 'fail' | undefined) => (r === 'pass' ? '✓ Pass' : r === 'fail' ? '⚠ FAIL' : '—');

export const CASE_TEXT = { new: 'new winding', repeat: 'repeat test', reconditioned: 'reconditioned winding' } as const;
export const PRACTICE_TEXT = { nema: 'NEMA MG 1 / ANSI/EASA AR100', iec: 'IEC 60034-1' } as const;

/**
 * The sentence saying which rating the verdicts were judged for, e.g. "judged for the as-repaired rating
 * 460 V 60 Hz, redesign revision 1" or "judged for the nameplate rating 400 V 50 Hz".
 */
export function ratingSentence(b: TestDataValues['basis']): string {
  const rating = [v(b.ratedVoltageV, 0, 'V'), b.frequencyHz === undefined ? null : v(b.frequencyHz, 0, 'Hz')].filter(Boolean).join(' ');
  if (b.ratingSource === 'redesign' && b.redesignRevision !== undefined)
    return `judged for the as-repaired rating ${rating}, redesign revision ${b.redesignRevision}`;
  if (b.ratingSource === 'entered')
    return `judged for the rating entered on this test record, ${rating}, which differs from the nameplate as received`;
  return `judged for the nameplate rating ${rating}`;
}

export function readingSections(d: TestDataValues, j: TestJudgement): ReadingSection[] {
  const pairs = d.resistance.between === 'phase' ? PHASE_NAMES.map((p) => `Phase ${p}`) : LEAD_PAIRS.map((p) => `Leads ${p}`);
  const levels = j.derived.hipotLevels;
  return [
    {
      key: 'basis',
      title: 'Basis of the verdicts',
      rows: [
        { label: 'Rating', value: ratingSentence(d.basis) },
        { label: 'Rated voltage', value: v(d.basis.ratedVoltageV, 0, 'V') },
        ...(d.basis.frequencyHz === undefined ? [] : [{ label: 'Frequency', value: v(d.basis.frequencyHz, 0, 'Hz') }]),
        ...(d.basis.connection ? [{ label: 'Connection', value: d.basis.connection }] : []),
        ...(d.basis.ratedCurrentA === undefined ? [] : [{ label: 'Rated current', value: v(d.basis.ratedCurrentA, 1, 'A') }]),
        ...(d.basis.ratedSpeedRpm === undefined
          ? []
          : [{ label: 'Rated speed', value: `${v(d.basis.ratedSpeedRpm, 0, 'rpm')}${d.basis.poles ? ` (${d.basis.poles} poles)` : ''}` }]),
        { label: 'Insulation class', value: d.basis.insulationClass },
        { label: 'Winding', value: d.basis.windingKind === 'random' ? 'random-wound' : 'form-wound' },
        { label: 'IEEE 43 minimum', value: d.basis.irCategory },
      ],
    },
    {
      key: 'ir',
      title: SECTION_TITLES.ir,
      rows: [
        { label: 'Test voltage', value: v(d.ir.testVoltageV, 0, 'V DC') },
        { label: 'Winding temperature', value: temperatureText(d.ir.temperatureC) },
        { label: 'IR at 1 minute', value: megohmText(d.ir.ir1MinMOhm) },
        { label: 'IR at 10 minutes', value: megohmText(d.ir.ir10MinMOhm) },
        { label: 'IR 1 min at 40 °C', value: megohmText(j.derived.ir40MOhm) },
        { label: 'Polarization index', value: j.derived.polarizationIndex === undefined ? '—' : j.derived.polarizationIndex.toFixed(2) },
        { label: 'Megohmmeter', value: d.ir.instrumentSerial ?? '—' },
      ],
    },
    {
      key: 'hipot',
      title: SECTION_TITLES.hipot,
      rows: [
        { label: 'Case', value: `${CASE_TEXT[d.hipot.case]}, ${PRACTICE_TEXT[d.hipot.practice]}` },
        { label: 'Proposed', value: levels ? `${levels.acV} V AC or ${levels.dcV} V DC` : '—' },
        {
          label: 'Applied',
          value:
            d.hipot.appliedV === undefined
              ? '—'
              : `${d.hipot.appliedV} V ${d.hipot.kind.toUpperCase()} for ${v(d.hipot.durationS, 0, 's')}`,
        },
        {
          label: 'Leakage current',
          value: d.hipot.leakageMa === undefined ? '—' : `${leakageText(d.hipot.leakageMa)} (recorded, not judged)`,
        },
        {
          label: 'Winding held',
          value: d.hipot.result === 'pass' ? 'yes, no breakdown' : d.hipot.result === 'fail' ? '⚠ no: breakdown' : '—',
        },
        ...(d.hipot.reducedReason ? [{ label: 'Reduced-level test', value: d.hipot.reducedReason }] : []),
        { label: 'Hipot tester', value: d.hipot.instrumentSerial ?? '—' },
      ],
    },
    {
      key: 'surge',
      title: SECTION_TITLES.surge,
      rows: [
        { label: 'Test voltage', value: v(d.surge.testVoltageV, 0, 'V peak') },
        ...d.surge.phases.map((p, i) => ({
          label: `Phase ${PHASE_NAMES[i]}`,
          value: `${result(p.result)}${p.notes ? ` — ${p.notes}` : ''}`,
        })),
        { label: 'Surge tester', value: d.surge.instrumentSerial ?? '—' },
      ],
    },
    {
      key: 'resistance',
      title: SECTION_TITLES.resistance,
      rows: [
        ...d.resistance.readings.map((r, i) => ({
          label: pairs[i] ?? `Reading ${i + 1}`,
          value:
            r === undefined
              ? '—'
              : `${ohmText(r)} → ${ohmText(j.derived.correctedOhm?.[i])} at ${v(d.resistance.referenceTemperatureC, 1, '°C')}`,
        })),
        { label: 'Winding temperature', value: temperatureText(d.resistance.temperatureC) },
        { label: 'Unbalance', value: percentText(j.derived.unbalanceFraction) },
        { label: 'Ohmmeter', value: d.resistance.instrumentSerial ?? '—' },
      ],
    },
    {
      key: 'run',
      title: SECTION_TITLES.run,
      rows: [
        { label: 'Supply voltage', value: v(d.run.voltageV, 0, 'V') },
        {
          label: 'Current A / B / C',
          value: d.run.currentsA.every((c) => c === undefined) ? '—' : d.run.currentsA.map((c) => v(c, 2, 'A')).join(' / '),
        },
        { label: 'Speed', value: v(d.run.speedRpm, 0, 'rpm') },
        { label: 'Vibration', value: velocityText(d.run.vibrationMmS) },
        { label: 'Bearing, drive end', value: temperatureText(d.run.bearingDeC) },
        { label: 'Bearing, opposite end', value: temperatureText(d.run.bearingOdeC) },
        { label: 'Result', value: result(d.run.result) },
        { label: 'Notes', value: d.run.notes ?? '—' },
        { label: 'Vibration meter', value: d.run.instrumentSerial ?? '—' },
      ],
    },
  ];
}
