/** After a refused submit, moves focus to the first field the server marked, once React has drawn the messages. */
export function focusFirstError(form: HTMLFormElement | null) {
  requestAnimationFrame(() => {
    const field = form?.querySelector<HTMLElement>('[aria-invalid="true"]');
    if (!field) return;
    field.focus();
    field.scrollIntoView({ block: 'center' });
  });
}
