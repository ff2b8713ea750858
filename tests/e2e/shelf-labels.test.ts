import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { DESKTOP, browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const jsqrSource = readFileSync(createRequire(import.meta.url).resolve('jsqr/dist/jsQR.js'), 'utf8');
const { newPage } = browserForFile();

/** Decodes every QR image on the sheet inside the page (jsQR's own build, evaluated as a test tool), handing back only the texts. */
async function decodeQrCodes(page: Page) {
  await page.evaluate(jsqrSource);
  return page.evaluate(async () => {
    const decode = (
      window as unknown as { jsQR: (d: Uint8ClampedArray, w: number, h: number) => { data: string } | null }
    ).jsQR;
    const images = [...document.querySelectorAll<HTMLImageElement>('img[alt^="QR code for jar"]')];
    const texts: (string | null)[] = [];
    for (const img of images) {
      await img.decode();
      const size = 400;
      const canvas = document.createElement('canvas');
      canvas.width = size;
      canvas.height = size;
      const context = canvas.getContext('2d')!;
      context.fillStyle = 'white';
      context.fillRect(0, 0, size, size);
      context.drawImage(img, 0, 0, size, size);
      texts.push(decode(context.getImageData(0, 0, size, size).data, size, size)?.data ?? null);
    }
    return texts;
  });
}

describe('label sheets', () => {
  it('prints one label a jar still to eat, each QR code decoding to the jar’s own page', async () => {
    const page = await newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    const jars = (await (await page.request.get(`${baseURL}/api/households/${hid}/jars?state=sealed`)).json()).jars as {
      code: string;
      batchId: string;
      productName: string;
    }[];
    const beets = jars.filter((j) => j.productName === 'Pickled Beets');
    // The batch with the most jars left, so the sheet shows a full row or two.
    const batchId = [...new Set(beets.map((j) => j.batchId))].sort(
      (a, b) => beets.filter((j) => j.batchId === b).length - beets.filter((j) => j.batchId === a).length,
    )[0];
    const batch = (await (await page.request.get(`${baseURL}/api/households/${hid}/batches/${batchId}`)).json())
      .batch as { jars: { code: string; state: string }[] };
    const onHand = batch.jars.filter((j) => j.state === 'sealed' || j.state === 'opened').map((j) => j.code);

    await page.goto(`${baseURL}/h/${hid}/batches/${batchId}`);
    await page.getByRole('link', { name: 'Print labels' }).click();
    const labels = page.locator('li.jar-label');
    await page.locator('img[alt^="QR code for jar"]').first().waitFor();
    await expect(labels.count()).resolves.toBe(onHand.length);

    const decoded = await decodeQrCodes(page);
    expect(decoded, 'every label has a readable QR code').not.toContain(null);
    expect(decoded.sort()).toEqual(onHand.map((c) => `${baseURL}/j/${c}`).sort());
    await expect(labels.first().textContent()).resolves.toMatch(/Pickled Beets.*[0-9A-Z]{6}/);
    await screenshot(page, 'shelf-labels-a4');

    await page.getByRole('button', { name: 'US Letter' }).click();
    await page.emulateMedia({ media: 'print' });
    await expect(page.getByRole('button', { name: 'Print' }).isVisible()).resolves.toBe(false);
    await screenshot(page, 'shelf-labels-letter-print');
    await page.close();
  }, 150_000);
});

describe('labels for a phone to scan', () => {
  it('point their QR codes at the configured public origin, carry the best-quality date, and print US Letter text at 9 pt or more', async () => {
    const page = await newPage({ viewport: DESKTOP });
    // The server's answer when APP_ORIGIN is set (its API test checks that); here the sheet is printed from a local address.
    await page.route('**/api/config', (route) =>
      route.fulfill({ json: { publicOrigin: 'https://larder.example.test' } }),
    );
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    const [jar] = (await (await page.request.get(`${baseURL}/api/households/${hid}/jars?state=sealed`)).json())
      .jars as { code: string; batchId: string; bestBy: string }[];
    await page.goto(`${baseURL}/h/${hid}/batches/${jar!.batchId}/labels?paper=letter`);
    await page.locator('img[alt^="QR code for jar"]').first().waitFor();
    const decoded = await decodeQrCodes(page);
    expect(decoded.length).toBeGreaterThan(0);
    for (const text of decoded) expect(text).toMatch(/^https:\/\/larder\.example\.test\/j\/[0-9A-Z]{6}$/);
    const label = page.locator(`li.jar-label[data-code="${jar!.code}"]`);
    const bestBy = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' }).format(
      new Date(`${jar!.bestBy}T00:00:00Z`),
    );
    await expect(label.getByText(/^Best quality by /).textContent()).resolves.toMatch(
      // A label is read for a year or more: its dates always carry the year, and no weekday.
      new RegExp(`^Best quality by ${bestBy}, \\d{4}$`),
    );
    await page.emulateMedia({ media: 'print' });
    // 9 pt is 12 CSS px; every line of text on a Letter label is at least that.
    const sizes = await page
      .locator('li.jar-label span span, li.jar-label > span > span')
      .evaluateAll((spans) => spans.map((s) => parseFloat(getComputedStyle(s).fontSize)));
    expect(sizes.length).toBeGreaterThan(0);
    expect(Math.min(...sizes)).toBeGreaterThanOrEqual(12);
    await screenshot(page, 'shelf-labels-letter-public-origin');
    await page.close();
  }, 150_000);
});

describe('a jar’s page', () => {
  it('lets a helper who scanned a label sign in and mark the jar opened', async () => {
    const cook = await newPage({ viewport: DESKTOP });
    await signIn(cook, baseURL, 'cook@larderly.test');
    const hid = cook.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    const jar = (
      (await (await cook.request.get(`${baseURL}/api/households/${hid}/jars?state=sealed`)).json()).jars as {
        code: string;
        productName: string;
      }[]
    ).find((j) => j.productName === 'Hot Pepper Jelly')!;
    await cook.close();

    const page = await newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await page.goto(`${baseURL}/j/${jar.code}`);
    await page.waitForURL(/\/sign-in\?next=/);
    await page.getByLabel('E-mail').fill('helper@larderly.test');
    await page.getByLabel('Password').fill('pantry-demo-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(new RegExp(`/j/${jar.code}$`));
    await page.getByRole('heading', { name: 'Hot Pepper Jelly' }).waitFor();
    await page.getByText('sealed', { exact: true }).waitFor();
    await screenshot(page, 'shelf-jar-phone');

    await page.getByRole('button', { name: `Mark opened: jar ${jar.code}` }).click();
    await page.getByText('opened, in the fridge').first().waitFor();
    await page
      .getByText(/use by/)
      .first()
      .waitFor();
    await page.getByRole('button', { name: `Mark finished: jar ${jar.code}` }).waitFor();
    await page.close();
  }, 150_000);

  it('tells a neighbour the jar was not found, never what it is', async () => {
    const page = await newPage({ viewport: PHONE });
    await signIn(page, baseURL, 'keeper@larderly.test');
    const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    const [jar] = (await (await page.request.get(`${baseURL}/api/households/${hid}/jars?state=sealed`)).json())
      .jars as { code: string; productName: string }[];
    await page.context().clearCookies();
    await signIn(page, baseURL, 'neighbor@larderly.test');
    await page.goto(`${baseURL}/j/${jar.code}`);
    await page.getByText(`Jar ${jar.code} was not found`).waitFor();
    await expect(page.getByText(jar.productName).count()).resolves.toBe(0);
    await page.close();
  }, 150_000);
});
