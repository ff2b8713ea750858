import { BEST_QUALITY_CAUTION_LINE, CANNING_CAUTION_LINE, USE_BY_CAUTION_LINE } from '@shared/words';

const LINES = {
  canning: CANNING_CAUTION_LINE,
  'use-by': USE_BY_CAUTION_LINE,
  'best-quality': BEST_QUALITY_CAUTION_LINE,
} as const;

/** The caution sized for a card: one line beside canning numbers, a use-by or a best-quality date. */
export function CautionLine({ about }: { about: keyof typeof LINES }) {
  return (
    <p className="text-sm text-ink-muted" data-caution={about}>
      <span aria-hidden="true">⚠ </span>
      {LINES[about]}
    </p>
  );
}
