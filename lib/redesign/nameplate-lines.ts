import type { ProposedNameplate } from '@/lib/engine/redesign/report';
import { fmt } from '@/lib/presentation/format';
import { nmToLbfFt } from '@/lib/engine/units';

/** The proposed supplementary nameplate as label/value lines, units included (screens and job sheet). */
export function nameplateLines(p: ProposedNameplate): { label: string; value: string }[] {
  return [
    { label: 'Voltage, connection', value: `${fmt.num(p.lineVoltageV, 0, 'V')}, ${p.connection === 'star' ? 'star (Y)' : 'delta (Δ)'}` },
    { label: 'Frequency, poles', value: `${fmt.num(p.frequencyHz, 0, 'Hz')}, ${p.poles} poles` },
    {
      label: 'Speed',
      value: `${p.speedRpm ? `${fmt.num(p.speedRpm, 0, 'rpm')} (estimated)` : '—'} · synchronous ${fmt.num(p.synchronousRpm, 0, 'rpm')}`,
    },
    { label: 'Current', value: fmt.num(p.currentA, 1, 'A') },
    { label: 'Output', value: fmt.power(p.outputKw) },
    { label: 'Torque', value: p.torqueNm ? `${fmt.num(p.torqueNm, 1, 'N·m')} (${fmt.num(nmToLbfFt(p.torqueNm), 1, 'lbf·ft')})` : '—' },
  ];
}
