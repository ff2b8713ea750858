import { describe, expect, it } from 'vitest';
import { frozen, householdMemo } from '../../server/services/household-memo';

describe('householdMemo: a value kept until the version it was made at moves', () => {
  it('works a value out once per version, again when the version moves, and every time without one', async () => {
    const memo = householdMemo<number>();
    let runs = 0;
    const compute = async () => (runs += 1);
    expect(await memo('h1 2027-01-04', '7', compute)).toBe(1);
    expect(await memo('h1 2027-01-04', '7', compute)).toBe(1);
    expect(await memo('h1 2027-01-04', '8', compute)).toBe(2);
    expect(await memo('h2 2027-01-04', '8', compute)).toBe(3);
    expect(await memo('h1 2027-01-04', undefined, compute)).toBe(4);
    expect(await memo('h1 2027-01-04', undefined, compute)).toBe(5);
    // The version held is still the last one made, whatever the calls without one did.
    expect(await memo('h1 2027-01-04', '8', compute)).toBe(2);
  });

  it('shares one computation between callers that miss at once, and keeps no failure', async () => {
    const memo = householdMemo<string>();
    let runs = 0;
    const [a, b] = await Promise.all([
      memo('k', '1', async () => `run ${(runs += 1)}`),
      memo('k', '1', async () => `run ${(runs += 1)}`),
    ]);
    expect([a, b, runs]).toEqual(['run 1', 'run 1', 1]);
    await expect(memo('k', '2', () => Promise.reject(new Error('database away')))).rejects.toThrow('database away');
    expect(await memo('k', '2', async () => 'made again')).toBe('made again');
  });

  it('holds at most its size, dropping the oldest key first', async () => {
    const memo = householdMemo<string>(2);
    for (const key of ['a', 'b', 'c']) await memo(key, '1', async () => `${key} first`);
    expect(await memo('a', '1', async () => 'a again')).toBe('a again');
    expect(await memo('c', '1', async () => 'c again')).toBe('c first');
  });

  it('freezes a shared value and its arrays, so a caller that sorts one in place fails at once', () => {
    const value = frozen({ jars: [3, 1, 2], today: '2027-01-04' });
    expect(() => value.jars.sort()).toThrow(TypeError);
    expect(() => Object.assign(value, { today: '2027-01-05' })).toThrow(TypeError);
    expect(value).toEqual({ jars: [3, 1, 2], today: '2027-01-04' });
  });
});
