/**
 * The shop floor on a tablet (820 × 1180 portrait): a winder fills in the as-found sheet with the findings
 * in view, touch-sized controls, number keyboards, select boxes that show their whole options and keys for
 * the sheet's rows; the front desk sees the sheet as values; the engineer's Choose buttons fit the screen.
 */
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { ENGINEER, FRONT_DESK, WINDER } from '../support/demo-users';

const e2e = useAppInBrowser();
const TABLET = { width: 820, height: 1180 };
/** Demo job 1016 is in winding with a saved as-found sheet. */
const SHEET = '/jobs/1016/as-found';

async function asUser(user: { email: string; password: string }): Promise<Page> {
  await e2e.browser.context.clearCookies();
  const page = await e2e.browser.context.newPage();
  await page.setViewportSize(TABLET);
  await signIn(page, e2e.app.baseUrl, user.email, user.password);
  return page;
}

/** True when the element's box lies inside the viewport and it is the topmost thing at its centre. */
async function inView(page: Page, selector: string): Promise<boolean> {
  return page
    .locator(selector)
    .first()
    .evaluate((el) => {
      const r = el.getBoundingClientRect();
      const inside = r.width > 0 && r.height > 0 && r.left >= 0 && r.top >= 0 && r.right <= innerWidth && r.bottom <= innerHeight;
      const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
      return inside && hit !== null && el.contains(hit);
    });
}

describe('the winder’s sheet on a tablet', () => {
  it('keeps the findings in view while the first core field has focus, and opens the full analysis as a drawer', async () => {
    const page = await asUser(WINDER);
    await page.goto(`${e2e.app.baseUrl}${SHEET}`);
    await page.waitForLoadState('networkidle');
    await page.getByLabel(/^Bore/).focus();
    expect(await inView(page, '[data-testid="findings-strip"]')).toBe(true);
    expect(await page.getByTestId('findings-strip').textContent()).toMatch(/No inconsistencies found|problem|check|note/);
    // The focused field is in view too (the strip does not cover it).
    expect(await inView(page, '#f-core-boreMm')).toBe(true);

    await page.getByRole('button', { name: 'Full analysis' }).click();
    await expect.poll(() => inView(page, '#live-analysis')).toBe(true);
    await page.keyboard.press('Escape');
    await expect.poll(() => page.locator('#live-analysis').isVisible()).toBe(false);
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Full analysis');
    await page.close();
  });

  it('has controls at least 44 px tall, number keyboards for numbers and select boxes wide enough for their options', async () => {
    const page = await asUser(WINDER);
    await page.goto(`${e2e.app.baseUrl}${SHEET}`);
    await page.waitForLoadState('networkidle');
    const small = await page.evaluate(() =>
      Array.from(
        document.querySelectorAll<HTMLElement>(
          'main input:not([type=checkbox]):not([type=radio]):not([type=file]):not([type=hidden]), main select, main button, main .btn',
        ),
      )
        .filter((el) => el.offsetParent !== null)
        .filter((el) => el.getBoundingClientRect().height < 44)
        .map(
          (el) =>
            `${el.tagName.toLowerCase()}#${el.id} "${(el.textContent ?? '').trim().slice(0, 30)}" ${Math.round(el.getBoundingClientRect().height)} px`,
        ),
    );
    expect(small).toEqual([]);

    const numberFields = await page
      .locator('#sec-core')
      .locator('xpath=..')
      .locator('input')
      .evaluateAll((els) => els.map((e) => (e as HTMLInputElement).inputMode));
    expect(numberFields.length).toBeGreaterThan(10);
    expect(numberFields.every((m) => m === 'decimal' || m === 'numeric')).toBe(true);

    const cutOff = await page.evaluate(() => {
      const ctx = document.createElement('canvas').getContext('2d');
      if (!ctx) return ['no canvas'];
      const out: string[] = [];
      for (const sel of Array.from(document.querySelectorAll('select'))) {
        if (sel.offsetParent === null) continue;
        const cs = getComputedStyle(sel);
        ctx.font = `${cs.fontWeight} ${cs.fontSize} ${cs.fontFamily}`;
        // Room for the text: the box less its padding, borders and the drop-down arrow (about 20 px).
        const room =
          sel.getBoundingClientRect().width -
          parseFloat(cs.paddingLeft) -
          parseFloat(cs.paddingRight) -
          parseFloat(cs.borderLeftWidth) -
          parseFloat(cs.borderRightWidth) -
          20;
        for (const o of Array.from(sel.options))
          if (ctx.measureText(o.text).width > room)
            out.push(`${sel.id}: “${o.text}” needs ${Math.ceil(ctx.measureText(o.text).width)} px, has ${Math.floor(room)}`);
      }
      return out;
    });
    expect(cutOff).toEqual([]);
    await page.close();
  });

  it('adds and removes wire rows with the keys written on the page', async () => {
    const page = await asUser(WINDER);
    await page.goto(`${e2e.app.baseUrl}${SHEET}`);
    await page.waitForLoadState('networkidle');
    expect(await page.locator('#wire-keys').textContent()).toMatch(
      /Alt\+Shift\+A adds a wire size; Alt\+Shift\+R removes the row you are in/,
    );
    const rows = page.locator('table.wires tbody tr');
    const before = await rows.count();
    await page.locator('#f-wires-0-size').focus();
    await page.keyboard.press('Alt+Shift+KeyA');
    await expect.poll(() => rows.count()).toBe(before + 1);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe(`f-wires-${before}-size`);
    await page.keyboard.press('Alt+Shift+KeyR');
    await expect.poll(() => rows.count()).toBe(before);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe(`f-wires-${before - 1}-size`);
    await page.close();
  });

  it('shows the front desk the sheet as values, with no form controls it cannot use', async () => {
    const page = await asUser(FRONT_DESK);
    await page.goto(`${e2e.app.baseUrl}${SHEET}`);
    await page.waitForLoadState('networkidle');
    const form = page.getByRole('form', { name: 'As-found data sheet' });
    expect(await form.locator('input, select, textarea').count()).toBe(0);
    expect(await form.locator('[data-field="core.boreMm"] dd').textContent()).toMatch(/^\d+(\.\d+)?$/);
    expect(await form.locator('table.wires tbody tr').count()).toBeGreaterThan(0);
    await page.close();
  });
});

describe('the engineer’s redesign on a tablet', () => {
  it('shows every Choose button inside the screen, with no sideways scrolling', async () => {
    const page = await asUser(ENGINEER);
    await page.goto(`${e2e.app.baseUrl}/jobs/1014/redesign`);
    await page.getByLabel(/^Line voltage/).fill('460');
    await page.getByLabel(/^Frequency/).fill('60');
    await page.getByRole('button', { name: 'Find windings (open revision 1)' }).click();
    // The search runs on the request thread for now; give it room on a busy machine.
    await page.waitForURL(/rev=1/, { timeout: 120_000 });
    await expect.poll(() => page.getByRole('table', { name: 'Candidate windings' }).count(), { timeout: 60_000 }).toBe(1);
    await page.waitForLoadState('networkidle');
    const choose = page.getByRole('table', { name: 'Candidate windings' }).getByRole('button', { name: /^Choose candidate/ });
    expect(await choose.count()).toBeGreaterThan(0);
    for (const b of await choose.all()) {
      await b.scrollIntoViewIfNeeded();
      const box = await b.boundingBox();
      expect(box, (await b.textContent()) ?? '').not.toBeNull();
      expect(box!.x).toBeGreaterThanOrEqual(0);
      expect(box!.x + box!.width).toBeLessThanOrEqual(TABLET.width);
    }
    expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(1);
    await page.close();
  });
});
