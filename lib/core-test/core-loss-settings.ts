/**
 * The shop's settings for the core-loss test and the losses statement (one row, id "shop"). A shop that
 * never saved them works from the engine's documented defaults.
 */
import { db } from '@/lib/db/client';
import { DEFAULT_CORE_LOSS_RISE_LIMIT } from '@/lib/engine/core-loss/core-verdict';
import { DEFAULT_HOT_SPOT_RISE_LIMIT_K } from '@/lib/engine/core-loss/hot-spots';
import { DEFAULT_LOOP_FIELD_STRENGTH_A_PER_M } from '@/lib/engine/core-loss/loop-current';
import { DEFAULT_LOOP_TEST_FLUX_DENSITY_T } from '@/lib/engine/core-loss/loop-plan';
import { DEFAULT_COPPER_LOSS_RISE_LIMIT } from '@/lib/engine/losses/rewind-losses';

export const CORE_LOSS_SETTINGS_ID = 'shop';

export interface CoreLossSettings {
  testFluxDensityT: number;
  fieldStrengthAPerM: number;
  /** Fractions: 0.2 = 20 %. */
  coreLossRiseLimit: number;
  hotSpotRiseLimitK: number;
  copperLossRiseLimit: number;
  /** 0 when never saved. */
  version: number;
  updatedAt: Date | null;
}

export const DEFAULT_CORE_LOSS_SETTINGS: CoreLossSettings = {
  testFluxDensityT: DEFAULT_LOOP_TEST_FLUX_DENSITY_T,
  fieldStrengthAPerM: DEFAULT_LOOP_FIELD_STRENGTH_A_PER_M,
  coreLossRiseLimit: DEFAULT_CORE_LOSS_RISE_LIMIT,
  hotSpotRiseLimitK: DEFAULT_HOT_SPOT_RISE_LIMIT_K,
  copperLossRiseLimit: DEFAULT_COPPER_LOSS_RISE_LIMIT,
  version: 0,
  updatedAt: null,
};

export async function getCoreLossSettings(): Promise<CoreLossSettings> {
  const s = await db().coreLossSettings.findUnique({ where: { id: CORE_LOSS_SETTINGS_ID } });
  if (!s) return DEFAULT_CORE_LOSS_SETTINGS;
  return {
    testFluxDensityT: s.testFluxDensityT,
    fieldStrengthAPerM: s.fieldStrengthAPerM,
    coreLossRiseLimit: s.coreLossRiseLimit,
    hotSpotRiseLimitK: s.hotSpotRiseLimitK,
    copperLossRiseLimit: s.copperLossRiseLimit,
    version: s.version,
    updatedAt: s.updatedAt,
  };
}
