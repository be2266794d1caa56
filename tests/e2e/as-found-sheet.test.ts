import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useAppInBrowser } from '../support/e2e-session';
import { signIn } from '../support/browser';
import { FRONT_DESK, WINDER } from '../support/demo-users';

const dir = mkdtempSync(join(tmpdir(), 'cw-sheet-e2e-'));
/** Job 1005 is a demo job in inspection (no sheet yet): 5.5 kW, 400 V, 50 Hz, 960 rpm → 6 poles. */
const JOB = 1005;

const e2e = useAppInBrowser();

const field = (page: Page, name: string) => page.getByLabel(name, { exact: true });

async function download(page: Page, name: string): Promise<string> {
  const [dl] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name, exact: true }).click()]);
  const path = join(dir, dl.suggestedFilename());
  await dl.saveAs(path);
  return readFileSync(path, 'utf8');
}

describe('a winder records an as-found sheet', () => {
  let exported = '';

  it('records a concentric winding with two wire sizes, sees the analysis and the inconsistency, and saves', async () => {
    const page = await e2e.browser.context.newPage();
    await signIn(page, e2e.app.baseUrl, WINDER.email, WINDER.password);
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}`);
    await page.getByRole('link', { name: 'As-found data sheet' }).click();
    await page.waitForURL(/\/as-found$/);
    // A new sheet starts from the nameplate: poles from 960 rpm at 50 Hz (docs/engineering/nameplate-and-speed.md: 6 poles).
    expect(await field(page, 'Line voltage (V)').inputValue()).toBe('400');
    expect(await field(page, 'Poles').inputValue()).toBe('6');

    for (const [label, value] of [
      ['Bore (mm)', '130'],
      ['Core length (mm)', '110'],
      ['Core outside diameter (mm)', '210'],
      ['Stator slots', '36'],
      ['Slot depth (mm)', '15'],
      ['Slot width, top (bore end) (mm)', '5'],
      ['Slot width, bottom (mm)', '7'],
      ['Tooth width (mm)', '5.5'],
    ] as const)
      await field(page, label).fill(value);
    await field(page, 'Layers').selectOption('1');
    await field(page, 'Coil style').selectOption('concentric');
    await field(page, 'Single-layer coiling').selectOption('half');
    // 36 slots, 6 poles, half-coiled: q = 2, spans 1–8 and 1–6 (τ + q − 1 = 7, then 5) [derived, docs/engineering/winding-factor.md].
    await field(page, 'Span of coil 1').fill('7');
    await field(page, 'Turns of coil 1').fill('34');
    await page.getByRole('button', { name: 'Add a coil to the group' }).click();
    await field(page, 'Span of coil 2').fill('5');
    await field(page, 'Turns of coil 2').fill('34');
    await field(page, 'Coils per group').fill('2');
    await field(page, 'Groups (total)').fill('9');
    // Deliberate mistake: a single-layer half-coiled 6-pole winding allows 1 or 3 circuits, not 2 (docs/engineering/redesign.md).
    await field(page, 'Parallel circuits').fill('2');
    await field(page, 'Connection').selectOption('star');
    await field(page, 'Wire 1 size').fill('0.85');
    await page.getByRole('button', { name: 'Add a wire size' }).click();
    await field(page, 'Wire 2 standard').selectOption('awg');
    await field(page, 'Wire 2 size').fill('20');
    await field(page, 'Mean length of turn (mm)').fill('420');
    await field(page, 'Insulation class').selectOption('F');

    const analysis = page.getByTestId('analysis');
    await expect
      .poll(() => analysis.locator('[data-finding="parallel-paths"]').textContent(), { timeout: 10_000 })
      .toContain('Possible: 1, 3.');
    expect(await page.getByTestId('kw1').textContent()).toMatch(/^0\.9\d{3}$/);
    expect(await analysis.getByText('Air gap, peak').count()).toBe(1);
    expect(await page.getByRole('img', { name: /Slot diagram: 36 slots, 6 poles/ }).count()).toBe(1);
    // Nothing typed is lost: the draft reaches the server a few seconds after typing stops.
    await expect.poll(() => page.getByTestId('draft-status').textContent(), { timeout: 15_000 }).toMatch(/Draft saved \d/);

    await page.getByRole('button', { name: 'Save data sheet' }).click();
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'Data sheet saved (revision 1).' }).count()).toBe(1);
    await page.close();
  });

  it('prints the saved sheet on a bench-ready page', async () => {
    const page = await e2e.browser.context.newPage();
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/as-found`);
    await page.getByRole('link', { name: 'Print view' }).click();
    await page.waitForURL(/\/as-found\/print$/);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain(`job ${JOB}`);
    const body = (await page.locator('main').textContent()) ?? '';
    expect(body).toContain('Single-layer concentric, half-coiled');
    expect(body).toContain('1 × 0.85 mm grade 2 + 1 × AWG 20 grade 2');
    expect(body).toContain('not possible');
    await page.close();
  });

  it('exports the sheet as JSON and imports it back to the same sheet', async () => {
    const page = await e2e.browser.context.newPage();
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/as-found`);
    exported = await download(page, 'Export JSON');
    const file = JSON.parse(exported) as { format: string; version: number; sheet: { winding: { spans: number[] } } };
    expect(file).toMatchObject({ format: 'coilwright.winding-sheet', version: 1 });
    expect(file.sheet.winding.spans).toEqual([7, 5]);

    // A broken file is refused whole, every problem named with its path.
    const bad = JSON.parse(exported) as { sheet: { core: { boreMm: unknown }; wires: { size: string }[] } };
    bad.sheet.core.boreMm = 'wide';
    bad.sheet.wires[0]!.size = '0.84';
    writeFileSync(join(dir, 'bad.json'), JSON.stringify(bad));
    await page.locator('#import-json').setInputFiles(join(dir, 'bad.json'));
    const issues = page.getByTestId('import-issues');
    await expect.poll(() => issues.textContent()).toContain('sheet.core.boreMm');
    expect(await issues.textContent()).toContain('sheet.wires.0.size');
    expect(await field(page, 'Bore (mm)').inputValue()).toBe('130');
    await page.getByRole('button', { name: 'Dismiss' }).click();

    await page
      .locator('#import-json')
      .setInputFiles({ name: 'job-sheet.json', mimeType: 'application/json', buffer: Buffer.from(exported) });
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'Imported job-sheet.json' }).count()).toBe(1);
    await page.getByRole('button', { name: 'Save data sheet' }).click();
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'Data sheet saved (revision 2).' }).count()).toBe(1);
    await page.reload();
    const again = JSON.parse(await download(page, 'Export JSON')) as { sheet: unknown };
    expect(again.sheet).toEqual((JSON.parse(exported) as { sheet: unknown }).sheet);
    await page.close();
  });

  it('keeps an unsaved change as a draft across a reload, in inches when the winder prefers them', async () => {
    const page = await e2e.browser.context.newPage();
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/as-found`);
    await page.getByLabel('inches').check();
    // 130 mm = 5.1181 in (1 in = 25.4 mm exactly).
    await expect.poll(() => field(page, 'Bore (in)').inputValue()).toBe('5.1181');
    // The unit switch itself may already have been kept as a draft: wait for the note to be pending, then saved.
    await field(page, 'Notes').fill('Leads re-sleeved at the box.');
    await expect.poll(() => page.getByTestId('draft-status').textContent()).toMatch(/Unsaved changes|Saving draft/);
    await expect.poll(() => page.getByTestId('draft-status').textContent(), { timeout: 15_000 }).toMatch(/Draft saved \d/);
    await page.reload();
    // The form fills its inputs when it hydrates, so poll rather than read once.
    await expect.poll(() => field(page, 'Notes').inputValue()).toBe('Leads re-sleeved at the box.');
    expect(await field(page, 'Bore (in)').inputValue()).toBe('5.1181');
    expect(await page.getByRole('status').filter({ hasText: 'Restored your unsaved draft' }).count()).toBe(1);
    await page.close();
  });

  it('shows the front desk the sheet read-only', async () => {
    await e2e.browser.context.clearCookies();
    const page = await e2e.browser.context.newPage();
    await signIn(page, e2e.app.baseUrl, FRONT_DESK.email, FRONT_DESK.password);
    await page.goto(`${e2e.app.baseUrl}/jobs/${JOB}/as-found`);
    // Read-only means values, not disabled inputs (issue 15): no form control for a role that cannot save.
    await page.waitForLoadState('networkidle');
    expect(await page.getByRole('form', { name: 'As-found data sheet' }).locator('input, select, textarea').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Save data sheet' }).count()).toBe(0);
    expect(await page.getByText('Your role can read this data sheet').count()).toBe(1);
    await page.close();
  });
});
