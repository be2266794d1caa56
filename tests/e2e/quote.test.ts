import { describe, expect, it } from 'vitest';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { FRONT_DESK } from '../support/demo-users';
import { pdfText } from '../support/pdf-text';

const e2e = useAppInBrowser();

describe('the front desk quotes a repair', () => {
  it('builds an estimate with live totals, sends the quote, records acceptance with an order number, and the job moves on', async () => {
    const page = await e2e.browser.context.newPage();
    await signIn(page, e2e.app.baseUrl, FRONT_DESK.email, FRONT_DESK.password);
    // A demo job whose winding was recorded at inspection (it has an as-found sheet) but has no quote yet.
    await page.goto(`${e2e.app.baseUrl}/jobs?status=QUOTE_SENT`);
    const jobLink = page.locator('tbody td.num a').first();
    const number = (await jobLink.textContent())!.trim();
    await jobLink.click();
    await page.waitForURL(new RegExp(`/jobs/${number}$`));
    // The shop path refuses customer approval without an accepted quote.
    await page.getByRole('button', { name: 'Move to Customer approved' }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toContain('only when the customer’s acceptance');

    await page.getByRole('link', { name: 'Estimate and quote' }).first().click();
    await page.getByRole('button', { name: 'Start the estimate' }).click();
    await page.getByRole('button', { name: 'Add labour' }).click();
    await page.getByLabel('Line 1 description').fill('Strip, rewind and varnish the stator');
    await page.getByLabel('Line 1 person or trade').fill('Winder');
    await page.getByLabel('Line 1 quantity').fill('6');
    // 6 h × 95.00 = 570.00; tax 7.5 % = 42.75; total 612.75 (the demo shop's rates) [derived]
    await expect.poll(() => page.locator('[data-total="total"]').textContent()).toBe('$612.75');
    await page.getByRole('button', { name: 'Add part' }).click();
    await page.getByLabel('Line 2 description').fill('Bearing, drive end');
    await page.getByLabel(/Line 2 designation/).fill('6309-2Z-C3');
    await page.getByLabel('Line 2 unit price').fill('48.20');
    // 618.20 + 7.5 % (46.365 → 46.37) = 664.57 [derived]
    await expect.poll(() => page.locator('[data-total="total"]').textContent()).toBe('$664.57');
    await page.getByRole('button', { name: /Add rewind material/ }).click();
    await expect.poll(async () => page.getByLabel('Line 3 unit', { exact: true }).inputValue()).toBe('kg');
    await expect.poll(() => page.locator('[data-total="total"]').textContent()).not.toBe('$664.57');

    await page.getByRole('button', { name: 'Save estimate' }).click();
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'Estimate saved.' }).count()).toBe(1);
    await page.getByRole('button', { name: `Send quote Q${number}-1` }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'Sent, awaiting the customer' }).count(), { timeout: 20_000 }).toBe(1);

    // The PDF the customer receives, read back.
    const href = await page.getByRole('link', { name: 'PDF' }).first().getAttribute('href');
    const res = await page.request.get(`${e2e.app.baseUrl}${href}`);
    expect(res.headers()['content-type']).toBe('application/pdf');
    const pdf = pdfText(await res.body());
    expect(pdf).toContain(`Quote Q${number}-1`);
    expect(pdf).toContain('6309-2Z-C3');
    expect(pdf).toContain('Magnet wire');
    expect(pdf).toContain('Valid until');
    expect(pdf).toContain('Isolation and lockout');

    const decision = page.getByRole('form', { name: /Customer's decision/ });
    await decision.getByLabel('Decided by (customer’s person)').fill('R. Okafor');
    await decision.getByLabel('How').selectOption('EMAIL');
    await decision.getByLabel('Customer order number').fill('PO-E2E-77');
    await decision.getByRole('button', { name: 'Record decision' }).click();
    await expect.poll(() => page.getByRole('cell', { name: 'Accepted' }).count(), { timeout: 20_000 }).toBe(1);

    await page.getByRole('link', { name: `← Job ${number}` }).click();
    await page.waitForURL(new RegExp(`/jobs/${number}$`));
    await expect.poll(() => page.getByText('accepted, customer order PO-E2E-77').count(), { timeout: 20_000 }).toBe(1);
    await page.getByRole('button', { name: 'Move to Customer approved' }).click();
    await expect
      .poll(() => page.getByRole('heading', { name: /^Status:/ }).textContent(), { timeout: 20_000 })
      .toContain('Customer approved');
    await page.close();
  });
});
