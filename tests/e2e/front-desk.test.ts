import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { FRONT_DESK, WINDER } from '../support/demo-users';

const e2e = useAppInBrowser();

async function newPage(): Promise<Page> {
  return e2e.browser.context.newPage();
}

describe('the front desk', () => {
  let jobUrl = '';

  it('signs in, logs a motor with field errors first, and lands on the new job', async () => {
    const page = await newPage();
    await signIn(page, e2e.app.baseUrl, FRONT_DESK.email, FRONT_DESK.password);
    await page.getByRole('link', { name: 'New intake', exact: true }).click();
    await page.getByLabel('New customer').check();
    await page.getByLabel('Company *').fill('Glenharrow Pumping Station');
    await page.getByLabel('Manufacturer').fill('Testwell Motors');
    await page.getByLabel('Serial number').fill('E2E-4471');
    await page.getByLabel('Rated voltage').fill('460');
    await page.getByLabel('Frequency').fill('60');
    await page.getByLabel('Rated speed').fill('-1750');
    await page.getByRole('button', { name: 'Log motor and open job' }).click();
    // Bad input: the field error appears beside the field, and what was typed stays.
    await expect.poll(() => page.locator('#motor-speedRpm-error').textContent()).toContain('greater than zero');
    expect(await page.getByLabel('Company *').inputValue()).toBe('Glenharrow Pumping Station');
    expect(await page.getByLabel('Reported fault *').getAttribute('aria-invalid')).toBe('true');
    await page.getByLabel('Rated speed').fill('1750');
    await expect.poll(() => page.getByTestId('speed-readout').textContent()).toContain('4 poles');
    await page.getByLabel('Reported fault *').fill('Trips on start; smells burnt.');
    await Promise.all([page.waitForURL(/\/jobs\/\d+$/), page.getByRole('button', { name: 'Log motor and open job' }).click()]);
    jobUrl = page.url();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toContain('Glenharrow Pumping Station');
    await page.close();
  });

  it('finds the motor on the board by serial and moves its status', async () => {
    const page = await newPage();
    await page.goto(`${e2e.app.baseUrl}/jobs`);
    await page.getByLabel('Search').fill('E2E-4471');
    await page.getByRole('button', { name: 'Apply' }).click();
    await page.waitForURL(/q=E2E-4471/);
    const number = jobUrl.split('/').at(-1)!;
    await page.getByRole('link', { name: number, exact: true }).click();
    await page.waitForURL(jobUrl);
    await page.getByRole('button', { name: 'Move to Inspection' }).click();
    // The move is a server action plus a refresh: seconds on a loaded machine, so poll longer than the 1 s default.
    await expect.poll(() => page.getByRole('heading', { name: /^Status:/ }).textContent(), { timeout: 15_000 }).toContain('Inspection');
    // Only allowed moves are offered: from inspection, shipping is not one of them.
    expect(await page.getByRole('button', { name: 'Move to Shipped' }).count()).toBe(0);
    await page.close();
  });

  it('refuses a stale edit and keeps what the user typed', async () => {
    const first = await newPage();
    const second = await newPage();
    await first.goto(jobUrl);
    await second.goto(jobUrl);
    await first.getByLabel('Notes').fill('Bearings ordered.');
    await first.getByRole('button', { name: 'Save job details' }).click();
    await expect.poll(() => first.getByRole('status').filter({ hasText: 'Job saved.' }).count()).toBe(1);
    await second.getByLabel('Notes').fill('Customer will collect.');
    await second.getByRole('button', { name: 'Save job details' }).click();
    await expect
      .poll(() => second.getByRole('form', { name: 'Job details' }).getByRole('alert').textContent())
      .toContain('Someone else changed this job');
    expect(await second.getByLabel('Notes').inputValue()).toBe('Customer will collect.');
    await second.getByRole('button', { name: /Keep my changes and retry/ }).click();
    await second.getByRole('button', { name: 'Save job details' }).click();
    await expect.poll(() => second.getByRole('status').filter({ hasText: 'Job saved.' }).count()).toBe(1);
    await first.close();
    await second.close();
  });
});

describe('a winder', () => {
  it('cannot open the intake screen and is not offered front-desk moves', async () => {
    await e2e.browser.context.clearCookies();
    const page = await newPage();
    await signIn(page, e2e.app.baseUrl, WINDER.email, WINDER.password);
    expect(await page.getByRole('link', { name: /new intake/i }).count()).toBe(0);
    await page.goto(`${e2e.app.baseUrl}/jobs/new`);
    await page.waitForURL(/\/denied/);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Not allowed');
    await page.close();
  });
});
