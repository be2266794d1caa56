import { describe, expect, it } from 'vitest';
import { DEFAULT_REDESIGN_LIMITS } from '@/lib/engine/redesign/from-sheet';
import { limitsToForm, shopSettingsSchema } from '@/lib/redesign/redesign-schema';

describe('the shop limits form', () => {
  // Version 0 means "never saved": a new installation must be able to save its first limits.
  it('accepts the first save of a shop that has never saved its limits', () => {
    expect(shopSettingsSchema.safeParse({ version: 0, limits: limitsToForm(DEFAULT_REDESIGN_LIMITS) }).success).toBe(true);
  });

  it('refuses a negative version', () => {
    expect(shopSettingsSchema.safeParse({ version: -1, limits: limitsToForm(DEFAULT_REDESIGN_LIMITS) }).success).toBe(false);
  });
});
