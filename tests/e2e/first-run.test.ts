import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import type { TodoView } from '../../shared/schemas/todos';
import { browserForFile, PHONE, screenshot, signIn } from '../support/browser';
import { signUpInBrowser } from '../support/sign-up-page';

const baseURL = inject('baseURL');
const browser = browserForFile();
const phone = { viewport: PHONE, isMobile: true, hasTouch: true } as const;
const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
const write = { headers: { Origin: baseURL } };

const signUp = (page: Page, name: string) =>
  signUpInBrowser(
    page,
    { baseURL, standInsDir: inject('standInsDir') },
    {
      name,
      email: `${name.toLowerCase().replace(/\W/g, '-')}-${Date.now()}@example.test`,
      password: 'a shelf of apricot jam',
      householdName: `${name}’s kitchen`,
    },
  );

describe('first run: the questions the canning numbers depend on', () => {
  it('asks a new household its altitude, time zone, canner and week start, shows no plan until then, and stores UTC as UTC', async () => {
    const page = await browser.newPage({ ...phone, timezoneId: 'America/Denver' });
    await signUp(page, 'Marguerite');
    const hid = householdOf(page);
    await page.getByRole('heading', { name: 'Before the first plan' }).waitFor();
    // The zone comes from the browser, for the keeper to confirm.
    expect(await page.getByLabel('Time zone').inputValue()).toBe('America/Denver');
    expect(await page.getByLabel(/Altitude of your kitchen/).inputValue()).toBe('');
    await page.getByText('How do I find my altitude?').click();
    await screenshot(page, 'first-run-setup-phone');

    // Before answering, the batch form shows the question, not a sea-level plan.
    await page.goto(`${baseURL}/h/${hid}/batches/new`);
    await page.getByText('First, your altitude').waitFor();
    expect(await page.getByText(/Processing plan at/).count()).toBe(0);
    expect(await page.getByLabel('What did you make?').count()).toBe(0);
    await screenshot(page, 'first-run-batch-form-gated-phone');
    await page.getByRole('link', { name: 'Confirm the altitude' }).click();
    await page.waitForURL(/\/setup\?back=/);

    // Confirming with no altitude moves focus to the altitude field and its message.
    await page.getByRole('button', { name: 'Confirm and continue' }).click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-invalid'))).toBe('true');
    await page.getByLabel(/Altitude of your kitchen/).fill('5,200');
    await page.getByLabel('Time zone').selectOption('UTC');
    await page.getByLabel('The canner you use most').selectOption('atmospheric-steam');
    await page.getByLabel('Jars it holds in one load').fill('8');
    await page.getByLabel('First day of your week').selectOption({ label: 'Sunday' });
    await page.getByRole('button', { name: 'Confirm and continue' }).click();
    await page.waitForURL(new RegExp(`/h/${hid}/batches/new$`));
    // The altitude question is answered; a household with no product yet is sent on to add its first.
    await page.getByText('Start with your first product').waitFor();
    expect(await page.getByText('First, your altitude').count()).toBe(0);

    const household = (await (await page.request.get(`${baseURL}/api/households/${hid}`)).json()).household;
    expect(household).toMatchObject({
      altitudeFt: 5200,
      altitudeConfirmed: true,
      timeZone: 'UTC',
      defaultMethod: 'atmospheric-steam',
      cannerCapacityJars: 8,
      weekStartsOn: 0,
    });
    // The settings form shows UTC as UTC, and saving keeps it (it used to fall to the first zone in the list).
    await page.goto(`${baseURL}/h/${hid}/household`);
    expect(await page.getByLabel('Time zone').inputValue()).toBe('UTC');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByText('Saved.').waitFor();
    expect((await (await page.request.get(`${baseURL}/api/households/${hid}`)).json()).household.timeZone).toBe('UTC');
    await page.close();
  });

  it('a household without a confirmed altitude sees the question on a recipe card instead of its scaled plan', async () => {
    const page = await browser.newPage(phone);
    await signUp(page, 'Tobias');
    const hid = householdOf(page);
    const product = await (
      await page.request.post(`${baseURL}/api/households/${hid}/products`, {
        ...write,
        data: { name: 'Ridge Pepper Jelly', kind: 'jelly', jarSize: 'half-pint' },
      })
    ).json();
    const recipe = await page.request.post(`${baseURL}/api/households/${hid}/recipes`, {
      ...write,
      // Our own test recipe; only its shape matters here, no number from it is checked.
      data: {
        productId: product.product.id,
        name: 'Pepper jelly',
        yieldJars: 6,
        yieldJarSize: 'half-pint',
        method: 'boiling-water',
        baseMinutes: { 'half-pint': 10 },
        headspaceInches: 0.25,
        acidified: true,
        acidPercent: 5,
        ph: null,
        ingredients: [{ name: 'sweet peppers', amount: 2, unit: 'cup', role: 'produce' }],
      },
    });
    expect(recipe.status(), await recipe.text()).toBe(201);
    await page.goto(`${baseURL}/h/${hid}/recipes/${(await recipe.json()).recipe.id}`);
    await page.getByText('First, your altitude').waitFor();
    await page.getByText('Your altitude is not confirmed yet').waitFor();
    expect(await page.getByText(/jars: .* minutes/).count()).toBe(0);
    await screenshot(page, 'first-run-recipe-card-gated-phone');
    await page.close();
  });
});

describe('a restock to-do’s batch plan on canning day', () => {
  it('shows the minutes for the altitude as it is now, and says what changed since it was planned', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, baseURL, 'keeper@larderly.test');
    const hid = householdOf(page);
    const todos: TodoView[] = (await (await page.request.get(`${baseURL}/api/households/${hid}/todos`)).json()).todos;
    const restock = todos.find((t) => t.kind === 'restock')!;
    const planned = restock.batchPlan!;
    expect(planned.altitudeFt).toBe(2350);
    try {
      await page.goto(`${baseURL}/h/${hid}/household`);
      await page.getByLabel('Altitude (feet above sea level)').fill('5200');
      await page.getByRole('button', { name: 'Save settings' }).click();
      await page.getByText('Saved.').waitFor();

      await page.goto(`${baseURL}/h/${hid}/todo?open=${restock.id}`);
      const dialog = page.getByRole('dialog');
      // USDA Complete Guide (2015), Guide 1: boiling water +5 min at 1,001-3,000 ft, +10 min at 3,001-6,000 ft.
      const now = planned.processing.minutes! + 5;
      await dialog.getByText(`${now} minutes in a boiling-water canner at 5,200 ft`).waitFor();
      await dialog.getByText(/Updated since it was planned on/).waitFor();
      await dialog.getByText(/altitude is now 5,200 ft \(it was 2,350 ft/).waitFor();
      await dialog
        .getByText(`Processing is now ${now} minutes (it was ${planned.processing.minutes} minutes).`)
        .waitFor();
      expect(await dialog.getByText(`at 2,350 ft`).count()).toBe(0);
      await screenshot(page, 'restock-plan-after-altitude-change-phone');
    } finally {
      await page.request.patch(`${baseURL}/api/households/${hid}`, { ...write, data: { altitudeFt: 2350 } });
    }
    await page.close();
  });
});

describe('first run without dead ends', () => {
  it('Today, New recipe and Record a batch each point a household with no product to adding its first', async () => {
    const page = await browser.newPage(phone);
    await signUp(page, 'Henrike');
    const hid = householdOf(page);
    expect(
      (await page.request.patch(`${baseURL}/api/households/${hid}`, { ...write, data: { altitudeFt: 800 } })).status(),
    ).toBe(200);
    for (const [path, name] of [
      ['', 'today'],
      ['/recipes/new', 'recipe'],
      ['/batches/new', 'batch'],
    ] as const) {
      await page.goto(`${baseURL}/h/${hid}${path}`);
      await page.getByText('Start with your first product').waitFor();
      await screenshot(page, `first-run-no-product-${name}-phone`);
    }
    await page.getByRole('link', { name: 'Add a product' }).tap();
    await page.waitForURL(new RegExp(`/h/${hid}/products/new$`));
    await page.close();
  });
});
