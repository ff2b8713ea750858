import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();

describe('empty jars and lids, on a phone', () => {
  it('reaches the stock from the Shelf, corrects a count by hand and shows who changed it', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'keeper@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
    await page.goto(`${baseURL}/h/${hid}/shelf`);
    await page.getByRole('link', { name: 'Jars and lids' }).click();
    await page.getByRole('heading', { name: 'Empty jars', exact: true }).waitFor();

    const pints = page.getByRole('spinbutton', { name: 'Pint jars: how many', exact: true });
    const before = Number(await pints.inputValue());
    await page.getByLabel('Why (optional)').fill('A jar chipped on the rim');
    const after = before > 0 ? before - 1 : 2;
    await pints.fill(String(after));
    await page.getByRole('button', { name: 'Save: Pint jars', exact: true }).click();

    const latest = page.getByRole('region', { name: 'Changes' }).getByRole('listitem').first();
    await latest.getByText('“A jar chipped on the rim”').waitFor();
    await latest.getByText(/Counted by hand · Wren Calloway/).waitFor();
    expect(await pints.inputValue()).toBe(String(after));
    await screenshot(page, 'jar-stock-phone');
    await page.close();
  });
});
