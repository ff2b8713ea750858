// Empty jars and new lids in stock: every change is one locked row update and one history row, in the caller's transaction.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { JAR_SIZES, MOUTHS, mouthFor, type JarSize, type Mouth, type StockItem } from '../../../shared/domain';
import type { JarStockView, StockChangeView, StockCorrection } from '../../../shared/schemas/stock';
import { stockShortWords, type StockReason } from '../../../shared/words/stock';
import type { Household } from '../../db/models';
import { emptyJarsBack, type JarEnding } from './jar-endings';

export { emptyJarsBack, type JarEnding } from './jar-endings';

export interface StockChange {
  item: StockItem;
  size: JarSize | Mouth;
  /** Positive: back in the cupboard; negative: used. */
  delta: number;
  reason: StockReason;
  userId: string | null;
  batchId?: string | null;
  jarEventId?: string | null;
  note?: string;
}

export interface StockApplied {
  item: StockItem;
  size: JarSize | Mouth;
  before: number;
  after: number;
  /** Used beyond the count in stock: the count stops at 0 and says so, rather than refusing the batch. */
  short: number;
  /** Words for the person, when the count stopped at 0. */
  warning: string | null;
}

/**
 * Applies one change to a count. The row is locked (SELECT ... FOR UPDATE) before it is written, so any number of
 * changes at once add up exactly; a count never goes below 0 (a household that used jars it never entered has them).
 */
export async function changeStock(
  sequelize: Sequelize,
  householdId: string,
  change: StockChange,
  transaction: Transaction,
): Promise<StockApplied> {
  await sequelize.query(
    `INSERT INTO jar_stock (household_id, item, size) VALUES ($1, $2, $3) ON CONFLICT (household_id, item, size) DO NOTHING`,
    { bind: [householdId, change.item, change.size], transaction },
  );
  // One statement locks the row (the FOR UPDATE sub-select waits for any other writer and reads its count), and
  // writes the new count, never below 0; it returns the count before and after.
  const [row] = await sequelize.query<{ before: number; after: number }>(
    `UPDATE jar_stock s SET count = GREATEST(0, o.count + $4), updated_at = now()
       FROM (SELECT count FROM jar_stock WHERE household_id = $1 AND item = $2 AND size = $3 FOR UPDATE) o
      WHERE s.household_id = $1 AND s.item = $2 AND s.size = $3
      RETURNING o.count AS before, s.count AS after`,
    { bind: [householdId, change.item, change.size, change.delta], type: QueryTypes.SELECT, transaction },
  );
  const { before, after } = row!;
  const short = after - (before + change.delta);
  if (change.delta !== 0 || change.reason === 'correction') {
    await sequelize.query(
      `INSERT INTO jar_stock_changes (household_id, item, size, reason, delta, count_after, short, note, user_id, batch_id, jar_event_id, created_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, clock_timestamp())`,
      {
        bind: [
          householdId,
          change.item,
          change.size,
          change.reason,
          after - before,
          after,
          short,
          change.note ?? '',
          change.userId,
          change.batchId ?? null,
          change.jarEventId ?? null,
        ],
        transaction,
      },
    );
  }
  return {
    item: change.item,
    size: change.size,
    before,
    after,
    short,
    warning: short > 0 ? stockShortWords(change.item, change.size, -change.delta, before) : null,
  };
}

/** A batch takes its jars from the empty ones in stock and one new lid a jar (lids seal once: USDA 2015, NCHFP). */
export async function takeForBatch(
  sequelize: Sequelize,
  householdId: string,
  batch: { id: string; jarSize: JarSize; mouth: Mouth | null },
  jars: number,
  reason: 'record' | 'reprocess',
  userId: string,
  transaction: Transaction,
): Promise<StockApplied[]> {
  const mouth = mouthFor(batch.jarSize, batch.mouth);
  const applied: StockApplied[] = [];
  // Jars before lids, in every transaction, so two writers never wait on each other's rows.
  if (reason === 'record')
    applied.push(
      await changeStock(
        sequelize,
        householdId,
        { item: 'jar', size: batch.jarSize, delta: -jars, reason, userId, batchId: batch.id },
        transaction,
      ),
    );
  applied.push(
    await changeStock(
      sequelize,
      householdId,
      { item: 'lid', size: mouth, delta: -jars, reason, userId, batchId: batch.id },
      transaction,
    ),
  );
  return applied;
}

/** A jar that ended: its empty jar comes back to stock or not, by the one rule of `emptyJarsBack`. */
export async function jarEnded(
  sequelize: Sequelize,
  householdId: string,
  jar: { jarSize: JarSize; batchId: string },
  ending: JarEnding,
  userId: string,
  jarEventId: string,
  transaction: Transaction,
): Promise<void> {
  const back = emptyJarsBack(ending);
  if (back === 0) return;
  await changeStock(
    sequelize,
    householdId,
    {
      item: 'jar',
      size: jar.jarSize,
      delta: back,
      reason: ending.reason === 'finish' ? 'finish' : 'discard',
      userId,
      batchId: jar.batchId,
      jarEventId,
    },
    transaction,
  );
}

/** Putting a jar back (an undone finish or discard) takes back the stock changes that ending made. */
export async function undoJarEnding(
  sequelize: Sequelize,
  householdId: string,
  undoneEventId: string,
  userId: string,
  jarEventId: string,
  transaction: Transaction,
): Promise<void> {
  const made = await sequelize.query<{
    item: StockItem;
    size: JarSize | Mouth;
    delta: number;
    batch_id: string | null;
  }>('SELECT item, size, delta, batch_id FROM jar_stock_changes WHERE household_id = $1 AND jar_event_id = $2', {
    bind: [householdId, undoneEventId],
    type: QueryTypes.SELECT,
    transaction,
  });
  for (const change of made) {
    await changeStock(
      sequelize,
      householdId,
      {
        item: change.item,
        size: change.size,
        delta: -change.delta,
        reason: 'undo',
        userId,
        batchId: change.batch_id,
        jarEventId,
      },
      transaction,
    );
  }
}

const HISTORY_ROWS = 50;

export async function stockView(sequelize: Sequelize, householdId: string): Promise<JarStockView> {
  const [counts, history] = await Promise.all([
    sequelize.query<{ item: StockItem; size: string; count: number }>(
      'SELECT item, size, count FROM jar_stock WHERE household_id = $1',
      { bind: [householdId], type: QueryTypes.SELECT },
    ),
    sequelize.query<{
      id: string;
      at: Date;
      item: StockItem;
      size: JarSize | Mouth;
      reason: StockReason;
      delta: number;
      count_after: number;
      short: number;
      note: string;
      who: string | null;
      batch_id: string | null;
    }>(
      `SELECT c.id, c.created_at AS at, c.item, c.size, c.reason, c.delta, c.count_after, c.short, c.note, u.name AS who, c.batch_id
       FROM jar_stock_changes c LEFT JOIN users u ON u.id = c.user_id
       WHERE c.household_id = $1 ORDER BY c.created_at DESC, c.id DESC LIMIT ${HISTORY_ROWS}`,
      { bind: [householdId], type: QueryTypes.SELECT },
    ),
  ]);
  const countOf = (item: StockItem, size: string) =>
    counts.find((row) => row.item === item && row.size === size)?.count ?? 0;
  return {
    jars: JAR_SIZES.map((size) => ({ size, count: countOf('jar', size) })),
    lids: MOUTHS.map((mouth) => ({ mouth, count: countOf('lid', mouth) })),
    history: history.map((row): StockChangeView => ({
      id: row.id,
      at: new Date(row.at).toISOString(),
      item: row.item,
      size: row.size,
      reason: row.reason,
      delta: row.delta,
      countAfter: row.count_after,
      short: row.short,
      note: row.note,
      who: row.who,
      batchId: row.batch_id,
    })),
  };
}

/** The counts a batch plan reads: empty jars of one size, new lids of one mouth. */
export async function stockFor(
  sequelize: Sequelize,
  householdId: string,
): Promise<(item: StockItem, size: string) => number> {
  const counts = await sequelize.query<{ item: StockItem; size: string; count: number }>(
    'SELECT item, size, count FROM jar_stock WHERE household_id = $1',
    { bind: [householdId], type: QueryTypes.SELECT },
  );
  return (item, size) => counts.find((row) => row.item === item && row.size === size)?.count ?? 0;
}

/**
 * The mouth a household uses for a product in a jar size: that of its latest batch of it that says, else the size's
 * usual one. A jar's mouth is the jar's, so what the household canned in last is the best guess for the next batch.
 */
export async function usualMouths(
  sequelize: Sequelize,
  householdId: string,
  productIds: string[],
): Promise<(productId: string, size: JarSize) => Mouth> {
  const rows =
    productIds.length === 0
      ? []
      : await sequelize.query<{ product_id: string; jar_size: JarSize; mouth: Mouth }>(
          `SELECT DISTINCT ON (product_id, jar_size) product_id, jar_size, mouth FROM batches
           WHERE household_id = $1 AND product_id = ANY($2::uuid[]) AND mouth IS NOT NULL
           ORDER BY product_id, jar_size, canned_on DESC, created_at DESC`,
          { bind: [householdId, productIds], type: QueryTypes.SELECT },
        );
  return (productId, size) =>
    mouthFor(size, rows.find((row) => row.product_id === productId && row.jar_size === size)?.mouth);
}

/** A count set by hand after counting the cupboard; the history keeps the difference and who counted. */
export async function correctStock(
  sequelize: Sequelize,
  household: Household,
  input: Required<StockCorrection>,
  userId: string,
): Promise<JarStockView> {
  await sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ count: number }>(
      'SELECT count FROM jar_stock WHERE household_id = $1 AND item = $2 AND size = $3 FOR UPDATE',
      { bind: [household.id, input.item, input.size], type: QueryTypes.SELECT, transaction },
    );
    const now = row?.count ?? 0;
    if (now === input.count) return;
    await changeStock(
      sequelize,
      household.id,
      {
        item: input.item,
        size: input.size,
        delta: input.count - now,
        reason: 'correction',
        userId,
        note: input.note.trim(),
      },
      transaction,
    );
  });
  return stockView(sequelize, household.id);
}
