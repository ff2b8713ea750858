/** Query keys of the week feature, built in one place so mutations touch exactly these. */
export const weekKeys = {
  all: (hid: string) => ['households', hid, 'week'] as const,
  week: (hid: string, start: string) => ['households', hid, 'week', start] as const,
  meals: (hid: string) => ['households', hid, 'meals'] as const,
  /** under the week's key, so every board edit that refetches the week refetches its waste too */
  waste: (hid: string, start: string) => ['households', hid, 'week', start, 'waste'] as const,
};
