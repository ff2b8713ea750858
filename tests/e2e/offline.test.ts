import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import type { JarView } from '../../shared/schemas/batches';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

// The pantry and the cellar often have no signal. Chromium's offline mode (playwright-core's
// BrowserContext.setOffline) cuts the network the way a phone loses it: navigator.onLine turns false and every
// request fails, also the page's own reload, which only the service worker can answer.
const baseURL = inject('baseURL');
const { newPage } = browserForFile();

const householdOf = (page: Page) => /\/h\/([0-9a-f-]{36})/.exec(page.url())![1]!;
async function getJson<T>(page: Page, path: string): Promise<T> {
  const answer = await page.request.get(`${baseURL}/api${path}`);
  expect(answer.ok(), `GET ${path}`).toBe(true);
  return answer.json();
}

/** A second member on another phone, online all along. */
async function keeperPage() {
  const page = await newPage({});
  await signIn(page, baseURL, 'keeper@larderly.test');
  return page;
}

/** What the app saved in IndexedDB for offline use, as text (empty until the first save). */
const savedCache = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<string>((resolve) => {
        const opened = indexedDB.open('larderly');
        opened.onerror = () => resolve('');
        opened.onsuccess = () => {
          const db = opened.result;
          if (!db.objectStoreNames.contains('query-cache')) return (db.close(), resolve(''));
          const read = db.transaction('query-cache').objectStore('query-cache').get('cache');
          // Closed after the read, so this look never holds up the app's own writes.
          read.onsuccess = () => (db.close(), resolve(typeof read.result === 'string' ? read.result : ''));
          read.onerror = () => (db.close(), resolve(''));
        };
      }),
  );

/** The service worker has the page in hand, so a reload with no network still opens the app. */
async function waitForShell(page: Page) {
  await page.evaluate(() => navigator.serviceWorker.ready);
  await expect
    .poll(() => page.evaluate(() => navigator.serviceWorker.controller !== null), { timeout: 20_000 })
    .toBe(true);
}

const banner = (page: Page) => page.getByRole('status').filter({ hasText: 'No network' });

describe('with no network', () => {
  it('opens Today and the fridge as last seen, keeps a jar opened and a to-do ticked, and sends each once when back online', async () => {
    const keeper = await keeperPage();
    const hid = householdOf(keeper);
    const page = await newPage(PHONE_TOUCH);
    page.setDefaultTimeout(20_000);
    const context: BrowserContext = page.context();
    await signIn(page, baseURL, 'helper@larderly.test');
    const helper = (await getJson<{ user: { id: string } }>(page, '/auth/me')).user;
    const title = `Carry the empty quart jars up from the cellar ${Date.now()}`;
    const created = await keeper.request.post(`${baseURL}/api/households/${hid}/todos`, {
      data: { title, assigneeId: helper.id },
    });
    expect(created.status()).toBe(201);
    const todoId: string = (await created.json()).todo.id;

    // The product with the most sealed jars, and its jars before: the one opened is the one that changes.
    const sealed = (await getJson<{ jars: JarView[] }>(page, `/households/${hid}/jars?state=sealed`)).jars;
    const counts = new Map<string, number>();
    for (const jar of sealed) counts.set(jar.productName, (counts.get(jar.productName) ?? 0) + 1);
    const [productName] = [...counts.entries()].sort((a, b) => b[1] - a[1])[0]!;
    const sealedBefore = sealed.filter((jar) => jar.productName === productName);

    // One visit online: Today, the fridge and the shelf, read and saved.
    await page.goto(`${baseURL}/h/${hid}`);
    await page.getByRole('checkbox', { name: `Done: ${title}` }).waitFor();
    await waitForShell(page);
    // The shelf's cards are a little wider than the phone, so a tap on the bottom bar can land on a card's dot:
    // the bar's links are followed with a click event of their own.
    const go = (screen: string) =>
      page
        .getByRole('navigation', { name: 'Screens' })
        .last()
        .getByRole('link', { name: screen })
        .dispatchEvent('click');
    await go('Fridge');
    await page.getByRole('list', { name: 'Opened jars' }).waitFor();
    const fridgeCodes = (await getJson<{ jars: { code: string }[] }>(page, `/households/${hid}/fridge`)).jars.map(
      (j) => j.code,
    );
    expect(fridgeCodes.length).toBeGreaterThan(0);
    await go('Shelf');
    await page.getByRole('button', { name: `Open oldest jar of ${productName}` }).waitFor();
    await go('Today');
    await page.getByRole('checkbox', { name: `Done: ${title}` }).waitFor();
    // Saved for offline use: Today with the new to-do, the fridge and the shelf's jars.
    const saved = async () => {
      const cache = await savedCache(page);
      return [title, fridgeCodes[0]!, sealedBefore[0]!.id].every((part) => cache.includes(part));
    };
    await expect.poll(saved, { timeout: 15_000 }).toBe(true);

    const sent: { method: string; url: string; key: string | undefined }[] = [];
    page.on('request', (request) => {
      if (request.method() !== 'GET' && request.url().includes('/api/households/'))
        sent.push({ method: request.method(), url: request.url(), key: request.headers()['idempotency-key'] });
    });

    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor();
    await banner(page)
      .getByText(/No network: showing what Larderly had at \d/)
      .waitFor();
    await page.getByRole('checkbox', { name: `Done: ${title}` }).waitFor();
    await screenshot(page, 'offline-today-phone');

    await go('Fridge');
    await page
      .getByRole('list', { name: 'Opened jars' })
      .getByText(fridgeCodes[0]!, { exact: false })
      .first()
      .waitFor();
    await banner(page).waitFor();
    await screenshot(page, 'offline-fridge-phone');

    // Open a jar on the shelf: the advice cannot be had offline, so the jar opens and the checks show at once.
    await go('Shelf');
    await page.getByRole('button', { name: `Open oldest jar of ${productName}` }).tap();
    await page.getByText(/is open\. Before you eat from it:/).waitFor();
    await banner(page).getByText('1 change waiting').waitFor();
    await screenshot(page, 'offline-shelf-opened-phone');

    await go('Today');
    await page.getByRole('checkbox', { name: `Done: ${title}` }).tap();
    // Shown as done at once: it leaves "My to-dos".
    await expect.poll(() => page.getByRole('checkbox', { name: `Done: ${title}` }).count()).toBe(0);
    await banner(page).getByText('2 changes waiting').waitFor();
    const savedChanges = async () => {
      const cache = await savedCache(page);
      return cache ? (JSON.parse(cache).clientState.mutations as unknown[]).length : 0;
    };
    await expect.poll(savedChanges, { timeout: 10_000 }).toBe(2);

    // Still offline, the tab is reloaded: both changes are still there, waiting.
    await page.reload();
    await banner(page).getByText('2 changes waiting').waitFor();
    expect(await page.getByRole('checkbox', { name: `Done: ${title}` }).count()).toBe(0);
    await screenshot(page, 'offline-waiting-phone');
    expect(sent).toEqual([]);

    await context.setOffline(false);
    await expect.poll(() => banner(page).count(), { timeout: 30_000 }).toBe(0);
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'Sending' }).count(), { timeout: 30_000 })
      .toBe(0);

    // On the server: the jar opened and the to-do done, each exactly once, in the order they were made.
    const afterJars = (await getJson<{ jars: JarView[] }>(keeper, `/households/${hid}/jars?state=all`)).jars;
    const opened = sealedBefore.filter((jar) => afterJars.find((j) => j.id === jar.id)?.state === 'opened');
    expect(opened).toHaveLength(1);
    const jar = opened[0]!;
    const history = (
      await getJson<{ batch: { history: { id: string; kind: string; jarCode: string }[] } }>(
        keeper,
        `/households/${hid}/batches/${jar.batchId}`,
      )
    ).batch.history;
    const openings = history.filter((event) => event.jarCode === jar.code && event.kind === 'opened');
    expect(openings).toHaveLength(1);
    const todo = (await getJson<{ todo: { done: boolean } }>(keeper, `/households/${hid}/todos/${todoId}`)).todo;
    expect(todo.done).toBe(true);

    const changes = sent.filter((request) => request.method !== 'GET');
    expect(changes.map((c) => `${c.method} ${new URL(c.url).pathname}`)).toEqual([
      `POST /api/households/${hid}/jars/${jar.id}/open`,
      `PATCH /api/households/${hid}/todos/${todoId}`,
    ]);
    for (const change of changes) expect(change.key).toMatch(/^[A-Za-z0-9_-]{16,100}$/);
    expect(new Set(changes.map((c) => c.key)).size).toBe(2);

    // The same change sent again under its key (a phone that lost the answer) is answered, not applied again.
    const replay = await page.request.post(`${baseURL}/api/households/${hid}/jars/${jar.id}/open`, {
      headers: { 'Idempotency-Key': changes[0]!.key! },
      data: {},
    });
    expect(replay.status()).toBe(200);
    expect(replay.headers()['idempotent-replayed']).toBe('true');
    const historyAgain = (
      await getJson<{ batch: { history: { kind: string; jarCode: string }[] } }>(
        keeper,
        `/households/${hid}/batches/${jar.batchId}`,
      )
    ).batch.history;
    expect(historyAgain.filter((event) => event.jarCode === jar.code && event.kind === 'opened')).toHaveLength(1);

    // The demo shelf as it was, for the other browser tests.
    expect(
      (
        await keeper.request.post(`${baseURL}/api/households/${hid}/jars/${jar.id}/undo`, {
          data: { eventId: openings[0]!.id },
        })
      ).status(),
    ).toBe(200);
    expect((await keeper.request.delete(`${baseURL}/api/households/${hid}/todos/${todoId}`)).status()).toBe(204);

    // Signing out forgets what was saved: the next person on this phone does not see this household offline.
    expect(await savedCache(page)).toContain(jar.code);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await expect.poll(async () => (await savedCache(page)).includes(jar.code), { timeout: 10_000 }).toBe(false);
    await page.close();
    await keeper.close();
  }, 180_000);

  it('tells the person when another member finished the jar they finished offline, and shows the fridge as it is now', async () => {
    const keeper = await keeperPage();
    const hid = householdOf(keeper);
    const page = await newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'helper@larderly.test');
    await page.goto(`${baseURL}/h/${hid}/fridge`);
    await page.getByRole('list', { name: 'Opened jars' }).waitFor();
    await waitForShell(page);
    const [jar] = (
      await getJson<{ jars: { jarId: string; code: string; productName: string }[] }>(page, `/households/${hid}/fridge`)
    ).jars;
    const finish = page.getByRole('button', { name: `Mark finished: jar ${jar!.code} of ${jar!.productName}` });
    await finish.waitFor();
    await expect.poll(async () => (await savedCache(page)).includes(jar!.jarId), { timeout: 15_000 }).toBe(true);

    await page.context().setOffline(true);
    await finish.tap();
    await expect.poll(() => finish.count()).toBe(0);
    await banner(page).getByText('1 change waiting').waitFor();

    // Meanwhile, in the kitchen upstairs, the keeper finishes the same jar.
    const theirs = await keeper.request.post(`${baseURL}/api/households/${hid}/jars/${jar!.jarId}/finish`, {
      data: {},
    });
    expect(theirs.status()).toBe(200);
    const theirEvent: string = (await theirs.json()).eventId;

    await page.context().setOffline(false);
    const refusal = page.getByRole('alert').filter({ hasText: 'While you were offline, something changed' });
    await refusal
      .getByText(`Finishing jar ${jar!.code} of ${jar!.productName} was not applied: Jar ${jar!.code} was finished on`)
      .waitFor();
    await refusal.getByText('What you see now is up to date.').waitFor();
    await screenshot(page, 'offline-conflict-phone');
    // Said once, by the banner: the fridge's own notice is for refusals the person just saw happen.
    expect(await page.getByRole('alert').count()).toBe(1);
    // The fridge was read again: the jar is gone, and the keeper's finish is the only one.
    await expect.poll(() => finish.count()).toBe(0);
    await refusal.getByRole('button', { name: 'Got it' }).tap();
    await expect.poll(() => refusal.count()).toBe(0);

    expect(
      (
        await keeper.request.post(`${baseURL}/api/households/${hid}/jars/${jar!.jarId}/undo`, {
          data: { eventId: theirEvent },
        })
      ).status(),
    ).toBe(200);
    await page.close();
    await keeper.close();
  });
});
