import { useId, type InputHTMLAttributes, type ReactNode, type TextareaHTMLAttributes } from 'react';

export function CheckboxField({ label, hint, ...props }: { label: ReactNode; hint?: ReactNode } & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <div className="flex items-start gap-3">
      <input id={id} type="checkbox" className="mt-1 h-6 w-6 shrink-0 accent-action" aria-describedby={hint ? `${id}-hint` : undefined} {...props} />
      <div>
        <label htmlFor={id} className="font-bold">
          {label}
        </label>
        {hint && (
          <p id={`${id}-hint`} className="text-sm text-ink-muted">
            {hint}
          </p>
        )}
      </div>
    </div>
  );
}

export function TextAreaField({ label, error, hint, ...props }: { label: string; error?: string; hint?: ReactNode } & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <textarea
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className="min-h-24 w-full rounded-lg border border-line bg-surface px-3 py-2 text-ink focus:border-info disabled:bg-sunken aria-[invalid=true]:border-past"
        {...props}
      />
      {hint && !error && (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm font-bold text-past" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** A plain number from a text field; NaN for an empty or unreadable one, so zod names the field. */
export function numberFrom(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text.replaceAll(',', ''));
}
