import { describe, expect, inject, it } from 'vitest';
import { DESKTOP, browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const { newPage } = browserForFile();

describe('the shelf screen', () => {
  it('shows cards by product with sealed counts and best-quality badges, and finds a product from a misspelling', async () => {
    const page = await newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'keeper@larderly.test');
    await page.getByRole('navigation', { name: 'Screens' }).first().getByRole('link', { name: 'Shelf' }).click();
    await page.getByRole('heading', { level: 1, name: 'Shelf' }).waitFor();
    await page.getByRole('heading', { name: 'Green Tomato Chutney' }).waitFor();
    await expect(page.getByText('Past best quality').count()).resolves.toBeGreaterThan(0);
    await screenshot(page, 'shelf-desktop');

    await page.getByRole('heading', { name: 'Pickled Beets' }).waitFor();
    await page.getByLabel('Search the shelf').fill('chutny');
    // The search module loads on the first keystroke; the cards filter once it is there.
    await page.getByRole('heading', { name: 'Pickled Beets' }).waitFor({ state: 'detached' });
    await page.getByRole('heading', { name: 'Green Tomato Chutney' }).waitFor();
    await page.getByLabel('Search the shelf').fill('');
    await page.close();
  }, 150_000);

  it('sorts and filters the table', async () => {
    const page = await newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    await page.goto(`${baseURL}/h/${hid}/shelf?view=table`);
    const firstProduct = () => page.locator('tbody tr').first().locator('td').first().textContent();
    await page.locator('tbody tr').first().waitFor();
    await page.getByRole('button', { name: /^Product/ }).click();
    await expect(firstProduct()).resolves.toBe('Apple-Cranberry Sauce');
    await page.getByRole('button', { name: /^Product/ }).click();
    await expect(firstProduct()).resolves.toBe('Sweet Corn Relish');
    await page.getByLabel('Kind').selectOption({ label: 'Jam' });
    const kinds = await page.locator('tbody tr td:nth-child(2)').allTextContents();
    expect(new Set(kinds)).toEqual(new Set(['Jam']));
    await page.getByLabel('Kind').selectOption({ label: 'Every kind' });
    await page.getByLabel('Only jars past best quality').check();
    await expect(page.locator('tbody tr').count()).resolves.toBeGreaterThan(0);
    expect(await page.locator('tbody tr').count()).toBe(
      await page.locator('tbody tr', { hasText: 'Past best quality' }).count(),
    );
    await screenshot(page, 'shelf-table-desktop');
    await page.close();
  }, 150_000);

  it('opens the oldest jar of a product from its card on a phone', async () => {
    const page = await newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
    await page.goto(`${baseURL}/h/${hid}/shelf`);
    const card = page.locator('li', { has: page.getByRole('heading', { name: 'Pickled Beets' }) });
    await card.getByText('sealed').waitFor();
    await screenshot(page, 'shelf-phone');
    const before = Number(await card.locator('.text-3xl').textContent());
    await card.getByRole('button', { name: /Open oldest jar of Pickled Beets/ }).click();
    await expect.poll(async () => Number(await card.locator('.text-3xl').textContent())).toBe(before - 1);
    await card.getByText(/opened in the fridge/).waitFor();
    await page.close();
  }, 150_000);
});
