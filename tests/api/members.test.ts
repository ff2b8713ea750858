import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { Membership, PushSubscription, ReminderDelivery, Todo } from '../../server/db/models';
import { bareApp } from '../support/bare-app';
import { newHousehold, openedJar } from '../support/opened-jar';
import { browserPushKeys } from '../support/push-keys';

let ctx: ReturnType<typeof bareApp>;
beforeAll(() => {
  ctx = bareApp();
});
afterAll(() => ctx.close());

/** A keeper's household with one more person in it, who also keeps a household of their own. */
async function householdWith(role: 'helper' | 'cook' | 'keeper') {
  const keeper = await newHousehold(ctx.app, 'UTC');
  const member = await newHousehold(ctx.app, 'UTC');
  await Membership.create({ householdId: keeper.householdId, userId: member.userId, role });
  return { keeper, member };
}

describe('removing a member', () => {
  it("ends the member's access on their very next request, on every app process, and takes their reminders and to-dos with it", async () => {
    const { keeper, member } = await householdWith('helper');
    const second = createApp(loadConfig({ ...process.env, NODE_ENV: 'test', BCRYPT_COST: '4', STATIC_DIR: 'none' }), {
      authLimit: 1000,
    });
    try {
      const onSecond = request.agent(second.app);
      await onSecond.post('/api/auth/login').send({ email: member.email, password: 'brine and patience' });
      expect((await member.agent.get(`/api/households/${keeper.householdId}/members`)).status).toBe(200);
      expect((await onSecond.get(`/api/households/${keeper.householdId}`)).status).toBe(200);
      const { jar } = await openedJar(keeper.householdId, {
        productName: 'Green tomato chutney',
        openedOn: '2026-11-28',
        useWithinDays: 28,
      });
      await ReminderDelivery.create({
        householdId: keeper.householdId,
        jarId: jar.id,
        userId: member.userId,
        kind: 'soon',
        useBy: jar.useBy!,
      });
      const todo = await Todo.create({
        householdId: keeper.householdId,
        title: 'Wash the jars',
        position: 0,
        assigneeId: member.userId,
      });

      const removed = await keeper.agent.delete(`/api/households/${keeper.householdId}/members/${member.userId}`);
      expect(removed.status).toBe(200);
      expect(removed.body.members.map((m: { userId: string }) => m.userId)).toEqual([keeper.userId]);

      expect((await member.agent.get(`/api/households/${keeper.householdId}/members`)).status).toBe(404);
      expect((await onSecond.get(`/api/households/${keeper.householdId}`)).status).toBe(404);
      expect((await onSecond.get(`/api/households/${keeper.householdId}/fridge`)).status).toBe(404);
      expect(
        (await member.agent.get('/api/auth/me')).body.memberships.map((m: { householdId: string }) => m.householdId),
      ).toEqual([member.householdId]);
      expect(await ReminderDelivery.count({ where: { householdId: keeper.householdId, userId: member.userId } })).toBe(
        0,
      );
      expect((await Todo.findByPk(todo.id))!.assigneeId).toBeNull();
      // They still keep their own household, so their own devices keep getting its reminders.
      expect((await member.agent.get(`/api/households/${member.householdId}`)).status).toBe(200);
    } finally {
      await second.close();
    }
  });

  it('removes the push subscriptions of someone who no longer belongs to any household', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const helper = await newHousehold(ctx.app, 'UTC');
    await Membership.create({ householdId: keeper.householdId, userId: helper.userId, role: 'helper' });
    // The keeper's household is now the only one the helper belongs to.
    await Membership.destroy({ where: { householdId: helper.householdId, userId: helper.userId } });
    const { keys } = browserPushKeys();
    await PushSubscription.create({
      userId: helper.userId,
      endpoint: 'https://push.example.test/helper-device',
      p256dh: keys.p256dh,
      auth: keys.auth,
    });
    expect((await keeper.agent.delete(`/api/households/${keeper.householdId}/members/${helper.userId}`)).status).toBe(
      200,
    );
    expect(await PushSubscription.count({ where: { userId: helper.userId } })).toBe(0);
  });

  it('refuses a keeper removing themself (they leave instead), and a member who is not there answers 404', async () => {
    const { keeper } = await householdWith('cook');
    const self = await keeper.agent.delete(`/api/households/${keeper.householdId}/members/${keeper.userId}`);
    expect(self.status).toBe(409);
    expect(self.body.error.message).toMatch(/Leave household/);
    const stranger = await newHousehold(ctx.app, 'UTC');
    expect((await keeper.agent.delete(`/api/households/${keeper.householdId}/members/${stranger.userId}`)).status).toBe(
      404,
    );
  });

  it('lets only a keeper remove: a cook is refused with 403', async () => {
    const { keeper, member } = await householdWith('cook');
    expect((await member.agent.delete(`/api/households/${keeper.householdId}/members/${keeper.userId}`)).status).toBe(
      403,
    );
  });
});

describe('leaving a household', () => {
  it('lets a helper leave; their next request answers 404', async () => {
    const { keeper, member } = await householdWith('helper');
    expect((await member.agent.post(`/api/households/${keeper.householdId}/leave`).send({})).status).toBe(204);
    expect((await member.agent.get(`/api/households/${keeper.householdId}`)).status).toBe(404);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}/members`)).body.members).toHaveLength(1);
  });

  it('refuses the last keeper until they hand over, then lets them go', async () => {
    const { keeper, member } = await householdWith('cook');
    const refused = await keeper.agent.post(`/api/households/${keeper.householdId}/leave`).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/Make someone else a keeper first/);
    await keeper.agent
      .patch(`/api/households/${keeper.householdId}/members/${member.userId}`)
      .send({ role: 'keeper' })
      .expect(200);
    expect((await keeper.agent.post(`/api/households/${keeper.householdId}/leave`).send({})).status).toBe(204);
    expect((await keeper.agent.get(`/api/households/${keeper.householdId}`)).status).toBe(404);
    expect(
      (await member.agent.get(`/api/households/${keeper.householdId}/members`)).body.members.map(
        (m: { role: string }) => m.role,
      ),
    ).toEqual(['keeper']);
  });
});
