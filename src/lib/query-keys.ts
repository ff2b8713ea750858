// Every TanStack Query key the client uses, built here and nowhere else, so a mutation invalidates exactly what a
// read cached. A household's reads all sit under householdKeys.all(hid): invalidating it refreshes every view of
// that household (what a jar action, an import or a new batch needs).

export const authKeys = { me: ['auth', 'me'] as const };

export const householdKeys = {
  all: (hid: string) => ['households', hid] as const,
  detail: (hid: string) => ['households', hid, 'detail'] as const,
  members: (hid: string) => ['households', hid, 'members'] as const,
};

export const todayKeys = { view: (hid: string) => ['households', hid, 'today'] as const };

export const shelfKeys = {
  all: (hid: string) => ['households', hid, 'shelf'] as const,
  products: (hid: string) => ['households', hid, 'shelf', 'products'] as const,
  recipes: (hid: string) => ['households', hid, 'shelf', 'recipes'] as const,
  recipe: (hid: string, recipeId: string) => ['households', hid, 'shelf', 'recipes', recipeId] as const,
  batches: (hid: string) => ['households', hid, 'shelf', 'batches'] as const,
  batch: (hid: string, batchId: string) => ['households', hid, 'shelf', 'batches', batchId] as const,
  jars: (hid: string, state: string) => ['households', hid, 'shelf', 'jars', state] as const,
  places: (hid: string) => ['households', hid, 'shelf', 'places'] as const,
  gifts: (hid: string) => ['households', hid, 'shelf', 'gifts'] as const,
  /** A label's page is read by jar code, before its household is known, so it sits outside the household. */
  jarsByCode: () => ['jar-by-code'] as const,
  jarByCode: (code: string) => ['jar-by-code', code] as const,
};

export const weekKeys = {
  all: (hid: string) => ['households', hid, 'week'] as const,
  week: (hid: string, start: string) => ['households', hid, 'week', start] as const,
  meals: (hid: string) => ['households', hid, 'meals'] as const,
  /** under the week's key, so every board edit that refetches the week refetches its waste too */
  waste: (hid: string, start: string) => ['households', hid, 'week', start, 'waste'] as const,
};

export const fridgeKeys = { fridge: (hid: string) => ['households', hid, 'fridge'] as const };

/** The household's empty jars and new lids; under the household, so a batch or a jar action refreshes it. */
export const stockKeys = { view: (hid: string) => ['households', hid, 'stock'] as const };

export const restockKeys = { list: (hid: string) => ['households', hid, 'restock'] as const };

export const todoKeys = {
  all: (hid: string) => ['households', hid, 'todos'] as const,
  list: (hid: string, filter: string) => ['households', hid, 'todos', filter] as const,
};

export const invitationKeys = {
  pending: (hid: string) => ['households', hid, 'invitations'] as const,
  preview: (token: string) => ['invitations', 'preview', token] as const,
};

export const devMailKeys = { list: (hid: string) => ['households', hid, 'dev-mail'] as const };

export const notificationKeys = {
  settings: ['me', 'notifications'] as const,
  /** This browser's push subscription, which only the browser knows. */
  thisDevice: ['push', 'this-device'] as const,
};

/** The signed-in person's own calendar address for a household, and the household's meal times. */
export const calendarKeys = { feed: (hid: string) => ['households', hid, 'calendar-feed'] as const };

/** Changes that may be made offline: kept, sent in order when the network returns, and resumed after a reload. */
export const changeKeys = {
  all: ['change'] as const,
  jarAction: ['change', 'jar-action'] as const,
  todoTick: ['change', 'todo-tick'] as const,
};

export const publicConfigKeys = { config: ['public-config'] as const };
