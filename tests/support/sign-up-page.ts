import type { Page } from 'playwright-core';
import { caughtMail, eventually } from './caught-files';

/** Signs up on the page the way a person does: the form, the notice, then the link from the caught e-mail. */
export async function signUpInBrowser(
  page: Page,
  where: { baseURL: string; standInsDir: string },
  person: { name: string; email: string; password: string; householdName: string },
  onSent?: (page: Page) => Promise<unknown>,
) {
  await page.goto(`${where.baseURL}/sign-up`);
  await page.getByLabel('Your name').fill(person.name);
  await page.getByLabel('E-mail').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByLabel('Household name').fill(person.householdName);
  await page.getByRole('button', { name: 'Create household' }).click();
  await page.getByText(`Check ${person.email}: we sent a link`).waitFor();
  await onSent?.(page);
  const mail = await eventually(() =>
    caughtMail(where.standInsDir).find(
      (m) => m.to.some((to) => to.includes(person.email)) && /sign-up\/confirm/.test(m.text),
    ),
  );
  const link = /https?:\/\/\S+(\/sign-up\/confirm\/[A-Za-z0-9_-]+)/.exec(mail.text)![1];
  await page.goto(`${where.baseURL}${link}`);
  await page.waitForURL(/\/h\/[0-9a-f-]{36}\/setup/);
}
