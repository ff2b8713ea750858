// Intl.DateTimeFormat made once per locale and options, on both sides: making a formatter costs far more than
// formatting with one, and every household request asks for its today in the household's zone (the read cache's
// key). Dates in words need no Intl (dates.ts); a zone's today, hour and clock time do.
const formatters = new Map<string, Intl.DateTimeFormat>();

/** The formatter for this locale and these options (time zone included), kept after its first use. */
export function dateFormatter(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale} ${JSON.stringify(options)}`;
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat(locale, options);
    // Bounded: one entry per kind of date and zone in use, so only a flood of zones ever reaches this.
    if (formatters.size > 2_000) formatters.clear();
    formatters.set(key, formatter);
  }
  return formatter;
}
