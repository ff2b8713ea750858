import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

describe('Export / Import on the Household screen', () => {
  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`downloads the household and imports it as a new one (${name})`, async () => {
      const page = await browser.newPage({ viewport, acceptDownloads: true });
      await signIn(page, baseURL, 'keeper@larderly.test');
      const home = new URL(page.url()).pathname.replace(/\/$/, '');
      await page.goto(`${baseURL}${home}/household`);
      await page.getByRole('heading', { name: 'Export / Import' }).waitFor();

      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download a backup' }).click()]);
      expect(download.suggestedFilename()).toMatch(/^larderly-backup-calloway-hollow-\d{4}-\d{2}-\d{2}\.json$/);
      const file = await download.path();

      await page.getByLabel('Choose a backup file').setInputFiles(file);
      const done = page.getByRole('status').filter({ hasText: 'Imported as a new household' });
      await done.waitFor();
      await done.scrollIntoViewIfNeeded();
      await screenshot(page, `backup-imported-${name}`);
      await page.getByRole('link', { name: 'Open Calloway Hollow' }).click();
      await page.waitForURL((url) => url.pathname !== home && /^\/h\/[0-9a-f-]{36}/.test(url.pathname));
      await page.close();
    });
  }

  it('says plainly when the chosen file is not a backup', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signIn(page, baseURL, 'keeper@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    await page.goto(`${baseURL}${home}/household`);
    await page.getByLabel('Choose a backup file').setInputFiles({ name: 'notes.json', mimeType: 'application/json', buffer: Buffer.from('{"jam": true}') });
    await expect(page.getByRole('alert').filter({ hasText: 'Nothing was imported' }).textContent()).resolves.toMatch(/not a Larderly household backup/);
    await page.getByRole('alert').scrollIntoViewIfNeeded();
    await screenshot(page, 'backup-refused-phone');
    await page.close();
  });

  it('is not offered to a cook', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signIn(page, baseURL, 'cook@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    await page.goto(`${baseURL}${home}/household`);
    // The members list loads with the page: once it shows, every section a cook may see is there.
    await page.getByText('Tobias Calloway').first().waitFor({ timeout: 60_000 });
    expect(await page.getByRole('heading', { name: 'Export / Import' }).count()).toBe(0);
    await page.close();
  }, 120_000);
});
