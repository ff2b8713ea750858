import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

describe('the fridge', () => {
  it('lists the opened demo jars soonest use-by first, on a phone', async () => {
    const page = await browser.newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
    await page.goto(`${baseURL}/h/${hid}/fridge`);
    const list = page.getByRole('list', { name: 'Opened jars' });
    await list.waitFor();
    const api = await (await page.request.get(`${baseURL}/api/households/${hid}/fridge`)).json();
    const useBys = api.jars.map((j: { useBy: string }) => j.useBy);
    expect(useBys.length).toBeGreaterThan(1);
    expect(useBys).toEqual([...useBys].sort());
    const names = await list.getByRole('heading', { level: 2 }).allTextContents();
    expect(names).toEqual(api.jars.map((j: { productName: string }) => j.productName));
    await screenshot(page, 'fridge-phone');
    await page.close();
  });

  it('lets a helper mark a jar finished from the fridge, and it leaves the list', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
    await page.goto(`${baseURL}/h/${hid}/fridge`);
    await page.getByRole('list', { name: 'Opened jars' }).waitFor();
    await screenshot(page, 'fridge-desktop');
    const first = (await (await page.request.get(`${baseURL}/api/households/${hid}/fridge`)).json()).jars[0];
    await page.getByRole('button', { name: `Mark finished: jar ${first.code} of ${first.productName}` }).click();
    await page
      .getByRole('button', { name: `Mark finished: jar ${first.code} of ${first.productName}` })
      .waitFor({ state: 'detached' });
    const openJarIds = async () =>
      (await (await page.request.get(`${baseURL}/api/households/${hid}/fridge`)).json()).jars.map(
        (j: { jarId: string }) => j.jarId,
      );
    await expect.poll(openJarIds).not.toContain(first.jarId);
    const after = (await (await page.request.get(`${baseURL}/api/households/${hid}/fridge`)).json()).jars;

    const second = after[0];
    await page.getByRole('button', { name: `Discard jar ${second.code} of ${second.productName}` }).click();
    await page.getByRole('button', { name: 'Yes, discard' }).click();
    await expect.poll(openJarIds).not.toContain(second.jarId);
    await page.close();
  });
});
