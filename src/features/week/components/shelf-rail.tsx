import type { ReactNode } from 'react';
import type { WeekProduct } from '@shared/schemas/week';
import { JarDrawing } from '@/components/ui/jar-drawing';
import { useBoardChip } from '../use-board-chip';
import { ChipList } from './chip-list';

function ProductChip({ product, putOn }: { product: WeekProduct; putOn: ReactNode }) {
  const { board, attributes, listeners, setNodeRef, isDragging, picked } = useBoardChip({ type: 'product', product });
  const counts = [
    product.openedJars ? `${product.openedJars} open` : '',
    product.sealedJars ? `${product.sealedJars} sealed` : '',
  ]
    .filter(Boolean)
    .join(', ');
  return (
    <>
      <button
        type="button"
        ref={setNodeRef}
        {...attributes}
        {...listeners}
        aria-pressed={board.canEdit ? picked : undefined}
        // A click from Space or Enter starts a keyboard drag instead; only a tap or a mouse click picks the product up.
        onClick={(e) => board.canEdit && e.detail > 0 && board.hold(picked ? null : { type: 'product', product })}
        className={`flex min-h-11 min-w-0 flex-1 touch-manipulation select-none items-center gap-2 rounded-lg border px-3 py-1 text-left hover:border-action ${picked ? 'border-action bg-action-soft ring-2 ring-action' : product.openedJars ? 'border-info/60 bg-surface' : 'border-line bg-surface'} ${board.canEdit ? 'cursor-grab' : 'cursor-default'} ${isDragging ? 'opacity-40' : ''}`}
      >
        <JarDrawing
          width={18}
          level={product.openedJars > 0 ? 0.25 : 0.6}
          lid={product.openedJars > 0 ? 'opened' : 'sealed'}
        />
        <span className="min-w-0">
          <span className="block font-bold leading-snug">{product.name}</span>
          <span className="tabular block text-xs text-ink-muted">
            {counts}
            {picked && (
              <span aria-hidden="true" className="font-bold text-action">
                {' '}
                · Picked
              </span>
            )}
          </span>
        </span>
      </button>
      {putOn}
    </>
  );
}

/** Products with jars on the shelf or open in the fridge, the opened ones first: tap or drag one onto a meal. */
export function ShelfRail({ products }: { products: WeekProduct[] }) {
  const onShelf = products
    .filter((p) => p.openedJars + p.sealedJars > 0)
    .sort((a, b) => Number(b.openedJars > 0) - Number(a.openedJars > 0) || a.name.localeCompare(b.name));
  return (
    <section aria-labelledby="shelf-rail" className="flex min-w-0 flex-col gap-2">
      <h2 id="shelf-rail" className="text-lg">
        On the shelf
      </h2>
      {onShelf.length === 0 ? (
        <p className="text-sm text-ink-muted">
          No jars on the shelf or in the fridge yet. Record a batch, then pair its jars with meals here.
        </p>
      ) : (
        <ChipList
          id="shelf-rail"
          things={onShelf}
          noun="products"
          sourceOf={(product) => ({ type: 'product', product })}
          chip={(product, putOn) => <ProductChip product={product} putOn={putOn} />}
        />
      )}
    </section>
  );
}
