import { randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BackupTable, HouseholdBackup } from '../../shared/schemas/backup';
import { accountSignedIn } from '../support/accounts';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
let keeper: Awaited<ReturnType<typeof ctx.signedIn>>;
let exported: HouseholdBackup;
beforeAll(async () => {
  ctx = await demoApp();
  keeper = await ctx.signedIn('keeper@larderly.test');
  const response = await keeper.get(`/api/households/${ctx.householdId}/backup`);
  expect(response.status).toBe(200);
  exported = response.body;
});
afterAll(() => ctx.close());

/** Which table each id column points into, in insert order, so a row can be named by its content. */
const REFS: [BackupTable, Record<string, BackupTable>][] = [
  ['places', {}],
  ['products', { defaultPlaceId: 'places' }],
  ['recipes', { productId: 'products' }],
  ['batches', { productId: 'products', recipeId: 'recipes' }],
  ['jars', { batchId: 'batches', productId: 'products', placeId: 'places' }],
  ['jarEvents', { jarId: 'jars', batchId: 'batches' }],
  ['meals', {}],
  ['mealProducts', { mealId: 'meals', productId: 'products' }],
  ['planEntries', { mealId: 'meals' }],
  ['pairings', { planEntryId: 'planEntries', productId: 'products' }],
  ['todos', { productId: 'products' }],
  ['jarStock', {}],
];

/** Each table as a sorted list of rows with ids replaced by what they point to: equal files give equal lists. */
function byContent(backup: HouseholdBackup) {
  const names = new Map<string, string>();
  const tables: Record<string, string[]> = {};
  for (const [table, refs] of REFS) {
    const rows = (backup[table] as Record<string, unknown>[]).map((row) => {
      // Label codes are kept only where free, so two households' copies differ in them.
      const { id, code: _code, ...rest } = row;
      for (const [column, target] of Object.entries(refs))
        if (rest[column] !== null) rest[column] = `${target}:${names.get(String(rest[column]))}`;
      if (rest.batchPlan) {
        const plan = rest.batchPlan as Record<string, unknown>;
        rest.batchPlan = {
          ...plan,
          productId: names.get(String(plan.productId)),
          recipeId: names.get(String(plan.recipeId)),
        };
      }
      const name = JSON.stringify(rest);
      names.set(String(id), name);
      return name;
    });
    tables[table] = rows.sort();
  }
  return tables;
}

async function householdCount() {
  const [row] = await ctx.sequelize.query<{ n: string }>('SELECT count(*) AS n FROM households', {
    type: QueryTypes.SELECT,
  });
  return Number(row!.n);
}

describe('household backup', () => {
  it('exports every table of the household, and no secret', async () => {
    expect(exported).toMatchObject({
      format: 'larderly-household-backup',
      version: 1,
      household: { name: 'Calloway Hollow', altitudeFt: 2350 },
    });
    for (const [table] of REFS) expect((exported[table] as unknown[]).length, table).toBeGreaterThan(0);
    const text = JSON.stringify(exported);
    for (const secret of [
      'passwordHash',
      'password_hash',
      'tokenHash',
      'token_hash',
      'p256dh',
      'session',
      '@larderly.test',
      '$2a$',
      '$2b$',
    ]) {
      expect(text, `the backup must not hold ${secret}`).not.toContain(secret);
    }
    const [neighbourProduct] = await ctx.sequelize.query<{ name: string }>(
      'SELECT name FROM products WHERE household_id = $1 LIMIT 1',
      {
        bind: [ctx.neighbourHouseholdId],
        type: QueryTypes.SELECT,
      },
    );
    expect(text).not.toContain(neighbourProduct!.name);
  });

  it('imports into a new household that the importer keeps, equal to the first but for ids and label codes', async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const imported = await neighbour.post('/api/households/import').send(exported);
    expect(imported.status, imported.text).toBe(201);
    const newId = imported.body.household.id as string;
    expect(newId).not.toBe(ctx.householdId);
    expect(imported.body.counts.jars).toBe(exported.jars.length);

    const again = await neighbour.get(`/api/households/${newId}/backup`);
    expect(again.status).toBe(200);
    const copy = again.body as HouseholdBackup;
    expect(copy.household).toEqual(exported.household);
    expect(byContent(copy)).toEqual(byContent(exported));

    const ids = (b: HouseholdBackup) => new Set(REFS.flatMap(([t]) => (b[t] as { id: string }[]).map((r) => r.id)));
    const shared = [...ids(copy)].filter((id) => ids(exported).has(id));
    expect(shared, 'ids are new').toEqual([]);
    const members = await neighbour.get(`/api/households/${newId}/members`);
    expect(members.body.members).toEqual([
      expect.objectContaining({ email: 'neighbor@larderly.test', role: 'keeper' }),
    ]);
    // The first household cannot see the copy.
    expect((await keeper.get(`/api/households/${newId}/products`)).status).toBe(404);
  });

  it('keeps each jar’s label code on import when no jar holds it, and gives a fresh one when one does', async () => {
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const codes = (b: HouseholdBackup) => b.jars.map((jar) => jar.code).sort();
    expect(
      codes(exported).every((code) => /^[0-9A-HJKMNP-TV-Z]{6}$/.test(code ?? '')),
      'the export carries every label code',
    ).toBe(true);

    // The first household still holds its codes, so its copy gets fresh ones.
    const first = await neighbour.post('/api/households/import').send(exported);
    expect(first.status, first.text).toBe(201);
    const copy = (await neighbour.get(`/api/households/${first.body.household.id}/backup`)).body as HouseholdBackup;
    expect(codes(copy).filter((code) => codes(exported).includes(code))).toEqual([]);

    // The copy is lost (its rows gone), then restored from its backup: the labels on its jars still open them.
    await ctx.sequelize.query('DELETE FROM households WHERE id = $1', { bind: [first.body.household.id] });
    const restored = await neighbour.post('/api/households/import').send(copy);
    expect(restored.status, restored.text).toBe(201);
    const again = (await neighbour.get(`/api/households/${restored.body.household.id}/backup`)).body as HouseholdBackup;
    expect(codes(again)).toEqual(codes(copy));
    const someJar = copy.jars[0]!;
    const opened = await neighbour.get(`/api/jars/by-code/${someJar.code}`);
    expect(opened.status, opened.text).toBe(200);
  });

  it('refuses a file that does not fit together and writes nothing', async () => {
    const before = await householdCount();
    const dangling = structuredClone(exported);
    dangling.jars[0]!.batchId = '00000000-0000-4000-8000-000000000000';
    const refused = await keeper.post('/api/households/import').send(dangling);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/jars\.batchId/);

    const unsealable = structuredClone(exported);
    unsealable.batches[0]!.jarsSealed = unsealable.batches[0]!.jarsFilled + 1;
    const broken = await keeper.post('/api/households/import').send(unsealable);
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('invalid_input');

    const notOurs = await keeper.post('/api/households/import').send({ format: 'something-else' });
    expect(notOurs.status).toBe(400);
    expect(await householdCount()).toBe(before);
  });

  it('accepts a file over 1 MB on the import route only, and refuses one over 10 MB with 413', async () => {
    // Many more jar events than the demo has: a long-kept household's history.
    const events = exported.jarEvents;
    const overOneMb = JSON.stringify({
      ...exported,
      jarEvents: [
        ...events,
        ...Array.from({ length: 9000 }, (_, i) => ({ ...events[i % events.length]!, id: randomUUID() })),
      ],
    });
    expect(overOneMb.length).toBeGreaterThan(1024 * 1024);
    const accepted = await keeper
      .post('/api/households/import')
      .set('Content-Type', 'application/json')
      .send(overOneMb);
    expect(accepted.status, accepted.text.slice(0, 300)).toBe(201);

    const tooBig = await keeper
      .post('/api/households/import')
      .set('Content-Type', 'application/json')
      .send(`{"pad":"${'x'.repeat(10 * 1024 * 1024 + 10)}"}`);
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error.code).toBe('too_large');
    const elsewhere = await keeper
      .post(`/api/households/${ctx.householdId}/todos`)
      .set('Content-Type', 'application/json')
      .send(`{"title":"${'x'.repeat(1024 * 1024 + 10)}"}`);
    expect(elsewhere.status).toBe(413);
  });

  it('keeps the export to keepers and the import to signed-in people', async () => {
    expect(
      (await (await ctx.signedIn('cook@larderly.test')).get(`/api/households/${ctx.householdId}/backup`)).status,
    ).toBe(403);
    expect((await ctx.request.post('/api/households/import').send(exported)).status).toBe(401);
  });
});

describe('one limit per value, shared by every entry point', () => {
  it('a household with every value at its limit exports a backup that imports', async () => {
    const { LIMITS } = await import('../../shared/schemas/limits');
    // Sign-up's own limits are pinned in sign-up.test.ts; this starts from the account it makes.
    const { agent, me } = await accountSignedIn(ctx.app, {
      email: `limits-${Date.now()}@example.test`,
      password: 'long enough password',
      name: 'N'.repeat(LIMITS.length.personName),
      householdName: 'H'.repeat(LIMITS.length.householdName),
    });
    const hid = me.memberships[0].householdId;
    const base = `/api/households/${hid}`;
    const ok = async (response: PromiseLike<import('supertest').Response>, status: number) => {
      const res = await response;
      expect(res.status, JSON.stringify(res.body)).toBe(status);
      return res.body;
    };
    await ok(
      agent.patch(base).send({
        altitudeFt: LIMITS.altitudeFt.max,
        bestQualityMonths: LIMITS.bestQualityMonths,
        cannerCapacityJars: LIMITS.cannerCapacityJars,
      }),
      200,
    );
    const name = 'P'.repeat(LIMITS.length.productName);
    const { product } = await ok(
      agent.post(`${base}/products`).send({
        name,
        kind: 'pickle',
        heat: LIMITS.heat,
        minJars: LIMITS.minJars,
        useWithinDays: LIMITS.useWithinDays,
        notes: 'n'.repeat(LIMITS.length.notes),
      }),
      201,
    );
    await ok(
      agent.post(`${base}/recipes`).send({
        productId: product.id,
        name: 'R'.repeat(LIMITS.length.recipeName),
        yieldJars: LIMITS.recipeYieldJars,
        yieldJarSize: 'pint',
        ingredients: Array.from({ length: LIMITS.ingredientsPerRecipe }, (_, i) => ({
          name: `${i}`.padEnd(LIMITS.length.ingredientName, 'i'),
          amount: LIMITS.ingredientAmount,
          unit: 'g',
          role: 'other',
        })),
        acidified: true,
        method: 'boiling-water',
        baseMinutes: { pint: LIMITS.processingMinutes },
        altitudeTable: Array.from({ length: LIMITS.altitudeRows }, (_, i) => ({
          upToFt: i * 1000,
          addMinutes: LIMITS.processingMinutes,
        })),
        headspaceInches: LIMITS.headspaceInches,
        steps: 's'.repeat(LIMITS.length.steps),
        source: 'u'.repeat(LIMITS.length.source),
      }),
      201,
    );
    // The CSV import at its limits: the most jars in one batch, and the most minutes a batch can carry.
    const csv = `product,canned_on,jar_size,jars_filled,jars_sealed,method,minutes,notes\n${name},2025-09-01,pint,${LIMITS.jarsPerBatch},${LIMITS.jarsPerBatch},boiling-water,${LIMITS.batchMinutes},${'n'.repeat(LIMITS.length.notes)}`;
    await ok(agent.post(`${base}/shelf/import`).send({ csv, commit: true }), 201);
    await ok(
      agent.post(`${base}/meals`).send({
        name: 'M'.repeat(LIMITS.length.mealName),
        tags: Array.from({ length: LIMITS.mealTags }, (_, i) => `${i}`.padEnd(LIMITS.length.mealTag, 't')),
        usualServings: LIMITS.servings,
        notes: 'n'.repeat(LIMITS.length.notes),
        products: [{ productId: product.id, tbspPerServing: LIMITS.tbspPerServing }],
      }),
      201,
    );
    await ok(
      agent
        .post(`${base}/todos`)
        .send({ title: 'T'.repeat(LIMITS.length.todoTitle), notes: 'n'.repeat(LIMITS.length.todoNotes) }),
      201,
    );

    const backup = await ok(agent.get(`${base}/backup`), 200);
    expect(backup.batches[0]).toMatchObject({ minutes: LIMITS.batchMinutes, jarsFilled: LIMITS.jarsPerBatch });
    const imported = await ok(agent.post('/api/households/import').send(backup), 201);
    expect(imported.counts).toMatchObject({
      products: 1,
      recipes: 1,
      batches: 1,
      jars: LIMITS.jarsPerBatch,
      meals: 1,
      todos: 1,
    });
  });
});

describe('a restock to-do’s batch plan in a backup', () => {
  it('is checked field by field on import: a free-form plan is refused with where it is wrong, and nothing is written', async () => {
    const index = exported.todos.findIndex((todo) => todo.batchPlan);
    expect(index).toBeGreaterThanOrEqual(0);
    const before = await householdCount();
    const freeForm = structuredClone(exported);
    // What once took down the to-do page: ids that fit, the rest of the plan anything at all.
    freeForm.todos[index].batchPlan = {
      productId: exported.todos[index].batchPlan!.productId,
      recipeId: exported.todos[index].batchPlan!.recipeId,
      plannedOn: 'next spring',
      jars: 'many',
    } as never;
    const refused = await keeper.post('/api/households/import').send(freeForm);
    expect(refused.status).toBe(400);
    expect(Object.keys(refused.body.error.fields)).toEqual(
      expect.arrayContaining([
        `todos.${index}.batchPlan.plannedOn`,
        `todos.${index}.batchPlan.jars`,
        `todos.${index}.batchPlan.processing`,
      ]),
    );
    const badDate = structuredClone(exported);
    badDate.todos[index].batchPlan!.targetOn = '2026-02-30';
    expect((await keeper.post('/api/households/import').send(badDate)).status).toBe(400);
    expect(await householdCount()).toBe(before);
  });
});

describe('backup import limits', () => {
  it('limits imports per person (10 an hour), whether the file is good or not', async () => {
    const { agent } = await accountSignedIn(ctx.app, {
      email: `imports-${Date.now()}@example.test`,
      password: 'long enough password',
      name: 'Ivo',
      householdName: 'Ivo Larder',
    });
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1)
      statuses.push((await agent.post('/api/households/import').send({ format: 'not-a-backup' })).status);
    expect(statuses).toEqual([...Array(10).fill(400), 429]);
    expect((await agent.post('/api/households/import').send(exported)).body.error.message).toBe(
      'Too many imports. Wait 60 minutes, then try again.',
    );
  });
});
