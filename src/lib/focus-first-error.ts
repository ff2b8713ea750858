import { useEffect, useRef } from 'react';

/**
 * Moves the focus to the first field marked invalid, in the order the form shows them, and scrolls it into view: on a
 * phone the mark may be far above the button. A group's error (marked `data-field-error` inside its fieldset) focuses
 * the group's first field.
 */
export function focusFirstError(form: HTMLFormElement | null) {
  requestAnimationFrame(() => {
    const first = form?.querySelector<HTMLElement>('[aria-invalid="true"], [data-field-error]');
    const field = first?.matches('input, select, textarea')
      ? first
      : first?.closest('fieldset')?.querySelector<HTMLElement>('input, select, textarea');
    if (!field) return;
    field.focus();
    field.scrollIntoView({ block: 'center' });
  });
}

/** The form's ref; after each refused submit with field errors, its first field in error takes the focus. */
export function useFocusFirstError(error: { fields: Record<string, string> } | null) {
  const form = useRef<HTMLFormElement>(null);
  // After the messages are drawn, not when the answer arrives: only then is the field marked invalid.
  useEffect(() => {
    if (error && Object.keys(error.fields).length) focusFirstError(form.current);
  }, [error]);
  return form;
}
