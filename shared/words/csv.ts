// The shelf's CSV file in words: its columns, and the values each column takes. The export writes the words
// the screens show; the import reads those words and the ids alike, and its help lists the same table.
// Imported from shared/words/csv, not the words' index, so only the screens with the CSV help load it.
import { PROCESSING_METHODS, type Method } from '../domain/processing-tables';
import { PRODUCT_KINDS, type ProductKind } from '../domain/products';
import { JAR_STATES, type JarState } from '../domain/shelf-life';
import { JAR_SIZES, type JarSize } from '../domain/units';
import { JAR_STATE_NAMES, METHOD_NAMES, PRODUCT_KIND_NAMES } from './names';
import { PLACE_CSV_HELP } from './shelf-places';
import { JAR_SIZE_NAMES } from './units';

const STATE_WORDS: Record<JarState, string> = {
  sealed: 'sealed',
  opened: 'opened',
  finished: 'finished',
  discarded: 'discarded',
  given: 'given',
};

/** Each column with a choice of values: the ids, and the words the file is written in. */
export const CSV_CHOICES = {
  jar_size: { ids: JAR_SIZES, words: JAR_SIZE_NAMES as Record<JarSize, string> },
  method: { ids: PROCESSING_METHODS, words: METHOD_NAMES as Record<Method, string> },
  kind: { ids: PRODUCT_KINDS, words: PRODUCT_KIND_NAMES as Record<ProductKind, string> },
  state: { ids: JAR_STATES, words: STATE_WORDS },
} as const;
type Choices = typeof CSV_CHOICES;
export type CsvChoiceColumn = keyof Choices;
type ChoiceId<C extends CsvChoiceColumn> = Choices[C]['ids'][number];

const plain = (value: string) =>
  value
    .trim()
    .toLowerCase()
    .replace(/\s+/g, ' ')
    .replace(/ jars?$/, '');

/** A cell's value as its id: the id itself or the words the screens show, in any case ("12-ounce", "Pressure canner, dial gauge"). */
export function readCsvChoice<C extends CsvChoiceColumn>(column: C, value: string): ChoiceId<C> | undefined {
  const { ids, words } = CSV_CHOICES[column] as { ids: readonly string[]; words: Record<string, string> };
  const wanted = plain(value);
  const extra = column === 'state' ? (JAR_STATE_NAMES as Record<string, string>) : {};
  return ids.find(
    (id) => id === wanted || plain(words[id]) === wanted || (extra[id] !== undefined && plain(extra[id]) === wanted),
  ) as ChoiceId<C> | undefined;
}

/** The words a column's value is written in. */
export function csvChoiceWords<C extends CsvChoiceColumn>(column: C, id: ChoiceId<C>): string {
  return (CSV_CHOICES[column].words as Record<string, string>)[id];
}

/** "Use one of: quarter-pint, half-pint, 12-ounce, ...". */
export function csvChoiceList(column: CsvChoiceColumn): string {
  const { ids, words } = CSV_CHOICES[column] as { ids: readonly string[]; words: Record<string, string> };
  return ids.map((id) => words[id]).join(', ');
}

export interface CsvColumnHelp {
  column: string;
  says: string;
  /** Which files need it: every one, one row a batch, or one row a jar (the shelf's own export). */
  needed: 'always' | 'batch rows' | 'jar rows' | 'no';
  choices?: CsvChoiceColumn;
}

/** The columns the import reads, in the order the help lists them. */
export const CSV_IMPORT_COLUMNS: CsvColumnHelp[] = [
  { column: 'product', says: 'The product’s name as the shelf shows it.', needed: 'always' },
  {
    column: 'kind',
    says: 'The kind of preserve; a product the household does not have yet is added with it.',
    needed: 'no',
    choices: 'kind',
  },
  { column: 'recipe', says: 'A recipe of that product; its plan for your altitude gives the minutes.', needed: 'no' },
  { column: 'canned_on', says: 'The canning day, written YYYY-MM-DD.', needed: 'always' },
  { column: 'jar_size', says: 'The jar size.', needed: 'always', choices: 'jar_size' },
  { column: 'method', says: 'The canner the batch was processed in.', needed: 'always', choices: 'method' },
  { column: 'minutes', says: 'Processing minutes, when no recipe is named; may be empty.', needed: 'no' },
  { column: 'jars_filled', says: 'Jars filled in the batch (one row a batch).', needed: 'batch rows' },
  { column: 'jars_sealed', says: 'Jars that sealed (one row a batch).', needed: 'batch rows' },
  {
    column: 'state',
    says: 'The jar’s state (one row a jar, as the shelf export writes it).',
    needed: 'jar rows',
    choices: 'state',
  },
  { column: 'batch', says: 'Which jars were canned together: rows with the same number are one batch.', needed: 'no' },
  { column: 'jar_code', says: 'The label code; kept where no other jar carries it.', needed: 'no' },
  {
    column: 'opened_on, finished_on, discarded_on, given_on',
    says: 'The day a jar was opened, finished, discarded or given away, YYYY-MM-DD.',
    needed: 'no',
  },
  { column: 'given_to', says: 'Whom a given jar went to; may be empty.', needed: 'no' },
  { column: 'use_by, best_by', says: 'The jar’s dates; worked out again when empty.', needed: 'no' },
  { column: 'unsealed', says: 'yes for a jar that did not seal.', needed: 'no' },
  { column: 'place', says: PLACE_CSV_HELP, needed: 'no' },
  { column: 'notes', says: 'The batch’s notes (batch_notes in the shelf export).', needed: 'no' },
];
