import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { paths } from '../../shared/paths';
import { SCREENS } from '../../src/app/screens';
import { browserForFile, PHONE_TOUCH, screenshot, signIn } from '../support/browser';

// One voice: every screen of the demo household, on a phone, says each thing one way. The retired words are the
// variants the product used before its words moved to shared/words/ (each with the word that replaced it).
const baseURL = inject('baseURL');
const browser = browserForFile();

const RETIRED: { pattern: RegExp; now: string }[] = [
  { pattern: /\bpsi\b/i, now: 'pounds of pressure' },
  { pattern: /pounds pressure/i, now: 'pounds of pressure' },
  { pattern: /\d lb pressure|\d lb\b(?= (at|for|in a))/i, now: 'pounds of pressure' },
  { pattern: /\b0\.(25|5|75) inch/i, now: 'a fraction: 1/4, 1/2 inch' },
  { pattern: /best quality until/i, now: 'Best quality by' },
  { pattern: /oldest best by/i, now: 'Oldest jar best quality by' },
  { pattern: /best_by|use_by/i, now: 'Best quality by / Use by' },
  { pattern: /months after canning\)/i, now: 'Best quality by' },
  { pattern: /what expires/i, now: 'Use by this week' },
  { pattern: /needs a new batch|time to make more|running low/i, now: 'Restock' },
  {
    pattern:
      /\b(colour|favourite|flavour|metres?|litres?|millilitres?|centre|mould|grey|cancelled|labelled|neighbours?)\b/i,
    now: 'US English',
  },
  {
    pattern: /\b(fl-oz|twelve-ounce|pressure-dial|pressure-weighted|atmospheric-steam|fruit-butter)\b/,
    now: 'the words the screens show',
  },
  { pattern: /\b(breakfast|lunch|dinner|snack):/, now: 'Breakfast, Lunch, Dinner, Snack' },
  { pattern: /\b20\d\d-\d\d-\d\d\b/, now: 'a date in words ("Wed, Dec 9")' },
  { pattern: /\bshort \d+(\.\d+)? tbsp/i, now: 'plain words for what is missing' },
  { pattern: /no jar drawn/i, now: 'plain words for a past meal' },
  { pattern: /undefined|NaN|\[object Object\]/, now: 'a real value' },
];

/** What the page says that has retired words in it, as "word (say: ...)". */
async function retiredWordsOn(page: Page): Promise<string[]> {
  const text = await page.locator('body').innerText();
  return RETIRED.flatMap(({ pattern, now }) => {
    const match = text.match(pattern);
    return match ? [`"${match[0]}" (say: ${now})`] : [];
  });
}

/** A page that shows a use-by date or processing numbers carries the caution sized for it. */
async function missingCautions(page: Page): Promise<string[]> {
  const text = await page.locator('main').first().innerText();
  const missing: string[] = [];
  const cautions = await page
    .locator('[data-caution]')
    .evaluateAll((nodes) => nodes.map((n) => n.getAttribute('data-caution')));
  if (/\buse by\b/i.test(text) && cautions.length === 0) missing.push('a use-by date without a caution');
  if (/pounds of pressure|\bminutes? (in|at)\b.*\bft\b/i.test(text) && !/tested recipe/i.test(text))
    missing.push('canning numbers without a caution');
  return missing;
}

async function walk(page: Page, name: string, path: string) {
  await page.goto(`${baseURL}${path}`);
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  await page.waitForLoadState('networkidle');
  await screenshot(page, `one-voice-${name}`);
  return { name, retired: await retiredWordsOn(page), cautions: await missingCautions(page) };
}

describe('one voice on every screen (phone)', () => {
  it('uses no retired word, and every use-by date and processing number has its caution', async () => {
    const page = await browser.newPage(PHONE_TOUCH);
    await signIn(page, baseURL, 'keeper@larderly.test');
    const home = new URL(page.url()).pathname.replace(/\/$/, '');
    const api = `${baseURL}/api/households/${home.split('/')[2]}`;
    const found = [];
    for (const screen of SCREENS)
      found.push(await walk(page, screen.label.toLowerCase(), `${home}${screen.path ? `/${screen.path}` : ''}`));

    // Pages reached from the screens: a jar of each state, a batch, a recipe card, the labels, a to-do's batch plan.
    const sealed = (await (await page.request.get(`${api}/jars?state=sealed`)).json()).jars[0];
    const opened = (await (await page.request.get(`${api}/jars?state=opened`)).json()).jars[0];
    const recipe = (await (await page.request.get(`${api}/recipes`)).json()).recipes[0];
    const todos = (await (await page.request.get(`${api}/todos`)).json()).todos as { id: string; batchPlan: unknown }[];
    const planned = todos.find((t) => t.batchPlan);
    found.push(await walk(page, 'sealed-jar', `/j/${sealed.code}`));
    if (opened) found.push(await walk(page, 'opened-jar', `/j/${opened.code}`));
    found.push(await walk(page, 'batch', `${home}/batches/${sealed.batchId}`));
    found.push(await walk(page, 'recipe-card', `${home}/recipes/${recipe.id}`));
    found.push(await walk(page, 'new-batch', `${home}/batches/new`));
    found.push(await walk(page, 'stock', paths.stock(home.split('/')[2]!)));
    found.push(await walk(page, 'labels', `${home}/batches/${sealed.batchId}/labels`));
    if (planned) found.push(await walk(page, 'todo-plan', `${home}/todo?open=${planned.id}`));
    await page.close();

    expect(opened, 'the demo household has an opened jar').toBeTruthy();
    expect(planned, 'the demo household has a to-do with a batch plan').toBeTruthy();
    expect(found.filter((f) => f.retired.length > 0 || f.cautions.length > 0)).toEqual([]);
  }, 240_000);
});
