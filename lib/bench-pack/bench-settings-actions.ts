'use server';

/** Bench-pack settings: only an administrator may change them ('settings.manage'). */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { benchSettingsSchema } from '@/lib/bench-pack/bench-pack-schema';
import { saveBenchPackSettings } from './bench-settings';

export async function saveBenchSettings(raw: unknown) {
  return guardedAction('settings.manage', 'change the shop settings', benchSettingsSchema, async (user, input) =>
    success(
      await saveBenchPackSettings(user.id, input.version, input.wireAllowancePercent / 100, input.leadConvention),
      'Bench pack settings saved. Every bench pack printed from now on uses them.',
    ),
  )(raw);
}
