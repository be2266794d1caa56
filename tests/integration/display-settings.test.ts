import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { displaySettings, fmt, serverTimeZone, setDisplaySettings } from '@/lib/presentation/format';
import { saveShopDisplaySettings } from '@/lib/settings/settings-actions';
import { DISPLAY_STALE, readDisplaySettings } from '@/lib/settings/display-settings';
import { useTestDatabase } from '../support/test-db';
import { actAs, signOutTest } from '../support/session';
import { ADMIN, ENGINEER } from '../support/demo-users';

useTestDatabase();
afterAll(() => setDisplaySettings({ timeZone: null, dateFormat: 'iso' }));

describe('the shop time zone and date format', () => {
  beforeEach(() => signOutTest());

  it('refuses a visitor and an engineer before reading the input', async () => {
    expect(await saveShopDisplaySettings({ nonsense: true })).toMatchObject({ ok: false, code: 'unauthenticated' });
    await actAs(ENGINEER.email);
    expect(await saveShopDisplaySettings({ version: 0, timeZone: 'Europe/London', dateFormat: 'iso' })).toMatchObject({
      ok: false,
      code: 'forbidden',
    });
  });

  it('refuses an unknown zone with a field error and keeps the stored settings', async () => {
    await actAs(ADMIN.email);
    const r = await saveShopDisplaySettings({ version: 0, timeZone: 'Atlantis/Harbour', dateFormat: 'iso' });
    expect(r).toMatchObject({ ok: false, code: 'invalid' });
    expect(r.ok ? undefined : r.fieldErrors?.timeZone?.[0]).toContain('Choose a time zone');
    expect(await readDisplaySettings()).toEqual({ timeZone: null, dateFormat: 'iso', version: 0 });
  });

  it('saves for an administrator, applies at once, and refuses a stale second save', async () => {
    await actAs(ADMIN.email);
    expect(await saveShopDisplaySettings({ version: 0, timeZone: 'America/Chicago', dateFormat: 'mdy' })).toMatchObject({
      ok: true,
      data: { version: 1 },
    });
    expect(displaySettings()).toEqual({ timeZone: 'America/Chicago', dateFormat: 'mdy' });
    // 2026-12-02 03:00 UTC is still 1 December in Chicago.
    expect(fmt.date(new Date('2026-12-02T03:00:00Z'))).toBe('12/01/2026');
    expect(await saveShopDisplaySettings({ version: 0, timeZone: 'UTC', dateFormat: 'iso' })).toMatchObject({
      ok: false,
      code: 'stale',
      message: DISPLAY_STALE,
    });
    expect(await saveShopDisplaySettings({ version: 1, timeZone: '', dateFormat: 'iso' })).toMatchObject({
      ok: true,
      data: { version: 2 },
    });
    expect(displaySettings()).toEqual({ timeZone: serverTimeZone(), dateFormat: 'iso' });
  });
});
