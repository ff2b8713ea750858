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
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}
