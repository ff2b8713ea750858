// Cells of a CSV that a spreadsheet opens: a formula start anywhere a cell could begin is kept as text.
//
// OWASP "CSV Injection": a cell that begins with =, +, -, @, tab or carriage return can run as a formula;
// prefix it with a single quote and quote every cell. A spreadsheet that splits on ";" or a tab instead of
// "," starts a new cell after that separator, so the same guard applies after every separator inside a cell,
// and leading spaces, line breaks and invisible characters (zero-width space, byte-order mark) do not hide it.

/** White space and characters a spreadsheet may skip before reading "=": spaces, line breaks, zero-width and direction marks. */
const SKIPPED = '\\s\\u00a0\\u1680\\u180e\\u2000-\\u200f\\u2028-\\u202f\\u205f-\\u2064\\u3000\\ufeff';
/** Where a spreadsheet may start a new cell inside ours: ",", ";", "|", a tab or a line break. */
const SEPARATORS = ',;|\\t\\r\\n';

const FORMULA_AHEAD = `[${SKIPPED}]*[=+\\-@]`;
const STARTS_AS_FORMULA = new RegExp(`^(?:${FORMULA_AHEAD}|[\\t\\r\\n])`);
const AFTER_SEPARATOR = new RegExp(`([${SEPARATORS}])(?=${FORMULA_AHEAD})`, 'g');
const GUARDED_AFTER_SEPARATOR = new RegExp(`([${SEPARATORS}])'(?=${FORMULA_AHEAD})`, 'g');

/** A text cell as it is written: a quote before every formula start, at the beginning and after any separator. */
export function guardCell(value: string): string {
  const inside = value.replace(AFTER_SEPARATOR, "$1'");
  return STARTS_AS_FORMULA.test(inside) ? `'${inside}` : inside;
}

/** The text a guarded cell stood for: what {@link guardCell} added is taken off again on import. */
export function unguardCell(value: string): string {
  const inside =
    value.startsWith("'") && STARTS_AS_FORMULA.test(value.slice(1).replace(GUARDED_AFTER_SEPARATOR, '$1'))
      ? value.slice(1)
      : value;
  return inside.replace(GUARDED_AFTER_SEPARATOR, '$1');
}

/** Papa.unparse options that quote every cell and end lines as spreadsheets expect. */
export const CSV_WRITE_OPTIONS = { quotes: true, newline: '\r\n' } as const;
