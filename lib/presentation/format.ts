/**
 * Display formatting shared by screens and printouts: every quantity with its unit, metric first and
 * imperial beside it where the trade uses both.
 */
import { kwToHp } from '@/lib/engine/units';

const n = (v: number, digits: number) => v.toLocaleString('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: 0 });

export const fmt = {
  num: (v: number | null | undefined, digits = 2, unit = ''): string => (v === null || v === undefined || !Number.isFinite(v) ? '—' : `${n(v, digits)}${unit ? ` ${unit}` : ''}`),
  power: (kw: number | null | undefined): string => (kw == null ? '—' : `${n(kw, 2)} kW (${n(kwToHp(kw), 1)} hp)`),
  date: (d: Date | string | null | undefined): string => {
    if (!d) return '—';
    const date = typeof d === 'string' ? new Date(d) : d;
    return date.toISOString().slice(0, 10);
  },
  dateTime: (d: Date | null | undefined): string => (d ? d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC' : '—'),
  bytes: (b: number): string => (b > 1_048_576 ? `${n(b / 1_048_576, 1)} MB` : `${n(b / 1024, 0)} kB`),
};
