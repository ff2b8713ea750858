import { useEffect, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { Notice } from './notice';

/** What a refused submit said: its message and, by field, what to change there. */
export interface FormFooterError {
  message: string;
  fields?: Record<string, string>;
}

/**
 * The tail every form shares: what went wrong, the submit button with its pending words, and an optional second
 * action (Cancel, a link back). With field errors the notice says how many to check; each mark is beside its field.
 */
export function FormFooter({
  error,
  pending,
  submitLabel,
  pendingLabel,
  secondary,
  className = '',
}: {
  error?: FormFooterError | null;
  pending: boolean;
  submitLabel: string;
  pendingLabel: string;
  secondary?: ReactNode;
  className?: string;
}) {
  const marked = Object.keys(error?.fields ?? {}).length;
  return (
    <div className={`flex flex-col gap-3 ${className}`}>
      {error && (
        <Notice tone="past" role="alert">
          {marked > 0
            ? `${error.message} Check the ${marked === 1 ? 'marked field' : `${marked} marked fields`}.`
            : error.message}
        </Notice>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending}>
          {pending ? pendingLabel : submitLabel}
        </Button>
        {secondary}
      </div>
    </div>
  );
}

/**
 * After a refused submit, the first field in error (in the order the form shows them) takes the focus and is scrolled
 * into view: on a phone the mark may be far above the button. A group's error (marked `data-field-error` inside its
 * fieldset) focuses the group's first field. Give it the form's ref and the error; each new error moves the focus again.
 */
export function useFocusFirstError<T extends HTMLElement>(error: unknown) {
  const ref = useRef<T>(null);
  useEffect(() => {
    if (!error || !ref.current) return;
    const first = ref.current.querySelector<HTMLElement>('[aria-invalid="true"], [data-field-error]');
    const target = first?.matches('input, select, textarea')
      ? first
      : first?.closest('fieldset')?.querySelector<HTMLElement>('input, select, textarea');
    if (!target) return;
    target.focus({ preventScroll: true });
    target.scrollIntoView({ block: 'center', behavior: 'instant' });
  }, [error]);
  return ref;
}
