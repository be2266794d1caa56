/**
 * Saves the core-loss settings under optimistic locking: version 0 means "never saved" (create the row);
 * any other version must match the stored one, or the save is refused as stale.
 */
import { db, Prisma } from '@/lib/db/client';
import { DomainError } from '@/lib/errors/domain-errors';
import type { CoreLossSettingsForm } from '@/lib/core-test/core-test-schema';
import { CORE_LOSS_SETTINGS_ID } from './core-loss-settings';

export const CORE_SETTINGS_STALE =
  'Someone else saved the core-loss settings while you were editing. Your values are still in the form: review the current ones, then save again.';

const columns = (s: CoreLossSettingsForm, userId: string) => ({
  testFluxDensityT: s.testFluxDensityT,
  fieldStrengthAPerM: s.fieldStrengthAPerM,
  coreLossRiseLimit: s.coreLossRiseLimitPercent / 100,
  hotSpotRiseLimitK: s.hotSpotRiseLimitK,
  copperLossRiseLimit: s.copperLossRiseLimitPercent / 100,
  updatedById: userId,
});

export async function saveCoreLossSettings(userId: string, input: CoreLossSettingsForm): Promise<{ version: number }> {
  try {
    return await db().$transaction(async (tx) => {
      if (input.version === 0) {
        await tx.coreLossSettings.create({ data: { id: CORE_LOSS_SETTINGS_ID, ...columns(input, userId) } });
        return { version: 1 };
      }
      const r = await tx.coreLossSettings.updateMany({
        where: { id: CORE_LOSS_SETTINGS_ID, version: input.version },
        data: { ...columns(input, userId), version: { increment: 1 } },
      });
      if (r.count === 0) throw new DomainError('stale', CORE_SETTINGS_STALE);
      return { version: input.version + 1 };
    });
  } catch (err) {
    // A racing first save hits the primary key: the same stale situation.
    if (err instanceof Prisma.PrismaClientKnownRequestError && err.code === 'P2002') throw new DomainError('stale', CORE_SETTINGS_STALE);
    throw err;
  }
}
