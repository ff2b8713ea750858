import { spawn } from 'node:child_process';
import webpush from 'web-push';
import { describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import { QueryTypes } from 'sequelize';
import { MAINTENANCE_INTERVAL_SECONDS, startJobs, SWEEP_EXPIRE_SECONDS } from '../../server/jobs';
import { USE_BY_CAUTION_SENTENCE } from '../../shared/words';
import { loadConfig } from '../../server/config';
import { AppSetting, ReminderDelivery } from '../../server/db/models';
import { loadVapidKeys, type VapidKeys } from '../../server/services/push/vapid-keys';
import { clock, todayIn } from '../../server/services/clock';
import { STALE_CLAIM_MINUTES, sweepReminders } from '../../server/services/reminders';
import type { bareApp } from '../support/bare-app';
import { instantAt } from '../support/household-time';
import { newHousehold, openedJar } from '../support/opened-jar';
import { browserPushKeys } from '../support/push-keys';
import type { StandIns } from '../support/stand-ins';
import { withStandInsApp } from '../support/stand-ins-app';

let built: ReturnType<typeof bareApp>;
let standIns: StandIns;
withStandInsApp((app, started) => {
  built = app;
  standIns = started;
});

const ZONE = 'America/Denver';

/** A household with one subscribed browser and a jar opened today that keeps 10 days. */
async function scenario(productName: string) {
  const home = await newHousehold(built.app, ZONE);
  const browser = browserPushKeys();
  const endpoint = standIns.push.newEndpoint();
  expect(
    (await home.agent.post('/api/push/subscriptions').send({ endpoint, expirationTime: null, keys: browser.keys }))
      .status,
  ).toBe(201);
  const openedOn = todayIn(ZONE);
  const { jar } = await openedJar(home.householdId, { productName, openedOn, useWithinDays: 10 });
  // The default reminder: 2 days before the use-by, at 8 in the household's time zone.
  const reminderDay = addDays(openedOn, 8);
  return {
    ...home,
    browser,
    endpoint,
    jar,
    at: (hour: number, minute = 5) => instantAt(reminderDay, hour, minute, ZONE),
  };
}

function runSweepProcess(at: Date) {
  return new Promise<string>((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/jobs/sweep-once.ts', '--at', at.toISOString()], {
      env: { ...process.env, ...standIns.env, NODE_ENV: 'test' },
    });
    let output = '';
    child.stdout.on('data', (chunk) => (output += chunk));
    child.stderr.on('data', (chunk) => (output += chunk));
    child.on('exit', (code) =>
      code === 0 ? resolve(output) : reject(new Error(`sweep process exited with ${code}: ${output}`)),
    );
  });
}

describe('use-by reminders', () => {
  it('sends one push naming the product and one e-mail at the reminder hour 2 days before the use-by, and nothing on the next run', async () => {
    const home = await scenario('Quince and Walnut Chutney');

    await sweepReminders(built.ctx, home.at(7, 55));
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(0);
    expect(standIns.mail.to(home.email)).toHaveLength(0);

    await sweepReminders(built.ctx, home.at(8, 5));
    const pushes = standIns.push.receivedBy(home.endpoint);
    expect(pushes).toHaveLength(1);
    const message = home.browser.read(pushes[0]);
    expect(message.title).toBe('Use the Quince and Walnut Chutney within 2 days');
    expect(message.url).toBe(`/j/${home.jar.code}`);
    // The push carries a caution sized to it: the use-by is a default, the jar's look and smell come first.
    expect(message.body).toMatch(/use-by is a default.*look and smell.*When in doubt, throw it out\./);
    expect(pushes[0].vapidKey).toBe(await built.ctx.push.publicKey());

    const mails = standIns.mail.to(home.email);
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toMatch(/Quince and Walnut Chutney within 2 days/);
    expect(mails[0].text).toContain(`/j/${home.jar.code}`);
    expect(mails[0].html).toContain('Quince and Walnut Chutney');
    expect(mails[0].text).toContain(USE_BY_CAUTION_SENTENCE);

    await sweepReminders(built.ctx, home.at(8, 10));
    await sweepReminders(built.ctx, home.at(10, 0));
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(1);
    expect(standIns.mail.to(home.email)).toHaveLength(1);
  });

  it('after a restart late in the evening sends nothing then, and the reminder at the next morning’s hour', async () => {
    const home = await scenario('Cherry Plum Chutney');
    // The server comes back at 10:30 pm household time, well after the 8:00 reminder hour.
    await sweepReminders(built.ctx, home.at(22, 30));
    await sweepReminders(built.ctx, home.at(11, 5));
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(0);
    expect(standIns.mail.to(home.email)).toHaveLength(0);
    // A sweep within the catch-up hours after the reminder hour still sends the missed one.
    await sweepReminders(built.ctx, instantAt(addDays(home.jar.useBy!, -1), 9, 40, ZONE));
    expect(standIns.push.receivedBy(home.endpoint).map((p) => home.browser.read(p).title)).toEqual([
      'Use the Cherry Plum Chutney within 1 day',
    ]);
    expect(standIns.mail.to(home.email)).toHaveLength(1);
  });

  it('sends the "today" reminder on the use-by day, once', async () => {
    const home = await scenario('Gooseberry Relish');
    const useByMorning = instantAt(home.jar.useBy!, 9, 0, ZONE);
    await sweepReminders(built.ctx, useByMorning);
    await sweepReminders(built.ctx, useByMorning);
    const titles = standIns.push.receivedBy(home.endpoint).map((p) => home.browser.read(p).title);
    expect(titles).toEqual(['Use the Gooseberry Relish today']);
  });

  it('sends once when two app processes run the sweep at the same moment (the unique key, not memory)', async () => {
    const home = await scenario('Damson Ketchup');
    const outputs = await Promise.all([runSweepProcess(home.at(8, 5)), runSweepProcess(home.at(8, 5))]);
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(1);
    expect(standIns.mail.to(home.email)).toHaveLength(1);
    expect(await ReminderDelivery.count({ where: { jarId: home.jar.id } })).toBe(1);
    expect(outputs.join('')).toMatch(/"reminders":/);
  });

  it('retries a claim whose sweep crashed between the claim and the send, once it is stale, and then sends once', async () => {
    const home = await scenario('Rowan Berry Jelly');
    const crash = new Error('the process died here');
    await expect(sweepReminders(built.ctx, home.at(8, 5), { afterClaim: () => Promise.reject(crash) })).rejects.toBe(
      crash,
    );
    const claimed = await ReminderDelivery.findOne({ where: { jarId: home.jar.id } });
    expect(claimed).toMatchObject({ sentAt: null, attempts: 1 });
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(0);

    // A sweep soon after leaves the claim to whoever might still hold it.
    await sweepReminders(built.ctx, home.at(8, 5 + STALE_CLAIM_MINUTES - 1));
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(0);

    await sweepReminders(built.ctx, home.at(8, 6 + STALE_CLAIM_MINUTES));
    await sweepReminders(built.ctx, home.at(9, 0));
    await sweepReminders(built.ctx, home.at(10, 0));
    expect(standIns.push.receivedBy(home.endpoint).map((p) => home.browser.read(p).title)).toEqual([
      'Use the Rowan Berry Jelly within 2 days',
    ]);
    expect(standIns.mail.to(home.email)).toHaveLength(1);
    const sent = await ReminderDelivery.findOne({ where: { jarId: home.jar.id } });
    expect(sent!.sentAt).not.toBeNull();
    expect(sent!.attempts).toBe(2);
    // The retried push replaces any first one at the push service; the retried mail keeps one Message-ID.
    expect(standIns.push.receivedBy(home.endpoint)[0].topic).toBe(sent!.id.replaceAll('-', ''));
  });

  it('expires a sweep whose worker died within a minute, so the next sweep is not blocked longer', async () => {
    const runner = await startJobs(built.ctx);
    try {
      const [queue] = await built.sequelize.query<{ expire_seconds: number }>(
        "SELECT expire_seconds FROM pgboss.queue WHERE name = 'reminder-sweep'",
        { type: QueryTypes.SELECT },
      );
      expect(queue.expire_seconds).toBe(SWEEP_EXPIRE_SECONDS);
      expect(SWEEP_EXPIRE_SECONDS + MAINTENANCE_INTERVAL_SECONDS).toBeLessThanOrEqual(60);
    } finally {
      await runner.stop();
    }
  });

  it('runs through the job queue in PostgreSQL with two runners, still once', async () => {
    const home = await scenario('Medlar Jelly');
    const realNow = clock.now;
    clock.now = () => home.at(8, 5);
    const runners = await Promise.all([startJobs(built.ctx), startJobs(built.ctx)]);
    try {
      await Promise.all(runners.map((r) => r.sweepNow()));
      for (let i = 0; i < 60 && standIns.push.receivedBy(home.endpoint).length === 0; i += 1)
        await new Promise((r) => setTimeout(r, 250));
      await new Promise((r) => setTimeout(r, 3_000));
    } finally {
      await Promise.all(runners.map((r) => r.stop()));
      clock.now = realNow;
    }
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(1);
    expect(standIns.mail.to(home.email)).toHaveLength(1);
  });

  it('respects a later reminder hour and more days before', async () => {
    const home = await scenario('Sloe Gin Jelly');
    expect(
      (await home.agent.patch('/api/me/notifications').send({ reminderHour: 18, daysBefore: 3, emailReminders: false }))
        .status,
    ).toBe(200);
    await sweepReminders(built.ctx, instantAt(addDays(home.jar.useBy!, -3), 17, 30, ZONE));
    expect(standIns.push.receivedBy(home.endpoint)).toHaveLength(0);
    await sweepReminders(built.ctx, instantAt(addDays(home.jar.useBy!, -3), 18, 5, ZONE));
    expect(standIns.push.receivedBy(home.endpoint).map((p) => home.browser.read(p).title)).toEqual([
      'Use the Sloe Gin Jelly within 3 days',
    ]);
    expect(standIns.mail.to(home.email)).toHaveLength(0);
  });
});

describe('push subscriptions', () => {
  it('removes a subscription the push service answers 410 Gone for', async () => {
    const home = await newHousehold(built.app, ZONE);
    const endpoint = standIns.push.newEndpoint();
    await home.agent.post('/api/push/subscriptions').send({ endpoint, keys: browserPushKeys().keys });
    expect((await home.agent.get('/api/me/notifications')).body.settings.pushDevices).toBe(1);
    standIns.push.expire(endpoint);
    const test = await home.agent.post('/api/push/test');
    expect(test.status).toBe(202);
    expect(test.body).toEqual({ devices: 1 });
    await expect.poll(async () => (await home.agent.get('/api/me/notifications')).body.settings.pushDevices).toBe(0);
  });

  it('delivers a test notification the browser can decrypt', async () => {
    const home = await newHousehold(built.app, ZONE);
    const browser = browserPushKeys();
    const endpoint = standIns.push.newEndpoint();
    await home.agent.post('/api/push/subscriptions').send({ endpoint, keys: browser.keys });
    expect((await home.agent.post('/api/push/test')).body).toEqual({ devices: 1 });
    await expect.poll(() => standIns.push.receivedBy(endpoint).length).toBe(1);
    expect(browser.read(standIns.push.receivedBy(endpoint)[0]).title).toBe('Notifications are on');
  });

  it('stops sending after unsubscribing', async () => {
    const home = await newHousehold(built.app, ZONE);
    const endpoint = standIns.push.newEndpoint();
    await home.agent.post('/api/push/subscriptions').send({ endpoint, keys: browserPushKeys().keys });
    expect((await home.agent.delete('/api/push/subscriptions').send({ endpoint })).status).toBe(204);
    expect((await home.agent.post('/api/push/test')).status).toBe(409);
  });

  it('refuses a subscription that is not https and answers 401 when signed out', async () => {
    const home = await newHousehold(built.app, ZONE);
    const bad = await home.agent
      .post('/api/push/subscriptions')
      .send({ endpoint: 'http://example.test/push/1', keys: browserPushKeys().keys });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.endpoint).toMatch(/https/);
    expect(
      (
        await built.request
          .post('/api/push/subscriptions')
          .send({ endpoint: standIns.push.newEndpoint(), keys: browserPushKeys().keys })
      ).status,
    ).toBe(401);
  });

  it('keeps the VAPID keys it made on first start, and lets the environment override them', async () => {
    const first = (await built.request.get('/api/push/public-key')).body.publicKey;
    expect(first).toMatch(/^B[A-Za-z0-9_-]{86}$/);
    expect(((await AppSetting.findByPk('vapid-keys'))!.value as VapidKeys).publicKey).toBe(first);
    expect((await loadVapidKeys(built.ctx.config)).publicKey).toBe(first);
    const fromEnvironment = webpush.generateVAPIDKeys();
    const config = loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      VAPID_PUBLIC_KEY: fromEnvironment.publicKey,
      VAPID_PRIVATE_KEY: fromEnvironment.privateKey,
    });
    expect((await loadVapidKeys(config)).publicKey).toBe(fromEnvironment.publicKey);
  });
});

describe('notification settings', () => {
  it('starts from the defaults: 2 days before, e-mail on', async () => {
    const home = await newHousehold(built.app, ZONE);
    const response = await home.agent.get('/api/me/notifications');
    expect(response.body.settings).toEqual({
      emailReminders: true,
      weeklyDigest: true,
      reminderHour: 8,
      daysBefore: 2,
      pushDevices: 0,
    });
  });

  it('refuses an hour outside 0-23 naming the field', async () => {
    const home = await newHousehold(built.app, ZONE);
    const response = await home.agent.patch('/api/me/notifications').send({ reminderHour: 24 });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.reminderHour).toMatch(/0 to 23/);
  });
});
