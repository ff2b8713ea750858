import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { addDays, defaultUseWithinDays, REPROCESS_WITHIN_HOURS, SEAL_CHECK_AFTER_HOURS } from '../../shared/domain';
import { CANNING_CAUTION_SENTENCE } from '../../shared/words';
import { Product, ReminderDelivery } from '../../server/db/models';
import { clock, todayIn } from '../../server/services/clock';
import { sweepReminders } from '../../server/services/reminders';
import { demoApp } from '../support/app';
import { instantAt } from '../support/household-time';
import { browserPushKeys } from '../support/push-keys';
import { startStandIns, type StandIns } from '../support/stand-ins';
import { shelfLookups } from './shelf-helpers';

// The demo household keeps New York time at 2,350 ft.
const ZONE = 'America/New_York';
const HOUR = 3_600_000;

let standIns: StandIns;
let ctx: Awaited<ReturnType<typeof demoApp>>;
let lookups: Awaited<ReturnType<typeof shelfLookups>>;
const browser = browserPushKeys();
let endpoint: string;
beforeAll(async () => {
  standIns = await startStandIns();
  ctx = await demoApp(standIns.env);
  const cook = await ctx.signedIn('cook@larderly.test');
  lookups = await shelfLookups(ctx, cook);
  endpoint = standIns.push.newEndpoint();
  expect(
    (await cook.post('/api/push/subscriptions').send({ endpoint, expirationTime: null, keys: browser.keys })).status,
  ).toBe(201);
});
afterAll(async () => {
  await ctx.close();
  await standIns.close();
});
const realNow = clock.now;
afterEach(() => {
  clock.now = realNow;
});

const at = (instant: Date) => {
  clock.now = () => instant;
};
/** Today at `hour` in the household's time zone: when the jars come out of the canner. */
const processingAt = (hour: number, daysAgo = 0) => instantAt(addDays(todayIn(ZONE), -daysAgo), hour, 0, ZONE);
const later = (from: Date, hours: number, minutes = 0) => new Date(from.getTime() + hours * HOUR + minutes * 60_000);

/** A batch of pickled beets recorded as it comes out of the canner, its seals still to check. */
async function justProcessed(
  processedAt: Date,
  jars = 6,
  email: 'cook@larderly.test' | 'keeper@larderly.test' = 'cook@larderly.test',
) {
  at(processedAt);
  const agent = await ctx.signedIn(email);
  const response = await agent.post(`${lookups.base}/batches`).send({
    productId: lookups.product('Pickled Beets').id,
    recipeId: lookups.recipe('Pickled beets').id,
    cannedOn: todayIn(ZONE, processedAt),
    jarSize: 'pint',
    jarsFilled: jars,
    jarsSealed: jars,
    method: 'boiling-water',
    seals: 'to-check',
  });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return {
    agent,
    batchId: response.body.batch.id as string,
    jars: response.body.jars as { id: string; code: string; seal: string; state: string }[],
    plan: response.body.plan,
  };
}

const detail = async (batchId: string) =>
  (await (await ctx.signedIn('keeper@larderly.test')).get(`${lookups.base}/batches/${batchId}`)).body.batch;
const sealPushes = () =>
  standIns.push
    .receivedBy(endpoint)
    .map((p) => browser.read(p))
    .filter((m) => /seals/.test(m.title));
const sealMails = () => standIns.mail.to('cook@larderly.test').filter((m) => /seals/.test(m.subject));

describe('the seal check after processing', () => {
  it('records every jar sealed with its seal to check, the first processing, and lists the batch on Today (USDA Complete Guide 2015: 12 to 24 hours undisturbed)', async () => {
    const processedAt = processingAt(10);
    const { agent, batchId, jars } = await justProcessed(processedAt);
    expect(jars.map((j) => [j.state, j.seal])).toEqual(Array(6).fill(['sealed', 'to-check']));
    const batch = await detail(batchId);
    expect(batch.processings).toMatchObject([
      { number: 1, jars: 6, processedAt: processedAt.toISOString(), altitudeFt: 2350, who: expect.any(String) },
    ]);
    expect(batch.sealCheck).toMatchObject({
      processingNumber: 1,
      checkFrom: later(processedAt, SEAL_CHECK_AFTER_HOURS).toISOString(),
      reprocessUntil: later(processedAt, REPROCESS_WITHIN_HOURS).toISOString(),
    });
    expect(batch.sealCheck.jarIds).toHaveLength(6);
    const today = (await agent.get(`${lookups.base}/today`)).body;
    expect(today.sealChecks.map((c: { batchId: string }) => c.batchId)).toContain(batchId);
  });

  // The seals may have been tested before the batch is recorded (USDA Complete Guide 2015, 12 to 24 hours after);
  // an unsealed jar then goes to the fridge at once (NCHFP).
  it('keeps today’s behaviour when the seals are checked already (the default): unsealed jars go to the fridge at once (USDA 2015, NCHFP)', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(`${lookups.base}/batches`).send({
      productId: lookups.product('Pickled Beets').id,
      recipeId: lookups.recipe('Pickled beets').id,
      cannedOn: todayIn(ZONE),
      jarSize: 'pint',
      jarsFilled: 3,
      jarsSealed: 2,
      method: 'boiling-water',
    });
    expect(response.status).toBe(201);
    expect(response.body.jars.map((j: { state: string; seal: string }) => `${j.state}/${j.seal}`).sort()).toEqual([
      'opened/checked',
      'sealed/checked',
      'sealed/checked',
    ]);
    expect((await detail(response.body.batch.id)).sealCheck).toBeNull();
  });

  it('refuses seals to check for a batch dated an earlier day', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const response = await cook.post(`${lookups.base}/batches`).send({
      productId: lookups.product('Pickled Beets').id,
      recipeId: lookups.recipe('Pickled beets').id,
      cannedOn: addDays(todayIn(ZONE), -2),
      jarSize: 'pint',
      jarsFilled: 3,
      jarsSealed: 3,
      method: 'boiling-water',
      seals: 'to-check',
    });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.seals).toMatch(/checked already/);
  });

  it('refuses a check before the jars have cooled 12 hours (USDA Complete Guide 2015), saying until when', async () => {
    const processedAt = processingAt(9);
    const { agent, batchId } = await justProcessed(processedAt);
    at(later(processedAt, 11, 59));
    const response = await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({});
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/undisturbed 12 hours, until/);
  });

  // USDA Complete Guide to Home Canning (2015): the jars stand undisturbed 12 to 24 hours before their seals are tested.
  it('reminds the cook once by push and e-mail 12 hours after processing, with the canning caution (USDA Complete Guide 2015)', async () => {
    const processedAt = processingAt(8);
    const { batchId } = await justProcessed(processedAt);
    const mine = () => sealPushes().filter((m) => m.url.endsWith(batchId));
    const processing = (await detail(batchId)).processings[0];
    await sweepReminders(ctx.ctx, later(processedAt, 11, 55));
    expect(mine()).toHaveLength(0);
    await sweepReminders(ctx.ctx, later(processedAt, 12, 5));
    await sweepReminders(ctx.ctx, later(processedAt, 12, 10));
    await sweepReminders(ctx.ctx, later(processedAt, 14));
    expect(mine()).toHaveLength(1);
    expect(mine()[0]).toMatchObject({
      title: 'Check the seals of the Pickled Beets',
      url: `/h/${ctx.householdId}/batches/${batchId}`,
    });
    expect(mine()[0].body).toMatch(/6 jars of Pickled Beets have cooled 12 hours/);
    // The push carries the short canning caution: the times are the published ones, the tested recipe comes first.
    expect(mine()[0].body).toMatch(/Your tested recipe and local extension service come first\.$/);
    const mails = sealMails().filter((m) => m.text.includes(batchId));
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain(CANNING_CAUTION_SENTENCE);
    expect(await ReminderDelivery.count({ where: { processingId: processing.id } })).toBe(1);
  });

  it('waits for the reminder hour (8 by default) when the 12 hours end in the night (USDA Complete Guide 2015: 12 to 24 hours)', async () => {
    const processedAt = processingAt(18); // 12 hours later is 6 in the morning
    const { batchId } = await justProcessed(processedAt);
    const processing = (await detail(batchId)).processings[0];
    await sweepReminders(ctx.ctx, later(processedAt, 12, 5));
    await sweepReminders(ctx.ctx, later(processedAt, 13, 55));
    expect(await ReminderDelivery.count({ where: { processingId: processing.id } })).toBe(0);
    await sweepReminders(ctx.ctx, later(processedAt, 14, 5));
    expect(await ReminderDelivery.count({ where: { processingId: processing.id } })).toBe(1);
  });

  it('sends no reminder once the seals have been checked', async () => {
    const processedAt = processingAt(7);
    const { agent, batchId } = await justProcessed(processedAt);
    at(later(processedAt, 12));
    expect((await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({})).status).toBe(200);
    const processing = (await detail(batchId)).processings[0];
    await sweepReminders(ctx.ctx, later(processedAt, 13));
    expect(await ReminderDelivery.count({ where: { processingId: processing.id } })).toBe(0);
  });

  // NCHFP: a jar that did not seal is refrigerated and used like an opened jar, or reprocessed within 24 hours.
  it('by count: the jars that did not seal go to the fridge as opened jars, their use-by from the product; the rest stay sealed (NCHFP)', async () => {
    const processedAt = processingAt(6, 1);
    const { agent, batchId } = await justProcessed(processedAt);
    const checkedAt = later(processedAt, 13);
    at(checkedAt);
    const response = await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({ fridge: { count: 2 } });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(response.body).toMatchObject({ sealed: 4, toFridge: 2, reprocessed: 0, plan: null });
    const product = await Product.findByPk(lookups.product('Pickled Beets').id);
    const checkDay = todayIn(ZONE, checkedAt);
    const batch = response.body.batch;
    const inFridge = batch.jars.filter((j: { state: string }) => j.state === 'opened');
    expect(inFridge).toHaveLength(2);
    for (const jar of inFridge)
      expect(jar).toMatchObject({
        unsealed: true,
        seal: 'checked',
        openedOn: checkDay,
        useBy: addDays(checkDay, product!.useWithinDays ?? defaultUseWithinDays(product!.kind)),
      });
    expect(
      batch.jars.filter((j: { state: string; seal: string }) => j.state === 'sealed' && j.seal === 'checked'),
    ).toHaveLength(4);
    expect(batch.jarsSealed).toBe(4);
    expect(batch.sealCheck).toBeNull();
    expect(batch.history.filter((e: { kind: string }) => e.kind === 'seal-checked')).toHaveLength(4);
    expect(batch.history.filter((e: { kind: string }) => e.kind === 'unsealed')).toHaveLength(2);
    expect((await agent.get(`${lookups.base}/fridge`)).body.jars.map((j: { code: string }) => j.code)).toEqual(
      expect.arrayContaining(inFridge.map((j: { code: string }) => j.code)),
    );
    const again = await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({});
    expect(again.status).toBe(409);
  });

  it('jar by jar, within 24 hours: reprocessing writes a second processing with a new lid and the full time again, then a second check (NCHFP)', async () => {
    const processedAt = processingAt(9, 1);
    const { agent, batchId, jars, plan } = await justProcessed(processedAt, 4);
    at(later(processedAt, 20));
    const redo = [jars[0].id, jars[2].id];
    const response = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ reprocess: { jarIds: redo } });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(response.body).toMatchObject({ sealed: 2, toFridge: 0, reprocessed: 2 });
    // The same altitude rule and the full time: the reprocess plan equals the first (shared/processing-plan.ts).
    expect(response.body.plan).toMatchObject({
      allowed: true,
      minutes: plan.minutes,
      altitudeAddMinutes: plan.altitudeAddMinutes,
    });
    const batch = response.body.batch;
    expect(
      batch.processings.map((p: { number: number; jars: number; minutes: number }) => [p.number, p.jars, p.minutes]),
    ).toEqual([
      [1, 4, plan.minutes],
      [2, 2, plan.minutes],
    ]);
    expect(batch.sealCheck).toMatchObject({
      processingNumber: 2,
      reprocessUntil: null,
      checkFrom: later(processedAt, 32).toISOString(),
    });
    expect([...batch.sealCheck.jarIds].sort()).toEqual([...redo].sort());
    expect(
      batch.history
        .filter((e: { kind: string }) => e.kind === 'reprocessed')
        .map((e: { jarCode: string }) => e.jarCode)
        .sort(),
    ).toEqual([jars[0].code, jars[2].code].sort());

    // The second check: a jar that fails again goes only to the fridge (one reprocess).
    at(later(processedAt, 33));
    const twice = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ reprocess: { jarIds: [jars[0].id] } });
    expect(twice.status).toBe(422);
    expect(twice.body.error.message).toMatch(/reprocessed once already.*fridge/);
    const done = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ fridge: { jarIds: [jars[0].id] } });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ sealed: 1, toFridge: 1, reprocessed: 0 });
    expect(done.body.batch.sealCheck).toBeNull();
  });

  it('after 24 hours offers only the fridge: a reprocess answers 422 with the reason (NCHFP: reprocess within 24 hours)', async () => {
    const processedAt = processingAt(6, 2);
    const { agent, batchId } = await justProcessed(processedAt, 3);
    at(later(processedAt, 24, 1));
    expect((await detail(batchId)).sealCheck.reprocessUntil).toBeNull();
    const response = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ reprocess: { count: 1 } });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(
      /More than 24 hours have passed since the first processing.*only go to the fridge/,
    );
    expect(
      (await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({ fridge: { count: 1 } })).status,
    ).toBe(200);
  });

  it('lets a helper check seals and put jars in the fridge, but not record a reprocess', async () => {
    const processedAt = processingAt(5, 1);
    const { batchId } = await justProcessed(processedAt, 3);
    at(later(processedAt, 13));
    const helper = await ctx.signedIn('helper@larderly.test');
    expect(
      (await helper.post(`${lookups.base}/batches/${batchId}/seal-check`).send({ reprocess: { count: 1 } })).status,
    ).toBe(403);
    expect(
      (await helper.post(`${lookups.base}/batches/${batchId}/seal-check`).send({ fridge: { count: 1 } })).status,
    ).toBe(200);
  });

  it('answers 400 for a jar that is not to check, more jars than are to check, or one jar named both ways', async () => {
    const processedAt = processingAt(4, 1);
    const { agent, batchId, jars } = await justProcessed(processedAt, 3);
    at(later(processedAt, 13));
    const url = `${lookups.base}/batches/${batchId}/seal-check`;
    expect((await agent.post(url).send({ fridge: { jarIds: ['00000000-0000-4000-8000-000000000000'] } })).status).toBe(
      400,
    );
    expect((await agent.post(url).send({ fridge: { count: 4 } })).body.error.message).toMatch(
      /Only 3 jars are still to check/,
    );
    expect(
      (await agent.post(url).send({ fridge: { jarIds: [jars[0].id] }, reprocess: { jarIds: [jars[0].id] } })).status,
    ).toBe(400);
    expect((await agent.post(url).send({ fridge: { count: -1 } })).status).toBe(400);
  });

  it('waits for the cook’s own later reminder hour, then sends push and e-mail once, to the cook alone (USDA Complete Guide 2015: 12 to 24 hours)', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    expect((await cook.patch('/api/me/notifications').send({ reminderHour: 10 })).status).toBe(200);
    try {
      // Out of the canner at 8 in the evening: 12 hours later is 8 in the morning, before the cook's hour of 10.
      const processedAt = processingAt(20, 1);
      const { batchId } = await justProcessed(processedAt);
      const pushes = () => sealPushes().filter((m) => m.url.endsWith(batchId));
      const mails = () => sealMails().filter((m) => m.text.includes(batchId));
      for (const hours of [12, 13]) await sweepReminders(ctx.ctx, later(processedAt, hours, 55));
      expect([pushes().length, mails().length]).toEqual([0, 0]);
      for (const minutes of [5, 30, 55]) await sweepReminders(ctx.ctx, later(processedAt, 14, minutes));
      await sweepReminders(ctx.ctx, later(processedAt, 20));
      expect([pushes().length, mails().length]).toEqual([1, 1]);
      // The reminder is the cook's, who recorded the batch: the keeper and the helper get none of it.
      for (const other of ['keeper@larderly.test', 'helper@larderly.test'])
        expect(standIns.mail.to(other).filter((m) => m.text.includes(batchId))).toHaveLength(0);
    } finally {
      await cook.patch('/api/me/notifications').send({ reminderHour: 8 });
    }
  });

  it('still offers reprocessing a minute before the 24 hours end, and records it (NCHFP: reprocess within 24 hours)', async () => {
    const processedAt = processingAt(3, 2);
    const { agent, batchId } = await justProcessed(processedAt, 2);
    at(later(processedAt, 23, 59));
    expect((await detail(batchId)).sealCheck.reprocessUntil).toBe(
      later(processedAt, REPROCESS_WITHIN_HOURS).toISOString(),
    );
    const response = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ reprocess: { count: 1 } });
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(response.body).toMatchObject({ sealed: 1, reprocessed: 1 });
    // The second processing starts its own cooling: its check is 12 hours after it (USDA Complete Guide 2015).
    expect(response.body.batch.sealCheck.checkFrom).toBe(later(processedAt, 23 + 12, 59).toISOString());
  });

  it('tells each jar’s own story on its page and in the batch history: filled, cooling, then sealed, fridge or reprocessed (USDA 2015, NCHFP)', async () => {
    const processedAt = processingAt(2, 3);
    const { agent, batchId, jars } = await justProcessed(processedAt, 3);
    const [stays, fridge, redo] = jars;
    const page = async (code: string) => (await agent.get(`/api/jars/by-code/${code}`)).body;
    // While the jars cool, each jar's page says its seal is still to check.
    expect((await page(stays.code)).jar).toMatchObject({ state: 'sealed', seal: 'to-check' });

    at(later(processedAt, 13));
    const first = await agent
      .post(`${lookups.base}/batches/${batchId}/seal-check`)
      .send({ fridge: { jarIds: [fridge.id] }, reprocess: { jarIds: [redo.id] } });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    at(later(processedAt, 13 + 13));
    expect((await agent.post(`${lookups.base}/batches/${batchId}/seal-check`).send({})).status).toBe(200);

    const history = (await detail(batchId)).history as { kind: string; jarCode: string; happenedOn: string }[];
    // The history lists the newest first; each jar's story, read oldest first:
    const story = (code: string) =>
      history
        .filter((e) => e.jarCode === code)
        .map((e) => e.kind)
        .reverse();
    expect(story(stays.code)).toEqual(['filled', 'seal-checked']);
    expect(story(fridge.code)).toEqual(['filled', 'unsealed']);
    expect(story(redo.code)).toEqual(['filled', 'reprocessed', 'seal-checked']);

    expect(await page(fridge.code)).toMatchObject({
      jar: { state: 'opened', unsealed: true },
      lastChange: { kind: 'unsealed' },
    });
    expect(await page(redo.code)).toMatchObject({
      jar: { state: 'sealed', seal: 'checked' },
      lastChange: { kind: 'seal-checked' },
    });
    // The batch page keeps both processings, the reprocess on the same jar with its own plan.
    expect(
      (await detail(batchId)).processings.map((p: { number: number; jars: number }) => [p.number, p.jars]),
    ).toEqual([
      [1, 3],
      [2, 1],
    ]);
  });
});
