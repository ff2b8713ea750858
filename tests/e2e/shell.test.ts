import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';
import { signUpInBrowser } from '../support/sign-up-page';

const baseURL = inject('baseURL');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

/** The header names the current household and the role, as a label or, for people in several, as the switcher's choice. */
async function shownHousehold(page: Page, name: RegExp, role: string) {
  const header = page.getByRole('banner');
  const switcher = header.getByRole('combobox', { name: 'Household' });
  await expect
    .poll(
      async () =>
        (await switcher.count())
          ? await switcher.evaluate((s: HTMLSelectElement) => s.selectedOptions[0]?.text ?? '')
          : await header.innerText(),
      { timeout: 15_000 },
    )
    .toMatch(new RegExp(`${name.source}[\\s\\S]*${role}`, 'i'));
}

describe('the app shell', () => {
  it('sends a signed-out visitor to sign-in', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await page.goto(`${baseURL}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByRole('heading', { name: 'Welcome back' }).waitFor();
    await page.close();
  });

  it('shows a clear message for a wrong password', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${baseURL}/sign-in`);
    await page.getByLabel('E-mail').fill('keeper@larderly.test');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toMatch(/do not match/);
    await page.close();
  });

  it('signs in the demo keeper, shows the shell on desktop, switches screens and signs out', async () => {
    const page = await browser.newPage({ viewport: DESKTOP });
    await signIn(page, baseURL, 'keeper@larderly.test');
    await shownHousehold(page, /Calloway Hollow/, 'keeper');
    await screenshot(page, 'shell-desktop');

    const nav = page.getByRole('navigation', { name: 'Screens' }).first();
    for (const [label, heading] of [
      ['Shelf', 'Shelf'],
      ['Week', 'Week'],
      ['Household', 'Household'],
    ] as const) {
      await nav.getByRole('link', { name: label }).click();
      await page.getByRole('heading', { level: 1, name: heading }).waitFor();
    }
    await expect(page.getByLabel('Altitude (feet above sea level)').inputValue()).resolves.toBe('2350');
    await screenshot(page, 'household-desktop');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto(`${baseURL}/`);
    await page.waitForURL(/\/sign-in/);
    await page.close();
  });

  it('shows the shell on a phone with the bottom navigation and the More menu', async () => {
    const page = await browser.newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await signIn(page, baseURL, 'helper@larderly.test');
    await shownHousehold(page, /Calloway Hollow/, 'helper');
    await screenshot(page, 'shell-phone');
    const bottomNav = page.getByRole('navigation', { name: 'Screens' }).last();
    await bottomNav.getByRole('button', { name: 'More' }).click();
    await bottomNav.getByRole('link', { name: 'Household' }).click();
    await page.getByRole('heading', { level: 1, name: 'Household' }).waitFor();
    await expect(page.getByLabel('Household name').isDisabled()).resolves.toBe(true);
    await screenshot(page, 'household-phone');
    await page.close();
  });

  it('creates a new household through sign-up', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await signUpInBrowser(
      page,
      { baseURL, standInsDir: inject('standInsDir') },
      {
        name: 'Ines Okafor',
        email: `ines-${Date.now()}@example.test`,
        password: 'plum jam every winter',
        householdName: 'Okafor Kitchen',
      },
      (sent) => screenshot(sent, 'sign-up-sent-phone'),
    );
    await shownHousehold(page, /Okafor Kitchen/, 'keeper');
    await page.close();
  });

  it('after a sign-out in another tab, the next click goes to sign-in once and signing in comes back to that screen', async () => {
    const context = await browser.newContext({ viewport: DESKTOP });
    const page = await context.newPage();
    await signIn(page, baseURL, 'keeper@larderly.test');
    const home = new URL(page.url()).pathname;
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor();

    // A second tab of the same browser signs out: the server ends the session both tabs share.
    const other = await context.newPage();
    await other.goto(`${baseURL}${home}/household`);
    await other.getByRole('button', { name: 'Sign out' }).click();
    await other.waitForURL(/\/sign-in/);
    await other.close();

    const signInVisits: string[] = [];
    page.on('framenavigated', (frame) => {
      if (frame === page.mainFrame() && new URL(frame.url()).pathname === '/sign-in') signInVisits.push(frame.url());
    });
    await page.getByRole('navigation', { name: 'Screens' }).first().getByRole('link', { name: 'Fridge' }).click();
    await page.getByRole('heading', { name: 'Welcome back' }).waitFor();
    const next = new URL(page.url()).searchParams.get('next');
    expect(next).toBe(`${home}/fridge`);
    expect(await page.getByText('Please sign in first.').count()).toBe(0);

    await page.getByLabel('E-mail').fill('keeper@larderly.test');
    await page.getByLabel('Password').fill('pantry-demo-2026');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => url.pathname === `${home}/fridge`);
    await page.getByRole('heading', { level: 1, name: 'Fridge' }).waitFor();
    expect(signInVisits).toHaveLength(1);
    await context.close();
  });
});
