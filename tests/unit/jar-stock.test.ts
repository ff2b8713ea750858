import { describe, expect, it } from 'vitest';
import { batchShopping, JAR_SIZES, mouthFor, USUAL_MOUTH } from '../../shared/domain';
import { batchShoppingTodo, batchShoppingWords } from '../../shared/words/stock';
import { emptyJarsBack } from '../../server/services/stock/jar-endings';

describe('which jar endings bring an empty jar back', () => {
  // Jars and bands are reused, lids are not: USDA Complete Guide to Home Canning (2015), Guide 1; NCHFP.
  it('a finished jar comes back empty', () => {
    expect(emptyJarsBack({ reason: 'finish' })).toBe(1);
  });
  it('a discarded jar comes back only when it was kept (a broken jar does not: common practice)', () => {
    expect(emptyJarsBack({ reason: 'discard', kept: true })).toBe(1);
    expect(emptyJarsBack({ reason: 'discard', kept: false })).toBe(0);
  });
  it('a jar given away leaves with its food, so nothing comes back', () => {
    expect(emptyJarsBack({ reason: 'given' })).toBe(0);
  });
});

describe('the mouth of a jar', () => {
  it('is the one the cook chose, else the usual one for the size', () => {
    // From memory of the common jar lines (Ball's): the 4-ounce jelly jar is regular-mouth, the 24-ounce wide-mouth.
    expect(mouthFor('quarter-pint')).toBe('regular');
    expect(mouthFor('pint-and-half')).toBe('wide');
    expect(mouthFor('pint', 'wide')).toBe('wide');
    expect(mouthFor('pint', null)).toBe('regular');
    expect(Object.keys(USUAL_MOUTH).sort()).toEqual([...JAR_SIZES].sort());
  });
});

describe('a batch’s shopping after stock', () => {
  // One new lid a jar, every batch (lids are single-use: USDA Complete Guide 2015; NCHFP); jars come from stock first.
  it('buys the jars beyond the empty ones in stock and a lid a jar beyond the lids in stock', () => {
    const shop = batchShopping(10, { emptyJars: 6, lids: 0 });
    expect(shop).toEqual({ emptyJars: 6, lids: 0, buyJars: 4, buyLids: 10 });
    expect(batchShoppingWords('pint', 'wide', shop)).toBe(
      'You have 6 empty pint jars and no new wide-mouth lids: buy 4 jars and 10 wide-mouth lids.',
    );
    expect(batchShoppingTodo('pint', 'wide', shop)).toBe('Buy 10 wide-mouth lids and 4 pint jars');
  });
  it('buys nothing when the stock covers the batch', () => {
    const shop = batchShopping(4, { emptyJars: 9, lids: 4 });
    expect(shop).toEqual({ emptyJars: 9, lids: 4, buyJars: 0, buyLids: 0 });
    expect(batchShoppingWords('half-pint', 'regular', shop)).toBe(
      'You have 9 empty half-pint jars and 4 new regular-mouth lids: enough for this batch.',
    );
    expect(batchShoppingTodo('half-pint', 'regular', shop)).toBeNull();
  });
});
