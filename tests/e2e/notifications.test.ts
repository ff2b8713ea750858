import { createECDH } from 'node:crypto';
import { decrypt } from 'http_ece';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';
import { caughtPushes, eventually } from '../support/caught-files';

const baseURL = inject('baseURL');
const standInsDir = inject('standInsDir');
const pushOrigin = inject('pushOrigin');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

interface TestSubscription {
  endpoint: string;
  keys: { p256dh: string; auth: string };
  privateJwk: JsonWebKey;
  applicationServerKey: string;
}

/**
 * Debian's Chromium cannot reach a browser push service here, so the page's PushManager hands out
 * a subscription whose endpoint is the local push endpoint and whose keys are a real P-256 pair
 * made with WebCrypto; the private key stays on window for the test to decrypt with.
 */
function standInPushManager(origin: string) {
  const base64url = (bytes: ArrayBuffer | Uint8Array) =>
    btoa(String.fromCharCode(...new Uint8Array(bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes))))
      .replace(/\+/g, '-')
      .replace(/\//g, '_')
      .replace(/=+$/, '');
  let current: PushSubscription | null = null;
  PushManager.prototype.subscribe = async function subscribe(options?: PushSubscriptionOptionsInit) {
    const pair = (await crypto.subtle.generateKey({ name: 'ECDH', namedCurve: 'P-256' }, true, [
      'deriveBits',
    ])) as CryptoKeyPair;
    const publicRaw = await crypto.subtle.exportKey('raw', pair.publicKey);
    const privateJwk = await crypto.subtle.exportKey('jwk', pair.privateKey);
    const auth = crypto.getRandomValues(new Uint8Array(16));
    const endpoint = `${origin}/push/${crypto.randomUUID().replaceAll('-', '')}`;
    const keys = { p256dh: base64url(publicRaw), auth: base64url(auth) };
    const serverKey = options?.applicationServerKey;
    (window as unknown as { __testPush: TestSubscription }).__testPush = {
      endpoint,
      keys,
      privateJwk,
      applicationServerKey:
        serverKey instanceof ArrayBuffer || serverKey instanceof Uint8Array ? base64url(serverKey) : String(serverKey),
    };
    current = {
      endpoint,
      expirationTime: null,
      options: { userVisibleOnly: true, applicationServerKey: null },
      getKey: (name: PushEncryptionKeyName) => (name === 'p256dh' ? publicRaw : auth.buffer),
      toJSON: () => ({ endpoint, expirationTime: null, keys }),
      unsubscribe: async () => {
        current = null;
        return true;
      },
    } as unknown as PushSubscription;
    return current;
  };
  PushManager.prototype.getSubscription = async function getSubscription() {
    return current;
  };
}

function decryptWith(subscription: TestSubscription, body: string) {
  const receiver = createECDH('prime256v1');
  receiver.setPrivateKey(Buffer.from(subscription.privateJwk.d!, 'base64url'));
  return JSON.parse(
    decrypt(Buffer.from(body, 'base64'), {
      version: 'aes128gcm',
      privateKey: receiver,
      authSecret: subscription.keys.auth,
    }).toString('utf8'),
  );
}

async function householdPage(context: BrowserContext, email: string) {
  const page = await context.newPage();
  await signIn(page, baseURL, email);
  const hid = /\/h\/([0-9a-f-]{36})/.exec(page.url())![1];
  await page.goto(`${baseURL}/h/${hid}/household`);
  await page.getByRole('heading', { name: 'Notifications' }).waitFor();
  return page;
}

async function serviceWorkerRegistrationId(page: Page) {
  const cdp = await page.context().newCDPSession(page);
  const registrations: { registrationId: string; scopeURL: string; isDeleted: boolean }[] = [];
  cdp.on('ServiceWorker.workerRegistrationUpdated', (event: { registrations: typeof registrations }) =>
    registrations.push(...event.registrations),
  );
  await cdp.send('ServiceWorker.enable');
  const registration = await eventually(() => registrations.find((r) => r.scopeURL === `${baseURL}/` && !r.isDeleted));
  return { cdp, registrationId: registration.registrationId };
}

describe('notifications on this device', () => {
  it('turns on push in Chromium, sends the subscription through the app, and the test notification arrives encrypted for it', async () => {
    const context = await browser.newContext({ viewport: PHONE, isMobile: true, hasTouch: true });
    await context.grantPermissions(['notifications'], { origin: baseURL });
    await context.addInitScript(standInPushManager, pushOrigin);
    const page = await householdPage(context, 'cook@larderly.test');

    await page.getByRole('button', { name: 'Turn on notifications' }).click();
    await page.getByText('Notifications are on for this device.').waitFor();
    const subscription = await page.evaluate(() => (window as unknown as { __testPush: TestSubscription }).__testPush);
    const { publicKey } = await (await fetch(`${baseURL}/api/push/public-key`)).json();
    expect(subscription.applicationServerKey).toBe(publicKey);
    await screenshot(page, 'notifications-phone');

    await page.getByRole('button', { name: 'Send a test notification' }).click();
    await page.getByText(/^Test notification sent to your device\./).waitFor();
    const id = subscription.endpoint.split('/').pop();
    const push = await eventually(() => caughtPushes(standInsDir).find((p) => p.subscription === id));
    expect(push.vapidKey).toBe(publicKey);
    expect(decryptWith(subscription, push.body)).toMatchObject({ title: 'Notifications are on', url: '/' });

    await page.getByRole('button', { name: 'Turn off on this device' }).click();
    await page.getByText('Notifications are off for this device.').waitFor();
    await context.close();
  });

  it('lets a person choose the reminder hour, the days before and e-mail, and keeps them', async () => {
    const context = await browser.newContext({ viewport: DESKTOP });
    const page = await householdPage(context, 'helper@larderly.test');
    await page.getByLabel('Remind me').selectOption('3');
    await page.getByText('Saved.').waitFor();
    await page.getByLabel('Reminder time').selectOption('18');
    await page.getByLabel('E-mail reminders').uncheck();
    await expect
      .poll(async () => (await page.request.get(`${baseURL}/api/me/notifications`)).json())
      .toMatchObject({ settings: { daysBefore: 3, reminderHour: 18, emailReminders: false } });
    await page.reload();
    await expect(page.getByLabel('Remind me').inputValue()).resolves.toBe('3');
    await screenshot(page, 'notifications-desktop');
    await context.close();
  });
});

describe('the service worker', () => {
  it('shows a pushed reminder as a notification and tells the open page, through the DevTools protocol', async () => {
    const context = await browser.newContext({ viewport: DESKTOP });
    await context.grantPermissions(['notifications'], { origin: baseURL });
    const page = await householdPage(context, 'keeper@larderly.test');
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
      const messages: unknown[] = [];
      (window as unknown as { __pushed: unknown[] }).__pushed = messages;
      navigator.serviceWorker.addEventListener('message', (event) => messages.push(event.data));
    });
    const { cdp, registrationId } = await serviceWorkerRegistrationId(page);
    const reminder = {
      title: 'Use the Spiced Pear Butter within 2 days',
      body: 'The opened jar of Spiced Pear Butter should be finished within 2 days.',
      url: '/j/TESTJAR',
      tag: 'jar-test-soon',
    };
    await cdp.send('ServiceWorker.deliverPushMessage', {
      origin: baseURL,
      registrationId,
      data: JSON.stringify(reminder),
    });

    await expect
      .poll(() => page.evaluate(() => (window as unknown as { __pushed: unknown[] }).__pushed))
      .toEqual([{ type: 'larderly-push', ...reminder }]);
    const shown = await page.evaluate(async () =>
      (await (await navigator.serviceWorker.ready).getNotifications()).map((n) => ({
        title: n.title,
        body: n.body,
        data: n.data,
      })),
    );
    expect(shown).toEqual([{ title: reminder.title, body: reminder.body, data: { url: '/j/TESTJAR' } }]);
    await context.close();
  });
});
