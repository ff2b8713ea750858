import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const { newPage } = browserForFile();

interface Named {
  id: string;
  name: string;
  productId: string;
}

describe('a household in metric units, on a phone', () => {
  it('switches to metric on the Household page, plans a batch and records it in mL, grams and meters', async () => {
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'keeper@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
    const api = `${baseURL}/api/households/${hid}`;
    try {
      await page.goto(`${baseURL}/h/${hid}/household`);
      await page.getByLabel('Units').selectOption('metric');
      // 2,350 ft x 0.3048 m a foot (NIST SP 811) = 716.28 m: the field converts what is in it.
      const altitude = page.getByLabel('Altitude (meters above sea level)');
      await expect.poll(() => altitude.inputValue()).toBe('716');
      await page.getByLabel('First day of your week').selectOption({ label: 'Sunday' });
      await page.getByLabel('Pressure canner, dial gauge').waitFor();
      await page.getByRole('button', { name: 'Save settings' }).click();
      await page.getByText('Saved.').waitFor();
      await screenshot(page, 'units-metric-household');
      const canners = page.getByRole('group', { name: 'Your canners' });
      await canners.screenshot({ path: 'test-results/screenshots/units-metric-canners.png' });
      const household = (await (await page.request.get(api)).json()).household;
      // 716 m / 0.3048 = 2,349.1 ft, kept in whole feet as the processing tables use.
      expect(household).toMatchObject({ unitSystem: 'metric', altitudeFt: 2349, weekStartsOn: 0 });

      // Plan a restock batch of pickled beets and read it in metric.
      const recipes = (await (await page.request.get(`${api}/recipes`)).json()).recipes as Named[];
      const beets = recipes.find((r) => r.name === 'Pickled beets')!;
      const made = await page.request.post(`${api}/restock/${beets.productId}/todo`, {
        data: { jars: 9, jarSize: 'pint' },
        headers: { Origin: baseURL },
      });
      expect(made.status()).toBe(201);
      const todo = (await made.json()).todo as { id: string; title: string };
      // A pint is 16 US fl oz x 29.5735295625 mL (NIST Handbook 44) = 473 mL.
      expect(todo.title).toMatch(/^Make 9 pint \(473 mL\) jars of /);
      await page.goto(`${baseURL}/h/${hid}/todo?open=${todo.id}`);
      await page.getByRole('heading', { name: 'Shopping list' }).waitFor();
      const shopping = page.locator('section[aria-labelledby="plan-shopping"]');
      await expect.poll(async () => /\d (mL|L|g|kg) /.test(await shopping.innerText())).toBe(true);
      expect(await shopping.innerText()).not.toMatch(/\b(cups?|tbsp|tsp|lb|oz)\b/);
      await page
        .getByText(/at 716 m/)
        .first()
        .waitFor();
      await page.getByText(/Headspace: \d+ mm\./).waitFor();
      await page.getByText(/your boiling-water canner holds 7/).waitFor();
      await screenshot(page, 'units-metric-batch-plan');

      // Record it from the plan: the form and the batch page speak metric too.
      await page.getByRole('link', { name: 'Record this batch' }).click();
      await page.getByText('Processing plan at 716 m').waitFor();
      // USDA Complete Guide to Home Canning (2015): at least 1 inch of water over the jars; NIST SP 811: 2.54 cm.
      await page.getByText('Keep the jars covered by at least 2.5 cm of water').waitFor();
      await expect.poll(() => page.getByLabel('Jar size').locator('option:checked').innerText()).toBe('pint (473 mL)');
      await page.getByLabel('Seals checked already').check();
      await page.getByLabel('Jars sealed').fill('9');
      await screenshot(page, 'units-metric-new-batch');
      await page.getByRole('button', { name: 'Save the batch' }).click();
      await page.getByText('Batch saved').waitFor();
      await page
        .getByText(/at 716 m/)
        .first()
        .waitFor();
      await page
        .getByText(/\d+ mm/)
        .first()
        .waitFor();
      await screenshot(page, 'units-metric-batch');

      // The recipe card and its scaling tool measure in mL and grams.
      await page.goto(`${baseURL}/h/${hid}/recipes/${beets.id}`);
      await page
        .getByText(/\d (mL|L|g|kg)\b/)
        .first()
        .waitFor();
      await page.getByText('Tested minutes at 0–305 m').waitFor();
      await screenshot(page, 'units-metric-recipe');

      // The recipe form takes the headspace in mm and stores inches: 6.35 mm / 25.4 mm an inch (NIST SP 811) = 1/4 in.
      const storedHeadspace = (recipes as (Named & { headspaceInches: number })[]).find(
        (r) => r.id === beets.id,
      )!.headspaceInches;
      try {
        await page.goto(`${baseURL}/h/${hid}/recipes/${beets.id}/edit`);
        const headspace = page.getByLabel('Headspace (mm)');
        await expect.poll(() => headspace.inputValue()).toBe(String(Math.round(storedHeadspace * 25.4 * 1000) / 1000));
        await headspace.fill('6.35');
        await page.getByText('That is 1/4 inch, as tested recipes give it.').waitFor();
        await screenshot(page, 'units-metric-recipe-headspace');
        await page.getByRole('button', { name: 'Save the recipe' }).click();
        await page.waitForURL(`**/recipes/${beets.id}`);
        const saved = (await (await page.request.get(`${api}/recipes/${beets.id}`)).json()).recipe;
        expect(saved.headspaceInches).toBe(0.25);
      } finally {
        await page.request.patch(`${api}/recipes/${beets.id}`, {
          data: { headspaceInches: storedHeadspace },
          headers: { Origin: baseURL },
        });
      }
    } finally {
      const reset = await page.request.patch(api, {
        data: { unitSystem: 'us', altitudeFt: 2350, weekStartsOn: 1 },
        headers: { Origin: baseURL },
      });
      expect(reset.status()).toBe(200);
      await page.close();
    }
  }, 240_000);
});
