import { describe, expect, inject, it } from 'vitest';
import { DESKTOP, browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const { newPage } = browserForFile();

async function signedInPage(email: string, viewport = DESKTOP) {
  const page = await newPage({ viewport });
  await signIn(page, baseURL, email);
  const hid = page.url().match(/\/h\/([0-9a-f-]{36})/)![1];
  return { page, hid };
}

async function setAltitude(altitudeFt: number) {
  const { page, hid } = await signedInPage('keeper@larderly.test');
  await page.goto(`${baseURL}/h/${hid}/household`);
  const field = page.getByLabel('Altitude (feet above sea level)');
  await field.fill(String(altitudeFt));
  await page.getByRole('button', { name: 'Save settings' }).click();
  await page.getByText('Saved.').waitFor();
  await page.close();
}

describe('recording a batch', () => {
  it('follows the altitude setting in the plan, then saves the batch with its jars', async () => {
    const { page, hid } = await signedInPage('cook@larderly.test');
    try {
      await page.goto(`${baseURL}/h/${hid}/batches`);
      await page.getByRole('link', { name: 'Record a batch' }).click();
      await page.getByLabel('What did you make?').selectOption({ label: 'Sweet Corn Relish' });
      await page.getByLabel('Jar size').selectOption('half-pint');
      await page.getByLabel('Jars filled').fill('9');
      await page.getByLabel('Jars sealed').fill('8');
      // Corn relish: 15 minutes at 0-1,000 ft; 1,001-3,000 ft adds 5 (USDA Complete Guide, Guide 1).
      await page.getByText('Process 20 minutes at a full rolling boil').waitFor();
      await page.getByText('Processing plan at 2,350 ft').waitFor();
      await page.getByText('1 jar did not seal').waitFor();

      await setAltitude(6500);
      await page.reload();
      // 6,001-8,000 ft adds 15 minutes (USDA Complete Guide, Guide 1).
      await page.getByText('Process 30 minutes at a full rolling boil').waitFor();
      await page.getByText('Processing plan at 6,500 ft').waitFor();
      await expect(page.getByLabel('Jars sealed').inputValue()).resolves.toBe('8');
      await screenshot(page, 'shelf-new-batch-desktop');

      await page.getByLabel('Canner').selectOption({ label: 'Pressure canner, dial gauge' });
      await page.getByText('Not allowed: this batch cannot be saved').waitFor();
      await expect(page.getByRole('button', { name: 'Save the batch' }).isDisabled()).resolves.toBe(true);
      await page.getByLabel('Canner').selectOption({ label: 'Boiling-water canner' });

      await page.getByLabel('Notes').fill('Last of the late corn.');
      await page.getByRole('button', { name: 'Save the batch' }).click();
      await page.getByText('Batch saved').waitFor();
      await page.getByText('Boiling-water canner, 30 minutes at 6,500 ft').waitFor();
      await expect(page.getByText('sealed', { exact: true }).count()).resolves.toBe(8);
      await page.getByText('did not seal, in the fridge').waitFor();
    } finally {
      await setAltitude(2350);
      await page.close();
    }
  }, 150_000);

  it('shows the plan on a phone too, pre-filled from the address', async () => {
    const { page, hid } = await signedInPage('cook@larderly.test', PHONE);
    const recipes = (await (await page.request.get(`${baseURL}/api/households/${hid}/recipes`)).json()).recipes as {
      id: string;
      name: string;
      productId: string;
    }[];
    const beets = recipes.find((r) => r.name === 'Pickled beets')!;
    await page.goto(
      `${baseURL}/h/${hid}/batches/new?productId=${beets.productId}&recipeId=${beets.id}&jars=7&jarSize=pint`,
    );
    // Pickled beets: 30 minutes at 0-1,000 ft, plus 5 at 2,350 ft (USDA Complete Guide, Guides 1 and 6).
    await page.getByText('Process 35 minutes at a full rolling boil').waitFor();
    await expect(page.getByLabel('Jars filled').inputValue()).resolves.toBe('7');
    await screenshot(page, 'shelf-new-batch-phone');
    await page.close();
  }, 150_000);
});
