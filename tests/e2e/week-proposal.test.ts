import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();
const DESKTOP_WIDE = { width: 1440, height: 900 };
const tbspOf = (text: string | null) => Number(/([\d.]+) tbsp past/.exec(text ?? '')?.[1] ?? NaN);

/**
 * The demo week with its lunches open and the fridge's chutney turning in it (in three days): this one, or the next
 * when this one has fewer than four days left.
 */
async function openDemoWeek(page: Page) {
  await signIn(page, baseURL, 'cook@larderly.test');
  await page.getByRole('navigation', { name: 'Screens' }).first().getByRole('link', { name: 'Week' }).click();
  await page.getByRole('heading', { name: 'Plan from the shelf' }).waitFor();
  const daysLeft = await page.getByLabel('Propose meals for').locator('option[value^="day:"]').count();
  if (daysLeft < 4) {
    const url = page.url();
    await page.getByRole('button', { name: 'Next week' }).click();
    await page.waitForURL((next) => next.toString() !== url);
    await page.getByRole('heading', { name: 'Plan from the shelf' }).waitFor();
  }
  await expect.poll(() => page.getByTestId('week-waste').textContent()).toMatch(/tbsp past/);
}

async function acceptTwoChutneyLunches(page: Page, name: string) {
  await openDemoWeek(page);
  const before = tbspOf(await page.getByTestId('week-waste').textContent());
  await page.getByLabel('Propose meals for').selectOption('slot:lunch');
  await page.getByRole('button', { name: 'Propose meals' }).click();
  const proposed = page.getByRole('list', { name: 'Proposed meals' }).locator(':scope > li');
  await proposed.first().waitFor();
  await expect(proposed.first().textContent()).resolves.toMatch(/lunch/);
  await expect(page.getByRole('list', { name: 'Proposed meals' }).textContent()).resolves.toMatch(
    /Uses the Green Tomato Chutney opened on [\w, ]+ before \w+/,
  );

  // Keep two that draw on the chutney, and leave the rest unticked.
  const rows = await proposed.all();
  const kept: { place: string; title: string; code: string }[] = [];
  for (const row of rows) {
    const text = (await row.textContent()) ?? '';
    const code = /Green Tomato Chutney: [\d.]+ tbsp (?:from|opens) jar (\w+)/.exec(text)?.[1];
    if (code && kept.length < 2) {
      const [place, title] = (await row.getAttribute('data-proposed'))!.split(': ');
      kept.push({ place, title, code });
    } else await row.getByRole('checkbox').uncheck();
  }
  expect(kept).toHaveLength(2);
  await screenshot(page, `week-proposal-${name}-proposed`);
  await page.getByRole('button', { name: 'Accept chosen (2)' }).click();
  await page.getByRole('status').filter({ hasText: 'Planned 2 proposed meals.' }).waitFor();
  await expect
    .poll(async () => tbspOf(await page.getByTestId('week-waste').textContent()), { timeout: 30_000 })
    .toBeLessThan(before);

  // Each accepted meal sits in its slot, and its pairing says which jar it draws from.
  for (const meal of kept) {
    const weekday = meal.place.split(' ')[0];
    const picker = page.getByRole('navigation', { name: 'Day of the week' });
    if (await picker.isVisible()) await picker.getByRole('button', { name: new RegExp(`^${weekday}`) }).click();
    const day = page.getByRole('region', { name: new RegExp(`^${weekday},`) });
    const line = day.locator(
      `article[data-entry="${meal.title}"] li[data-pairing="Green Tomato Chutney"] [data-testid="allocation-line"]`,
    );
    await expect
      .poll(() => line.textContent(), { timeout: 30_000 })
      .toMatch(new RegExp(`(from|opens) jar ${meal.code}`));
    await line.scrollIntoViewIfNeeded();
    await screenshot(page, `week-proposal-${name}-planned-${weekday.toLowerCase()}`);
  }

  // Undo takes both back, and the figure returns to where it was.
  await page.getByRole('heading', { name: 'Plan from the shelf' }).scrollIntoViewIfNeeded();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect
    .poll(async () => tbspOf(await page.getByTestId('week-waste').textContent()), { timeout: 30_000 })
    .toBe(before);
}

describe('planning lunches from the shelf', () => {
  it('on a phone: proposes the lunches, accepts two that use the opened chutney, the waste falls and the cards name the jar', async () => {
    const page = await browser.newPage({ viewport: PHONE, hasTouch: true, isMobile: true });
    await acceptTwoChutneyLunches(page, 'phone');
    await page.close();
  });

  it('on a desktop: the same, with the whole week in view', async () => {
    const page = await browser.newPage({ viewport: DESKTOP_WIDE });
    await acceptTwoChutneyLunches(page, 'desktop');
    await page.close();
  });
});
