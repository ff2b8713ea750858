/** Query keys of the shelf: everything sits under the household, so a jar action refreshes every view of it. */
export const shelfKeys = {
  all: (hid: string) => ['households', hid, 'shelf'] as const,
  products: (hid: string) => ['households', hid, 'shelf', 'products'] as const,
  recipes: (hid: string) => ['households', hid, 'shelf', 'recipes'] as const,
  recipe: (hid: string, recipeId: string) => ['households', hid, 'shelf', 'recipes', recipeId] as const,
  batches: (hid: string) => ['households', hid, 'shelf', 'batches'] as const,
  batch: (hid: string, batchId: string) => ['households', hid, 'shelf', 'batches', batchId] as const,
  jars: (hid: string, state: string) => ['households', hid, 'shelf', 'jars', state] as const,
  jarsByCode: () => ['jar-by-code'] as const,
  jarByCode: (code: string) => ['jar-by-code', code] as const,
};
