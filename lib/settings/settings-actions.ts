'use server';

/** Shop settings: only an administrator may change them ('settings.manage'). */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { displaySettingsSchema } from './display-settings-schema';
import { limitsFromForm, shopSettingsSchema } from '@/lib/redesign/redesign-schema';
import { saveDisplaySettings } from './display-settings';
import { saveShopLimits } from './settings-writes';

export async function saveShopSettings(raw: unknown) {
  return guardedAction('settings.manage', 'change the shop settings', shopSettingsSchema, async (user, input) =>
    success(
      await saveShopLimits(user.id, input.version, limitsFromForm(input.limits)),
      'Shop settings saved. New redesign requests start from these limits.',
    ),
  )(raw);
}

export async function saveShopDisplaySettings(raw: unknown) {
  return guardedAction('settings.manage', 'change the shop settings', displaySettingsSchema, async (user, input) =>
    success(
      await saveDisplaySettings(user.id, input.version, input),
      'Date settings saved: every screen, print view and PDF now uses them.',
    ),
  )(raw);
}
