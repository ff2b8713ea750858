import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const { newPage } = browserForFile();

const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
const getJson = async (page: Page, path: string) => (await page.request.get(`${baseURL}/api${path}`)).json();

describe('one-tap actions can be undone', () => {
  it('says which jar a helper finished in the fridge, and Undo brings it back to the fridge', async () => {
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    await page.goto(`${baseURL}/h/${hid}/fridge`);
    await page.getByRole('list', { name: 'Opened jars' }).waitFor();
    const [jar] = (await getJson(page, `/households/${hid}/fridge`)).jars;
    await page.getByRole('button', { name: `Mark finished: jar ${jar.code} of ${jar.productName}` }).tap();

    const toast = page.getByTestId('undo-toast');
    await toast.getByText(`Finished jar ${jar.code} of ${jar.productName}. It has left the fridge.`).waitFor();
    // The words sit in a polite live region, so a screen reader hears them without losing its place.
    await expect(page.getByRole('status').filter({ has: toast }).getAttribute('aria-live')).resolves.toBe('polite');
    await screenshot(page, 'undo-fridge-toast-phone');
    await toast.getByRole('button', { name: 'Undo' }).tap();
    await toast.getByText(`Jar ${jar.code} is back in the fridge.`).waitFor();
    await page.getByRole('button', { name: `Mark finished: jar ${jar.code} of ${jar.productName}` }).waitFor();
    const fridge = await getJson(page, `/households/${hid}/fridge`);
    expect(fridge.jars.map((j: { jarId: string }) => j.jarId)).toContain(jar.jarId);
    await screenshot(page, 'undo-fridge-undone-phone');
    await page.close();
  });

  it('lets a keyboard undo opening a jar from its label page, and the batch history keeps both', async () => {
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    // A jar that should go first anyway, so the opening advice does not step in between.
    let jar: { id: string; code: string; productName: string; batchId: string } | undefined;
    for (const sealed of (await getJson(page, `/households/${hid}/jars?state=sealed`)).jars) {
      const { advice } = await getJson(page, `/households/${hid}/jars/${sealed.id}/opening-advice`);
      if (!advice.openedJars.length && !advice.olderSealed.length) {
        jar = sealed;
        break;
      }
    }
    if (!jar) throw new Error('the demo shelf has no jar that should go first');
    await page.goto(`${baseURL}/j/${jar.code}`);
    await page.getByRole('button', { name: `Mark opened: jar ${jar.code}` }).focus();
    await page.keyboard.press('Enter');
    const toast = page.getByTestId('undo-toast');
    await toast
      .getByText(new RegExp(`^Opened jar ${jar.code} of ${jar.productName}\\. It is in the fridge now; use by`))
      .waitFor();
    await screenshot(page, 'undo-jar-page-toast-phone');
    // The opened jar's buttons replaced the one pressed; Tab still reaches Undo, and Ctrl+Z works from the page.
    await expect(
      toast.getByRole('button', { name: 'Undo' }).evaluate((b) => (b as HTMLButtonElement).tabIndex),
    ).resolves.toBe(0);
    await page.keyboard.press('Control+z');
    await toast.getByText(`Jar ${jar.code} is back on the shelf, sealed.`).waitFor();
    await page.getByRole('button', { name: `Mark opened: jar ${jar.code}` }).waitFor();
    const history = (await getJson(page, `/households/${hid}/batches/${jar.batchId}`)).batch.history.filter(
      (e: { jarCode: string }) => e.jarCode === jar.code,
    );
    expect(history.map((e: { kind: string }) => e.kind).slice(0, 2)).toEqual(['restored', 'opened']);
    await page.close();
  });

  it('lets a cook put back a jar finished days ago from its page; a helper is told who can', async () => {
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    const [jar] = (await getJson(page, `/households/${hid}/jars?state=finished`)).jars;
    await page.goto(`${baseURL}/j/${jar.code}`);
    await page.getByText('If that was a mistake, a cook or keeper can put it back from this page.').waitFor();
    await page.close();

    const cookPage = await newPage(PHONE_TOUCH);
    await signIn(cookPage, baseURL, 'cook@larderly.test');
    await cookPage.goto(`${baseURL}/j/${jar.code}`);
    await cookPage.getByText(/^Finished .* by /).waitFor();
    await screenshot(cookPage, 'undo-put-back-phone');
    await cookPage.getByRole('button', { name: `Put jar ${jar.code} back` }).tap();
    await cookPage.getByText(`Jar ${jar.code} is back in the fridge.`).waitFor();
    expect((await getJson(cookPage, `/households/${hid}/jars/by-code/${jar.code}`)).jar.state).toBe('opened');
    // Finished again, so the demo fridge stays as the other browser tests expect it.
    expect((await cookPage.request.post(`${baseURL}/api/households/${hid}/jars/${jar.id}/finish`)).status()).toBe(200);
    await cookPage.close();
  });

  it('says which to-do was ticked, and Undo opens it again', async () => {
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'helper@larderly.test');
    const hid = householdOf(page);
    await page.goto(`${baseURL}/h/${hid}/todo`);
    const open = (await getJson(page, `/households/${hid}/todos?filter=all`)).todos.filter(
      (t: { done: boolean }) => !t.done,
    );
    const todo = open[0];
    await page.getByRole('checkbox', { name: `Done: ${todo.title}` }).tap();
    const toast = page.getByTestId('undo-toast');
    await toast.getByText(`Ticked “${todo.title}” done; it is under Done now.`).waitFor();
    await screenshot(page, 'undo-todo-toast-phone');
    await toast.getByRole('button', { name: 'Undo' }).tap();
    await toast.getByText(`“${todo.title}” is open again.`).waitFor();
    const after = (await getJson(page, `/households/${hid}/todos/${todo.id}`)).todo;
    expect(after.done).toBe(false);
    await page.close();
  });
});
