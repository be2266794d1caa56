import { describe, expect, it } from 'vitest';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { ADMIN, ENGINEER } from '../support/demo-users';

const e2e = useAppInBrowser();

// Demo job 1016 is in winding with a saved as-found sheet; 1026 has shipped.
const PAGES = [
  '/jobs',
  '/jobs?due=overdue&sort=customer',
  '/jobs/new',
  '/jobs/1016',
  '/jobs/1016/as-found',
  '/jobs/1016/as-found/print',
  '/jobs/1005/as-found',
  '/jobs/1016/redesign',
  '/jobs/1016/final-tests',
  '/jobs/1016/job-sheet',
  '/jobs/1026/job-sheet',
  '/library',
  '/library?slots=36&poles=4',
  '/stock',
  '/admin/users',
];

describe('every screen', () => {
  it('renders and hydrates without a script error or a server error', async () => {
    const page = await e2e.browser.context.newPage();
    const problems: string[] = [];
    let current = '';
    page.on('pageerror', (err) => problems.push(`${current}: ${err.message}`));
    page.on('response', (res) => {
      if (res.status() >= 500) problems.push(`${current}: HTTP ${res.status()} for ${res.url()}`);
    });
    await signIn(page, e2e.app.baseUrl, ADMIN.email, ADMIN.password);
    for (const path of PAGES) {
      current = path;
      const res = await page.goto(`${e2e.app.baseUrl}${path}`);
      expect(res?.status(), path).toBeLessThan(400);
      await page.waitForLoadState('networkidle');
    }
    expect(problems).toEqual([]);
    await page.close();
  });

  it('sends the old addresses of the as-found sheet and the final tests to their new ones', async () => {
    await e2e.browser.context.clearCookies();
    const page = await e2e.browser.context.newPage();
    await signIn(page, e2e.app.baseUrl, ADMIN.email, ADMIN.password);
    await page.goto(`${e2e.app.baseUrl}/jobs/1016/sheet/print`);
    expect(new URL(page.url()).pathname).toBe('/jobs/1016/as-found/print');
    await page.goto(`${e2e.app.baseUrl}/jobs/1016/tests`);
    expect(new URL(page.url()).pathname).toBe('/jobs/1016/final-tests');
    await page.close();
  });

  it('sends a signed-out visitor to sign in, and a role without access to the refusal page', async () => {
    await e2e.browser.context.clearCookies();
    const page = await e2e.browser.context.newPage();
    await page.goto(`${e2e.app.baseUrl}/jobs/1016/as-found`);
    await page.waitForURL(/\/login/);
    await signIn(page, e2e.app.baseUrl, ENGINEER.email, ENGINEER.password);
    await page.goto(`${e2e.app.baseUrl}/admin/users`);
    await page.waitForURL(/\/denied/);
    await page.close();
  });
});
