import type { BrowserContext, Locator, Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';
import { signUpInBrowser } from '../support/sign-up-page';

const baseURL = inject('baseURL');
const browser = browserForFile();
const write = { headers: { Origin: baseURL } };
const NARROW_PHONE = { viewport: { width: 320, height: 640 }, isMobile: true, hasTouch: true };

const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
const getJson = async (page: Page, path: string) => (await page.request.get(`${baseURL}/api${path}`)).json();
const weekdayOf = (date: string) =>
  new Date(`${date}T12:00:00Z`).toLocaleDateString('en-US', { weekday: 'long', timeZone: 'UTC' });

interface WeekEntry {
  id: string;
  date: string;
  slot: string;
  title: string;
  pairings: { id: string; productId: string; flags: { label: string; reason: string }[] }[];
}
interface WeekAnswer {
  today: string;
  days: { date: string; entries: WeekEntry[] }[];
  allocation: { warnings: { kind: string; productId: string; jarId?: string; date: string }[] };
  jars: Record<string, { code: string }>;
  products: { id: string; name: string }[];
}

async function showDay(page: Page, date: string) {
  await page
    .getByRole('navigation', { name: 'Day of the week' })
    .getByRole('button', { name: new RegExp(`^${weekdayOf(date)}`) })
    .tap();
  await page
    .getByRole('region', { name: new RegExp(weekdayOf(date)) })
    .first()
    .waitFor();
}

async function signUp(page: Page, name: string) {
  await signUpInBrowser(
    page,
    { baseURL, standInsDir: inject('standInsDir') },
    {
      name,
      email: `${name.toLowerCase()}-${Date.now()}@example.test`,
      password: 'a shelf of apricot jam',
      householdName: `${name}’s kitchen`,
    },
  );
}

describe('flag reasons on a phone', () => {
  it('opens a pairing flag’s reason with a tap, inline, and says so to a screen reader', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    const week: WeekAnswer = await getJson(page, `/households/${hid}/week`);
    const flagged = week.days.flatMap((day) =>
      day.entries.flatMap((entry) => entry.pairings.flatMap((p) => p.flags.map((flag) => ({ date: day.date, flag })))),
    )[0];
    expect(flagged, 'the demo week has a flagged pairing').toBeDefined();
    await page.goto(`${baseURL}/h/${hid}/week`);
    await showDay(page, flagged.date);

    const toggle = page.getByRole('button', { name: flagged.flag.label }).first();
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('false');
    expect(await toggle.getAttribute('title')).toBeNull();
    const reason = page.locator(`[id="${await toggle.getAttribute('aria-controls')}"]`);
    await expect(reason.isVisible()).resolves.toBe(false);
    // The reason is the button's description even before it is opened.
    await expect(page.locator(`[id="${await toggle.getAttribute('aria-describedby')}"]`).textContent()).resolves.toBe(
      flagged.flag.reason,
    );

    await toggle.tap();
    await expect(toggle.getAttribute('aria-expanded')).resolves.toBe('true');
    await reason.waitFor({ state: 'visible' });
    await expect(reason.textContent()).resolves.toBe(flagged.flag.reason);
    await screenshot(page, 'surfaces-flag-reason-phone');
    await toggle.tap();
    await reason.waitFor({ state: 'hidden' });
    await page.close();
  });
});

describe('a fridge jar that would turn with food left', () => {
  it('offers “Plan it on a meal”, not a restock, and a tap pairs it with the next planned meal before its use-by', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    const week: WeekAnswer = await getJson(page, `/households/${hid}/week`);
    const wastes = week.allocation.warnings.filter((w) => w.kind === 'will-expire' && w.date >= week.today);
    expect(wastes.length, 'the demo week has jars that pass their use-by with food left').toBeGreaterThan(0);
    // Not every such jar has a meal it suits before its use-by; the first that has one is offered it.
    let offered: { waste: (typeof wastes)[number]; planIt: Locator } | null = null;
    for (const waste of wastes) {
      const name = week.products.find((p) => p.id === waste.productId)!.name;
      const code = week.jars[waste.jarId!]!.code;
      // The Fridge's link opens the week at the day the jar's use-by comes.
      await page.goto(`${baseURL}/h/${hid}/fridge`);
      await page.getByRole('link', { name: `Plan it on a meal: jar ${code} of ${name}` }).tap();
      await page.waitForURL(new RegExp(`/week\\?start=${waste.date}&day=${waste.date}$`));
      await expect(
        page.getByRole('button', { name: new RegExp(`^${weekdayOf(waste.date)}`) }).getAttribute('aria-pressed'),
      ).resolves.toBe('true');
      const note = page.getByRole('note').filter({ hasText: `Jar ${code} of ${name} passes its use-by` });
      await note.waitFor();
      expect(
        await note.getByRole('button', { name: /restock/i }).count(),
        'a jar that would turn is not a restock',
      ).toBe(0);
      const planIt = note.getByRole('button', { name: new RegExp(`^Plan it on a meal: jar ${code} of ${name}, on `) });
      if ((await planIt.count()) === 1) {
        offered = { waste, planIt };
        break;
      }
    }
    expect(offered, 'a jar that would turn is offered a meal').not.toBeNull();
    const { waste, planIt } = offered!;
    const pairedBefore = new Set(
      week.days.flatMap((d) =>
        d.entries.flatMap((e) => e.pairings.filter((p) => p.productId === waste.productId).map((p) => p.id)),
      ),
    );
    const label = String(await planIt.getAttribute('aria-label'));
    await screenshot(page, 'surfaces-plan-it-on-a-meal-phone');
    await planIt.tap();

    const newPairing = async () => {
      const after: WeekAnswer = await getJson(page, `/households/${hid}/week`);
      for (const day of after.days) {
        for (const entry of day.entries) {
          const pairing = entry.pairings.find((p) => p.productId === waste.productId && !pairedBefore.has(p.id));
          if (pairing) return { pairing, date: day.date, title: entry.title };
        }
      }
      return null;
    };
    await expect.poll(newPairing).not.toBeNull();
    const placed = (await newPairing())!;
    expect(
      placed.date >= week.today && placed.date <= waste.date,
      `paired on ${placed.date}, between today and the use-by ${waste.date}`,
    ).toBe(true);
    expect(label, 'the button named the meal it went on').toContain(placed.title);
    await page.request.delete(`${baseURL}/api/households/${hid}/pairings/${placed.pairing.id}`, write);
    await page.close();
  });

  it('shows a restock refusal beside the button pressed, with the server’s link to what to do first', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signUp(page, 'Marit');
    const hid = householdOf(page);
    expect(
      (await page.request.patch(`${baseURL}/api/households/${hid}`, { ...write, data: { altitudeFt: 900 } })).status(),
    ).toBe(200);
    const product = (
      await (
        await page.request.post(`${baseURL}/api/households/${hid}/products`, {
          ...write,
          data: { name: 'Quince Paste', kind: 'fruit-butter', jarSize: 'half-pint' },
        })
      ).json()
    ).product;
    const { today } = await getJson(page, `/households/${hid}/week`);
    const entry = await (
      await page.request.post(`${baseURL}/api/households/${hid}/plan-entries`, {
        ...write,
        data: { date: today, slot: 'dinner', title: 'Cheese board', servings: 2 },
      })
    ).json();
    expect(
      (
        await page.request.post(`${baseURL}/api/households/${hid}/plan-entries/${entry.id}/pairings`, {
          ...write,
          data: { productId: product.id },
        })
      ).status(),
    ).toBe(201);

    await page.goto(`${baseURL}/h/${hid}/week`);
    const note = page.getByRole('note').filter({ hasText: 'Not enough Quince Paste on the shelf' });
    await note.getByRole('button', { name: 'Add a restock to-do for Quince Paste' }).tap();
    const refusal = note.getByRole('alert');
    await refusal.getByText(/Quince Paste has no recipe yet/).waitFor();
    await expect(refusal.getByRole('link', { name: 'Add a recipe' }).getAttribute('href')).resolves.toBe(
      `/h/${hid}/recipes/new?productId=${product.id}`,
    );
    expect(await page.getByText('That change was not saved').count()).toBe(0);
    await screenshot(page, 'surfaces-restock-refusal-phone');
    await page.close();
  });
});

describe('nothing scrolls sideways on a 320 px phone', () => {
  it('keeps every main screen within 320 px, the Shelf with a long product name too', async () => {
    const page = await browser.newPage(NARROW_PHONE);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    const products: { id: string; name: string }[] = (await getJson(page, `/households/${hid}/products`)).products;
    const relish = products.find((p) => p.name === 'Sweet Corn Relish')!;
    const longName = 'Grandmother Adelheid’s Extra-Chunky Sweet Corn and Roasted Red Pepper Relish';
    expect(
      (
        await page.request.patch(`${baseURL}/api/households/${hid}/products/${relish.id}`, {
          ...write,
          data: { name: longName },
        })
      ).status(),
    ).toBe(200);
    try {
      const batch = (await getJson(page, `/households/${hid}/batches`)).batches[0];
      const recipe = (await getJson(page, `/households/${hid}/recipes`)).recipes[0];
      const jar = (await getJson(page, `/households/${hid}/fridge`)).jars[0];
      const screens: [string, string, string][] = [
        ['Today', `/h/${hid}`, 'My to-dos'],
        ['Week', `/h/${hid}/week`, 'On the shelf'],
        ['Shelf', `/h/${hid}/shelf`, longName],
        ['Fridge', `/h/${hid}/fridge`, 'Fridge'],
        ['To-do', `/h/${hid}/todo`, 'To-do'],
        ['Household', `/h/${hid}/household`, 'Household'],
        ['a batch', `/h/${hid}/batches/${batch.id}`, batch.productName],
        ['a jar', `/j/${jar.code}`, jar.productName],
        ['a recipe', `/h/${hid}/recipes/${recipe.id}`, recipe.name],
      ];
      for (const [screen, address, heading] of screens) {
        await page.goto(`${baseURL}${address}`);
        await page.getByRole('heading', { name: heading }).first().waitFor();
        await page.waitForLoadState('networkidle');
        expect(
          await page.evaluate(() => document.documentElement.scrollWidth),
          `${screen} at 320 px`,
        ).toBeLessThanOrEqual(320);
        if (screen === 'Shelf') {
          const card = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: longName }) });
          const count = card.getByText('sealed', { exact: true });
          const box = (await count.boundingBox())!;
          expect(box.x + box.width, 'the jar count is in view').toBeLessThanOrEqual(320);
          await screenshot(page, 'surfaces-shelf-320');
        }
      }
    } finally {
      await page.request.patch(`${baseURL}/api/households/${hid}/products/${relish.id}`, {
        ...write,
        data: { name: relish.name },
      });
    }
    await page.close();
  });
});

describe('Today on a phone', () => {
  it('links the jar codes, opens a new jar in place with Undo, and ticks my to-do', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    await page.getByRole('region', { name: 'Open and use today' }).waitFor();
    const today = await getJson(page, `/households/${hid}/today`);
    const opening = today.use.find((u: { opensToday: boolean }) => u.opensToday);
    expect(opening, 'the demo plan opens a new jar today').toBeDefined();
    const section = page.getByRole('region', { name: 'Open and use today' });
    await expect(
      section
        .getByRole('link', { name: `jar ${opening.jarCode}` })
        .first()
        .getAttribute('href'),
    ).resolves.toBe(`/j/${opening.jarCode}`);
    const fridgeJar = today.fridge[0];
    await expect(
      page
        .getByRole('region', { name: 'In the fridge' })
        .getByRole('link', { name: `Jar ${fridgeJar.code}` })
        .getAttribute('href'),
    ).resolves.toBe(`/j/${fridgeJar.code}`);

    await section.getByRole('button', { name: `Open it: jar ${opening.jarCode} of ${opening.productName}` }).tap();
    const toast = page.getByTestId('undo-toast');
    await toast.getByText(`Opened jar ${opening.jarCode} of ${opening.productName}.`, { exact: false }).waitFor();
    const jarState = async () => (await getJson(page, `/households/${hid}/jars/by-code/${opening.jarCode}`)).jar?.state;
    await expect.poll(jarState).toBe('opened');
    await screenshot(page, 'surfaces-today-opened-phone');
    await toast.getByRole('button', { name: 'Undo' }).tap();
    await expect.poll(jarState).toBe('sealed');

    const todo = today.myTodos[0];
    await page.getByRole('checkbox', { name: `Done: ${todo.title}` }).tap();
    const todoDone = async () =>
      (await getJson(page, `/households/${hid}/todos?filter=all`)).todos.find((t: { id: string }) => t.id === todo.id)
        ?.done;
    await expect.poll(todoDone).toBe(true);
    await page.request.patch(`${baseURL}/api/households/${hid}/todos/${todo.id}`, { ...write, data: { done: false } });
    await page.close();
  });

  it('says to use the opened jar first when its use-by is a day or two off, instead of opening a new one', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = householdOf(page);
    const fridge = (await getJson(page, `/households/${hid}/fridge`)).jars as {
      code: string;
      productId: string;
      productName: string;
      daysLeft: number;
      remainingTbsp: number;
    }[];
    const soon = fridge.find((j) => j.daysLeft >= 1 && j.daysLeft <= 2 && j.remainingTbsp >= 2)!;
    expect(soon, 'the demo fridge has a jar with a day or two left').toBeDefined();
    const { today } = await getJson(page, `/households/${hid}/today`);
    const entry = await (
      await page.request.post(`${baseURL}/api/households/${hid}/plan-entries`, {
        ...write,
        data: { date: today, slot: 'snack', title: 'Crackers', servings: 1 },
      })
    ).json();
    try {
      await page.request.post(`${baseURL}/api/households/${hid}/plan-entries/${entry.id}/pairings`, {
        ...write,
        data: { productId: soon.productId },
      });
      await page.reload();
      const line = page
        .getByRole('region', { name: 'Open and use today' })
        .getByRole('listitem')
        .filter({ hasText: `Crackers: 1 tbsp ${soon.productName}` });
      await line
        .getByText(
          `use the opened jar first: jar ${soon.code} (${soon.daysLeft} day${soon.daysLeft === 1 ? '' : 's'} left)`,
        )
        .waitFor();
      expect(await page.getByRole('button', { name: new RegExp(`^Open it: .* of ${soon.productName}$`) }).count()).toBe(
        0,
      );
      await screenshot(page, 'surfaces-today-use-opened-first-phone');
    } finally {
      await page.request.delete(`${baseURL}/api/households/${hid}/plan-entries/${entry.id}`, write);
    }
    await page.close();
  });
});

/** Makes this page's push subscription fail the way Chromium does when the site may not notify. */
function refusePushSubscription() {
  PushManager.prototype.subscribe = async () => {
    throw new DOMException('Registration failed - permission denied', 'NotAllowedError');
  };
  PushManager.prototype.getSubscription = async () => null;
}

async function pushContext(refuse: boolean): Promise<{ context: BrowserContext; page: Page; hid: string }> {
  const page = await browser.newPage(PHONE_TOUCH);
  const context = page.context();
  await context.grantPermissions(['notifications'], { origin: baseURL });
  if (refuse) await context.addInitScript(refusePushSubscription);
  await signIn(page, baseURL, 'helper@larderly.test');
  return { context, page, hid: householdOf(page) };
}

describe('push on this device, said in what to do', () => {
  it('turns a refused subscription into how to allow notifications, never the browser’s words', async () => {
    const { page, hid } = await pushContext(true);
    await page.goto(`${baseURL}/h/${hid}/household`);
    await page.getByRole('button', { name: 'Turn on notifications' }).tap();
    const alert = page.getByRole('alert').filter({ hasText: 'Notifications are blocked' });
    await alert.waitFor();
    await expect(alert.textContent()).resolves.toMatch(/set Notifications to Allow/);
    expect(await page.getByText('Registration failed').count()).toBe(0);
    await screenshot(page, 'surfaces-push-blocked-phone');
    await page.close();
  });

  it('names the browsers that can, where this one has no push', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await page.context().addInitScript(() => {
      delete (window as { PushManager?: unknown }).PushManager;
    });
    await signIn(page, baseURL, 'helper@larderly.test');
    await page.goto(`${baseURL}/h/${householdOf(page)}/household`);
    await page.getByText(/This browser cannot receive push notifications/).waitFor();
    await page.getByText(/Safari 16\.4 or later on an iPhone or iPad/).waitFor();
    await page.close();
  });

  it('offers a reminder before the use-by on the Fridge and on an opened jar’s page, and a refusal shows beside it', async () => {
    const { page, hid } = await pushContext(true);
    await page.goto(`${baseURL}/h/${hid}/fridge`);
    const offer = page.getByRole('region', { name: 'Reminders on this device' });
    await offer.getByText('Get a reminder on this device before a jar’s use-by.').waitFor();
    await screenshot(page, 'surfaces-fridge-reminder-offer-phone');
    await offer.getByRole('button', { name: 'Get a reminder' }).tap();
    await offer
      .getByRole('alert')
      .getByText(/Notifications are blocked for Larderly/)
      .waitFor();

    const jar = (await getJson(page, `/households/${hid}/fridge`)).jars[0];
    await page.goto(`${baseURL}/j/${jar.code}`);
    await page
      .getByRole('region', { name: 'Reminders on this device' })
      .getByText(/Get a reminder on this device before this jar’s use-by/)
      .waitFor();
    await screenshot(page, 'surfaces-jar-reminder-offer-phone');
    await page.close();
  });
});
