/**
 * Issue 12: the production build sends a nonce-based Content-Security-Policy, refuses framing and keeps
 * the Referer on the site, and every screen still hydrates with no CSP violation in Chromium's console.
 * Also: an unknown address shows the not-found screen with a way back, and the sign-in redirect stays on
 * the app for the reported bypasses.
 */
import { describe, expect, it } from 'vitest';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { ADMIN } from '../support/demo-users';

const e2e = useAppInBrowser();

const PAGES = [
  '/jobs',
  '/jobs/new',
  '/jobs/1016',
  '/jobs/1016/as-found',
  '/jobs/1016/redesign',
  '/jobs/1016/final-tests',
  '/library',
  '/stock',
  '/admin/users',
];

describe('security headers', () => {
  it('a page carries a fresh nonce CSP and the framing and referrer rules', async () => {
    const a = await fetch(`${e2e.app.baseUrl}/login`);
    const b = await fetch(`${e2e.app.baseUrl}/login`);
    const csp = a.headers.get('content-security-policy') ?? '';
    expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).not.toBe(b.headers.get('content-security-policy'));
    expect(a.headers.get('x-frame-options')).toBe('DENY');
    expect(a.headers.get('referrer-policy')).toBe('same-origin');
    expect(a.headers.get('x-content-type-options')).toBe('nosniff');
    const html = await a.text();
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1];
    expect(html).toContain(`nonce="${nonce}"`);
  });

  it('every screen hydrates with no CSP violation or script error in Chromium', async () => {
    const page = await e2e.browser.context.newPage();
    const problems: string[] = [];
    page.on('console', (m) => {
      if (/Content Security Policy|Refused to/i.test(m.text())) problems.push(`${page.url()}: ${m.text()}`);
    });
    page.on('pageerror', (err) => problems.push(`${page.url()}: ${err.message}`));
    await signIn(page, e2e.app.baseUrl, ADMIN.email, ADMIN.password);
    for (const path of PAGES) {
      await page.goto(`${e2e.app.baseUrl}${path}`);
      await page.waitForLoadState('networkidle');
    }
    // Hydrated: a client-side control reacts (the board's link navigates without a full reload).
    await page.goto(`${e2e.app.baseUrl}/jobs/1016`);
    await page
      .getByRole('link', { name: 'Back to the job board' })
      .or(page.getByRole('link', { name: 'Job board' }))
      .first()
      .click();
    await page.waitForURL(/\/jobs$/);
    expect(problems).toEqual([]);
    await page.close();
  });

  it('an unknown address shows the not-found screen with a way back', async () => {
    // The browser context is already signed in by the test before (it shares cookies).
    const page = await e2e.browser.context.newPage();
    const res = await page.goto(`${e2e.app.baseUrl}/no-such-screen`);
    expect(res?.status()).toBe(404);
    await expect(page.getByRole('heading', { name: 'Nothing here' }).isVisible()).resolves.toBe(true);
    await expect(page.getByRole('link', { name: 'Back to the job board' }).isVisible()).resolves.toBe(true);
    await page.close();
  });

  it('signing in with a crafted next= never leaves the app', async () => {
    for (const next of ['/\\evil.example/x', '/\t/evil.example/x', '//evil.example/x']) {
      const page = await e2e.browser.context.newPage();
      await page.context().clearCookies();
      await page.goto(`${e2e.app.baseUrl}/login?next=${encodeURIComponent(next)}`);
      await page.getByLabel('Email').fill(ADMIN.email);
      await page.getByLabel('Password').fill(ADMIN.password);
      await page.getByRole('button', { name: /sign in/i }).click();
      await page.waitForLoadState('networkidle');
      expect(new URL(page.url()).origin).toBe(e2e.app.baseUrl);
      await page.close();
    }
  });
});
