/**
 * Saves the shop settings under optimistic locking: version 0 means "never saved" (create the row); any
 * other version must match the stored one, or the save is refused as stale.
 */
import { db } from '@/lib/db/client';
import type { RedesignLimits } from '@/lib/engine/redesign/types';
import { DomainError } from '@/lib/errors/domain-errors';
import { SHOP_SETTINGS_ID } from './settings-queries';

export const SETTINGS_STALE =
  'Someone else saved the shop settings while you were editing. Your values are still in the form: review the current ones, then save again.';

const columns = (l: RedesignLimits, userId: string) => ({
  fluxGapRise: l.gap.over,
  fluxGapFall: l.gap.under,
  fluxToothRise: l.tooth.over,
  fluxToothFall: l.tooth.under,
  fluxYokeRise: l.yoke.over,
  fluxYokeFall: l.yoke.under,
  currentDensityRise: l.currentDensityRise,
  currentDensityMaxAPerMm2: l.currentDensityMaxAPerMm2,
  slotFillMax: l.slotFillMax,
  maxStrandsInHand: l.maxStrandsInHand,
  maxWireSizes: l.maxWireSizes,
  mixedSizeRatioMax: l.mixedSizeRatioMax,
  minWireBareMm: l.minWireBareMm,
  harmonicKwMax: l.harmonicKwMax,
  updatedById: userId,
});

export async function saveShopLimits(userId: string, version: number, limits: RedesignLimits): Promise<{ version: number }> {
  return db()
    .$transaction(async (tx) => {
      if (version === 0) {
        const existing = await tx.shopSettings.findUnique({ where: { id: SHOP_SETTINGS_ID }, select: { id: true } });
        if (existing) throw new DomainError('stale', SETTINGS_STALE);
        await tx.shopSettings.create({ data: { id: SHOP_SETTINGS_ID, ...columns(limits, userId) } });
        return { version: 1 };
      }
      const r = await tx.shopSettings.updateMany({
        where: { id: SHOP_SETTINGS_ID, version },
        data: { ...columns(limits, userId), version: { increment: 1 } },
      });
      if (r.count === 0) throw new DomainError('stale', SETTINGS_STALE);
      return { version: version + 1 };
    })
    .catch((err: unknown) => {
      if (err instanceof DomainError) throw err;
      // A racing first save hits the primary key: that is the same stale situation.
      if (err instanceof Error && /Unique constraint|unique/i.test(err.message)) throw new DomainError('stale', SETTINGS_STALE);
      throw err;
    });
}
