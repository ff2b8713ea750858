// The app's own addresses, built here and nowhere else: the client's links and routes, and the server's e-mails,
// reminders, calendar feed and error actions. A label's QR code carries `jar()`: printed labels keep it for years.

/** `?a=1&b=2` from the given values, leaving out the empty ones; '' when none is left. */
function query(values: Record<string, string | number | null | undefined>): string {
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(values))
    if (value !== undefined && value !== null && value !== '') search.set(name, String(value));
  const text = search.toString();
  return text ? `?${text}` : '';
}

/** What the new-batch form can be filled in with. */
export interface NewBatchPrefill {
  productId?: string;
  recipeId?: string;
  jars?: number;
  jarSize?: string;
  todoId?: string | null;
}

/** A household's screen: '' for Today, or one of the SCREENS paths ('week', 'shelf', …). */
const inHousehold = (hid: string, screen = '') => `/h/${hid}${screen ? `/${screen}` : ''}`;

export const paths = {
  home: () => '/',
  signIn: (next?: string | null) => `/sign-in${query({ next })}`,
  signUp: () => '/sign-up',
  /** The link a sign-up e-mail carries: it makes the account and its household. */
  signUpConfirm: (token: string) => `/sign-up/confirm/${encodeURIComponent(token)}`,
  invitation: (token: string) => `/invite/${encodeURIComponent(token)}`,
  /** A jar's page, which its label's QR code opens. */
  jar: (code: string) => `/j/${encodeURIComponent(code)}`,

  screen: inHousehold,
  today: (hid: string) => inHousehold(hid),
  /** The week board, at the week holding `start` (YYYY-MM-DD) when given; `day` is the day a phone shows first. */
  week: (hid: string, start?: string, day?: string) => `${inHousehold(hid, 'week')}${query({ start, day })}`,
  shelf: (hid: string) => inHousehold(hid, 'shelf'),
  /** The empty jars and new lids in the cupboard, reached from the Shelf. */
  stock: (hid: string) => inHousehold(hid, 'shelf/stock'),
  fridge: (hid: string) => inHousehold(hid, 'fridge'),
  batches: (hid: string) => inHousehold(hid, 'batches'),
  newBatch: (hid: string, prefill: NewBatchPrefill = {}) =>
    `${inHousehold(hid, 'batches/new')}${query({ ...prefill })}`,
  batch: (hid: string, batchId: string, extra: { saved?: boolean; todoId?: string | null } = {}) =>
    `${inHousehold(hid, `batches/${batchId}`)}${query({ saved: extra.saved ? 1 : undefined, todoId: extra.todoId })}`,
  batchLabels: (hid: string, batchId: string) => inHousehold(hid, `batches/${batchId}/labels`),
  recipes: (hid: string) => inHousehold(hid, 'recipes'),
  newRecipe: (hid: string, productId?: string) => `${inHousehold(hid, 'recipes/new')}${query({ productId })}`,
  recipe: (hid: string, recipeId: string) => inHousehold(hid, `recipes/${recipeId}`),
  editRecipe: (hid: string, recipeId: string) => inHousehold(hid, `recipes/${recipeId}/edit`),
  newProduct: (hid: string) => inHousehold(hid, 'products/new'),
  product: (hid: string, productId: string) => inHousehold(hid, `products/${productId}`),
  restock: (hid: string, productId?: string) => `${inHousehold(hid, 'restock')}${query({ product: productId })}`,
  /** The to-do list, with one item's batch plan open when `open` is given. */
  todo: (hid: string, open?: string | null) => `${inHousehold(hid, 'todo')}${query({ open })}`,
  setup: (hid: string, back?: string) => `${inHousehold(hid, 'setup')}${query({ back })}`,
  household: (hid: string) => inHousehold(hid, 'household'),
  caughtMail: (hid: string) => inHousehold(hid, 'household/mail'),
};
