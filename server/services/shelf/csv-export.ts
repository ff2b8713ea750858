import Papa from 'papaparse';
import type { ProductKind } from '../../../shared/domain';
import { csvChoiceWords } from '../../../shared/words/csv';
import { Batch, type Household } from '../../db/models';
import { CSV_WRITE_OPTIONS, guardCell } from './csv-cells';
import { listJars } from './jars';

/** One row a jar; the batch import reads these columns back (see shared/words/csv.ts). */
export const SHELF_COLUMNS = [
  'batch',
  'jar_code',
  'product',
  'kind',
  'state',
  'place',
  'canned_on',
  'jar_size',
  'method',
  'minutes',
  'best_by',
  'opened_on',
  'use_by',
  'finished_on',
  'discarded_on',
  'given_on',
  'given_to',
  'unsealed',
  'past_best_quality',
  'batch_notes',
] as const;

/** The shelf as CSV, one row a jar: sealed and opened jars, or every jar ever made. Sizes, canners and kinds in the screens' words. */
export async function shelfCsv(household: Household, everyJar: boolean) {
  const jars = await listJars(household, { state: everyJar ? 'all' : undefined });
  const batches = new Map(
    (await Batch.findAll({ where: { householdId: household.id }, attributes: ['id', 'method', 'minutes'] })).map(
      (b) => [b.id, b],
    ),
  );
  // Rows of one batch share a number, counted in the order the batches first appear.
  const batchNumbers = new Map<string, number>();
  const rows = jars.map((jar) => {
    if (!batchNumbers.has(jar.batchId)) batchNumbers.set(jar.batchId, batchNumbers.size + 1);
    const batch = batches.get(jar.batchId)!;
    return [
      String(batchNumbers.get(jar.batchId)),
      jar.code,
      jar.productName,
      csvChoiceWords('kind', jar.productKind as ProductKind),
      jar.state,
      jar.placeName ?? '',
      jar.cannedOn,
      csvChoiceWords('jar_size', jar.jarSize),
      csvChoiceWords('method', batch.method),
      batch.minutes === null ? '' : String(batch.minutes),
      jar.bestBy,
      jar.openedOn ?? '',
      jar.useBy ?? '',
      jar.finishedOn ?? '',
      jar.discardedOn ?? '',
      jar.givenOn ?? '',
      jar.givenTo ?? '',
      jar.unsealed ? 'yes' : 'no',
      jar.pastBestQuality ? 'yes' : 'no',
      jar.batchNotes,
    ].map(guardCell);
  });
  return Papa.unparse({ fields: [...SHELF_COLUMNS], data: rows }, CSV_WRITE_OPTIONS);
}
