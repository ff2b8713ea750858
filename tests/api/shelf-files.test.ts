import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
    await keeper.patch(`${lookups.base}/products/${lookups.product('Plum Ketchup').id}`).send({ name: '=HYPERLINK("x")' });
    const response = await keeper.get(`${lookups.base}/shelf.csv`).buffer(true).parse((res, done) => {
      let text = '';
      res.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
      res.on('end', () => done(null, text));
    });
    await keeper.patch(`${lookups.base}/products/${lookups.product('Plum Ketchup').id}`).send({ name: 'Plum Ketchup' });
    expect(response.headers['content-type']).toMatch(/text\/csv/);
    expect(response.headers['content-disposition']).toMatch(/attachment; filename="larderly-shelf-calloway-hollow.csv"/);
    const parsed = Papa.parse<Record<string, string>>(String(response.body).replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: true });
    const onHand = (await keeper.get(`${lookups.base}/jars`)).body.jars as { code: string }[];
    expect(parsed.data.map((row) => row.jar_code).sort()).toEqual(onHand.map((j) => j.code).sort());
    expect(parsed.meta.fields).toEqual(expect.arrayContaining(['jar_code', 'product', 'state', 'canned_on', 'best_by', 'use_by']));
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
    const csv = [header, 'Quince Paste,,2025-10-01,pint,4,4,boiling-water,,', 'Pickled Beets,,2025-02-30,pint,4,4,boiling-water,,', 'Pickled Beets,,2025-10-01,pint,4,5,boiling-water,,'].join('\n');
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
    const response = await cook.post(`${lookups.base}/shelf/import`).send({ csv: [header, ...good].join('\r\n'), commit: true });
    expect(response.status).toBe(201);
    expect(response.body).toEqual({ imported: 2, jars: 13 });
    expect(await lookups.counts()).toEqual({ batches: before.batches + 2, jars: before.jars + 13 });
  });

  it('refuses a file without the needed columns', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const { problems } = (await cook.post(`${lookups.base}/shelf/import`).send({ csv: 'name,date\nBeets,2025-01-01' })).body;
    expect(problems[0]).toMatchObject({ row: 1, message: expect.stringMatching(/needs the columns product, canned_on/) });
  });
});
