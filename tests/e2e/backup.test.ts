import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

// One sign-in for the whole file: the server allows 20 sign-ins per 15 minutes from one address.
// That a cook gets no export is checked on the API (backup.test.ts); the screen only hides it.
describe('Export / Import on the Household screen', () => {
  it('downloads the household, imports it as a new one on desktop and phone, and says plainly when a file is not a backup', async () => {
    const page = await browser.newPage({ viewport: DESKTOP, acceptDownloads: true });
    await signIn(page, baseURL, 'keeper@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    await page.goto(`${baseURL}${home}/household`);
    await page.getByRole('heading', { name: 'Export / Import' }).waitFor();

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download a backup' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^larderly-backup-calloway-hollow-\d{4}-\d{2}-\d{2}\.json$/);
    const file = await download.path();

    for (const [name, viewport] of [
      ['desktop', DESKTOP],
      ['phone', PHONE],
    ] as const) {
      await page.setViewportSize(viewport);
      await page.goto(`${baseURL}${home}/household`);
      await page.getByLabel('Choose a backup file').setInputFiles(file);
      const done = page.getByRole('status').filter({ hasText: 'Imported as a new household' });
      await done.waitFor();
      await done.scrollIntoViewIfNeeded();
      await screenshot(page, `backup-imported-${name}`);
    }

    await page
      .getByLabel('Choose a backup file')
      .setInputFiles({ name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('{"jam": true}') });
    const refused = page.getByRole('alert').filter({ hasText: 'Nothing was imported' });
    await expect(refused.textContent()).resolves.toMatch(/not a Larderly household backup/);
    await refused.scrollIntoViewIfNeeded();
    await screenshot(page, 'backup-refused-phone');

    await page.getByLabel('Choose a backup file').setInputFiles(file);
    await page.getByRole('link', { name: 'Open Calloway Hollow' }).click();
    await page.waitForURL((url) => url.pathname !== home && /^\/h\/[0-9a-f-]{36}/.test(url.pathname));
    await page.close();
  }, 180_000);

  it('keeps one screen’s bad data to that screen: a broken to-do answer shows the boundary, and the navigation still works', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signIn(page, baseURL, 'keeper@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    // The to-do list as an old free-form backup left it: a batch plan whose dates are not dates.
    let broken = '';
    await page.route('**/api/households/*/todos?*', async (route) => {
      const response = await route.fetch();
      const body = (await response.json()) as { todos: { id: string; batchPlan: Record<string, unknown> | null }[] };
      for (const todo of body.todos.filter((t) => t.batchPlan)) {
        todo.batchPlan = { ...todo.batchPlan, plannedOn: 'next spring', targetOn: 'soon', changes: ['x'] };
        broken ||= todo.id;
      }
      await route.fulfill({ response, json: body });
    });
    await page.goto(`${baseURL}${home}/todo?show=all`);
    await expect.poll(() => broken).not.toBe('');
    await page.goto(`${baseURL}${home}/todo?show=all&open=${broken}`);
    const boundary = page
      .getByRole('alert')
      .filter({ has: page.getByRole('heading', { name: 'This screen could not be shown' }) });
    await boundary.waitFor();
    await expect(boundary.textContent()).resolves.toMatch(/What happened: .*Invalid time value/);
    await screenshot(page, 'route-error-todo-phone');
    // The layout around it stands: the navigation takes the person to another screen, which draws as usual.
    await page.getByRole('link', { name: 'Shelf' }).first().click();
    await page.getByRole('heading', { level: 1, name: 'Shelf' }).waitFor();
    await expect(page.getByText('This screen could not be shown').count()).resolves.toBe(0);
    await page.close();
  }, 60_000);
});
