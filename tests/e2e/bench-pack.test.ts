import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { ENGINEER, WINDER } from '../support/demo-users';

/** Demo job 1016: 0.75 kW, 400 V 50 Hz, 4 poles, star, with an invented as-found sheet. */
const JOB = 1016;

const e2e = useAppInBrowser();

async function as(user: { email: string; password: string }): Promise<Page> {
  await e2e.browser.context.clearCookies();
  const page = await e2e.browser.context.newPage();
  await signIn(page, e2e.app.baseUrl, user.email, user.password);
  return page;
}

describe('the winder’s bench pack', () => {
  it('an engineer approves a redesign; the bench pack opens from the approved revision', async () => {
    const page = await as(ENGINEER);
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/redesign`);
    await page.getByLabel(/^Line voltage/).fill('460');
    await page.getByLabel(/^Frequency/).fill('60');
    await page.getByRole('button', { name: 'Find windings (open revision 1)' }).click();
    await page.waitForURL(/rev=1/);
    await expect.poll(() => page.getByRole('table', { name: 'Candidate windings' }).count(), { timeout: 30_000 }).toBe(1);
    await page.getByRole('button', { name: 'Choose candidate 1', exact: true }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Approve revision 1' }).isEnabled(), { timeout: 30_000 }).toBe(true);
    await page.getByLabel('Approval note *').fill('Flux and current density within limits.');
    await page.getByRole('button', { name: 'Approve revision 1' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Revision 1: approved and frozen' }).count(), { timeout: 30_000 }).toBe(1);
    await page.getByRole('link', { name: /Winder’s bench pack/ }).click();
    await page.waitForURL(/\/redesign\/bench-pack\?rev=1/);
    expect(await page.getByRole('heading', { name: /Bench pack · job 1016 · redesign revision 1/ }).count()).toBe(1);
    expect(await page.getByRole('region', { name: 'Approval' }).textContent()).toContain(ENGINEER.name);
    await page.close();
  });

  it('a winder reads groups, circuits, the diagram, wire and coil sizes, and switches the lead marking', async () => {
    const page = await as(WINDER);
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/redesign/print`);
    await page.getByRole('link', { name: /Bench pack: groups, connections/ }).click();
    await page.waitForURL(/\/redesign\/bench-pack/);
    const groups = page.getByRole('table', { name: 'Coil groups round the stator' });
    expect(await groups.locator('tbody tr').first().textContent()).toMatch(/^1A1/);
    expect(await groups.textContent()).toMatch(/forward \(in at S\)/);
    expect(await page.locator('.circuit').first().textContent()).toMatch(/Circuit A-1 \(\d+ turns\): U1 → S·A1·F/);
    const diagram = page.getByRole('img', { name: /Connection diagram/ });
    expect(await diagram.count()).toBe(1);
    expect(await page.getByText('IEC 60034-8 terminal markings').count()).toBeGreaterThan(0);
    expect(await page.getByRole('table', { name: 'Wire to draw from stock' }).textContent()).toMatch(/kg/);
    expect(await page.getByRole('table', { name: 'Coil dimensions' }).textContent()).toMatch(/mm \(.* in\)/);
    await page.getByLabel('Lead marking').selectOption('nema');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.waitForURL(/marking=nema/);
    expect(await page.locator('.circuit').first().textContent()).toMatch(/T1 → S·A1·F/);
    const href = await page.getByRole('link', { name: 'Download PDF' }).getAttribute('href');
    expect(href).toMatch(/\/bench-pack\/pdf\?marking=nema/);
    const pdf = await page.request.get(`${e2e.app.baseUrl}${href}`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');
    expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');
    await page.close();
  });

  it('the as-found sheet offers the pack for a rewind to the original', async () => {
    const page = await as(WINDER);
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/as-found`);
    await page.getByRole('link', { name: 'Bench pack for a rewind to the original winding' }).click();
    await page.waitForURL(/basis=original/);
    expect(await page.getByRole('heading', { name: /rewind to the original/ }).count()).toBe(1);
    expect(await page.getByRole('region', { name: 'Approval' }).textContent()).toMatch(/Redesign revision 1 is approved/);
    await page.close();
  });
});
