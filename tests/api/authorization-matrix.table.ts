/**
 * Who may call each route, kept beside the test that walks Express's router: a route missing here
 * fails that test, so every new route needs a line saying who may use it.
 */

/** Which people may call a route; the guard that enforces it is named in brackets. */
export type Access =
  /** anybody, signed in or not */
  | 'public'
  /** any signed-in person, whatever their household (requireUser) */
  | 'signed-in'
  /** members of the household only (householdAccess('read')) */
  | 'read'
  /** members: open, finish or discard a jar, tick a to-do (householdAccess('handleJars')) */
  | 'handleJars'
  /** keepers and cooks (householdAccess('cook')) */
  | 'cook'
  /** keepers (householdAccess('manage')) */
  | 'manage'
  /** the member named in the path, or a keeper; the path names the helper */
  | 'self';

export type Person = 'signed out' | 'helper' | 'cook' | 'keeper' | "neighbour's keeper";
export const PEOPLE: Person[] = ['signed out', "neighbour's keeper", 'helper', 'cook', 'keeper'];

/** allow: anything but 401, 403 and the household's 404; the others are the exact status. */
export type Outcome = 'allow' | 401 | 403 | 404;

const members = (helper: Outcome, cook: Outcome): Record<Person, Outcome> => ({
  'signed out': 401,
  "neighbour's keeper": 404,
  helper,
  cook,
  keeper: 'allow',
});

export const EXPECTED: Record<Access, Record<Person, Outcome>> = {
  public: { 'signed out': 'allow', "neighbour's keeper": 'allow', helper: 'allow', cook: 'allow', keeper: 'allow' },
  'signed-in': { 'signed out': 401, "neighbour's keeper": 'allow', helper: 'allow', cook: 'allow', keeper: 'allow' },
  read: members('allow', 'allow'),
  handleJars: members('allow', 'allow'),
  cook: members(403, 'allow'),
  manage: members(403, 403),
  self: members('allow', 403),
};

/** Real ids from the first demo household, looked up by the test. */
export interface Ids {
  hid: string;
  productId: string;
  recipeId: string;
  batchId: string;
  jarId: string;
  jarCode: string;
  placeId: string;
  mealId: string;
  planEntryId: string;
  pairingId: string;
  todoId: string;
  invitationId: string;
  helperId: string;
  planDate: string;
  weekStart: string;
}

/** Where each path parameter takes its value: by name, or by the segment before it for a bare :id. */
export const PARAMS: Record<string, keyof Ids | { literal: string }> = {
  hid: 'hid',
  productId: 'productId',
  recipeId: 'recipeId',
  batchId: 'batchId',
  jarId: 'jarId',
  action: { literal: 'open' },
  code: 'jarCode',
  placeId: 'placeId',
  userId: 'helperId',
  date: 'planDate',
  'meals/:id': 'mealId',
  'plan-entries/:id': 'planEntryId',
  'pairings/:id': 'pairingId',
  'todos/:id': 'todoId',
  'invitations/:id': 'invitationId',
  // Not a real invitation: accepting a real one would make the neighbour a member mid-test.
  token: { literal: 'not-a-real-invitation-token-0123456789' },
  // Not a real calendar secret: the feed answers 404 for it to everybody.
  file: { literal: `${'0'.repeat(43)}.ics` },
};

export interface RouteRule {
  access: Access;
  body?: (ids: Ids) => unknown;
  query?: (ids: Ids) => string;
  /** runs after every non-destructive request (DELETEs count as destructive anyway) */
  destructive?: boolean;
  /** ends the session of whoever calls it, so it runs at the very end */
  signsOut?: boolean;
  /** takes someone out of the household; the memberships are put back after each request */
  endsMembership?: boolean;
}

const H = '/api/households/:hid';

export const TABLE: Record<string, RouteRule> = {
  'GET /api/health': { access: 'public' },
  'GET /api/ready': { access: 'public' },
  'GET /api/config': { access: 'public' },
  'POST /api/auth/signup': { access: 'public', body: () => ({}) },
  'POST /api/auth/signup/confirm/:token': { access: 'public' },
  'POST /api/auth/login': { access: 'public', body: () => ({}) },
  'POST /api/auth/logout': { access: 'public', signsOut: true },
  'GET /api/auth/me': { access: 'signed-in' },
  'GET /api/jars/by-code/:code': { access: 'read' },
  'GET /api/push/public-key': { access: 'public' },
  'POST /api/push/subscriptions': { access: 'signed-in', body: () => ({ endpoint: 'http://not-https.example/push' }) },
  'DELETE /api/push/subscriptions': { access: 'signed-in', body: () => ({ endpoint: 'https://push.example/none' }) },
  'POST /api/push/test': { access: 'signed-in' },
  'GET /api/me/notifications': { access: 'signed-in' },
  'PATCH /api/me/notifications': { access: 'signed-in', body: () => ({ reminderHour: 8 }) },
  'GET /api/invitations/:token': { access: 'public' },
  'POST /api/invitations/:token/accept': { access: 'signed-in', body: () => ({}) },
  'POST /api/households/import': { access: 'signed-in', body: () => ({}) },
  'GET /api/calendar/:file': { access: 'public' },

  [`GET ${H}`]: { access: 'read' },
  [`PATCH ${H}`]: { access: 'manage', body: () => ({ bestQualityMonths: 12 }) },
  [`GET ${H}/members`]: { access: 'read' },
  [`PATCH ${H}/members/:userId`]: { access: 'manage', body: () => ({ role: 'helper' }), destructive: true },
  [`DELETE ${H}/members/:userId`]: { access: 'manage', endsMembership: true },
  [`POST ${H}/leave`]: { access: 'read', endsMembership: true },
  [`PATCH ${H}/members/:userId/preferences`]: { access: 'self', body: () => ({ heatTolerance: 3 }) },
  [`GET ${H}/backup`]: { access: 'manage' },
  [`GET ${H}/calendar-feed`]: { access: 'read' },
  [`POST ${H}/calendar-feed`]: { access: 'read' },
  [`DELETE ${H}/calendar-feed`]: { access: 'read' },
  [`PUT ${H}/meal-times`]: {
    access: 'manage',
    body: () => ({ breakfast: '08:00', lunch: '12:30', snack: '15:30', dinner: '18:30' }),
  },

  [`GET ${H}/products`]: { access: 'read' },
  [`GET ${H}/products/:productId`]: { access: 'read' },
  [`POST ${H}/products`]: {
    access: 'cook',
    body: () => ({ name: `Quince paste ${Math.random().toString(36).slice(2, 8)}`, kind: 'other' }),
  },
  [`PATCH ${H}/products/:productId`]: { access: 'cook', body: () => ({ notes: 'Keeps well.' }) },
  [`GET ${H}/recipes`]: { access: 'read' },
  [`GET ${H}/recipes/:recipeId`]: { access: 'read' },
  [`POST ${H}/recipes`]: { access: 'cook', body: (ids) => ({ productId: ids.productId }) },
  [`PATCH ${H}/recipes/:recipeId`]: { access: 'cook', body: () => ({ steps: 'Follow the tested recipe.' }) },
  [`GET ${H}/batches`]: { access: 'read' },
  [`GET ${H}/batches/plan`]: {
    access: 'read',
    query: (ids) => `recipeId=${ids.recipeId}&jarSize=pint&method=boiling-water`,
  },
  [`GET ${H}/batches/:batchId`]: { access: 'read' },
  [`POST ${H}/batches`]: {
    access: 'cook',
    body: (ids) => ({
      productId: ids.productId,
      recipeId: ids.recipeId,
      cannedOn: ids.planDate,
      jarSize: 'pint',
      jarsFilled: 2,
      jarsSealed: 2,
      method: 'boiling-water',
    }),
  },
  // Any member checks seals; the service lets only a cook or keeper reprocess (tests/api/seal-check.test.ts).
  [`POST ${H}/batches/:batchId/seal-check`]: { access: 'handleJars', body: () => ({ fridge: { count: 0 } }) },
  [`POST ${H}/batches/:batchId/photo`]: { access: 'cook' },
  [`GET ${H}/batches/:batchId/photo`]: { access: 'read' },
  [`GET ${H}/jars`]: { access: 'read' },
  [`GET ${H}/jars/by-code/:code`]: { access: 'read' },
  [`GET ${H}/jars/:jarId/opening-advice`]: { access: 'read' },
  [`POST ${H}/jars/:jarId/:action`]: { access: 'handleJars', destructive: true },
  // Giving a jar away is a jar action like the others: any member, and undone the same way (tests/api/gifts.test.ts).
  [`POST ${H}/jars/:jarId/give`]: {
    access: 'handleJars',
    body: () => ({ to: 'the Okafors next door' }),
    destructive: true,
  },
  [`GET ${H}/gifts`]: { access: 'read' },
  // Any member reaches the service, which lets a helper undo only their own recent change (tests/api/jar-undo.test.ts).
  [`POST ${H}/jars/:jarId/undo`]: {
    access: 'handleJars',
    body: () => ({ eventId: '00000000-0000-4000-8000-000000000000' }),
  },
  [`GET ${H}/places`]: { access: 'read' },
  [`POST ${H}/places`]: {
    access: 'cook',
    body: () => ({ name: `Crate ${Math.random().toString(36).slice(2, 8)}` }),
  },
  [`PATCH ${H}/places/:placeId`]: { access: 'cook', body: () => ({ name: 'Pantry shelf' }) },
  // The place holds jars, so without a choice of where they go the removal is refused (409) and the place stays.
  [`DELETE ${H}/places/:placeId`]: { access: 'cook' },
  // Any member may move jars (tests/api/places.test.ts).
  [`POST ${H}/jars/move`]: { access: 'handleJars', body: (ids) => ({ jarIds: [ids.jarId], placeId: ids.placeId }) },
  [`GET ${H}/shelf.csv`]: { access: 'read' },
  [`POST ${H}/shelf/import`]: { access: 'cook', body: () => ({ csv: 'product,canned on\n', commit: false }) },

  [`GET ${H}/meals`]: { access: 'read' },
  [`POST ${H}/meals`]: { access: 'cook', body: () => ({ name: 'Cheese board' }) },
  [`PATCH ${H}/meals/:id`]: { access: 'cook', body: () => ({ usualServings: 3 }) },
  [`DELETE ${H}/meals/:id`]: { access: 'cook' },
  [`GET ${H}/week`]: { access: 'read' },
  [`POST ${H}/week/copy`]: { access: 'cook', body: (ids) => ({ from: ids.weekStart, to: '2030-01-07' }) },
  [`DELETE ${H}/week/days/:date`]: { access: 'cook' },
  [`GET ${H}/week/waste`]: { access: 'read', query: (ids) => `start=${ids.weekStart}` },
  [`POST ${H}/week/proposal`]: {
    access: 'cook',
    body: (ids) => ({ start: ids.weekStart, scope: { kind: 'slot', slot: 'lunch' } }),
  },
  [`POST ${H}/week/proposal/accept`]: {
    access: 'cook',
    body: (ids) => ({
      entries: [{ date: ids.planDate, slot: 'snack', mealId: ids.mealId, servings: 2, eaters: null }],
    }),
  },
  [`POST ${H}/week/proposal/undo`]: {
    access: 'cook',
    body: (ids) => ({ entryIds: [ids.planEntryId] }),
    destructive: true,
  },
  [`POST ${H}/plan-entries`]: {
    access: 'cook',
    body: (ids) => ({ date: ids.planDate, slot: 'snack', title: 'Crackers' }),
  },
  [`PATCH ${H}/plan-entries/:id`]: { access: 'cook', body: () => ({ servings: 3 }) },
  [`DELETE ${H}/plan-entries/:id`]: { access: 'cook' },
  [`POST ${H}/plan-entries/:id/pairings`]: { access: 'cook', body: (ids) => ({ productId: ids.productId }) },
  [`PATCH ${H}/pairings/:id`]: { access: 'cook', body: () => ({ tbspPerServing: 2 }) },
  [`DELETE ${H}/pairings/:id`]: { access: 'cook' },

  [`GET ${H}/restock`]: { access: 'read' },
  [`POST ${H}/restock/:productId/todo`]: { access: 'cook', body: () => ({}) },
  [`GET ${H}/todos`]: { access: 'read' },
  [`GET ${H}/todos/:id`]: { access: 'read' },
  [`POST ${H}/todos`]: { access: 'cook', body: () => ({ title: 'Buy new lids' }) },
  // Helpers may tick a to-do; anything else they send is refused by the service.
  [`PATCH ${H}/todos/:id`]: { access: 'handleJars', body: () => ({ done: true }) },
  [`DELETE ${H}/todos/:id`]: { access: 'cook' },
  [`GET ${H}/stock`]: { access: 'read' },
  // A hand count: cooks and keepers (tests/api/jar-stock.test.ts).
  [`POST ${H}/stock/correction`]: {
    access: 'cook',
    body: () => ({ item: 'lid', size: 'wide', count: 12, note: 'Counted again' }),
  },
  [`GET ${H}/today`]: { access: 'read' },
  [`GET ${H}/fridge`]: { access: 'read' },

  [`GET ${H}/invitations`]: { access: 'manage' },
  [`POST ${H}/invitations`]: { access: 'manage', body: () => ({ email: 'not-an-address', role: 'helper' }) },
  [`DELETE ${H}/invitations/:id`]: { access: 'manage' },
  [`GET ${H}/dev/mail`]: { access: 'manage' },
};
