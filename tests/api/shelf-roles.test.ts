import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApp, type DemoEmail } from '../support/app';
import { shelfLookups } from './shelf-helpers';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
beforeAll(async () => {
  ctx = await demoApp({ UPLOAD_DIR: mkdtempSync(path.join(tmpdir(), 'larderly-photos-')) });
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
});
afterAll(() => ctx.close());

type Agent = Awaited<ReturnType<typeof ctx.signedIn>>;
type Route = {
  name: string;
  may: 'read' | 'cook' | 'handleJars';
  send: (agent: Agent, who: DemoEmail) => Promise<{ status: number; body: unknown }>;
};

const PEOPLE: DemoEmail[] = [
  'keeper@larderly.test',
  'cook@larderly.test',
  'helper@larderly.test',
  'neighbor@larderly.test',
];
const ALLOWED: Record<Route['may'], DemoEmail[]> = {
  read: ['keeper@larderly.test', 'cook@larderly.test', 'helper@larderly.test'],
  handleJars: ['keeper@larderly.test', 'cook@larderly.test', 'helper@larderly.test'],
  cook: ['keeper@larderly.test', 'cook@larderly.test'],
};

const tag = (who: DemoEmail) => who.split('@')[0];
/** Each action gets a jar of its own, so one person's action never blocks the next person's. */
async function jarFor(state: 'sealed' | 'opened') {
  const jars = (await (await ctx.signedIn('keeper@larderly.test')).get(`${lookups.base}/jars?state=${state}`)).body
    .jars as { id: string }[];
  usedJars.add(jars.find((j) => !usedJars.has(j.id))!.id);
  return [...usedJars].at(-1)!;
}
const usedJars = new Set<string>();

const ROUTES: Route[] = [
  { name: 'GET products', may: 'read', send: (a) => a.get(`${lookups.base}/products`) },
  {
    name: 'GET a product',
    may: 'read',
    send: (a) => a.get(`${lookups.base}/products/${lookups.product('Pickled Beets').id}`),
  },
  {
    name: 'POST products',
    may: 'cook',
    send: (a, who) => a.post(`${lookups.base}/products`).send({ name: `Quince paste (${tag(who)})`, kind: 'other' }),
  },
  {
    name: 'PATCH a product',
    may: 'cook',
    send: (a) => a.patch(`${lookups.base}/products/${lookups.product('Pickled Beets').id}`).send({ minJars: 3 }),
  },
  { name: 'GET recipes', may: 'read', send: (a) => a.get(`${lookups.base}/recipes`) },
  {
    name: 'GET a recipe',
    may: 'read',
    send: (a) => a.get(`${lookups.base}/recipes/${lookups.recipe('Pickled beets').id}`),
  },
  {
    name: 'POST recipes',
    may: 'cook',
    send: (a, who) =>
      a.post(`${lookups.base}/recipes`).send({
        productId: lookups.product('Plum Ketchup').id,
        name: `Plum ketchup (${tag(who)})`,
        yieldJars: 4,
        yieldJarSize: 'half-pint',
        ingredients: [{ name: 'plums', amount: 3, unit: 'lb', role: 'produce' }],
        method: 'boiling-water',
        baseMinutes: { 'half-pint': 15 },
        headspaceInches: 0.5,
      }),
  },
  {
    name: 'PATCH a recipe',
    may: 'cook',
    send: (a) =>
      a
        .patch(`${lookups.base}/recipes/${lookups.recipe('Pickled beets').id}`)
        .send({ source: 'USDA Complete Guide, Guide 6' }),
  },
  { name: 'GET batches', may: 'read', send: (a) => a.get(`${lookups.base}/batches`) },
  {
    name: 'GET a batch',
    may: 'read',
    send: async (a) => a.get(`${lookups.base}/batches/${(await lookups.sealedJars('Pickled Beets'))[0].batchId}`),
  },
  {
    name: 'GET a plan preview',
    may: 'read',
    send: (a) =>
      a.get(
        `${lookups.base}/batches/plan?recipeId=${lookups.recipe('Pickled beets').id}&jarSize=pint&method=boiling-water`,
      ),
  },
  {
    name: 'POST batches',
    may: 'cook',
    send: (a) =>
      a.post(`${lookups.base}/batches`).send({
        productId: lookups.product('Pickled Beets').id,
        recipeId: lookups.recipe('Pickled beets').id,
        cannedOn: '2026-07-01',
        jarSize: 'pint',
        jarsFilled: 2,
        jarsSealed: 2,
        method: 'boiling-water',
      }),
  },
  {
    name: 'POST a batch photo',
    may: 'cook',
    send: async (a) =>
      a
        .post(`${lookups.base}/batches/${(await lookups.sealedJars('Pickled Beets'))[0].batchId}/photo`)
        .attach('photo', Buffer.from(ONE_PIXEL_PNG, 'base64'), 'beets.png'),
  },
  { name: 'GET jars', may: 'read', send: (a) => a.get(`${lookups.base}/jars?state=sealed`) },
  {
    name: 'GET a jar by code',
    may: 'read',
    send: async (a) => a.get(`${lookups.base}/jars/by-code/${(await lookups.sealedJars())[0].code}`),
  },
  {
    name: 'POST open',
    may: 'handleJars',
    send: async (a) => a.post(`${lookups.base}/jars/${await jarFor('sealed')}/open`),
  },
  {
    name: 'POST finish',
    may: 'handleJars',
    send: async (a) => a.post(`${lookups.base}/jars/${await jarFor('opened')}/finish`),
  },
  {
    name: 'POST discard',
    may: 'handleJars',
    send: async (a) => a.post(`${lookups.base}/jars/${await jarFor('sealed')}/discard`),
  },
  { name: 'GET shelf.csv', may: 'read', send: (a) => a.get(`${lookups.base}/shelf.csv`) },
  {
    name: 'POST shelf/import (preview)',
    may: 'cook',
    send: (a) =>
      a.post(`${lookups.base}/shelf/import`).send({
        csv: 'product,canned_on,jar_size,jars_filled,jars_sealed,method\nPickled Beets,2026-07-02,pint,2,2,boiling-water\n',
      }),
  },
];

// A 1x1 PNG (the smallest valid image), so the photo route has real image bytes to sniff.
const ONE_PIXEL_PNG =
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==';

describe.each(ROUTES)('$name', (route) => {
  it.each(PEOPLE)('answers %s as the role allows', async (who) => {
    const response = await route.send(await ctx.signedIn(who), who);
    if (who === 'neighbor@larderly.test') {
      expect(response.status).toBe(404);
      expect(JSON.stringify(response.body)).not.toMatch(/Calloway|Pickled Beets|Beets/);
    } else if (ALLOWED[route.may].includes(who)) {
      expect(response.status, JSON.stringify(response.body)).toBeLessThan(300);
    } else {
      expect(response.status).toBe(403);
      expect((response.body as { error: { code: string } }).error.code).toBe('forbidden');
    }
  });
});

describe('signed out and cross-household ids', () => {
  it('answers 401 to a signed-out request', async () => {
    expect((await ctx.request.get(`${lookups.base}/jars`)).status).toBe(401);
    expect((await ctx.request.get(`/api/jars/by-code/ABC123`)).status).toBe(401);
  });

  it("answers 404 when the neighbour acts on a Calloway jar through their own household's address", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const jar = (await lookups.sealedJars())[0];
    const own = `/api/households/${ctx.neighbourHouseholdId}`;
    expect((await neighbour.post(`${own}/jars/${jar.id}/open`)).status).toBe(404);
    expect((await neighbour.get(`${own}/jars/by-code/${jar.code}`)).status).toBe(404);
    expect((await neighbour.get(`/api/jars/by-code/${jar.code}`)).status).toBe(404);
    expect((await neighbour.get(`${own}/products/${lookups.product('Pickled Beets').id}`)).status).toBe(404);
    expect((await neighbour.get(`${own}/batches/${jar.batchId}`)).status).toBe(404);
  });

  it("lists only the household's own products", async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const names = (await neighbour.get(`/api/households/${ctx.neighbourHouseholdId}/products`)).body.products.map(
      (p: { name: string }) => p.name,
    );
    expect(names).toEqual(['Crabapple Jelly', 'Marsh End Bread Pickles']);
  });
});
