import Papa from 'papaparse';
import type { Household } from '../../db/models';
import { listJars } from './jars';

const COLUMNS = ['jar_code', 'product', 'kind', 'state', 'canned_on', 'jar_size', 'best_by', 'opened_on', 'use_by', 'finished_on', 'discarded_on', 'unsealed', 'past_best_quality', 'batch_notes'] as const;

/** A spreadsheet runs a cell that starts like a formula; a leading apostrophe keeps it text. */
function safeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** The shelf as CSV, one row a jar: sealed and opened jars, or every jar ever made. */
export async function shelfCsv(household: Household, everyJar: boolean) {
  const jars = await listJars(household, { state: everyJar ? 'all' : undefined });
  const rows = jars.map((jar) =>
    [jar.code, jar.productName, jar.productKind, jar.state, jar.cannedOn, jar.jarSize, jar.bestBy, jar.openedOn ?? '', jar.useBy ?? '', jar.finishedOn ?? '', jar.discardedOn ?? '', jar.unsealed ? 'yes' : 'no', jar.pastBestQuality ? 'yes' : 'no', jar.batchNotes].map(safeCell),
  );
  return Papa.unparse({ fields: [...COLUMNS], data: rows }, { newline: '\r\n' });
}
