/**
 * The shop's bench-pack settings (columns of the one ShopSettings row): the allowance added to the wire
 * drawn from stock for leads, jumpers and waste, and the lead-marking convention shown first. Saving shares
 * the row's version with the redesign limits, so a stale form of either is refused.
 */
import { db } from '@/lib/db/client';
import { DEFAULT_WIRE_ALLOWANCE } from '@/lib/engine/bench/wire-draw';
import type { LeadConvention } from '@/lib/engine/bench/lead-markings';
import { DomainError } from '@/lib/errors/domain-errors';
import { SHOP_SETTINGS_ID } from '@/lib/settings/settings-queries';
import { SETTINGS_STALE } from '@/lib/settings/settings-writes';

export interface BenchPackSettings {
  /** Fraction, 0 … 1. */
  wireAllowance: number;
  leadConvention: LeadConvention;
  /** Version of the settings row (0: never saved). */
  version: number;
  /** True while the shop has not changed the starting values. */
  isDefault: boolean;
}

const convention = (v: string): LeadConvention => (v === 'nema' ? 'nema' : 'iec');

export async function getBenchPackSettings(): Promise<BenchPackSettings> {
  const s = await db().shopSettings.findUnique({
    where: { id: SHOP_SETTINGS_ID },
    select: { wireAllowance: true, leadConvention: true, version: true },
  });
  if (!s) return { wireAllowance: DEFAULT_WIRE_ALLOWANCE, leadConvention: 'iec', version: 0, isDefault: true };
  return {
    wireAllowance: s.wireAllowance,
    leadConvention: convention(s.leadConvention),
    version: s.version,
    isDefault: s.wireAllowance === DEFAULT_WIRE_ALLOWANCE,
  };
}

/** Saves the allowance (fraction) and convention under the row's version (0 creates the row with the limits' defaults). */
export async function saveBenchPackSettings(
  userId: string,
  version: number,
  wireAllowance: number,
  leadConvention: LeadConvention,
): Promise<{ version: number }> {
  const data = { wireAllowance, leadConvention, updatedById: userId };
  return db()
    .$transaction(async (tx) => {
      if (version === 0) {
        const existing = await tx.shopSettings.findUnique({ where: { id: SHOP_SETTINGS_ID }, select: { id: true } });
        if (existing) throw new DomainError('stale', SETTINGS_STALE);
        await tx.shopSettings.create({ data: { id: SHOP_SETTINGS_ID, ...data } });
        return { version: 1 };
      }
      const r = await tx.shopSettings.updateMany({
        where: { id: SHOP_SETTINGS_ID, version },
        data: { ...data, version: { increment: 1 } },
      });
      if (r.count === 0) throw new DomainError('stale', SETTINGS_STALE);
      return { version: version + 1 };
    })
    .catch((err: unknown) => {
      if (err instanceof DomainError) throw err;
      if (err instanceof Error && /Unique constraint|unique/i.test(err.message)) throw new DomainError('stale', SETTINGS_STALE);
      throw err;
    });
}
