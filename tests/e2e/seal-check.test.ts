import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { paths } from '../../shared/paths';
import { clockWords, sealCheckMessage, sealCheckTitle } from '../../shared/words';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const browser = browserForFile();

/**
 * Delivers a push to the page's service worker through the DevTools protocol, as the push service would, and
 * answers the notification it shows. The words and address are the seal-check reminder's own (the sweep builds
 * them with the same functions; tests/api/seal-check.test.ts checks what it sends, and that it sends it once).
 */
async function showPush(page: Page, push: { title: string; body: string; url: string; tag: string }) {
  const cdp = await page.context().newCDPSession(page);
  const registrations: { registrationId: string; scopeURL: string; isDeleted: boolean }[] = [];
  cdp.on('ServiceWorker.workerRegistrationUpdated', (event: { registrations: typeof registrations }) =>
    registrations.push(...event.registrations),
  );
  await cdp.send('ServiceWorker.enable');
  await page.evaluate(() => navigator.serviceWorker.ready);
  await expect.poll(() => registrations.some((r) => r.scopeURL === `${baseURL}/` && !r.isDeleted)).toBe(true);
  const { registrationId } = registrations.find((r) => r.scopeURL === `${baseURL}/` && !r.isDeleted)!;
  await cdp.send('ServiceWorker.deliverPushMessage', { origin: baseURL, registrationId, data: JSON.stringify(push) });
  const shown = () =>
    page.evaluate(async () =>
      (await (await navigator.serviceWorker.ready).getNotifications()).map((n) => ({
        title: n.title,
        body: n.body,
        url: (n.data as { url?: string } | null)?.url,
      })),
    );
  await expect.poll(shown).toContainEqual({ title: push.title, body: push.body, url: push.url });
}

describe('the seal check on a phone', () => {
  it('from the reminder to the batch page: one jar did not seal and goes to the fridge, the rest stay on the shelf', async () => {
    const page = await browser.newPage({ ...PHONE_TOUCH, permissions: ['notifications'] });
    await signIn(page, baseURL, 'cook@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
    await page.goto(`${baseURL}/h/${hid}`);
    // The demo's salsa verde came out of the canner 13 hours before the demo was made (USDA: 12 to 24 hours undisturbed).
    const section = page.getByRole('region', { name: 'Seal check' });
    await section.getByText('Roasted Salsa Verde').waitFor();
    await expect(section.getByText('4 jars, pint · cooled 12 hours').count()).resolves.toBe(1);
    await screenshot(page, 'seal-check-today-phone');

    // The reminder, 12 hours after processing (USDA Complete Guide 2015): its notification opens the batch page,
    // which is where a tap on it goes (src/sw.ts, notificationclick).
    const href = (await section.getByRole('link', { name: 'Check the seals' }).getAttribute('href'))!;
    const batchId = /batches\/([0-9a-f-]{36})/.exec(href)![1]!;
    const batch = (await (await page.request.get(`${baseURL}/api/households/${hid}/batches/${batchId}`)).json()).batch;
    const reminder = {
      title: sealCheckTitle('Roasted Salsa Verde'),
      body: sealCheckMessage(
        'Roasted Salsa Verde',
        4,
        batch.sealCheck.reprocessUntil ? clockWords(batch.sealCheck.reprocessUntil, batch.timeZone) : null,
      ),
      url: paths.batch(hid, batchId),
      tag: `seal-check-${batch.processings[0].id}`,
    };
    expect(new URL(href, baseURL).pathname).toBe(reminder.url);
    await showPush(page, reminder);
    await page.goto(`${baseURL}${reminder.url}`);

    const panel = page.getByRole('region', { name: 'Check the seals' });
    await panel.getByText('They have cooled 12 hours: check them now.').waitFor();
    await panel.getByRole('button', { name: 'Jar by jar' }).click();
    const boxes = panel.getByRole('checkbox');
    await expect(boxes.count()).resolves.toBe(4);
    const code = (await panel
      .locator('label')
      .filter({ has: page.getByRole('checkbox') })
      .first()
      .textContent())!.trim();
    await boxes.first().check();
    // Within 24 hours a cook may reprocess; the fridge is the first choice.
    await panel.getByText(/Reprocess within 24 hours/).waitFor();
    await screenshot(page, 'seal-check-panel-phone');
    await panel.getByRole('button', { name: 'Put 1 jar in the fridge' }).click();
    await page.getByText('Seal check saved').waitFor();
    await expect(page.getByRole('region', { name: 'Check the seals' }).count()).resolves.toBe(0);
    await page.getByText(`did not seal; put in the fridge by`).first().waitFor();
    await screenshot(page, 'seal-check-saved-phone');

    await page.goto(`${baseURL}/h/${hid}/fridge`);
    await page.getByRole('list', { name: 'Opened jars' }).getByText(code).first().waitFor();
    await page.goto(`${baseURL}/h/${hid}`);
    await page.getByRole('heading', { name: 'In the fridge' }).waitFor();
    await expect(page.getByRole('region', { name: 'Seal check' }).count()).resolves.toBe(0);
    await page.setViewportSize({ width: 320, height: 740 });
    await screenshot(page, 'seal-check-today-after-320');
    await page.close();
  });
});
