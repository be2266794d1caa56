'use server';

/** The commercial settings: only an administrator may change them ('settings.manage'). */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { commercialSettingsSchema } from './commercial-schema';
import { saveCommercialSettings as save } from './commercial-writes';

export async function saveCommercialSettings(raw: unknown) {
  return guardedAction('settings.manage', 'change the shop settings', commercialSettingsSchema, async (user, input) =>
    success(await save(user.id, input.version, input.settings), 'Commercial settings saved. New estimates start from these figures.'),
  )(raw);
}
