import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

/** The week two weeks ahead: nothing planned there by the demo, and every day is still to come. */
async function openEmptyWeek(page: Page) {
  await signIn(page, baseURL, 'cook@larderly.test');
  await page.getByRole('navigation', { name: 'Screens' }).first().getByRole('link', { name: 'Week' }).click();
  await page.getByRole('heading', { name: 'Meals' }).waitFor();
  for (let i = 0; i < 2; i += 1) {
    const url = page.url();
    await page.getByRole('button', { name: 'Next week' }).click();
    await page.waitForURL((next) => next.toString() !== url);
  }
  await page.getByRole('region', { name: /^Wednesday/ }).waitFor();
}

const day = (page: Page, weekday: string) => page.getByRole('region', { name: new RegExp(`^${weekday},`) });
const slot = (page: Page, weekday: string, name: string) =>
  day(page, weekday).getByRole('region', { name, exact: true });
const card = (scope: Page | Locator, title: string) => scope.locator(`article[data-entry="${title}"]`);
const liveRegion = (page: Page) => page.locator('[id^="DndLiveRegion"]');

async function addMeal(page: Page, name: string) {
  await page.getByLabel('New meal name').fill(name);
  await page.getByRole('button', { name: 'Add', exact: true }).click();
  await page.getByRole('button', { name: new RegExp(`^${name}\\s*serves`) }).waitFor();
}

const toMiddle = (element: Locator) => element.evaluate((node) => node.scrollIntoView({ block: 'center' }));

/** Presses a mouse button on one element and lets go over another, moving in steps as a hand would. */
async function mouseDrag(page: Page, from: Locator, to: Locator) {
  await toMiddle(from);
  const start = (await from.boundingBox())!;
  await page.mouse.move(start.x + start.width / 2, start.y + start.height / 2);
  await page.mouse.down();
  await page.mouse.move(start.x + start.width / 2 + 12, start.y + start.height / 2 + 12, { steps: 4 });
  // In the middle of the window, away from the edges where the board scrolls by itself.
  await toMiddle(to);
  const end = (await to.boundingBox())!;
  await page.mouse.move(end.x + end.width / 2, end.y + Math.min(end.height / 2, 30), { steps: 12 });
  await page.mouse.up();
}

/** Presses arrow keys until the screen-reader announcement says the item is over the place wanted. */
async function keyTo(page: Page, key: string, over: RegExp) {
  for (let i = 0; i < 12; i += 1) {
    const before = (await liveRegion(page).textContent()) ?? '';
    await page.keyboard.press(key);
    // The announcement follows the move a moment later; a key that cannot move further changes nothing.
    let now = before;
    for (let wait = 0; wait < 20 && now === before; wait += 1) {
      await page.waitForTimeout(50);
      now = (await liveRegion(page).textContent()) ?? '';
    }
    if (over.test(now)) return;
  }
  throw new Error(`never announced ${over}; last: ${await liveRegion(page).textContent()}`);
}

async function expectPlannedOnThursday(page: Page, title: string, product: string) {
  await page.reload();
  const planned = card(slot(page, 'Thursday', 'Lunch'), title);
  await planned.waitFor();
  expect(await card(day(page, 'Wednesday'), title).count()).toBe(0);
  const pairing = planned.locator(`li[data-pairing="${product}"]`);
  await pairing.waitFor();
  // The allocation line names the jar the portion comes from (opens or draws from jar <code>).
  await expect(pairing.getByTestId('allocation-line').textContent()).resolves.toMatch(/^(opens|from) jar [A-Z0-9]{4,}/);
}

describe('the week board', () => {
  it('shows the demo week full on desktop and on a phone', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'cook@larderly.test');
    await page.goto(page.url().replace(/\/h\/([0-9a-f-]{36}).*/, '/h/$1/week'));
    await page.getByRole('heading', { name: 'On the shelf' }).waitFor();
    await page
      .getByText(/^Open (a new jar|\d+ new jars) of/)
      .first()
      .waitFor();
    await page.getByRole('note').first().waitFor();
    await screenshot(page, 'week-desktop');
    const url = page.url();
    await page.close();

    const phone = await browser.newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await signIn(phone, baseURL, 'cook@larderly.test');
    await phone.goto(url);
    await phone.getByRole('navigation', { name: 'Day of the week' }).waitFor();
    // One day at a time: the picker chooses it.
    expect(await phone.getByRole('region', { name: /^\w+day, \w+ \d/ }).count()).toBe(1);
    await screenshot(phone, 'week-phone');
    await phone.close();
  });

  it('drags with the mouse: a meal onto Wednesday lunch, a product onto it, the entry to Thursday; a reload keeps it all', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await openEmptyWeek(page);
    await addMeal(page, 'Harvest hash');

    await mouseDrag(
      page,
      page.getByRole('button', { name: /^Harvest hash\s*serves/ }),
      slot(page, 'Wednesday', 'Lunch'),
    );
    const planned = card(slot(page, 'Wednesday', 'Lunch'), 'Harvest hash');
    await planned.getByRole('button', { name: 'Remove Harvest hash from the plan' }).waitFor();

    await mouseDrag(page, page.getByRole('button', { name: /^Pickled Beets\s*\d/ }), planned);
    await planned.getByRole('button', { name: 'Unpair Pickled Beets from Harvest hash' }).waitFor();

    await mouseDrag(
      page,
      planned.getByRole('button', { name: 'Move Harvest hash', exact: true }),
      slot(page, 'Thursday', 'Lunch'),
    );
    await card(slot(page, 'Thursday', 'Lunch'), 'Harvest hash')
      .getByRole('button', { name: 'Remove Harvest hash from the plan' })
      .waitFor();
    await expectPlannedOnThursday(page, 'Harvest hash', 'Pickled Beets');
    await screenshot(page, 'week-mouse-drag');
    await page.close();
  });

  it('drags with the keyboard, announcing each place: the same three moves, kept after a reload', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await openEmptyWeek(page);
    await addMeal(page, 'Corn fritters');

    await page.getByRole('button', { name: /^Corn fritters\s*serves/ }).focus();
    await page.keyboard.press('Space');
    await expect(liveRegion(page).textContent()).resolves.toMatch(/Picked up Corn fritters/);
    await keyTo(page, 'ArrowRight', /over Wednesday breakfast/);
    await keyTo(page, 'ArrowDown', /over Wednesday lunch/);
    await page.keyboard.press('Space');
    const planned = card(slot(page, 'Wednesday', 'Lunch'), 'Corn fritters');
    await planned.getByRole('button', { name: 'Remove Corn fritters from the plan' }).waitFor();

    await page.getByRole('button', { name: /^Green Tomato Chutney\s*\d/ }).focus();
    await page.keyboard.press('Space');
    await keyTo(page, 'ArrowRight', /over Corn fritters on Wednesday lunch/);
    await page.keyboard.press('Space');
    await planned.getByRole('button', { name: 'Unpair Green Tomato Chutney from Corn fritters' }).waitFor();

    await planned.getByRole('button', { name: 'Move Corn fritters', exact: true }).focus();
    await page.keyboard.press('Space');
    await keyTo(page, 'ArrowRight', /over Thursday lunch/);
    await page.keyboard.press('Space');
    await expect(liveRegion(page).textContent()).resolves.toMatch(/Corn fritters was dropped on Thursday lunch/);
    await card(slot(page, 'Thursday', 'Lunch'), 'Corn fritters')
      .getByRole('button', { name: 'Remove Corn fritters from the plan' })
      .waitFor();
    await expectPlannedOnThursday(page, 'Corn fritters', 'Green Tomato Chutney');
    await page.close();
  });

  it('shows a helper the plan without anything to drag', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'helper@larderly.test');
    await page.goto(page.url().replace(/\/h\/([0-9a-f-]{36}).*/, '/h/$1/week'));
    await page.getByText('You can see the plan; cooks and keepers change it.').waitFor();
    expect(await page.getByRole('button', { name: /^Move / }).count()).toBe(0);
    await page.close();
  });
});
