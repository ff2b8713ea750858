import { createHash } from 'node:crypto';
import ICAL from 'ical.js';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { BatchProcessing, CalendarFeed, Jar, Membership, PlanEntry, Todo } from '../../server/db/models';
import { clock } from '../../server/services/clock';
import { bareApp } from '../support/bare-app';
import { newHousehold, openedJar } from '../support/opened-jar';

// The outside check is ical.js, a general-purpose iCalendar (RFC 5545) parser: every feed is parsed by it,
// and times are read through the feed's own VTIMEZONE, as a calendar app would.

let ctx: ReturnType<typeof bareApp>;
beforeAll(() => {
  ctx = bareApp();
});
const realNow = clock.now;
afterEach(() => {
  clock.now = realNow;
});
afterAll(() => ctx.close());

/** The path of an address the server gave: "/api/calendar/<secret>.ics". */
const pathOf = (address: string) => new URL(address).pathname;

async function turnOn(agent: request.Agent, householdId: string) {
  const res = await agent.post(`/api/households/${householdId}/calendar-feed`);
  expect(res.status).toBe(201);
  expect(res.body.feed.address).toMatch(/\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
  return res.body.feed.address as string;
}

/** Parses a feed and registers its time zones, so event times convert as a calendar app converts them. */
function parse(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  for (const zone of calendar.getAllSubcomponents('vtimezone')) ICAL.TimezoneService.register(zone);
  return { calendar, events: calendar.getAllSubcomponents('vevent').map((v) => new ICAL.Event(v)) };
}

describe('the household calendar address', () => {
  it('holds the planned meals at the meal times, in the household zone on both sides of a daylight-saving change', async () => {
    // US daylight saving time begins on the second Sunday of March (Energy Policy Act of 2005, as kept in the IANA
    // time zone database): 2027-03-14. Denver is UTC-7 before it and UTC-6 after it.
    clock.now = () => new Date('2027-03-10T17:00:00Z');
    const keeper = await newHousehold(ctx.app, 'America/Denver');
    expect(
      (
        await keeper.agent
          .put(`/api/households/${keeper.householdId}/meal-times`)
          .send({ breakfast: '07:15', lunch: '12:00', snack: '15:30', dinner: '18:30' })
      ).status,
    ).toBe(200);
    const before = await PlanEntry.create({
      householdId: keeper.householdId,
      date: '2027-03-12',
      slot: 'dinner',
      position: 0,
      title: 'Bean chili with green tomato relish',
    });
    const after = await PlanEntry.create({
      householdId: keeper.householdId,
      date: '2027-03-16',
      slot: 'breakfast',
      position: 0,
      title: 'Oat porridge',
    });

    const address = await turnOn(keeper.agent, keeper.householdId);
    const res = await request(ctx.app).get(pathOf(address));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    expect(res.headers['set-cookie']).toBeUndefined();
    const { calendar, events } = parse(res.text);
    expect(calendar.getFirstPropertyValue('version')).toBe('2.0');
    expect(calendar.getAllSubcomponents('vtimezone').map((z) => z.getFirstPropertyValue('tzid'))).toEqual([
      'America/Denver',
    ]);

    const dinner = events.find((e) => e.uid.includes(before.id))!;
    const breakfast = events.find((e) => e.uid.includes(after.id))!;
    expect(dinner.summary).toBe('Dinner: Bean chili with green tomato relish');
    // The week screen takes the week to show from ?start= (src/app/routes/week.tsx).
    expect(new URL(String(dinner.component.getFirstPropertyValue('url'))).search).toBe('?start=2027-03-12');
    expect(dinner.startDate.zone?.tzid).toBe('America/Denver');
    expect(dinner.startDate.toJSDate().toISOString()).toBe('2027-03-13T01:30:00.000Z');
    expect(breakfast.startDate.toJSDate().toISOString()).toBe('2027-03-16T13:15:00.000Z');
    expect(dinner.endDate.toJSDate().getTime() - dinner.startDate.toJSDate().getTime()).toBe(45 * 60_000);
    // RFC 5545 3.6.1: every VEVENT has a UID and a DTSTAMP.
    for (const event of calendar.getAllSubcomponents('vevent')) {
      expect(event.getFirstPropertyValue('uid')).toBeTruthy();
      expect(event.getFirstPropertyValue('dtstamp')).toBeTruthy();
      expect(event.getFirstPropertyValue('dtstart')).toBeTruthy();
    }
  });

  it('gives opened jars their use-by and to-dos their due date as all-day events, with the use-by caution', async () => {
    clock.now = () => new Date('2026-12-02T15:00:00Z');
    const keeper = await newHousehold(ctx.app, 'Europe/Berlin');
    const { jar } = await openedJar(keeper.householdId, {
      productName: 'Beet relish',
      openedOn: '2026-11-30',
      useWithinDays: 28,
    });
    const todo = await Todo.create({
      householdId: keeper.householdId,
      title: 'Buy wide-mouth lids',
      position: 0,
      dueOn: '2026-12-05',
    });
    await Todo.create({
      householdId: keeper.householdId,
      title: 'Already done',
      position: 1,
      dueOn: '2026-12-04',
      done: true,
      doneAt: new Date(),
    });
    const { events } = parse((await request(ctx.app).get(pathOf(await turnOn(keeper.agent, keeper.householdId)))).text);

    const useBy = events.find((e) => e.uid.includes(jar.id))!;
    expect(useBy.summary).toBe(`Use by: Beet relish (jar ${jar.code})`);
    expect(useBy.startDate.isDate).toBe(true);
    expect(useBy.startDate.toString()).toBe('2026-12-28');
    expect(useBy.description).toMatch(/default/i);
    const due = events.find((e) => e.uid.includes(todo.id))!;
    expect(due.summary).toBe('To do: Buy wide-mouth lids');
    expect(due.startDate.toString()).toBe('2026-12-05');
    expect(events.some((e) => e.summary.includes('Already done'))).toBe(false);
  });

  it('holds a seal check 12 hours after processing while jars wait for it, and drops it once they are checked (USDA Complete Guide 2015: cool 12 to 24 hours, then test the seals)', async () => {
    clock.now = () => new Date('2026-12-02T15:00:00Z');
    const keeper = await newHousehold(ctx.app, 'America/Denver');
    const { batch, jar: opened } = await openedJar(keeper.householdId, {
      productName: 'Dilly beans',
      openedOn: '2026-12-01',
      useWithinDays: 28,
    });
    // Processed at 8:30 pm Denver time (03:30 UTC the next day): the check falls at 8:30 am there.
    const processing = await BatchProcessing.create({
      householdId: keeper.householdId,
      batchId: batch.id,
      number: 1,
      processedAt: new Date('2026-12-02T03:30:00Z'),
      method: 'boiling-water',
      altitudeFt: 5280,
      minutes: 15,
      jars: 2,
      createdBy: keeper.userId,
    });
    const waiting = await Promise.all(
      ['A', 'B'].map((letter) =>
        Jar.create({
          householdId: keeper.householdId,
          batchId: batch.id,
          productId: batch.productId,
          processingId: processing.id,
          code: `${opened.code.slice(0, 6)}S${letter}`,
          state: 'sealed',
          seal: 'to-check',
          capacityTbsp: 16,
          remainingTbsp: 16,
          bestBy: '2027-12-01',
        }),
      ),
    );
    const address = pathOf(await turnOn(keeper.agent, keeper.householdId));
    const { events } = parse((await request(ctx.app).get(address)).text);
    const check = events.find((e) => e.uid === `seal-check-${processing.id}@larderly.calendar`)!;
    expect(check.summary).toBe('Check the seals of the Dilly beans');
    expect(check.startDate.toJSDate().toISOString()).toBe('2026-12-02T15:30:00.000Z');
    expect(check.startDate.zone?.tzid).toBe('America/Denver');
    expect(check.startDate.toString()).toBe('2026-12-02T08:30:00');
    expect(check.description).toMatch(/^2 jars still to check\./);
    expect(check.component.getFirstPropertyValue('url')).toBe(
      `http://127.0.0.1:3000/h/${keeper.householdId}/batches/${batch.id}`,
    );

    await Jar.update({ seal: 'checked' }, { where: { id: waiting.map((j) => j.id) } });
    const after = parse((await request(ctx.app).get(address)).text).events;
    expect(after.some((e) => e.uid.startsWith('seal-check-'))).toBe(false);
  });

  it('keeps UIDs and text stable between fetches, answers If-None-Match with 304, and changes when the plan does', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const today = new Date().toISOString().slice(0, 10);
    await PlanEntry.create({
      householdId: keeper.householdId,
      date: today,
      slot: 'lunch',
      position: 0,
      title: 'Cheese and chutney sandwiches',
    });
    const path = pathOf(await turnOn(keeper.agent, keeper.householdId));
    const first = await request(ctx.app).get(path);
    const second = await request(ctx.app).get(path);
    expect(second.text).toBe(first.text);
    expect(parse(second.text).events.map((e) => e.uid)).toEqual(parse(first.text).events.map((e) => e.uid));
    const etag = first.headers.etag;
    expect(etag).toMatch(/^"/);
    const unchanged = await request(ctx.app).get(path).set('If-None-Match', etag);
    expect(unchanged.status).toBe(304);

    await PlanEntry.create({
      householdId: keeper.householdId,
      date: today,
      slot: 'dinner',
      position: 0,
      title: 'Pork chops with apple butter',
    });
    const changed = await request(ctx.app).get(path).set('If-None-Match', etag);
    expect(changed.status).toBe(200);
    expect(changed.headers.etag).not.toBe(etag);
    expect(parse(changed.text).events).toHaveLength(2);
  });

  it('keeps only a fingerprint of the secret; renewing stops the old address and turning off stops the new one', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const first = await turnOn(keeper.agent, keeper.householdId);
    const secret = pathOf(first)
      .split('/')
      .pop()!
      .replace(/\.ics$/, '');
    const stored = await CalendarFeed.findOne({ where: { householdId: keeper.householdId, userId: keeper.userId } });
    expect(stored!.tokenHash).toBe(createHash('sha256').update(secret).digest('hex'));
    expect(JSON.stringify(stored!.toJSON())).not.toContain(secret);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/calendar-feed`)).body.feed).toMatchObject({
      on: true,
    });
    expect(
      (await keeper.agent.get(`/api/households/${keeper.householdId}/calendar-feed`)).body.feed.address,
    ).toBeUndefined();

    const renewed = await turnOn(keeper.agent, keeper.householdId);
    expect(renewed).not.toBe(first);
    expect((await request(ctx.app).get(pathOf(first))).status).toBe(404);
    expect((await request(ctx.app).get(pathOf(renewed))).status).toBe(200);

    expect((await keeper.agent.delete(`/api/households/${keeper.householdId}/calendar-feed`)).status).toBe(204);
    expect((await request(ctx.app).get(pathOf(renewed))).status).toBe(404);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/calendar-feed`)).body.feed).toMatchObject({
      on: false,
    });
    expect((await request(ctx.app).get('/api/calendar/not-an-address.ics')).status).toBe(400);
  });

  it("never shows a household to someone who left it, and one person's address shows only that household", async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const helper = await newHousehold(ctx.app, 'UTC');
    await Membership.create({ householdId: keeper.householdId, userId: helper.userId, role: 'helper' });
    const today = new Date().toISOString().slice(0, 10);
    await PlanEntry.create({
      householdId: keeper.householdId,
      date: today,
      slot: 'dinner',
      position: 0,
      title: 'Keeper household dinner',
    });
    await PlanEntry.create({
      householdId: helper.householdId,
      date: today,
      slot: 'dinner',
      position: 0,
      title: 'Helper own dinner',
    });

    const helpersView = pathOf(await turnOn(helper.agent, keeper.householdId));
    const text = (await request(ctx.app).get(helpersView)).text;
    expect(text).toContain('Keeper household dinner');
    expect(text).not.toContain('Helper own dinner');

    expect((await helper.agent.post(`/api/households/${keeper.householdId}/leave`)).status).toBe(204);
    expect((await request(ctx.app).get(helpersView)).status).toBe(404);
    expect(await CalendarFeed.count({ where: { householdId: keeper.householdId, userId: helper.userId } })).toBe(0);
  });

  it('lets only a keeper set the meal times, and says what a bad time should look like', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const helper = await newHousehold(ctx.app, 'UTC');
    await Membership.create({ householdId: keeper.householdId, userId: helper.userId, role: 'helper' });
    const times = { breakfast: '07:00', lunch: '12:00', snack: '16:00', dinner: '19:00' };
    expect((await helper.agent.put(`/api/households/${keeper.householdId}/meal-times`).send(times)).status).toBe(403);
    const bad = await keeper.agent
      .put(`/api/households/${keeper.householdId}/meal-times`)
      .send({ ...times, dinner: '7pm' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.dinner).toMatch(/18:30/);
    const good = await keeper.agent.put(`/api/households/${keeper.householdId}/meal-times`).send(times);
    expect(good.body.feed.mealTimes).toEqual(times);
    // The household's backup carries them, so a restored household keeps its calendar times.
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/backup`)).body.household.mealTimes).toEqual(
      times,
    );
  });
});
