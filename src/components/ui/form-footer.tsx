import type { ReactNode } from 'react';
import { Button } from './button';
import { RefusalAction } from './error-with-action';
import { Notice } from './notice';

/** What a refused submit said: its message and, by field, what to change there. */
export interface FormFooterError {
  message: string;
  fields?: Record<string, string>;
  /** the way forward the server named with its refusal (an ApiError's action), shown as a link */
  action?: { href: string; label: string };
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
  disabled = false,
  wide = false,
  className = '',
}: {
  error?: FormFooterError | null;
  pending: boolean;
  submitLabel: string;
  pendingLabel: string;
  secondary?: ReactNode;
  /** the submit is off for another reason than a save in flight (the plan refuses, nothing to save yet) */
  disabled?: boolean;
  /** the button the width of the form, as on the narrow sign-in and sign-up cards */
  wide?: boolean;
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
          <RefusalAction action={error.action} />
        </Notice>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={pending || disabled} className={wide ? 'w-full' : ''}>
          {pending ? pendingLabel : submitLabel}
        </Button>
        {secondary}
      </div>
    </div>
  );
}
