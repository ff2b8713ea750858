// The app's own addresses, for the client and the server alike: the ones DEVELOPERS.md lists as relied on by
// labels, e-mails, the calendar feed and to-dos keep their shape.
import { describe, expect, it } from 'vitest';
import { paths } from '../../shared/paths';

const hid = '7d1f2c3a-0000-4000-8000-000000000001';

describe('paths', () => {
  it('builds the addresses other parts rely on', () => {
    expect(paths.jar('PK-0042')).toBe('/j/PK-0042');
    expect(paths.newBatch(hid, { productId: 'p1', recipeId: 'r1', jars: 6, jarSize: 'pint', todoId: 't1' })).toBe(
      `/h/${hid}/batches/new?productId=p1&recipeId=r1&jars=6&jarSize=pint&todoId=t1`,
    );
    expect(paths.recipe(hid, 'r1')).toBe(`/h/${hid}/recipes/r1`);
    expect(paths.todo(hid, 't1')).toBe(`/h/${hid}/todo?open=t1`);
    expect(paths.invitation('tok_en')).toBe('/invite/tok_en');
    expect(paths.week(hid, '2026-12-07')).toBe(`/h/${hid}/week?start=2026-12-07`);
    expect(paths.week(hid, '2026-12-09', '2026-12-09')).toBe(`/h/${hid}/week?start=2026-12-09&day=2026-12-09`);
    expect(paths.household(hid)).toBe(`/h/${hid}/household`);
    expect(paths.signUpConfirm('tok_en')).toBe('/sign-up/confirm/tok_en');
  });

  it('leaves out what is not given and encodes what needs it', () => {
    expect(paths.newBatch(hid)).toBe(`/h/${hid}/batches/new`);
    expect(paths.todo(hid, null)).toBe(`/h/${hid}/todo`);
    expect(paths.batch(hid, 'b1', { saved: true, todoId: null })).toBe(`/h/${hid}/batches/b1?saved=1`);
    expect(paths.signIn()).toBe('/sign-in');
    expect(paths.signIn(`/h/${hid}/week?start=2026-12-07`)).toBe(
      `/sign-in?next=%2Fh%2F${hid}%2Fweek%3Fstart%3D2026-12-07`,
    );
    expect(paths.setup(hid, `/h/${hid}/shelf`)).toBe(`/h/${hid}/setup?back=%2Fh%2F${hid}%2Fshelf`);
    expect(paths.screen(hid, '')).toBe(`/h/${hid}`);
    expect(paths.screen(hid, 'fridge')).toBe(`/h/${hid}/fridge`);
    expect(paths.stock(hid)).toBe(`/h/${hid}/shelf/stock`);
  });
});
