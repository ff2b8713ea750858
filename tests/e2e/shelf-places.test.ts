import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();

describe('shelf places on a phone', () => {
  it('a cook adds a place, moves the jar to eat first there from its page, then removes the place, choosing where its jar goes', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];

    await page.goto(`${baseURL}/h/${hid}/household`);
    const places = page.getByRole('list', { name: 'Places' });
    await places.getByText('Pantry shelf').waitFor();
    await page.getByLabel('New place').fill('Garage bench');
    await page.getByRole('button', { name: 'Add place' }).click();
    await places.getByText('Garage bench').waitFor();

    // The shelf, in one place: each product's jar to eat first says where it is.
    await page.goto(`${baseURL}/h/${hid}/shelf`);
    await page.getByLabel('Place', { exact: true }).selectOption({ label: 'Pantry shelf' });
    const card = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: 'Rhubarb-Ginger Jam' }) });
    const eatFirst = card.getByText(/^Eat first: jar [0-9A-Z]{6}, in the Pantry shelf$/);
    await eatFirst.waitFor();
    const code = /jar ([0-9A-Z]{6})/.exec((await eatFirst.textContent())!)![1];

    await page.goto(`${baseURL}/j/${code}`);
    await page.getByText('Place: Pantry shelf').waitFor();
    await page.getByLabel('Move to').selectOption({ label: 'Garage bench' });
    await page.getByRole('button', { name: `Move jar ${code}` }).click();
    await page.getByRole('status').getByText('1 jar is in the Garage bench now.').waitFor();
    await page.getByText('Place: Garage bench').waitFor();
    await screenshot(page, 'shelf-places-jar-moved-phone');

    // Removing a place that holds a jar asks where it goes.
    await page.goto(`${baseURL}/h/${hid}/household`);
    await places.getByText('1 sealed jar', { exact: true }).waitFor();
    await page.getByRole('button', { name: 'Remove Garage bench' }).click();
    await page.getByText('Garage bench holds 1 sealed jar. Where should it go?').waitFor();
    await places.getByLabel('Move to').selectOption({ label: 'Pantry shelf' });
    await screenshot(page, 'shelf-places-remove-phone');
    await page.getByRole('button', { name: 'Move the jars and remove Garage bench' }).click();
    await expect.poll(() => places.getByText('Garage bench').count()).toBe(0);

    await page.goto(`${baseURL}/j/${code}`);
    await page.getByText('Place: Pantry shelf').waitFor();
    await page.close();
  });
});
