// The shelf as the screens read it: sealed jars by batch (table rows) and by product (cards).
import type { JarView } from '@shared/schemas/batches';
import type { ProductView } from '@shared/schemas/products';

export interface ShelfBatchRow {
  batchId: string;
  productId: string;
  productName: string;
  productKind: string;
  productColour: string;
  productNotes: string;
  cannedOn: string;
  jarSize: JarView['jarSize'];
  sealed: number;
  bestBy: string;
  pastBestQuality: boolean;
  notes: string;
  /** Where the batch's sealed jars are, by place name ('' for jars with no place), each name once. */
  places: string;
}

export interface ShelfProductGroup {
  product: ProductView;
  sealed: number;
  opened: number;
  pastBest: number;
  /** the earliest best-quality date on the shelf, null when none is sealed */
  oldestBestBy: string | null;
  /** the sealed jar to open next: the earliest best-quality date */
  nextJar: JarView | null;
  batches: ShelfBatchRow[];
}

/** YYYY-MM-DD dates sort as plain strings: no locale's collation is needed (or loaded) for them. */
const compareIso = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

export function shelfBatchRows(jars: JarView[], products: ProductView[]): ShelfBatchRow[] {
  const notes = new Map(products.map((p) => [p.id, p.notes]));
  const rows = new Map<string, ShelfBatchRow>();
  for (const jar of jars) {
    if (jar.state !== 'sealed') continue;
    const row = rows.get(jar.batchId);
    if (row) {
      row.sealed += 1;
      const names = row.places.split(', ');
      if (!names.includes(jar.placeName ?? '')) row.places = [...names, jar.placeName ?? ''].filter(Boolean).join(', ');
      continue;
    }
    rows.set(jar.batchId, {
      batchId: jar.batchId,
      productId: jar.productId,
      productName: jar.productName,
      productKind: jar.productKind,
      productColour: jar.productColour,
      productNotes: notes.get(jar.productId) ?? '',
      cannedOn: jar.cannedOn,
      jarSize: jar.jarSize,
      sealed: 1,
      bestBy: jar.bestBy,
      pastBestQuality: jar.pastBestQuality,
      notes: jar.batchNotes,
      places: jar.placeName ?? '',
    });
  }
  return [...rows.values()].sort(
    (a, b) => compareIso(a.bestBy, b.bestBy) || a.productName.localeCompare(b.productName),
  );
}

export function shelfProductGroups(
  jars: JarView[],
  products: ProductView[],
  rows: ShelfBatchRow[],
): ShelfProductGroup[] {
  const groups = products.map((product) => {
    const own = jars.filter((jar) => jar.productId === product.id);
    const sealed = own.filter((jar) => jar.state === 'sealed');
    return {
      product,
      sealed: sealed.length,
      opened: own.filter((jar) => jar.state === 'opened').length,
      pastBest: sealed.filter((jar) => jar.pastBestQuality).length,
      oldestBestBy: sealed[0]?.bestBy ?? null,
      nextJar: sealed[0] ?? null,
      batches: rows.filter((row) => row.productId === product.id),
    };
  });
  // Oldest best-quality date first, so the jars to eat soonest lead; empty products last.
  return groups.sort(
    (a, b) =>
      compareIso(a.oldestBestBy ?? '9999', b.oldestBestBy ?? '9999') || a.product.name.localeCompare(b.product.name),
  );
}
