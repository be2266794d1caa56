/**
 * Display formatting shared by screens, print views and PDFs: every quantity with its unit, metric first and
 * imperial beside it where the trade uses both, and every date and time in the shop's one time zone and
 * date format (shop settings; the server's zone until set).
 *
 * Intl formatters are costly to build (tens of µs each) and a board page formats hundreds of values, so
 * each distinct formatter is built once and kept (a handful: one per digit count, one per time zone).
 */
import { kwToHp } from '@/lib/engine/units';

export const DATE_FORMATS = ['iso', 'dmy', 'mdy'] as const;
export type DateFormat = (typeof DATE_FORMATS)[number];
export const DATE_FORMAT_LABELS: Record<DateFormat, string> = {
  iso: '2026-12-31 (year-month-day)',
  dmy: '31/12/2026 (day/month/year)',
  mdy: '12/31/2026 (month/day/year)',
};

export interface DisplaySettings {
  /** IANA time zone, e.g. "Europe/London". */
  timeZone: string;
  dateFormat: DateFormat;
}

/** The zone this process runs in (the default until the shop sets one). */
export const serverTimeZone = (): string => new Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** True when `zone` is a time zone this runtime knows. */
export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

let current: DisplaySettings = { timeZone: serverTimeZone(), dateFormat: 'iso' };

/** Sets the shop's zone and date format for every later call (an unknown zone falls back to the server's). */
export function setDisplaySettings(s: { timeZone?: string | null; dateFormat?: string | null }): void {
  const timeZone = s.timeZone && isTimeZone(s.timeZone) ? s.timeZone : serverTimeZone();
  const dateFormat = DATE_FORMATS.find((f) => f === s.dateFormat) ?? 'iso';
  if (timeZone !== current.timeZone || dateFormat !== current.dateFormat) current = { timeZone, dateFormat };
}
export const displaySettings = (): DisplaySettings => current;

const numberFormats = new Map<number, Intl.NumberFormat>();
/** The cached formatter for up to `digits` decimals (grouped thousands, as the shop's paperwork writes). */
export function numberFormat(digits: number): Intl.NumberFormat {
  let f = numberFormats.get(digits);
  if (!f) {
    f = new Intl.NumberFormat('en-GB', { maximumFractionDigits: digits, minimumFractionDigits: 0 });
    numberFormats.set(digits, f);
  }
  return f;
}

const partFormats = new Map<string, Intl.DateTimeFormat>();
/** The cached formatter giving year, month, day, 24-hour time and the zone's short name in `zone`. */
export function dateTimeFormat(zone: string): Intl.DateTimeFormat {
  let f = partFormats.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-GB', {
      timeZone: zone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
      timeZoneName: 'short',
    });
    partFormats.set(zone, f);
  }
  return f;
}

interface Parts {
  year: string;
  month: string;
  day: string;
  hour: string;
  minute: string;
  zone: string;
}
function partsIn(d: Date, zone: string): Parts {
  const p: Parts = { year: '', month: '', day: '', hour: '', minute: '', zone: '' };
  for (const x of dateTimeFormat(zone).formatToParts(d)) {
    if (x.type === 'year' || x.type === 'month' || x.type === 'day' || x.type === 'hour' || x.type === 'minute') p[x.type] = x.value;
    else if (x.type === 'timeZoneName') p.zone = x.value;
  }
  return p;
}

function writeDay(p: Pick<Parts, 'year' | 'month' | 'day'>, f: DateFormat): string {
  if (f === 'dmy') return `${p.day}/${p.month}/${p.year}`;
  if (f === 'mdy') return `${p.month}/${p.day}/${p.year}`;
  return `${p.year}-${p.month}-${p.day}`;
}

const asDate = (d: Date | string): Date => (typeof d === 'string' ? new Date(d) : d);
const valid = (d: Date): boolean => !Number.isNaN(d.getTime());

/** The calendar date `d` falls on in the shop's zone, as YYYY-MM-DD (for "today" and date inputs). */
export function isoDayInZone(d: Date, zone = current.timeZone): string {
  const p = partsIn(d, zone);
  return `${p.year}-${p.month}-${p.day}`;
}

/** A Date as the wall-clock "YYYY-MM-DDTHH:MM" of the shop's zone (the value a datetime-local input shows). */
export function toZonedLocal(d: Date, zone = current.timeZone): string {
  const p = partsIn(d, zone);
  return `${p.year}-${p.month}-${p.day}T${p.hour}:${p.minute}`;
}

/**
 * The instant a wall-clock "YYYY-MM-DDTHH:MM[:SS]" means in the shop's zone. In the hour skipped at the
 * spring change the time is read with the offset before the change (as the clocks on the wall did).
 */
export function fromZonedLocal(local: string, zone = current.timeZone): Date {
  const asUtc = Date.parse(`${local.length === 16 ? `${local}:00` : local}Z`);
  const offsetAt = (t: number): number => {
    const p = partsIn(new Date(t), zone);
    const wall = Date.UTC(Number(p.year), Number(p.month) - 1, Number(p.day), Number(p.hour), Number(p.minute));
    return wall - Math.floor(t / 60_000) * 60_000;
  };
  const first = asUtc - offsetAt(asUtc);
  return new Date(asUtc - offsetAt(first));
}

const n = (v: number, digits: number) => numberFormat(digits).format(v);

export const fmt = {
  num: (v: number | null | undefined, digits = 2, unit = ''): string =>
    v === null || v === undefined || !Number.isFinite(v) ? '—' : `${n(v, digits)}${unit ? ` ${unit}` : ''}`,
  int: (v: number): string => n(v, 0),
  power: (kw: number | null | undefined): string => (kw == null ? '—' : `${n(kw, 2)} kW (${n(kwToHp(kw), 1)} hp)`),
  /** An instant (received, saved, approved) as the date it fell on in the shop's zone. */
  date: (d: Date | string | null | undefined): string => {
    if (!d || !valid(asDate(d))) return '—';
    return writeDay(partsIn(asDate(d), current.timeZone), current.dateFormat);
  },
  /** A calendar date stored as midnight UTC (promised date): the same day everywhere, in the shop's format. */
  day: (d: Date | string | null | undefined): string => {
    if (!d || !valid(asDate(d))) return '—';
    const iso = asDate(d).toISOString();
    return writeDay({ year: iso.slice(0, 4), month: iso.slice(5, 7), day: iso.slice(8, 10) }, current.dateFormat);
  },
  /** An instant with its 24-hour time and the zone's short name, e.g. "2026-12-01 14:05 GMT". */
  dateTime: (d: Date | string | null | undefined): string => {
    if (!d || !valid(asDate(d))) return '—';
    const p = partsIn(asDate(d), current.timeZone);
    return `${writeDay(p, current.dateFormat)} ${p.hour}:${p.minute}${p.zone ? ` ${p.zone}` : ''}`;
  },
  /** Only the 24-hour time in the shop's zone, e.g. "14:05". */
  time: (d: Date): string => {
    const p = partsIn(d, current.timeZone);
    return `${p.hour}:${p.minute}`;
  },
  bytes: (b: number): string => (b > 1_048_576 ? `${n(b / 1_048_576, 1)} MB` : `${n(b / 1024, 0)} kB`),
};
