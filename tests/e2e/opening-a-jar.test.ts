import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import type { JarView } from '../../shared/schemas/batches';
import { browserForFile, PHONE, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();
const phone = { viewport: PHONE, isMobile: true, hasTouch: true } as const;
const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];

async function jarsOf(page: Page, hid: string, productName: string): Promise<JarView[]> {
  const jars: JarView[] = (await (await page.request.get(`${baseURL}/api/households/${hid}/jars`)).json()).jars;
  return jars.filter((jar) => jar.productName === productName);
}

describe('opening a jar when a better one is there', () => {
  it('from a label: says a jar is already open and an older one waits, offers the older one, and reminds to check seal, look and smell', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    // The demo's Smoky Tomato Jam: one jar open in the fridge, one sealed from last year's batch, newer ones sealed.
    const jam = await jarsOf(page, hid, 'Smoky Tomato Jam');
    const open = jam.filter((jar) => jar.state === 'opened');
    const sealed = jam
      .filter((jar) => jar.state === 'sealed')
      .sort((a, b) => a.cannedOn.localeCompare(b.cannedOn) || a.code.localeCompare(b.code));
    const oldest = sealed[0]!;
    const newest = sealed.at(-1)!;
    expect(open.length).toBeGreaterThan(0);
    expect(oldest.cannedOn < newest.cannedOn).toBe(true);

    await page.goto(`${baseURL}/j/${newest.code}`);
    await page.getByRole('button', { name: `Mark opened: jar ${newest.code}` }).click();
    await page.getByRole('heading', { name: 'Smoky Tomato Jam already has an opened jar' }).waitFor();
    await page.getByRole('link', { name: `Jar ${open[0]!.code}` }).waitFor();
    await page.getByText(`Jar ${oldest.code} was canned`).waitFor();
    await screenshot(page, 'opening-a-jar-advice-phone');
    // Nothing was opened while the advice is shown.
    expect((await jarsOf(page, hid, 'Smoky Tomato Jam')).find((jar) => jar.id === newest.id)!.state).toBe('sealed');

    await page.getByRole('button', { name: `Open jar ${oldest.code} instead` }).click();
    await page.getByText(`Jar ${oldest.code} of Smoky Tomato Jam is open. Before you eat from it:`).waitFor();
    await page.getByText(/Check the seal/).waitFor();
    await page.getByText(/Smell: any off/).waitFor();
    await page.getByText(/National Center for Home Food Preservation/).waitFor();
    await screenshot(page, 'opening-a-jar-checks-phone');
    const after = await jarsOf(page, hid, 'Smoky Tomato Jam');
    expect(after.find((jar) => jar.id === oldest.id)!.state).toBe('opened');
    expect(after.find((jar) => jar.id === newest.id)!.state).toBe('sealed');
    await page.close();
  });

  it('from the shelf: warns of the opened jar but lets the person open another anyway', async () => {
    const page = await browser.newPage(phone);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    const carrots = await jarsOf(page, hid, 'Dilly Carrots');
    const sealedBefore = carrots.filter((jar) => jar.state === 'sealed').length;
    expect(carrots.some((jar) => jar.state === 'opened')).toBe(true);

    await page.goto(`${baseURL}/h/${hid}/shelf`);
    const card = page.locator('li', { has: page.getByRole('heading', { name: 'Dilly Carrots' }) });
    await card.getByRole('button', { name: 'Open oldest jar of Dilly Carrots' }).click();
    await card.getByRole('heading', { name: 'Dilly Carrots already has an opened jar' }).waitFor();
    await screenshot(page, 'opening-a-jar-shelf-advice-phone');
    await card.getByRole('button', { name: /Open jar .* anyway/ }).click();
    await card.getByText(/is open\. Before you eat from it:/).waitFor();
    await expect
      .poll(async () => (await jarsOf(page, hid, 'Dilly Carrots')).filter((jar) => jar.state === 'sealed').length)
      .toBe(sealedBefore - 1);
    await page.close();
  });
});
