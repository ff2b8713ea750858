import { CANNING_CAUTION_LINE, USE_BY_CAUTION_LINE } from '@shared/words';

/** The caution sized for a card: one line beside canning numbers or a use-by date. */
export function CautionLine({ about }: { about: 'canning' | 'use-by' }) {
  return (
    <p className="text-sm text-ink-muted" data-caution={about}>
      <span aria-hidden="true">⚠ </span>
      {about === 'canning' ? CANNING_CAUTION_LINE : USE_BY_CAUTION_LINE}
    </p>
  );
}
