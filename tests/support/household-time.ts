/** The instant a wall clock in `timeZone` shows `date` at `hour`:`minute` (DST-safe by correction). */
export function instantAt(date: string, hour: number, minute: number, timeZone: string): Date {
  const wanted = Date.parse(`${date}T${String(hour).padStart(2, '0')}:${String(minute).padStart(2, '0')}:00Z`);
  const format = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  });
  let guess = wanted;
  for (let i = 0; i < 3; i += 1) {
    const parts = Object.fromEntries(format.formatToParts(new Date(guess)).map((p) => [p.type, p.value]));
    const shown = Date.parse(`${parts.year}-${parts.month}-${parts.day}T${parts.hour}:${parts.minute}:00Z`);
    guess += wanted - shown;
  }
  return new Date(guess);
}
