import Fuse from 'fuse.js';
import type { ProductView } from '@shared/schemas/products';
import type { ShelfBatchRow } from './shelf-rows';

// A module of its own, loaded when the person first reaches for the search field: the shelf shows without Fuse.

/** Fuzzy search over products, batches and notes; returns the batch rows and product ids that match. */
export function searchShelf(rows: ShelfBatchRow[], products: ProductView[], text: string) {
  const query = text.trim();
  if (!query) return null;
  const fuse = new Fuse(rows, {
    keys: [
      { name: 'productName', weight: 3 },
      { name: 'productKind', weight: 1 },
      { name: 'notes', weight: 1 },
      { name: 'productNotes', weight: 1 },
      { name: 'cannedOn', weight: 0.5 },
    ],
    threshold: 0.38,
    ignoreLocation: true,
  });
  const productFuse = new Fuse(products, { keys: ['name', 'kind', 'notes'], threshold: 0.38, ignoreLocation: true });
  const batchIds = new Set(fuse.search(query).map((hit) => hit.item.batchId));
  const productIds = new Set([
    ...productFuse.search(query).map((hit) => hit.item.id),
    ...rows.filter((r) => batchIds.has(r.batchId)).map((r) => r.productId),
  ]);
  return { batchIds, productIds };
}
