import type { CoreRing } from '@/lib/engine/core-loss/core-ring';

/** The core of worked example A (docs/engineering/flux-density.md): OD 240, bore 150, slot depth 20, length 120 mm, k_fe 0.95, 36 slots 7/9 mm. */
export const EXAMPLE_A_RING: CoreRing = {
  outsideDiameterM: 0.24,
  boreM: 0.15,
  slotDepthM: 0.02,
  coreLengthM: 0.12,
  stackingFactor: 0.95,
  slots: 36,
  slotWidthTopM: 0.007,
  slotWidthBottomM: 0.009,
};

export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
