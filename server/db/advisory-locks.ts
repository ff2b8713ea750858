// Transaction-scoped advisory locks on names of our own (a household's day, its to-do list), for writes that
// no row lock could order: an insert's new row, or a renumbering of rows another writer is about to add to.
import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

/** A stable 64-bit key for a lock name (the first 8 bytes of its SHA-256). */
export function advisoryKey(name: string): string {
  return createHash('sha256').update(name).digest().readBigInt64BE(0).toString();
}

/**
 * Takes the names' locks until the transaction ends, in one fixed order (no deadlock between two writers taking
 * several), in one statement.
 */
export async function lockNames(sequelize: Sequelize, transaction: Transaction, names: string[]) {
  const keys = [...new Set(names.map(advisoryKey))].sort();
  await sequelize.query('SELECT pg_advisory_xact_lock(k) FROM unnest($1::bigint[]) AS k', {
    bind: [keys],
    transaction,
    type: QueryTypes.SELECT,
  });
}
