'use client';

import { setDisplaySettings, type DisplaySettings } from '@/lib/presentation/format';

/**
 * Gives the browser's copy of the formatting module the shop's time zone and date format, so a time
 * formatted in a client component reads the same as one from the server. Renders nothing.
 */
export function ShopFormat({ settings }: { settings: DisplaySettings }) {
  setDisplaySettings(settings);
  return null;
}
