import { useDraggable } from '@dnd-kit/core';
import type { WeekProduct } from '@shared/schemas/week';
import { JarDrawing } from '@/components/ui/jar-drawing';

function DraggableProduct({ product, canEdit }: { product: WeekProduct; canEdit: boolean }) {
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({ id: `product:${product.id}`, data: { type: 'product', product }, disabled: !canEdit });
  const counts = [product.openedJars ? `${product.openedJars} open` : '', product.sealedJars ? `${product.sealedJars} sealed` : ''].filter(Boolean).join(', ');
  return (
    <li className="w-44 shrink-0 md:w-auto">
      <button
        type="button"
        ref={setNodeRef}
        {...attributes}
        {...listeners}
        className={`flex h-full min-h-11 w-full touch-manipulation select-none items-center gap-2 rounded-lg border bg-surface px-3 py-1 text-left hover:border-action ${product.openedJars ? 'border-info/60' : 'border-line'} ${canEdit ? 'cursor-grab' : 'cursor-default'} ${isDragging ? 'opacity-40' : ''}`}
      >
        <JarDrawing width={18} level={product.openedJars > 0 ? 0.25 : 0.6} lid={product.openedJars > 0 ? 'opened' : 'sealed'} />
        <span className="min-w-0">
          <span className="block font-bold leading-snug">{product.name}</span>
          <span className="tabular block text-xs text-ink-muted">{counts}</span>
        </span>
      </button>
    </li>
  );
}

/** Products with jars on the shelf or open in the fridge, the opened ones first: drag one onto a meal. */
export function ShelfRail({ products, canEdit }: { products: WeekProduct[]; canEdit: boolean }) {
  const onShelf = products
    .filter((p) => p.openedJars + p.sealedJars > 0)
    .sort((a, b) => Number(b.openedJars > 0) - Number(a.openedJars > 0) || a.name.localeCompare(b.name));
  return (
    <section aria-labelledby="shelf-rail" className="flex min-w-0 flex-col gap-2">
      <h2 id="shelf-rail" className="text-lg">
        On the shelf
      </h2>
      {onShelf.length === 0 ? (
        <p className="text-sm text-ink-muted">No jars on the shelf or in the fridge yet. Record a batch, then pair its jars with meals here.</p>
      ) : (
        <ul className="-mx-1 flex gap-1.5 overflow-x-auto px-1 pb-1 md:mx-0 md:grid md:max-h-72 md:grid-cols-[repeat(auto-fill,minmax(11rem,1fr))] md:overflow-x-visible md:overflow-y-auto md:px-0 md:pr-1">
          {onShelf.map((product) => (
            <DraggableProduct key={product.id} product={product} canEdit={canEdit} />
          ))}
        </ul>
      )}
    </section>
  );
}
