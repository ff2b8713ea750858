// Chromium's list of zones leaves out "UTC" itself, so a select built from it alone shows (and saves) its first entry instead.
const LISTED = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];

/** Every zone a household can choose, UTC first, with the current one kept even when the list lacks it. */
export function timeZoneChoices(current?: string): string[] {
  const zones = ['UTC', ...LISTED.filter((zone) => zone !== 'UTC')];
  return current && !zones.includes(current) ? [current, ...zones] : zones;
}

/** The zone this browser runs in, the best first guess for a new household. */
export function browserTimeZone(): string {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  } catch {
    return 'UTC';
  }
}

export function timeZoneName(zone: string): string {
  return zone === 'UTC' ? 'UTC (Coordinated Universal Time)' : zone.replaceAll('_', ' ');
}
