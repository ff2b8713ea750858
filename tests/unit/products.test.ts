import { describe, expect, it } from 'vitest';
import { PRODUCT_KINDS, defaultHeadspaceInches, defaultUseWithinDays, type ProductKind } from '@shared/domain';

describe('defaultHeadspaceInches (USDA Complete Guide, AIB 539 (2015), Guide 1 glossary and recipes)', () => {
  it("a relish's headspace is 1/2 inch (common practice; the Guide's relish and pickle recipes)", () => {
    expect(defaultHeadspaceInches('relish')).toBe(0.5);
    expect(defaultHeadspaceInches('pickle')).toBe(0.5);
  });

  it('jams and jellies take 1/4 inch (USDA Guide 1)', () => {
    expect(defaultHeadspaceInches('jam')).toBe(0.25);
    expect(defaultHeadspaceInches('jelly')).toBe(0.25);
  });

  it('pressure-canned low-acid food usually takes 1 inch (USDA Guide 1)', () => {
    expect(defaultHeadspaceInches('other', 'pressure-dial')).toBe(1);
    expect(defaultHeadspaceInches('sauce', 'pressure-weighted')).toBe(1);
    expect(defaultHeadspaceInches('relish', 'boiling-water')).toBe(0.5);
  });

  it('refuses an unknown kind or method with a RangeError', () => {
    expect(() => defaultHeadspaceInches('marmalade' as ProductKind)).toThrow(/kind must be one of/);
    expect(() => defaultHeadspaceInches('jam', 'microwave' as never)).toThrow(RangeError);
  });
});

describe('defaultUseWithinDays (from memory, as REFERENCE.md marks them: no published figure for opened jars)', () => {
  it('about a month for opened relishes and pickled products (from memory)', () => {
    expect(defaultUseWithinDays('relish')).toBe(30);
    expect(defaultUseWithinDays('pickle')).toBe(30);
  });

  it('about three weeks for spreads, the low-sugar figure (from memory)', () => {
    for (const kind of ['jam', 'jelly', 'fruit-butter'] as const) expect(defaultUseWithinDays(kind)).toBe(21);
  });

  it('gives every kind a whole number of days, at most a month', () => {
    for (const kind of PRODUCT_KINDS) {
      const days = defaultUseWithinDays(kind);
      expect(Number.isInteger(days)).toBe(true);
      expect(days).toBeGreaterThan(0);
      expect(days).toBeLessThanOrEqual(30);
    }
  });

  it('refuses an unknown kind with a RangeError', () => {
    expect(() => defaultUseWithinDays('cordial' as ProductKind)).toThrow(RangeError);
  });
});
