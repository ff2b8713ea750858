import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { lockNames } from '../../server/db/advisory-locks';
import { Todo } from '../../server/db/models';
import { demoApp } from '../support/app';

let ctx: Awaited<ReturnType<typeof demoApp>>;
beforeAll(async () => {
  ctx = await demoApp();
});
afterAll(() => ctx.close());

const url = (path = '') => `/api/households/${ctx.householdId}/todos${path}`;
type Listed = {
  id: string;
  title: string;
  position: number;
  done: boolean;
  doneAt: string | null;
  assigneeId: string | null;
};

async function list(filter = 'all') {
  const keeper = await ctx.signedIn('keeper@larderly.test');
  const response = await keeper.get(url(`?filter=${filter}`));
  expect(response.status).toBe(200);
  return response.body.todos as Listed[];
}

async function add(...titles: string[]) {
  const cook = await ctx.signedIn('cook@larderly.test');
  const made: Listed[] = [];
  for (const title of titles) {
    const response = await cook.post(url()).send({ title });
    expect(response.status).toBe(201);
    made.push(response.body.todo);
  }
  return made;
}

function expectDense(todos: Listed[]) {
  expect(todos.map((t) => t.position)).toEqual(todos.map((_, index) => index));
}

describe('the household to-do list', () => {
  it('adds to-dos at the end and keeps positions dense through moves and deletes', async () => {
    const [wash, lids, vinegar, jars] = await add(
      'Wash the half-pint jars',
      'Buy new lids',
      'Buy cider vinegar',
      'Sort the jars in the cellar',
    );
    const cook = await ctx.signedIn('cook@larderly.test');
    const start = (await list()).length - 4;
    expect([wash, lids, vinegar, jars].map((t) => t.position)).toEqual([start, start + 1, start + 2, start + 3]);

    const moved = await cook.patch(url(`/${jars.id}`)).send({ position: start });
    expect(moved.status).toBe(200);
    expect(moved.body.todo.position).toBe(start);
    let all = await list();
    expectDense(all);
    expect(all.slice(start).map((t) => t.title)).toEqual([
      'Sort the jars in the cellar',
      'Wash the half-pint jars',
      'Buy new lids',
      'Buy cider vinegar',
    ]);

    await cook.patch(url(`/${jars.id}`)).send({ position: start + 2 });
    all = await list();
    expect(all.slice(start).map((t) => t.title)).toEqual([
      'Wash the half-pint jars',
      'Buy new lids',
      'Sort the jars in the cellar',
      'Buy cider vinegar',
    ]);

    expect((await cook.delete(url(`/${lids.id}`))).status).toBe(204);
    all = await list();
    expectDense(all);
    expect(all.slice(start).map((t) => t.title)).toEqual([
      'Wash the half-pint jars',
      'Sort the jars in the cellar',
      'Buy cider vinegar',
    ]);
  });

  it('keeps positions a dense permutation when many moves and adds race', async () => {
    const made = await add('Race one', 'Race two', 'Race three', 'Race four', 'Race five');
    const cook = await ctx.signedIn('cook@larderly.test');
    const keeper = await ctx.signedIn('keeper@larderly.test');
    const responses = await Promise.all([
      ...made.map((todo, i) => (i % 2 ? cook : keeper).patch(url(`/${todo.id}`)).send({ position: (i * 3) % 5 })),
      cook.post(url()).send({ title: 'Race six' }),
      keeper.post(url()).send({ title: 'Race seven' }),
    ]);
    expect(responses.map((r) => r.status).sort()).toEqual([200, 200, 200, 200, 200, 201, 201]);
    const all = await list();
    expectDense(all);
    expect(new Set(all.map((t) => t.id)).size).toBe(all.length);
  });

  it("answers a change that changes nothing without waiting for the list's lock; a change that writes waits and builds on what the lock's holder wrote", async () => {
    const [first, second] = await add('Lock one', 'Lock two');
    const cook = await ctx.signedIn('cook@larderly.test');
    const last = (await list()).length - 1;
    await cook
      .patch(url(`/${first!.id}`))
      .send({ position: last, title: 'Lock one' })
      .expect(200);
    // Another writer of the list holds its lock (as a move in progress would) and moves `second` to the top.
    const holder = await ctx.sequelize.transaction();
    try {
      await lockNames(ctx.sequelize, holder, [`todos:${ctx.householdId}`]);
      await Todo.update({ title: 'Lock two, renamed' }, { where: { id: second!.id }, transaction: holder });
      // Already last, already so named, a to-do that is not there, an outsider as assignee: answered at once.
      const answers = await Promise.all([
        cook.patch(url(`/${first!.id}`)).send({ position: last, title: 'Lock one' }),
        cook.patch(url(`/${first!.id}`)).send({ position: last + 5 }),
        cook.patch(url('/00000000-0000-4000-8000-000000000000')).send({ position: 0 }),
        cook.patch(url(`/${first!.id}`)).send({ assigneeId: '00000000-0000-4000-8000-000000000000' }),
      ]);
      expect(answers.map((a) => a.status)).toEqual([200, 200, 404, 400]);
      expect(answers[0]!.body.todo.position).toBe(last);
      // A real move waits for the lock's holder...
      let settled = false;
      const move = cook
        .patch(url(`/${first!.id}`))
        .send({ position: 0 })
        .then((answer) => {
          settled = true;
          return answer;
        });
      await new Promise((resolve) => setTimeout(resolve, 300));
      expect(settled).toBe(false);
      await holder.commit();
      // ...and then writes on top of what it committed.
      expect((await move).status).toBe(200);
    } finally {
      if (!(holder as unknown as { finished?: string }).finished) await holder.rollback();
    }
    const all = await list();
    expectDense(all);
    expect(all[0]!.id).toBe(first!.id);
    expect(all.find((t) => t.id === second!.id)!.title).toBe('Lock two, renamed');
  });

  it('moves past the end to the last place', async () => {
    const [todo] = await add('Label the chutney');
    const cook = await ctx.signedIn('cook@larderly.test');
    await cook.patch(url(`/${todo.id}`)).send({ position: 0 });
    const response = await cook.patch(url(`/${todo.id}`)).send({ position: 10_000 });
    const all = await list();
    expect(response.body.todo.position).toBe(all.length - 1);
    expectDense(all);
  });

  it('saves notes, a due date and an assignee from the household, and refuses an outsider as assignee', async () => {
    const [todo] = await add('Pick the green tomatoes');
    const cook = await ctx.signedIn('cook@larderly.test');
    const members = (await cook.get(`/api/households/${ctx.householdId}/members`)).body.members as {
      userId: string;
      email: string;
    }[];
    const helperId = members.find((m) => m.email === 'helper@larderly.test')!.userId;
    const response = await cook
      .patch(url(`/${todo.id}`))
      .send({ notes: 'The ones by the fence', dueOn: '2026-09-14', assigneeId: helperId });
    expect(response.status).toBe(200);
    expect(response.body.todo).toMatchObject({
      notes: 'The ones by the fence',
      dueOn: '2026-09-14',
      assigneeId: helperId,
      assigneeName: expect.any(String),
    });

    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    const neighbourId = (await neighbour.get('/api/auth/me')).body.user.id;
    const outsider = await cook.patch(url(`/${todo.id}`)).send({ assigneeId: neighbourId });
    expect(outsider.status).toBe(400);
    expect(outsider.body.error.fields.assigneeId).toMatch(/member of this household/);
    // The refused change wrote nothing, not even its other fields.
    const refusedToo = await cook.patch(url(`/${todo.id}`)).send({ title: 'Not saved', assigneeId: neighbourId });
    expect(refusedToo.status).toBe(400);
    expect((await cook.get(url(`/${todo.id}`))).body.todo).toMatchObject({
      title: 'Pick the green tomatoes',
      assigneeId: helperId,
    });
    // null clears the due date and the assignee; the same values again change nothing, not even updated_at.
    const cleared = await cook.patch(url(`/${todo.id}`)).send({ dueOn: null, assigneeId: null });
    expect(cleared.body.todo).toMatchObject({
      dueOn: null,
      assigneeId: null,
      assigneeName: null,
      notes: 'The ones by the fence',
    });
    const stamp = async () =>
      String(
        (
          (
            await ctx.sequelize.query('SELECT updated_at FROM todos WHERE id = :id', { replacements: { id: todo.id } })
          )[0][0] as { updated_at: Date }
        ).updated_at.getTime(),
      );
    const before = await stamp();
    const same = await cook
      .patch(url(`/${todo.id}`))
      .send({ dueOn: null, notes: 'The ones by the fence', position: cleared.body.todo.position });
    expect(same.status).toBe(200);
    expect(await stamp()).toBe(before);
    const invalid = await cook.post(url()).send({ title: '  ' });
    expect(invalid.status).toBe(400);
    expect(invalid.body.error.fields.title).toMatch(/title/);
  });

  it('lets a helper tick and untick a to-do and read the list, and nothing else', async () => {
    const [todo] = await add('Check the seals on Tuesday’s batch');
    const helper = await ctx.signedIn('helper@larderly.test');
    const ticked = await helper.patch(url(`/${todo.id}`)).send({ done: true });
    expect(ticked.status).toBe(200);
    expect(ticked.body.todo.done).toBe(true);
    expect(Date.parse(ticked.body.todo.doneAt)).toBeGreaterThan(Date.now() - 60_000);
    const unticked = await helper.patch(url(`/${todo.id}`)).send({ done: false });
    expect(unticked.body.todo).toMatchObject({ done: false, doneAt: null });

    expect((await helper.get(url())).status).toBe(200);
    const rename = await helper.patch(url(`/${todo.id}`)).send({ title: 'Mine now', done: true });
    expect(rename.status).toBe(403);
    expect(rename.body.error.message).toMatch(/Helpers may tick/);
    expect((await helper.patch(url(`/${todo.id}`)).send({ position: 0 })).status).toBe(403);
    expect((await helper.post(url()).send({ title: 'Helper list' })).status).toBe(403);
    expect((await helper.delete(url(`/${todo.id}`))).status).toBe(403);
    await expect(
      (await ctx.signedIn('keeper@larderly.test')).get(url(`/${todo.id}`)).then((r) => r.body.todo.done),
    ).resolves.toBe(false);
  });

  it('filters by open, done and mine', async () => {
    const cook = await ctx.signedIn('cook@larderly.test');
    const me = (await cook.get('/api/auth/me')).body.user.id;
    const [mine, done] = await add('Filter: mine', 'Filter: done');
    await cook.patch(url(`/${mine.id}`)).send({ assigneeId: me });
    await cook.patch(url(`/${done.id}`)).send({ done: true, assigneeId: me });
    const titles = async (filter: string) =>
      ((await cook.get(url(`?filter=${filter}`))).body.todos as Listed[]).map((t) => t.title);
    const mineListed = (await cook.get(url('?filter=mine'))).body.todos as Listed[];
    expect(mineListed.map((t) => t.title)).toContain('Filter: mine');
    expect(mineListed.every((t) => t.assigneeId === me && !t.done)).toBe(true);
    expect(await titles('mine')).not.toContain('Filter: done');
    expect(await titles('open')).toContain('Filter: mine');
    expect(await titles('open')).not.toContain('Filter: done');
    expect(await titles('done')).toContain('Filter: done');
    expect(await titles('done')).not.toContain('Filter: mine');
    expect((await cook.get(url('?filter=soon'))).status).toBe(400);
  });

  it("answers the neighbour 404 for this household's to-dos and changes nothing", async () => {
    const [todo] = await add('Private to-do');
    const neighbour = await ctx.signedIn('neighbor@larderly.test');
    for (const response of [
      await neighbour.get(url()),
      await neighbour.patch(url(`/${todo.id}`)).send({ done: true }),
      await neighbour.delete(url(`/${todo.id}`)),
      await neighbour.patch(`/api/households/${ctx.neighbourHouseholdId}/todos/${todo.id}`).send({ done: true }),
      await neighbour.delete(`/api/households/${ctx.neighbourHouseholdId}/todos/${todo.id}`),
    ]) {
      expect(response.status).toBe(404);
      expect(JSON.stringify(response.body)).not.toMatch(/Private to-do/);
    }
    expect((await list()).find((t) => t.id === todo.id)?.done).toBe(false);
  });
});
