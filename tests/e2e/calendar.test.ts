import ICAL from 'ical.js';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();

describe('the calendar address (phone)', () => {
  it('is turned on under Household, shown once, and serves the planned meals to a calendar app', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'cook@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    await page.goto(`${baseURL}${home}/household`);
    await page.getByRole('button', { name: 'Turn on my calendar address' }).click();
    const field = page.getByLabel('Your calendar address');
    await field.waitFor();
    const address = await field.inputValue();
    expect(address).toMatch(/\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    await page.getByText('Copy it now').scrollIntoViewIfNeeded();
    await screenshot(page, 'calendar-address');

    // What a calendar app fetches: no cookie needed (a fresh request context), parsed by ical.js.
    const fetched = await (await browser.newPage({})).request.get(address.replace(/^https?:\/\/[^/]+/, baseURL));
    expect(fetched.status()).toBe(200);
    const events = new ICAL.Component(ICAL.parse(await fetched.text()))
      .getAllSubcomponents('vevent')
      .map((v) => new ICAL.Event(v));
    expect(events.some((e) => /^(Breakfast|Lunch|Dinner|Snack): /.test(e.summary))).toBe(true);

    // A cook sees the meal times but a keeper sets them; after a reload the address is no longer shown.
    await page.reload();
    await page.getByText(/Your calendar address is on since/).waitFor();
    expect(await page.getByLabel('Dinner').isDisabled()).toBe(true);
    await page.getByRole('button', { name: 'Turn off' }).click();
    await page.getByRole('button', { name: 'Turn on my calendar address' }).waitFor();
    await page.close();
  }, 120_000);
});
