// Time zones the same way on both sides: whether a name is one the runtime knows, and the date there.

export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** The calendar date at an instant in a time zone, as YYYY-MM-DD (the household's today, given now). */
export function calendarDateIn(timeZone: string, at: Date = new Date()): string {
  return formatterIn(dateFormatters, timeZone, { year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}

/** The hour of the day (0-23) at an instant in a time zone. */
export function hourOfDayIn(timeZone: string, at: Date = new Date()): number {
  return Number(formatterIn(hourFormatters, timeZone, { hour: '2-digit', hourCycle: 'h23' }).format(at));
}

// One formatter per zone: making an Intl.DateTimeFormat costs far more than formatting with one, and every
// household request asks for its today (the read cache's key).
const dateFormatters = new Map<string, Intl.DateTimeFormat>();
const hourFormatters = new Map<string, Intl.DateTimeFormat>();
function formatterIn(cache: Map<string, Intl.DateTimeFormat>, timeZone: string, options: Intl.DateTimeFormatOptions) {
  let formatter = cache.get(timeZone);
  if (!formatter) {
    // 'en-CA' writes dates as YYYY-MM-DD; the hour is a plain number in any locale with hourCycle h23.
    formatter = new Intl.DateTimeFormat('en-CA', { timeZone, ...options });
    if (cache.size > 1_000) cache.clear();
    cache.set(timeZone, formatter);
  }
  return formatter;
}
