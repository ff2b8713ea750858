// How a batch's processings and its jars still to check look to the client (batch page and Today).
import { mayReprocess, reprocessUntil, sealCheckFrom } from '../../../shared/domain';
import type { ProcessingView, SealCheckView } from '../../../shared/schemas/batches';
import type { Batch, BatchProcessing, Jar, Product, User } from '../../db/models';

export function processingView(processing: BatchProcessing): ProcessingView {
  return {
    id: processing.id,
    number: processing.number,
    processedAt: processing.processedAt.toISOString(),
    method: processing.method,
    altitudeFt: processing.altitudeFt,
    minutes: processing.minutes,
    pressurePsi: processing.pressurePsi,
    jars: processing.jars,
    who: (processing as BatchProcessing & { user?: User | null }).user?.name ?? null,
  };
}

/** The jars of a batch still to check (sealed, lid not yet checked); null when there are none. */
export function sealCheckView(
  batch: Batch,
  product: Product,
  jars: Jar[],
  processings: BatchProcessing[],
  now: Date,
  timeZone: string,
): SealCheckView | null {
  const toCheck = jars.filter((jar) => jar.state === 'sealed' && jar.seal === 'to-check');
  if (toCheck.length === 0) return null;
  const first = processings.find((p) => p.number === 1);
  const latest = processings.find((p) => p.id === toCheck[0].processingId) ?? processings[processings.length - 1];
  if (!first || !latest) return null;
  return {
    batchId: batch.id,
    productName: product.name,
    jarSize: batch.jarSize,
    processingNumber: latest.number,
    processedAt: latest.processedAt.toISOString(),
    checkFrom: sealCheckFrom(latest.processedAt).toISOString(),
    reprocessUntil: mayReprocess(first.processedAt, now, latest.number)
      ? reprocessUntil(first.processedAt).toISOString()
      : null,
    jarIds: toCheck.map((jar) => jar.id),
    timeZone,
  };
}
