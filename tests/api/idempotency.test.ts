import { randomBytes, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../shared/domain';
import { Batch, Jar, JarEvent, Membership, Product, Todo } from '../../server/db/models';
import { bareApp } from '../support/bare-app';
import { newHousehold } from '../support/opened-jar';

// Changes made offline are sent again when the network returns. The Idempotency-Key header (IETF httpapi
// working group draft "The Idempotency-Key HTTP Header Field") lets the server answer a replay with the first
// answer instead of applying the change twice.
let ctx: ReturnType<typeof bareApp>;
beforeAll(() => {
  ctx = bareApp();
});
afterAll(() => ctx.close());

async function sealedJars(householdId: string, count: number) {
  const product = await Product.create({ householdId, name: 'Dilly beans', kind: 'pickle' });
  const batch = await Batch.create({
    householdId,
    productId: product.id,
    cannedOn: '2026-08-20',
    jarSize: 'pint',
    jarsFilled: count,
    jarsSealed: count,
    method: 'boiling-water',
    altitudeFt: 0,
  });
  return Promise.all(
    Array.from({ length: count }, () =>
      Jar.create({
        householdId,
        batchId: batch.id,
        productId: product.id,
        code: `I${randomBytes(4).toString('hex').toUpperCase()}`,
        state: 'sealed',
        capacityTbsp: 32,
        remainingTbsp: 32,
        bestBy: addDays('2026-08-20', 365),
      }),
    ),
  );
}

const key = () => randomUUID();

describe('changes sent with an Idempotency-Key', () => {
  it('apply once however often they are sent, also all at once, and the replays get the first answer', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const [jar] = await sealedJars(keeper.householdId, 1);
    const k = key();
    const path = `/api/households/${keeper.householdId}/jars/${jar.id}/open`;
    const first = await keeper.agent.post(path).set('Idempotency-Key', k).send({});
    expect(first.status).toBe(200);
    const replays = await Promise.all(
      Array.from({ length: 5 }, () => keeper.agent.post(path).set('Idempotency-Key', k).send({})),
    );
    for (const replay of replays) {
      expect(replay.status).toBe(200);
      expect(replay.headers['idempotent-replayed']).toBe('true');
      expect(replay.body).toEqual(first.body);
    }
    expect(await JarEvent.count({ where: { jarId: jar.id, kind: 'opened' } })).toBe(1);
  });

  it('lets one of several identical first sends apply, never two', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const [jar] = await sealedJars(keeper.householdId, 1);
    const k = key();
    const answers = await Promise.all(
      Array.from({ length: 6 }, () =>
        keeper.agent
          .post(`/api/households/${keeper.householdId}/jars/${jar.id}/open`)
          .set('Idempotency-Key', k)
          .send({}),
      ),
    );
    expect(answers.filter((a) => a.status === 200 && !a.headers['idempotent-replayed'])).toHaveLength(1);
    for (const a of answers) expect([200, 409]).toContain(a.status);
    expect(await JarEvent.count({ where: { jarId: jar.id, kind: 'opened' } })).toBe(1);
  });

  it('keeps a refusal as the answer: the jar someone else already opened stays a conflict on every replay', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const cook = await newHousehold(ctx.app, 'UTC');
    await Membership.create({ householdId: keeper.householdId, userId: cook.userId, role: 'cook' });
    const [jar] = await sealedJars(keeper.householdId, 1);
    expect((await cook.agent.post(`/api/households/${keeper.householdId}/jars/${jar.id}/open`).send({})).status).toBe(
      200,
    );
    const k = key();
    const offline = await keeper.agent
      .post(`/api/households/${keeper.householdId}/jars/${jar.id}/open`)
      .set('Idempotency-Key', k)
      .send({});
    expect(offline.status).toBe(409);
    expect(offline.body.error.message).toMatch(/open/i);
    const again = await keeper.agent
      .post(`/api/households/${keeper.householdId}/jars/${jar.id}/open`)
      .set('Idempotency-Key', k)
      .send({});
    expect(again.status).toBe(409);
    expect(again.headers['idempotent-replayed']).toBe('true');
  });

  it('refuses a key reused for another change, a malformed key, and never replays another person’s answer', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const cook = await newHousehold(ctx.app, 'UTC');
    await Membership.create({ householdId: keeper.householdId, userId: cook.userId, role: 'cook' });
    const [one, two, three] = await sealedJars(keeper.householdId, 3);
    const k = key();
    const base = `/api/households/${keeper.householdId}/jars`;
    expect((await keeper.agent.post(`${base}/${one.id}/open`).set('Idempotency-Key', k).send({})).status).toBe(200);
    const reused = await keeper.agent.post(`${base}/${two.id}/open`).set('Idempotency-Key', k).send({});
    expect(reused.status).toBe(422);
    expect(reused.body.error.message).toMatch(/new key/);
    expect((await keeper.agent.post(`${base}/${two.id}/open`).set('Idempotency-Key', 'short').send({})).status).toBe(
      400,
    );
    // The same key from someone else is their own change.
    const theirs = await cook.agent.post(`${base}/${three.id}/open`).set('Idempotency-Key', k).send({});
    expect(theirs.status).toBe(200);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
    expect((await Jar.findByPk(three.id))!.state).toBe('opened');
  });

  it('ticks a to-do once, and a to-do someone deleted answers 404 on the replay too', async () => {
    const keeper = await newHousehold(ctx.app, 'UTC');
    const todo = await Todo.create({ householdId: keeper.householdId, title: 'Label the relish', position: 0 });
    const k = key();
    const tick = () =>
      keeper.agent
        .patch(`/api/households/${keeper.householdId}/todos/${todo.id}`)
        .set('Idempotency-Key', k)
        .send({ done: true });
    const first = await tick();
    expect(first.status).toBe(200);
    const doneAt = (await Todo.findByPk(todo.id))!.doneAt;
    expect((await tick()).body).toEqual(first.body);
    expect((await Todo.findByPk(todo.id))!.doneAt).toEqual(doneAt);

    const gone = await Todo.create({ householdId: keeper.householdId, title: 'Wash the canner', position: 1 });
    await gone.destroy();
    const late = await keeper.agent
      .patch(`/api/households/${keeper.householdId}/todos/${gone.id}`)
      .set('Idempotency-Key', key())
      .send({ done: true });
    expect(late.status).toBe(404);
  });
});
