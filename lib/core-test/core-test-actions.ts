'use server';

/**
 * Server actions for core-loss tests and their shop settings. Each is a public POST endpoint:
 * `guardedAction` checks the session and the permission first ('tests.record': winder, engineer,
 * administrator; 'settings.manage': administrator), then parses, then saves.
 */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { CORE_TEST_STAGE_LABELS, coreLossSettingsSchema, coreTestFormSchema } from '@/lib/core-test/core-test-schema';
import { saveCoreLossSettings } from './core-loss-settings-writes';
import { saveCoreTest } from './core-test-writes';

export async function saveCoreTestAction(raw: unknown) {
  return guardedAction('tests.record', 'record core-loss tests', coreTestFormSchema, async (user, input) => {
    const saved = await saveCoreTest(user.id, input);
    return success(saved, `Core-loss test ${CORE_TEST_STAGE_LABELS[input.stage].toLowerCase()} saved.`);
  })(raw);
}

export async function saveCoreLossSettingsAction(raw: unknown) {
  return guardedAction('settings.manage', 'change the shop settings', coreLossSettingsSchema, async (user, input) =>
    success(await saveCoreLossSettings(user.id, input), 'Core-loss settings saved.'),
  )(raw);
}
