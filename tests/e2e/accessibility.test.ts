import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { paths } from '../../shared/paths';
import { SCREENS } from '../../src/app/screens';
import { DESKTOP, launchChromium, PHONE, signIn } from '../support/browser';

const baseURL = inject('baseURL');
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(() => browser?.close());

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** axe-core's serious and critical findings on the page as it stands. */
async function seriousViolations(page: Page) {
  // Evaluated through DevTools, as a test tool, so the app's own CSP stays strict.
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const result = await (
      window as unknown as { axe: { run: (o: object) => Promise<{ violations: Violation[] }> } }
    ).axe.run({
      resultTypes: ['violations'],
    });
    return result.violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.id} (${v.impact}): ${v.help} at ${v.nodes
          .map((n) => n.target.join(' '))
          .slice(0, 3)
          .join(', ')}`,
    );
}

describe('accessibility (axe-core, WCAG 2 A and AA rules)', () => {
  it('finds no serious or critical violations on the sign-in and sign-up pages', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    for (const path of ['/sign-in', '/sign-up']) {
      await page.goto(`${baseURL}${path}`);
      await page.getByRole('heading', { level: 1 }).waitFor();
      expect(await seriousViolations(page), path).toEqual([]);
    }
    await page.close();
  });

  for (const [name, viewport] of [
    ['desktop', DESKTOP],
    ['phone', PHONE],
  ] as const) {
    it(`finds no serious or critical violations on any screen with the demo data (${name})`, async () => {
      const page = await browser.newPage({ viewport });
      await signIn(page, baseURL, 'keeper@larderly.test');
      const home = new URL(page.url()).pathname.replace(/\/$/, '');
      for (const screen of SCREENS) {
        await page.goto(`${baseURL}${home}${screen.path ? `/${screen.path}` : ''}`);
        await page.getByRole('heading', { level: 1 }).first().waitFor();
        await page.waitForLoadState('networkidle');
        expect(await seriousViolations(page), screen.label).toEqual([]);
      }
      // Pages reached by address, in the same session (sign-ins per address are limited).
      const api = `${baseURL}/api/households/${home.split('/')[2]}`;
      const jar = (await (await page.request.get(`${api}/jars?state=sealed`)).json()).jars[0];
      const recipe = (await (await page.request.get(`${api}/recipes`)).json()).recipes[0];
      for (const path of [
        `/j/${jar.code}`,
        `${home}/recipes/${recipe.id}`,
        `${home}/batches/new`,
        paths.stock(home.split('/')[2]!),
        `${home}/batches/${jar.batchId}/labels`,
        '/invite/not-a-real-invitation-token-0000',
      ]) {
        await page.goto(`${baseURL}${path}`);
        await page.getByRole('heading', { level: 1 }).first().waitFor();
        await page.waitForLoadState('networkidle');
        expect(await seriousViolations(page), path).toEqual([]);
      }
      await page.close();
    }, 240_000);
  }
});
