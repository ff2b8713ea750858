/** A plain number from a text field; NaN for an empty or unreadable one, so zod names the field. */
export function numberFrom(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text.replaceAll(',', ''));
}
