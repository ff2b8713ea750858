import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();
const WIDE = { width: 1440, height: 900 };
const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];

async function scrollToBottom(page: Page) {
  const tall = await page.evaluate(() => document.documentElement.scrollHeight - window.innerHeight);
  expect(tall, 'the page is long enough to scroll').toBeGreaterThan(300);
  // Scrolled again on each try: on a busy machine a late layout (a query settling) may land after the first scroll.
  await expect
    .poll(() =>
      page.evaluate(() => {
        window.scrollTo(0, document.documentElement.scrollHeight);
        return window.scrollY;
      }),
    )
    .toBeGreaterThan(300);
}

describe('moving between screens', () => {
  it('on a desktop the side navigation stays in view down a long page, and the next screen opens at its top', async () => {
    const page = await browser.newPage({ viewport: WIDE });
    const warnings: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'warning' || message.type() === 'error') warnings.push(message.text());
    });
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    await page.goto(`${baseURL}/h/${hid}/shelf`);
    await page.getByRole('heading', { name: 'Pickled Beets' }).first().waitFor();
    await scrollToBottom(page);
    const nav = page.getByRole('navigation', { name: 'Screens' }).first();
    const box = (await nav.boundingBox())!;
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + 40).toBeLessThan(WIDE.height);
    await page.screenshot({ path: 'test-results/screenshots/navigation-sticky-side-desktop.png' });
    await nav.getByRole('link', { name: 'Batches' }).click();
    await page.waitForURL(new RegExp(`/h/${hid}/batches$`));
    await page.getByRole('heading', { name: 'Batches', level: 1 }).waitFor();
    expect(await page.evaluate(() => window.scrollY)).toBe(0);
    // The first load of the app, and each screen after it, warns of no missing hydration fallback.
    await page.reload();
    await page.getByRole('heading', { name: 'Batches', level: 1 }).waitFor();
    expect(warnings.filter((text) => /HydrateFallback/i.test(text))).toEqual([]);
    await page.close();
  });

  it('on a phone a tap in the bottom bar opens the next screen at its top', async () => {
    const page = await browser.newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    await page.getByRole('region', { name: 'My to-dos' }).waitFor();
    await scrollToBottom(page);
    await page.getByRole('navigation', { name: 'Screens' }).last().getByRole('link', { name: 'Fridge' }).tap();
    await page.waitForURL(new RegExp(`/h/${hid}/fridge$`));
    await page.getByRole('list', { name: 'Opened jars' }).waitFor();
    expect(await page.evaluate(() => window.scrollY)).toBe(0);
    await screenshot(page, 'navigation-new-page-at-top-phone');
    await page.close();
  });
});
