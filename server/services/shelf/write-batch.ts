// Writing one batch and its jars: the part the new-batch form and the CSV import share.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import {
  bestQualityBy,
  defaultUseWithinDays,
  jarCapacityTbsp,
  useBy,
  type JarSize,
  type Method,
  type Mouth,
} from '../../../shared/domain';
import { Batch, BatchProcessing, Jar, JarEvent, type Household, type Product } from '../../db/models';
import { newJarCode } from './jar-codes';

// NCHFP: an unsealed jar keeps "several days" in the fridge; the shortest opened default (5, from memory) stands for it.
const UNSEALED_USE_WITHIN_DAYS = defaultUseWithinDays('other');

export interface BatchRecord {
  productId: string;
  recipeId: string | null;
  cannedOn: string;
  jarSize: JarSize;
  mouth?: Mouth | null;
  jarsFilled: number;
  jarsSealed: number;
  method: Method;
  minutes: number | null;
  pressurePsi: number | null;
  headspaceInches: number | null;
  notes: string;
}

/**
 * Creates the batch, one sealed jar per sealed lid and one opened jar in the fridge per lid that did not seal.
 * With `sealsToCheckFrom` (recorded right after processing) every jar is sealed with its seal still to check,
 * and the batch's first processing is kept with the time it came out of the canner.
 */
export async function writeBatch(
  household: Household,
  product: Product,
  record: BatchRecord,
  userId: string,
  transaction: Transaction,
  sealsToCheckFrom?: Date,
) {
  const toCheck = sealsToCheckFrom !== undefined;
  if (toCheck) record = { ...record, jarsSealed: record.jarsFilled };
  const batch = await Batch.create(
    { householdId: household.id, altitudeFt: household.altitudeFt, createdBy: userId, ...record },
    { transaction },
  );
  const processing = toCheck
    ? await BatchProcessing.create(
        {
          householdId: household.id,
          batchId: batch.id,
          number: 1,
          processedAt: sealsToCheckFrom,
          method: record.method,
          altitudeFt: household.altitudeFt,
          minutes: record.minutes,
          pressurePsi: record.pressurePsi,
          jars: record.jarsFilled,
          createdBy: userId,
        },
        { transaction },
      )
    : null;
  const capacityTbsp = jarCapacityTbsp(record.jarSize);
  const bestBy = bestQualityBy(record.cannedOn, household.bestQualityMonths);
  const unsealedUseWithin = Math.min(
    product.useWithinDays ?? defaultUseWithinDays(product.kind),
    UNSEALED_USE_WITHIN_DAYS,
  );
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
        seal: toCheck ? ('to-check' as const) : ('checked' as const),
        processingId: processing?.id ?? null,
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
      {
        householdId: household.id,
        jarId: jar.id,
        batchId: batch.id,
        kind: 'filled' as const,
        userId,
        happenedOn: record.cannedOn,
      },
      ...(jar.unsealed
        ? [
            {
              householdId: household.id,
              jarId: jar.id,
              batchId: batch.id,
              kind: 'unsealed' as const,
              userId,
              happenedOn: record.cannedOn,
            },
          ]
        : []),
    ]),
    { transaction },
  );
  return { batch, jars };
}

/** A fresh jar code colliding with an existing one is rare; the whole write is retried with new codes. */
export async function withFreshJarCodes<T>(
  sequelize: Sequelize,
  work: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await sequelize.transaction(work);
    } catch (error) {
      const codeClash = error instanceof UniqueConstraintError && error.errors.some((e) => e.path === 'code');
      if (!codeClash || attempt >= 3) throw error;
    }
  }
}
