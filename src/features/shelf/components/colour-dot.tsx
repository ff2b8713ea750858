import type { ProductColour } from '@shared/words';

// The household chooses a product's color; each maps to a theme token, never a raw color.
const CHIP: Record<ProductColour, string> = {
  honey: 'bg-soon-fill',
  leaf: 'bg-action',
  brine: 'bg-info',
  earth: 'bg-ink-muted',
  wheat: 'bg-soon-soft border border-line',
};

export function ColourDot({ colour, className = '' }: { colour: string; className?: string }) {
  return (
    <span
      aria-hidden="true"
      className={`inline-block h-3.5 w-3.5 shrink-0 rounded-full ${CHIP[colour as ProductColour] ?? CHIP.wheat} ${className}`}
    />
  );
}
