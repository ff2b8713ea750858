import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESKTOP, launchChromium, PHONE, screenshot, signIn } from '../support/browser';
import { caughtMail, eventually } from '../support/caught-files';

const baseURL = inject('baseURL');
const standInsDir = inject('standInsDir');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

describe('inviting someone to the household', () => {
  it('a keeper invites by e-mail; the invitee opens the link, creates an account and joins with that role', async () => {
    const keeperPage = await browser.newPage({ viewport: DESKTOP });
    await signIn(keeperPage, baseURL, 'keeper@larderly.test');
    const hid = /\/h\/([0-9a-f-]{36})/.exec(keeperPage.url())![1];
    await keeperPage.goto(`${baseURL}/h/${hid}/household`);
    const email = `rowan-${Date.now()}@example.test`;
    await keeperPage.getByLabel('Invite by e-mail').fill(email);
    await keeperPage.getByLabel('As', { exact: true }).selectOption('helper');
    await keeperPage.getByRole('button', { name: 'Send invitation' }).click();
    await keeperPage.getByText(`Invitation sent to ${email}.`).waitFor();
    await keeperPage.getByText(email, { exact: true }).waitFor();
    await screenshot(keeperPage, 'household-keeper-desktop');

    const mail = await eventually(() => caughtMail(standInsDir).find((m) => m.to.includes(email)));
    expect(mail.subject).toBe('Wren Calloway invites you to Calloway Hollow on Larderly');
    const link = /(http:\/\/\S+\/invite\/[A-Za-z0-9_-]+)/.exec(mail.text)![1];
    expect(link.startsWith(`${baseURL}/invite/`)).toBe(true);

    const invitee = await browser.newPage({ viewport: PHONE, isMobile: true, hasTouch: true });
    await invitee.goto(link);
    await invitee.getByRole('heading', { name: 'Join Calloway Hollow' }).waitFor();
    await invitee.getByText(`Wren Calloway invited ${email} to join Calloway Hollow as a helper.`).waitFor();
    await invitee.getByLabel('Your name').fill('Rowan Ashby');
    await invitee.getByLabel('Choose a password').fill('crab apples in october');
    await screenshot(invitee, 'invite-phone');
    await invitee.getByRole('button', { name: 'Create account and join' }).click();
    await invitee.waitForURL(`${baseURL}/h/${hid}`);
    await invitee.getByText('You are a helper').waitFor();

    await keeperPage.reload();
    await keeperPage.getByText('No pending invitations.').waitFor();
    await keeperPage.getByText(email, { exact: true }).waitFor();

    // A used link says so and offers no second join.
    await invitee.goto(link);
    await expect(invitee.getByRole('alert').textContent()).resolves.toMatch(/already been used/);
    expect(await invitee.getByRole('button', { name: /Join/ }).count()).toBe(0);
    await screenshot(invitee, 'invite-used-phone');
    await keeperPage.close();
    await invitee.close();
  });
});
