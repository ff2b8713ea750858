import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1366, height: 900 };
/** The desktop the week board must stay readable on. */
export const WIDE_DESKTOP = { width: 1440, height: 900 };
/** A phone held in the hand: touch, not a mouse. */
export const PHONE_TOUCH = { viewport: PHONE, isMobile: true, hasTouch: true };

export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function signIn(page: Page, baseURL: string, email: string, password = 'pantry-demo-2026') {
  await page.goto(`${baseURL}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/h\/[0-9a-f-]{36}/);
}

/** Saved under test-results/screenshots, for a person to look at. */
export async function screenshot(page: Page, name: string) {
  const dir = path.resolve('test-results/screenshots');
  mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

/** One Chromium for a test file, opened before its tests and closed after; its pages wait up to a minute on a busy machine. */
export function browserForFile() {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(() => browser?.close());
  return {
    async newPage(options: Parameters<Browser['newPage']>[0]) {
      const page = await browser.newPage(options);
      page.setDefaultTimeout(60_000);
      return page;
    },
  };
}
