// The demo's cupboard of empty jars and new lids, counted by hand once, so the stock screen and the plans have numbers.
import { Household } from '../db/models';
import { changeStock, type StockChange } from '../services/stock/jar-stock';
import type { DemoSeedContext } from './features';

/** Our invented household's cupboard: a few empty pints, more half-pints, and lids of both mouths. */
export const DEMO_STOCK: Pick<StockChange, 'item' | 'size' | 'delta'>[] = [
  { item: 'jar', size: 'pint', delta: 6 },
  { item: 'jar', size: 'half-pint', delta: 11 },
  { item: 'jar', size: 'quart', delta: 3 },
  { item: 'lid', size: 'regular', delta: 8 },
  { item: 'lid', size: 'wide', delta: 12 },
];

export async function seedStock({ households, members, transaction }: DemoSeedContext) {
  const calloway = households['Calloway Hollow'];
  for (const count of DEMO_STOCK) {
    await changeStock(
      Household.sequelize!,
      calloway.id,
      {
        ...count,
        reason: 'correction',
        userId: members['keeper@larderly.test'].id,
        note: 'Counted the cellar cupboard',
      },
      transaction,
    );
  }
}
