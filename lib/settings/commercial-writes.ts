/** Saves the commercial settings under optimistic locking (version 0: never saved, create the row). */
import { db } from '@/lib/db/client';
import { DomainError } from '@/lib/errors/domain-errors';
import type { CommercialSettings } from './commercial-defaults';
import { SHOP_SETTINGS_ID } from './settings-queries';

export const COMMERCIAL_STALE =
  'Someone else saved the commercial settings while you were editing. Your values are still in the form: review the current ones, then save again.';

export async function saveCommercialSettings(userId: string, version: number, settings: CommercialSettings): Promise<{ version: number }> {
  return db()
    .$transaction(async (tx) => {
      if (version === 0) {
        const existing = await tx.commercialSettings.findUnique({ where: { id: SHOP_SETTINGS_ID }, select: { id: true } });
        if (existing) throw new DomainError('stale', COMMERCIAL_STALE);
        await tx.commercialSettings.create({ data: { id: SHOP_SETTINGS_ID, ...settings, updatedById: userId } });
        return { version: 1 };
      }
      const r = await tx.commercialSettings.updateMany({
        where: { id: SHOP_SETTINGS_ID, version },
        data: { ...settings, updatedById: userId, version: { increment: 1 } },
      });
      if (r.count === 0) throw new DomainError('stale', COMMERCIAL_STALE);
      return { version: version + 1 };
    })
    .catch((err: unknown) => {
      if (err instanceof DomainError) throw err;
      if (err instanceof Error && /Unique constraint|unique/i.test(err.message)) throw new DomainError('stale', COMMERCIAL_STALE);
      throw err;
    });
}
