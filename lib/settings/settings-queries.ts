/**
 * Reads of the shop-wide settings (one row, id "shop"). Missing row → the documented defaults, so a new
 * shop works before anyone opens the settings.
 */
import { db } from '@/lib/db/client';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import type { RedesignLimits } from '@/lib/engine/redesign/types';

export const SHOP_SETTINGS_ID = 'shop';

/** The redesign limits the shop has set, and the row version for optimistic locking (0: never saved). */
export async function getShopLimits(): Promise<{ limits: RedesignLimits; version: number; updatedAt: Date | null }> {
  const s = await db().shopSettings.findUnique({ where: { id: SHOP_SETTINGS_ID } });
  if (!s) return { limits: DEFAULT_REDESIGN_LIMITS, version: 0, updatedAt: null };
  const sizes = s.maxWireSizes === 1 || s.maxWireSizes === 2 ? s.maxWireSizes : 3;
  return {
    limits: {
      gap: { over: s.fluxGapRise, under: s.fluxGapFall },
      tooth: { over: s.fluxToothRise, under: s.fluxToothFall },
      yoke: { over: s.fluxYokeRise, under: s.fluxYokeFall },
      currentDensityRise: s.currentDensityRise,
      currentDensityMaxAPerMm2: s.currentDensityMaxAPerMm2,
      slotFillMax: s.slotFillMax,
      maxStrandsInHand: s.maxStrandsInHand,
      maxWireSizes: sizes,
      mixedSizeRatioMax: s.mixedSizeRatioMax,
      minWireBareMm: s.minWireBareMm,
      harmonicKwMax: s.harmonicKwMax,
    },
    version: s.version,
    updatedAt: s.updatedAt,
  };
}
