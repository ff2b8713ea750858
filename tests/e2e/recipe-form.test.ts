import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import type { RecipeView } from '../../shared/schemas/recipes';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';
import { signUpInBrowser } from '../support/sign-up-page';

const baseURL = inject('baseURL');
const browser = browserForFile();
const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
const write = { headers: { Origin: baseURL } };

/** A household of its own, so the recipes these tests save change no other file's demo shelf. */
async function ownKitchen(page: Page, name: string) {
  await signUpInBrowser(
    page,
    { baseURL, standInsDir: inject('standInsDir') },
    {
      name,
      email: `${name.toLowerCase()}-${Date.now()}@example.test`,
      password: 'quince paste in november',
      householdName: `${name}’s kitchen`,
    },
  );
  const hid = householdOf(page);
  const product = await (
    await page.request.post(`${baseURL}/api/households/${hid}/products`, {
      ...write,
      data: { name: 'Garden Dill Pickles', kind: 'pickle', jarSize: 'pint' },
    })
  ).json();
  return { hid, productId: product.product.id as string };
}

/** What the options of a select say and store. */
const optionsOf = (page: Page, label: string) =>
  page
    .getByLabel(label, { exact: true })
    .first()
    .locator('option')
    .evaluateAll((options) => options.map((o) => ({ value: (o as HTMLOptionElement).value, text: o.textContent })));

describe('the recipe form on a phone', () => {
  it('offers every unit and role in words, and stores the same short values', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    await page.goto(`${baseURL}/h/${householdOf(page)}/recipes/new`);
    await page.getByLabel('Unit', { exact: true }).first().waitFor();
    const units = await optionsOf(page, 'Unit');
    expect(units).toContainEqual({ value: 'fl-oz', text: 'fluid ounces' });
    expect(units).toContainEqual({ value: 'each', text: 'each (whole items)' });
    expect(units).toContainEqual({ value: 'tbsp', text: 'tablespoons' });
    const roles = await optionsOf(page, 'Role');
    expect(roles).toContainEqual({ value: 'produce', text: 'Produce (fruit, vegetables)' });
    expect(roles).toContainEqual({ value: 'acid', text: 'Acid (vinegar, lemon juice)' });
    // No unit, role or canner reads as its stored code; jar sizes read as a cook says them (a pint, a 12-ounce jar).
    for (const option of [...units, ...roles, ...(await optionsOf(page, 'Tested for'))])
      expect(option.text, option.value).not.toBe(option.value);
    const jarSizes = (await optionsOf(page, 'Jar size of the yield')).map((o) => o.text);
    expect(jarSizes).toContain('12-ounce');
    expect(jarSizes).toContain('pint-and-a-half');
    await page.getByLabel('Unit', { exact: true }).first().selectOption('fl-oz');
    expect(await page.getByLabel('Unit', { exact: true }).first().inputValue()).toBe('fl-oz');
    await screenshot(page, 'recipe-form-words-phone');
    await page.close();
  });

  it('starts a new recipe from a copy of one the household keeps, saved under its new name beside the original', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    const { hid, productId } = await ownKitchen(page, 'Linnea');
    // Our own test recipe: the copy must carry every value over, whatever the values are.
    const original = {
      productId,
      name: 'Dill spears',
      yieldJars: 6,
      yieldJarSize: 'pint',
      method: 'boiling-water',
      baseMinutes: { pint: 10, quart: 15 },
      headspaceInches: 0.5,
      acidified: true,
      acidPercent: 5,
      ph: null,
      ingredients: [
        { name: 'pickling cucumbers', amount: 4, unit: 'lb', role: 'produce' },
        { name: 'cider vinegar', amount: 24, unit: 'fl-oz', role: 'acid' },
        { name: 'dill heads', amount: 6, unit: 'each', role: 'spice' },
      ],
      steps: 'Pack the spears, pour the hot brine over them.',
      source: 'Our own card, from the household binder.',
    };
    const saved = await page.request.post(`${baseURL}/api/households/${hid}/recipes`, { ...write, data: original });
    expect(saved.status(), await saved.text()).toBe(201);
    const originalId = (await saved.json()).recipe.id as string;

    await page.goto(`${baseURL}/h/${hid}/recipes/new`);
    await page.getByLabel('Start from a copy of…').selectOption({ label: 'Dill spears' });
    expect(await page.getByLabel('Recipe name').inputValue()).toBe('Dill spears (copy)');
    expect(await page.getByRole('textbox', { name: 'Ingredient 2', exact: true }).inputValue()).toBe('cider vinegar');
    expect(await page.getByLabel('Role', { exact: true }).nth(1).inputValue()).toBe('acid');
    await page.getByLabel('Recipe name').fill('Dill spears, quart jars');
    await screenshot(page, 'recipe-form-copy-phone');
    await page.getByRole('button', { name: 'Add the recipe' }).tap();
    await page.waitForURL(/\/recipes\/[0-9a-f-]{36}$/);
    const copyId = /\/recipes\/([0-9a-f-]{36})$/.exec(page.url())![1];
    expect(copyId).not.toBe(originalId);

    const recipes: RecipeView[] = (await (await page.request.get(`${baseURL}/api/households/${hid}/recipes`)).json())
      .recipes;
    const copy = recipes.find((r) => r.id === copyId)!;
    const kept = recipes.find((r) => r.id === originalId)!;
    expect(recipes).toHaveLength(2);
    expect(kept.name).toBe('Dill spears');
    expect(copy.name).toBe('Dill spears, quart jars');
    const { name: _name, ...sameValues } = original;
    expect(copy).toMatchObject(sameValues);
    expect(copy.ingredients).toEqual(kept.ingredients);
    await page.close();
  });

  it('moves the focus to the first field in error after a refused save, scrolled into view', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    // The demo household: a refused save changes nothing of it.
    await signIn(page, baseURL, 'cook@larderly.test');
    await page.goto(`${baseURL}/h/${householdOf(page)}/recipes/new`);
    await page.getByLabel('Recipe name').waitFor();
    await page.getByLabel('Recipe name').fill('Bread and butter pickles');
    await page.getByRole('textbox', { name: 'Ingredient 1', exact: true }).fill('cucumbers');
    // No tested minutes for any jar size and no amount: the minutes come first on the form.
    await page.getByRole('button', { name: 'Add the recipe' }).tap();
    await page.getByText('Check the 2 marked fields.').waitFor();
    await expect
      .poll(() =>
        page.evaluate(
          () =>
            document.activeElement?.id &&
            document.querySelector(`label[for="${document.activeElement.id}"]`)?.textContent,
        ),
      )
      .toBe('quarter-pint');
    const inView = await page.evaluate(() => {
      const box = document.activeElement!.getBoundingClientRect();
      return box.top >= 0 && box.bottom <= window.innerHeight;
    });
    expect(inView).toBe(true);
    await screenshot(page, 'recipe-form-first-error-phone');

    await page.getByLabel('pint', { exact: true }).fill('10');
    await page.getByRole('button', { name: 'Add the recipe' }).tap();
    await expect
      .poll(() =>
        page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.getAttribute('aria-invalid')),
      )
      .toBe('true');
    expect(
      await page.evaluate(() => document.querySelector(`label[for="${document.activeElement!.id}"]`)?.textContent),
    ).toBe('Amount');
    await page.close();
  });
});
