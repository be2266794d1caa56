'use server';

/**
 * Server actions for final tests. Each is a public POST endpoint: `guardedAction` checks the session and
 * the 'tests.record' permission first, then parses with the test record schema, then saves.
 */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { testRecordFormSchema } from '@/lib/final-tests/test-record-schema';
import { saveTestRecord } from './record-writes';

export async function saveTestRecordAction(raw: unknown) {
  return guardedAction('tests.record', 'record final tests', testRecordFormSchema, async (user, input) => {
    const saved = await saveTestRecord(user.id, input);
    return success(saved, `Test record #${saved.sequence} saved: ${saved.verdict}.`);
  })(raw);
}
