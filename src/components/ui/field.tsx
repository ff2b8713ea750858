import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

interface FieldProps {
  label: string;
  error?: string;
  hint?: ReactNode;
}

const inputClass =
  'min-h-11 w-full rounded-lg border border-line bg-surface px-3 text-ink placeholder:text-ink-muted/70 focus:border-info disabled:bg-sunken disabled:text-ink-muted aria-[invalid=true]:border-past';

function FieldFrame({ id, label, error, hint, children }: FieldProps & { id: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      {children}
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

export function TextField({
  label,
  error,
  hint,
  className = '',
  ...props
}: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint}>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={`${inputClass} ${className}`}
        {...props}
      />
    </FieldFrame>
  );
}

export function SelectField({
  label,
  error,
  hint,
  children,
  className = '',
  ...props
}: FieldProps & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint}>
      <select id={id} aria-invalid={error ? true : undefined} className={`${inputClass} ${className}`} {...props}>
        {children}
      </select>
    </FieldFrame>
  );
}

export function TextAreaField({
  label,
  error,
  hint,
  className = '',
  ...props
}: FieldProps & TextareaHTMLAttributes<HTMLTextAreaElement>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint}>
      <textarea
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={`${inputClass} min-h-24 py-2 ${className}`}
        {...props}
      />
    </FieldFrame>
  );
}

export function CheckboxField({
  label,
  hint,
  ...props
}: { label: ReactNode; hint?: ReactNode } & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <div className="flex items-start gap-3">
      <input
        id={id}
        type="checkbox"
        className="mt-1 h-6 w-6 shrink-0 accent-action"
        aria-describedby={hint ? `${id}-hint` : undefined}
        {...props}
      />
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

/** One of a few choices, as a card: its radio, its label and a hint; the card is marked while it is chosen. */
export function ChoiceCard({
  label,
  hint,
  ...props
}: { label: ReactNode; hint?: ReactNode } & Omit<InputHTMLAttributes<HTMLInputElement>, 'type'>) {
  const id = useId();
  return (
    <div className="flex min-h-11 items-start gap-3 rounded-lg border border-line p-3 has-[:checked]:border-action has-[:checked]:bg-action-soft">
      <input
        id={id}
        type="radio"
        className="mt-1 size-5 shrink-0 accent-action"
        aria-describedby={hint ? `${id}-hint` : undefined}
        {...props}
      />
      <div>
        {/* A choice with a hint reads as a title and its explanation; a lone choice is plain text. */}
        <label htmlFor={id} className={`block cursor-pointer ${hint ? 'font-bold' : ''}`}>
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
