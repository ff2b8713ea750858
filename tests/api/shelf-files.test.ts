import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { accountSignedIn } from '../support/accounts';
import { demoApp } from '../support/app';
import { shelfLookups } from './shelf-helpers';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
beforeAll(async () => {
  ctx = await demoApp();
  lookups = await shelfLookups(ctx, await ctx.signedIn('keeper@larderly.test'));
});
afterAll(() => ctx.close());

describe('shelf CSV export', () => {
  it('writes one row a jar on hand, with a header, and keeps spreadsheet formulas as text', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    await keeper
      .patch(`${lookups.base}/products/${lookups.product('Plum Ketchup').id}`)
      .send({ name: '=HYPERLINK("x")' });
    const response = await keeper
      .get(`${lookups.base}/shelf.csv`)
      .buffer(true)
      .parse((res, done) => {
        let text = '';
        res.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
        res.on('end', () => done(null, text));
      });
    await keeper.patch(`${lookups.base}/products/${lookups.product('Plum Ketchup').id}`).send({ name: 'Plum Ketchup' });
    expect(response.headers['content-type']).toMatch(/text\/csv/);
    expect(response.headers['content-disposition']).toMatch(
      /attachment; filename="larderly-shelf-calloway-hollow.csv"/,
    );
    const parsed = Papa.parse<Record<string, string>>(String(response.body).replace(/^\uFEFF/, ''), {
      header: true,
      skipEmptyLines: true,
    });
    const onHand = (await keeper.get(`${lookups.base}/jars`)).body.jars as { code: string }[];
    expect(parsed.data.map((row) => row.jar_code).sort()).toEqual(onHand.map((j) => j.code).sort());
    expect(parsed.meta.fields).toEqual(
      expect.arrayContaining(['jar_code', 'product', 'state', 'canned_on', 'best_by', 'use_by']),
    );
    expect(parsed.data.some((row) => row.product === `'=HYPERLINK("x")`)).toBe(true);
  });
});

describe('batch CSV import', () => {
  const header = 'product,recipe,canned_on,jar_size,jars_filled,jars_sealed,method,minutes,notes';
  const good = [
    'Pickled Beets,Pickled beets,2025-09-14,pint,7,7,boiling-water,,From the old notebook',
    'Hot Pepper Jelly,,2025-08-30,half-pint,6,5,boiling-water,5,',
  ];

  it('previews the rows with their computed minutes and writes nothing', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const before = await lookups.counts();
    const response = await cook.post(`${lookups.base}/shelf/import`).send({ csv: [header, ...good].join('\n') });
    expect(response.status).toBe(200);
    expect(response.body.problems).toEqual([]);
    expect(response.body.rows).toEqual([
      expect.objectContaining({ row: 2, productName: 'Pickled Beets', recipeName: 'Pickled beets', minutes: 35 }),
      expect.objectContaining({ row: 3, productName: 'Hot Pepper Jelly', recipeName: null, minutes: 5 }),
    ]);
    expect(await lookups.counts()).toEqual(before);
  });

  it('writes nothing when one row is bad, and names the row and what is wrong', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const before = await lookups.counts();
    const csv = [header, ...good, 'Pickled Beets,,2025-10-01,gallon-jug,4,4,boiling-water,,'].join('\n');
    const response = await cook.post(`${lookups.base}/shelf/import`).send({ csv, commit: true });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/^Nothing was imported\. Row 4: Use one of: quarter-pint/);
    expect(response.body.error.details.problems).toEqual([{ row: 4, field: 'jar_size', message: expect.any(String) }]);
    expect(await lookups.counts()).toEqual(before);
  });

  it('names every problem: an unknown product, a bad date, more sealed than filled', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const csv = [
      header,
      'Quince Paste,,2025-10-01,pint,4,4,boiling-water,,',
      'Pickled Beets,,2025-02-30,pint,4,4,boiling-water,,',
      'Pickled Beets,,2025-10-01,pint,4,5,boiling-water,,',
    ].join('\n');
    const { problems } = (await cook.post(`${lookups.base}/shelf/import`).send({ csv })).body;
    expect(problems.map((p: { row: number; field: string }) => [p.row, p.field])).toEqual([
      [2, 'product'],
      [3, 'canned_on'],
      [4, 'jars_sealed'],
    ]);
  });

  it('imports a valid file in one go: the batches and a jar for each one filled', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const before = await lookups.counts();
    const response = await cook
      .post(`${lookups.base}/shelf/import`)
      .send({ csv: [header, ...good].join('\r\n'), commit: true });
    expect(response.status).toBe(201);
    expect(response.body).toEqual({ imported: 2, jars: 13 });
    expect(await lookups.counts()).toEqual({ batches: before.batches + 2, jars: before.jars + 13 });
  });

  it('refuses a file without the needed columns', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const { problems } = (await cook.post(`${lookups.base}/shelf/import`).send({ csv: 'name,date\nBeets,2025-01-01' }))
      .body;
    expect(problems[0]).toMatchObject({
      row: 1,
      message: expect.stringMatching(/needs the columns product, canned_on/),
    });
  });
});

/** A person of their own, with a fresh household whose altitude is confirmed: "another household". */
async function freshHousehold(tag: string) {
  const email = `${tag}-${Date.now()}@example.test`;
  const { agent, me } = await accountSignedIn(ctx.app, {
    email,
    password: 'long enough password',
    name: 'Wren',
    householdName: `Wren ${tag}`,
  });
  const hid = me.memberships[0].householdId;
  const home = (await (await ctx.signedIn('keeper@larderly.test')).get(`/api/households/${ctx.householdId}`)).body
    .household as { altitudeFt: number };
  expect((await agent.patch(`/api/households/${hid}`).send({ altitudeFt: home.altitudeFt })).status).toBe(200);
  return { agent, base: `/api/households/${hid}` };
}

const csvText = (res: import('supertest').Response) => String(res.text ?? res.body).replace(/^\uFEFF/, '');

describe('shelf CSV round trip', () => {
  /** The shelf as a person sees it, without ids and label codes (another household's jars get codes of their own). */
  async function shelfOf(agent: import('supertest').Agent, base: string) {
    const jars = (await agent.get(`${base}/jars?state=all`)).body.jars as Record<string, unknown>[];
    return jars
      .map(
        ({
          productName,
          productKind,
          state,
          unsealed,
          bestBy,
          openedOn,
          useBy,
          finishedOn,
          discardedOn,
          cannedOn,
          jarSize,
          batchNotes,
          pastBestQuality,
          remainingTbsp,
          placeName,
        }) =>
          JSON.stringify({
            productName,
            productKind,
            state,
            unsealed,
            bestBy,
            openedOn,
            useBy,
            finishedOn,
            discardedOn,
            cannedOn,
            jarSize,
            batchNotes,
            pastBestQuality,
            remainingTbsp,
            placeName,
          }),
      )
      .sort();
  }

  it('imports the shelf’s own export into another household and gives the same shelf', async () => {
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const exported = await keeper.get(`${lookups.base}/shelf.csv?jars=all`).buffer(true);
    expect(exported.status).toBe(200);
    const csv = csvText(exported);
    // The file speaks the screens' words.
    expect(csv).toMatch(/"Boiling-water canner"/);
    expect(csv).not.toMatch(/"boiling-water"/);

    const other = await freshHousehold('round-trip');
    const preview = await other.agent.post(`${other.base}/shelf/import`).send({ csv });
    expect(preview.body.problems).toEqual([]);
    const imported = await other.agent.post(`${other.base}/shelf/import`).send({ csv, commit: true });
    expect(imported.status).toBe(201);
    expect(imported.body.jars).toBe(csv.trim().split('\r\n').length - 1);
    expect(await shelfOf(other.agent, other.base)).toEqual(await shelfOf(keeper, lookups.base));
    // The places came by name: the other household now has the same places, each holding the same jars.
    const placeNames = async (agent: import('supertest').Agent, base: string) =>
      ((await agent.get(`${base}/places`)).body.places as { name: string; sealedJars: number }[])
        .map(({ name, sealedJars }) => `${name}: ${sealedJars}`)
        .sort();
    expect(await placeNames(other.agent, other.base)).toEqual(await placeNames(keeper, lookups.base));
    expect((await placeNames(other.agent, other.base)).length).toBeGreaterThan(1);

    // The same batches, canned together as before, and the file exported again reads the same but for label codes.
    const batches = async (agent: import('supertest').Agent, base: string) =>
      ((await agent.get(`${base}/batches`)).body.batches as Record<string, unknown>[])
        .map(({ productName, cannedOn, jarSize, jarsFilled, jarsSealed, method, minutes }) =>
          JSON.stringify({ productName, cannedOn, jarSize, jarsFilled, jarsSealed, method, minutes }),
        )
        .sort();
    expect(await batches(other.agent, other.base)).toEqual(await batches(keeper, lookups.base));
    const again = csvText(await other.agent.get(`${other.base}/shelf.csv?jars=all`).buffer(true));
    const withoutCodes = (text: string) =>
      Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true })
        .data.map(({ jar_code: _c, batch: _b, ...rest }) => JSON.stringify(rest))
        .sort();
    expect(withoutCodes(again)).toEqual(withoutCodes(csv));
  });

  it('accepts the words the screens show as well as the ids', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const csv = [
      'product,canned_on,jar_size,jars_filled,jars_sealed,method,minutes',
      'Hot Pepper Jelly,2025-08-30,12-ounce,6,6,Boiling-water canner,10',
      'Hot Pepper Jelly,2025-08-31,twelve-ounce,6,6,boiling-water,10',
      'Hot Pepper Jelly,2025-09-01,Pint-and-a-half,2,2,"Pressure canner, dial gauge",25',
      'Hot Pepper Jelly,2025-09-02,HALF-PINT,4,4,"pressure canner, weighted gauge",25',
    ].join('\n');
    const { rows, problems } = (await cook.post(`${lookups.base}/shelf/import`).send({ csv })).body;
    expect(problems).toEqual([]);
    expect(rows.map((r: { jarSize: string; method: string }) => [r.jarSize, r.method])).toEqual([
      ['twelve-ounce', 'boiling-water'],
      ['twelve-ounce', 'boiling-water'],
      ['pint-and-half', 'pressure-dial'],
      ['half-pint', 'pressure-weighted'],
    ]);
    const wrong = (
      await cook.post(`${lookups.base}/shelf/import`).send({
        csv: 'product,canned_on,jar_size,jars_filled,jars_sealed,method\nHot Pepper Jelly,2025-08-30,gallon,1,1,kettle',
      })
    ).body.problems;
    expect(wrong).toEqual([
      {
        row: 2,
        field: 'jar_size',
        message: 'Use one of: quarter-pint, half-pint, 12-ounce, pint, pint-and-a-half, quart, half-gallon.',
      },
      {
        row: 2,
        field: 'method',
        message:
          'Use one of: Boiling-water canner, Atmospheric steam canner, Pressure canner, dial gauge, Pressure canner, weighted gauge.',
      },
    ]);
  });

  it('puts a batch row’s jars in the place it names, adding a place the household does not have yet', async () => {
    const other = await freshHousehold('places');
    const made = (await other.agent.post(`${other.base}/places`).send({ name: 'Larder' })).body.place;
    const csv = [
      'product,kind,canned_on,jar_size,jars_filled,jars_sealed,method,minutes,place',
      'Quince Paste,Fruit butter,2025-10-01,half-pint,4,4,Boiling-water canner,10,larder',
      'Quince Paste,Fruit butter,2025-10-02,half-pint,2,2,Boiling-water canner,10,Shed shelf',
      'Quince Paste,Fruit butter,2025-10-03,half-pint,1,1,Boiling-water canner,10,',
    ].join('\n');
    expect((await other.agent.post(`${other.base}/shelf/import`).send({ csv, commit: true })).status).toBe(201);
    const places = (await other.agent.get(`${other.base}/places`)).body.places as {
      id: string;
      name: string;
      sealedJars: number;
    }[];
    // "larder" is the household's Larder (names match in any case); "Shed shelf" is added.
    expect(places.map(({ name, sealedJars }) => ({ name, sealedJars }))).toEqual([
      { name: 'Larder', sealedJars: 4 },
      { name: 'Shed shelf', sealedJars: 2 },
    ]);
    expect(places[0]!.id).toBe(made.id);
    const jars = (await other.agent.get(`${other.base}/jars?placeId=none`)).body.jars as { cannedOn: string }[];
    expect(jars.map((j) => j.cannedOn)).toEqual(['2025-10-03']);

    const long = csv.replace('Shed shelf', 'x'.repeat(61));
    const { problems } = (await other.agent.post(`${other.base}/shelf/import`).send({ csv: long })).body;
    expect(problems).toEqual([{ row: 3, field: 'place', message: 'Use at most 60 characters for a place.' }]);
  });

  it('adds a product the household does not have when the row gives its kind', async () => {
    const other = await freshHousehold('new-product');
    const csv =
      'product,kind,canned_on,jar_size,jars_filled,jars_sealed,method,minutes\nQuince Paste,Fruit butter,2025-10-01,half-pint,4,3,Boiling-water canner,10';
    expect((await other.agent.post(`${other.base}/shelf/import`).send({ csv, commit: true })).status).toBe(201);
    const products = (await other.agent.get(`${other.base}/products`)).body.products as {
      name: string;
      kind: string;
    }[];
    expect(products).toEqual([expect.objectContaining({ name: 'Quince Paste', kind: 'fruit-butter' })]);
  });

  it('takes the formula guard off again, so a guarded name matches its product', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const csv = `product,canned_on,jar_size,jars_filled,jars_sealed,method\n"'=Hot Pepper Jelly",2025-08-30,pint,1,1,boiling-water`;
    const { problems } = (await cook.post(`${lookups.base}/shelf/import`).send({ csv })).body;
    // "=Hot Pepper Jelly" is not a product here: the apostrophe the export adds is not part of the name.
    expect(problems).toEqual([
      expect.objectContaining({ field: 'product', message: expect.stringContaining('“=Hot Pepper Jelly”') }),
    ]);
  });
});

describe('one limit per value', () => {
  it('refuses minutes and jars past the shared limits, naming them', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const header = 'product,canned_on,jar_size,jars_filled,jars_sealed,method,minutes';
    const { problems } = (
      await cook
        .post(`${lookups.base}/shelf/import`)
        .send({ csv: `${header}\nHot Pepper Jelly,2025-08-30,pint,201,1,boiling-water,1201` })
    ).body;
    expect(problems).toEqual([
      { row: 2, field: 'minutes', message: 'Use at most 1,200 minutes.' },
      { row: 2, field: 'jars_filled', message: 'Use at most 200 jars.' },
    ]);
  });
});

describe('CSV import limits', () => {
  it('limits checks and imports per person', async () => {
    const other = await freshHousehold('import-limit');
    const statuses: number[] = [];
    for (let i = 0; i < 61; i += 1)
      statuses.push((await other.agent.post(`${other.base}/shelf/import`).send({ csv: 'x' })).status);
    expect(statuses.slice(0, 60).every((status) => status === 200)).toBe(true);
    const refused = await other.agent.post(`${other.base}/shelf/import`).send({ csv: 'x' });
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toBe('Too many CSV imports and checks. Wait 60 minutes, then try again.');
  });
});
