/**
 * The shop's time zone and date format (one for every screen, print view and PDF). The formatting module
 * (lib/format.ts) holds the values in memory; this module loads them from the database at start-up, after
 * a save, and at most every REFRESH_MS when a request asks (so several app instances agree within that).
 */
import { db } from '@/lib/db/client';
import { DomainError } from '@/lib/errors/domain-errors';
import { displaySettings, setDisplaySettings, type DisplaySettings } from '@/lib/presentation/format';
import { SHOP_SETTINGS_ID } from './settings-queries';

const REFRESH_MS = 30_000;
let loadedAt = 0;
let loading: Promise<void> | null = null;

export const DISPLAY_STALE = 'Someone else saved the date settings while you were editing. Review the current ones, then save again.';

export interface StoredDisplaySettings {
  /** Null: the server's zone. */
  timeZone: string | null;
  dateFormat: string;
  version: number;
}

export async function readDisplaySettings(): Promise<StoredDisplaySettings> {
  const row = await db().shopDisplaySettings.findUnique({ where: { id: SHOP_SETTINGS_ID } });
  return row
    ? { timeZone: row.timeZone, dateFormat: row.dateFormat, version: row.version }
    : { timeZone: null, dateFormat: 'iso', version: 0 };
}

/** Loads the stored settings into the formatter now. */
export async function refreshDisplaySettings(): Promise<DisplaySettings> {
  const s = await readDisplaySettings();
  setDisplaySettings(s);
  loadedAt = Date.now();
  return displaySettings();
}

/** Loads the settings if the copy in memory is older than REFRESH_MS (one load at a time). */
export async function ensureDisplaySettings(): Promise<DisplaySettings> {
  if (Date.now() - loadedAt < REFRESH_MS) return displaySettings();
  loading ??= refreshDisplaySettings()
    .then(() => undefined)
    .finally(() => {
      loading = null;
    });
  await loading;
  return displaySettings();
}

/** Saves under optimistic locking (version 0: never saved) and applies the settings at once. */
export async function saveDisplaySettings(
  userId: string,
  version: number,
  s: { timeZone: string | null; dateFormat: string },
): Promise<{ version: number }> {
  const data = { timeZone: s.timeZone, dateFormat: s.dateFormat, updatedById: userId };
  const next = await db()
    .$transaction(async (tx) => {
      if (version === 0) {
        const existing = await tx.shopDisplaySettings.findUnique({ where: { id: SHOP_SETTINGS_ID }, select: { id: true } });
        if (existing) throw new DomainError('stale', DISPLAY_STALE);
        await tx.shopDisplaySettings.create({ data: { id: SHOP_SETTINGS_ID, ...data } });
        return 1;
      }
      const r = await tx.shopDisplaySettings.updateMany({
        where: { id: SHOP_SETTINGS_ID, version },
        data: { ...data, version: { increment: 1 } },
      });
      if (r.count === 0) throw new DomainError('stale', DISPLAY_STALE);
      return version + 1;
    })
    .catch((err: unknown) => {
      if (err instanceof DomainError) throw err;
      // Two first saves racing: the second hits the primary key, which is the same stale situation.
      if (err instanceof Error && /Unique constraint|unique/i.test(err.message)) throw new DomainError('stale', DISPLAY_STALE);
      throw err;
    });
  await refreshDisplaySettings();
  return { version: next };
}
