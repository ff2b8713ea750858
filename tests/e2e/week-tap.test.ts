import type { Locator, Page } from 'playwright-core';
import type { WeekView } from '@shared/schemas/week';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn, WIDE_DESKTOP } from '../support/browser';

const baseURL = inject('baseURL');
const { newPage } = browserForFile();

const HINT = 'Tap a meal, then tap a day to put it on. Or press and hold to drag.';
const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
const weekOf = async (page: Page, start: string): Promise<WeekView> =>
  (await page.request.get(`${baseURL}/api/households/${householdOf(page)}/week?start=${start}`)).json();
const day = (page: Page, weekday: string) => page.getByRole('region', { name: new RegExp(`^${weekday},`) });
const slot = (page: Page, weekday: string, name: string) =>
  day(page, weekday).getByRole('region', { name, exact: true });
const card = (scope: Page | Locator, title: string) => scope.locator(`article[data-entry="${title}"]`);
const heldLine = (page: Page) => page.getByTestId('held-line');

/** The planned meals of one weekday and slot, as the server has them. */
async function plannedOn(page: Page, start: string, date: string, slotName: string) {
  const week = await weekOf(page, start);
  const names = new Map(week.products.map((p) => [p.id, p.name]));
  return week.days
    .find((d) => d.date === date)!
    .entries.filter((e) => e.slot === slotName)
    .map((e) => ({ title: e.title, products: e.pairings.map((p) => names.get(p.productId)) }));
}

/**
 * Signs the keeper in on a phone and opens the week three weeks ahead: the demo plans nothing there, and the
 * drag tests (which share the household) use the week two ahead.
 */
async function openEmptyWeekOnPhone(page: Page) {
  await signIn(page, baseURL, 'keeper@larderly.test');
  await page.goto(`${baseURL}/h/${householdOf(page)}/week`);
  await page.getByRole('heading', { name: 'Meals' }).waitFor();
  for (let i = 0; i < 3; i += 1) {
    const url = page.url();
    await page.getByRole('button', { name: 'Next week' }).tap();
    await page.waitForURL((next) => next.toString() !== url);
  }
  await page.getByRole('navigation', { name: 'Day of the week' }).waitFor();
  const start = new URL(page.url()).searchParams.get('start')!;
  expect(start).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  const week = await weekOf(page, start);
  const dateOf = (weekday: string) =>
    week.days.find(
      (d) =>
        new Date(`${d.date}T12:00:00Z`).toLocaleDateString('en-US', { weekday: 'long', timeZone: 'UTC' }) === weekday,
    )!.date;
  return { start, dateOf };
}

describe('the week board by tapping, on a phone', () => {
  it('puts a meal on a slot with two taps and a jar on that meal with two more, then uses the "Put on…" menu', async () => {
    const page = await newPage(PHONE_TOUCH);
    const { start, dateOf } = await openEmptyWeekOnPhone(page);

    // The first visit says how; once dismissed it stays gone.
    await page.getByText(HINT).waitFor();

    // More than two meals show at once: the chips sit in rows down the page, not in a sideways strip.
    const meals = page.getByRole('region', { name: 'Meals' }).getByRole('button', { name: /serves \d/ });
    const fullyOnScreen = await meals.evaluateAll(
      (chips) =>
        chips.filter((chip) => {
          const box = chip.getBoundingClientRect();
          return box.width > 0 && box.left >= 0 && box.right <= window.innerWidth;
        }).length,
    );
    expect(fullyOnScreen).toBeGreaterThan(2);

    await page.getByRole('button', { name: 'Got it' }).tap();
    expect(await page.getByText(HINT).count()).toBe(0);

    // Tap one: it shows as picked, the live line says what to tap next, and Cancel puts it back.
    await page.getByLabel('Search meals').fill('lentil');
    const lentils = page.getByRole('button', { name: /^Lentil soup and bread\s/ });
    await lentils.tap();
    await expect(lentils.getAttribute('aria-pressed')).resolves.toBe('true');
    await expect(heldLine(page).getAttribute('aria-live')).resolves.toBe('polite');
    await expect(heldLine(page).textContent()).resolves.toMatch(/Lentil soup and bread is picked\. Tap a day's slot/);
    await page.getByRole('button', { name: 'Cancel', exact: true }).tap();
    await expect(lentils.getAttribute('aria-pressed')).resolves.toBe('false');
    expect(await page.getByRole('button', { name: /^Put Lentil soup and bread on / }).count()).toBe(0);

    // Two taps: the meal, then Wednesday's lunch (another day chosen in between, as a hand would).
    await lentils.tap();
    await page.getByRole('navigation', { name: 'Day of the week' }).getByRole('button', { name: /^W/ }).tap();
    await screenshot(page, 'week-tap-picked-phone');
    // As the hand sees it: the day's slots and, above the bottom navigation, what is picked and Cancel.
    await slot(page, 'Wednesday', 'Lunch').scrollIntoViewIfNeeded();
    await page.screenshot({ path: 'test-results/screenshots/week-tap-picked-phone-viewport.png' });
    await page.getByRole('button', { name: 'Put Lentil soup and bread on Wednesday lunch' }).tap();
    const planned = card(slot(page, 'Wednesday', 'Lunch'), 'Lentil soup and bread');
    await planned.getByRole('button', { name: 'Remove Lentil soup and bread from the plan' }).waitFor();
    await expect(heldLine(page).textContent()).resolves.toBe('Lentil soup and bread is on Wednesday lunch.');
    await expect(lentils.getAttribute('aria-pressed')).resolves.toBe('false');

    // Two taps: a jar from the shelf rail, then the planned meal.
    const shelf = page.getByRole('region', { name: 'On the shelf' });
    const beets = shelf.getByRole('button', { name: /^Pickled Beets\s*\d/ });
    if (!(await beets.isVisible())) await shelf.getByRole('button', { name: /^Show all \d+ products$/ }).tap();
    await beets.tap();
    await expect(heldLine(page).textContent()).resolves.toMatch(/Pickled Beets is picked\. Tap a planned meal/);
    await planned
      .getByRole('button', { name: 'Pair Pickled Beets with Lentil soup and bread on Wednesday lunch' })
      .tap();
    await planned.getByRole('button', { name: 'Unpair Pickled Beets from Lentil soup and bread' }).waitFor();
    await expect
      .poll(() => plannedOn(page, start, dateOf('Wednesday'), 'lunch'))
      .toEqual([{ title: 'Lentil soup and bread', products: ['Pickled Beets'] }]);

    // The compact line opens the editor for servings and amounts.
    await planned.getByRole('button', { name: /^Servings and amounts of Lentil soup and bread: 3 srv · 1 jar$/ }).tap();
    await planned.getByLabel('Servings of Lentil soup and bread').waitFor();
    await planned.getByLabel('Tablespoons of Pickled Beets per serving of Lentil soup and bread').waitFor();

    // The menu, by keyboard: Thursday dinner, without any drag.
    await page.getByLabel('Search meals').fill('tacos');
    const putOn = page.getByRole('button', { name: 'Put on… Black bean tacos' });
    await putOn.focus();
    await page.keyboard.press('Enter');
    const menu = page.getByRole('group', { name: 'Put Black bean tacos on…' });
    await expect(menu.getByRole('heading').evaluate((h) => h === document.activeElement)).resolves.toBe(true);
    await screenshot(page, 'week-put-on-menu-phone');
    await menu.getByRole('button', { name: 'Thursday dinner' }).focus();
    await page.keyboard.press('Enter');
    expect(await menu.count()).toBe(0);
    await expect(putOn.evaluate((b) => b === document.activeElement)).resolves.toBe(true);
    await expect
      .poll(() => plannedOn(page, start, dateOf('Thursday'), 'dinner'))
      .toEqual([{ title: 'Black bean tacos', products: ['Roasted Salsa Verde'] }]);
    await page.getByRole('navigation', { name: 'Day of the week' }).getByRole('button', { name: /^Th/ }).tap();
    await card(slot(page, 'Thursday', 'Dinner'), 'Black bean tacos').waitFor();
    await screenshot(page, 'week-tap-phone');

    await page.reload();
    await page.getByRole('heading', { name: 'Meals' }).waitFor();
    await page.getByRole('region', { name: /^\w+day, / }).waitFor();
    expect(await page.getByText(HINT).count()).toBe(0);
    await page.close();
  });
});

describe('the week board on a 1440 x 900 desktop', () => {
  it('keeps each planned meal name to a line or two instead of one word a line', async () => {
    const page = await newPage({ viewport: WIDE_DESKTOP });
    await signIn(page, baseURL, 'keeper@larderly.test');
    await page.goto(`${baseURL}/h/${householdOf(page)}/week`);
    await page.getByRole('heading', { name: 'On the shelf' }).waitFor();
    const titles = page.getByRole('region', { name: /^\w+day, \w+ \d+$/ }).locator('article[data-entry] h4');
    await titles.first().waitFor();
    const measured = await titles.evaluateAll((nodes) =>
      nodes.map((node) => {
        const lineHeight = parseFloat(getComputedStyle(node).lineHeight);
        return {
          title: node.textContent ?? '',
          lines: Math.round(node.scrollHeight / lineHeight),
          cardWidth: node.closest('article')!.getBoundingClientRect().width,
        };
      }),
    );
    expect(measured.length).toBeGreaterThan(5);
    for (const { title, lines, cardWidth } of measured) {
      const words = title.trim().split(/\s+/).length;
      // Never one word a line: a two-word name stays on one line, a longer one on at most two.
      expect({ title, lines }).toEqual({ title, lines: Math.min(lines, Math.max(1, Math.min(2, words - 1))) });
      expect(cardWidth).toBeGreaterThanOrEqual(130);
    }
    // Servings and amounts are one compact line until opened.
    await expect(
      page
        .locator('article[data-entry]')
        .first()
        .getByRole('button', { name: /^Servings and amounts of .+: \d+ srv/ })
        .count(),
    ).resolves.toBe(1);
    expect(await page.getByLabel(/^Servings of /).count()).toBe(0);
    await screenshot(page, 'week-desktop-1440');
    await page.close();
  });
});
