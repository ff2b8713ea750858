// Writing one batch and its jars: the part the new-batch form and the CSV import share.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { bestQualityBy, defaultUseWithinDays, jarCapacityTbsp, useBy, type JarSize, type Method } from '../../../shared/domain';
import { Batch, Jar, JarEvent, type Household, type Product } from '../../db/models';
import { newJarCode } from './jar-codes';

// NCHFP: an unsealed jar keeps "several days" in the fridge; the shortest opened default (5, from memory) stands for it.
const UNSEALED_USE_WITHIN_DAYS = defaultUseWithinDays('other');

export interface BatchRecord {
  productId: string;
  recipeId: string | null;
  cannedOn: string;
  jarSize: JarSize;
  jarsFilled: number;
  jarsSealed: number;
  method: Method;
  minutes: number | null;
  pressurePsi: number | null;
  headspaceInches: number | null;
  notes: string;
}

/** Creates the batch, one sealed jar per sealed lid and one opened jar in the fridge per lid that did not seal. */
export async function writeBatch(household: Household, product: Product, record: BatchRecord, userId: string, transaction: Transaction) {
  const batch = await Batch.create({ householdId: household.id, altitudeFt: household.altitudeFt, createdBy: userId, ...record }, { transaction });
  const capacityTbsp = jarCapacityTbsp(record.jarSize);
  const bestBy = bestQualityBy(record.cannedOn, household.bestQualityMonths);
  const unsealedUseWithin = Math.min(product.useWithinDays ?? defaultUseWithinDays(product.kind), UNSEALED_USE_WITHIN_DAYS);
  const jars = await Jar.bulkCreate(
    Array.from({ length: record.jarsFilled }, (_, index) => {
      const sealed = index < record.jarsSealed;
      return {
        householdId: household.id,
        batchId: batch.id,
        productId: product.id,
        code: newJarCode(),
        state: sealed ? ('sealed' as const) : ('opened' as const),
        unsealed: !sealed,
        capacityTbsp,
        remainingTbsp: capacityTbsp,
        bestBy,
        openedOn: sealed ? null : record.cannedOn,
        useBy: sealed ? null : useBy(record.cannedOn, unsealedUseWithin),
      };
    }),
    { transaction, returning: true },
  );
  await JarEvent.bulkCreate(
    jars.flatMap((jar) => [
      { householdId: household.id, jarId: jar.id, batchId: batch.id, kind: 'filled' as const, userId, happenedOn: record.cannedOn },
      ...(jar.unsealed ? [{ householdId: household.id, jarId: jar.id, batchId: batch.id, kind: 'unsealed' as const, userId, happenedOn: record.cannedOn }] : []),
    ]),
    { transaction },
  );
  return { batch, jars };
}

/** A fresh jar code colliding with an existing one is rare; the whole write is retried with new codes. */
export async function withFreshJarCodes<T>(sequelize: Sequelize, work: (transaction: Transaction) => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await sequelize.transaction(work);
    } catch (error) {
      const codeClash = error instanceof UniqueConstraintError && error.errors.some((e) => e.path === 'code');
      if (!codeClash || attempt >= 3) throw error;
    }
  }
}
