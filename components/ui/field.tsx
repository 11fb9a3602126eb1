import { cloneElement, isValidElement, type ReactNode } from 'react';

/** The id of a field's error message, for its input's `aria-describedby`. */
export const errorIdFor = (id: string) => `${id}-error`;

/**
 * A labelled form field with its error underneath. The error is tied to the input (the child with the field's id):
 * `aria-invalid` and `aria-describedby` are set on it, so a screen reader reads the message with the field.
 */
export function Field({
  id,
  label,
  error,
  children,
  className = '',
}: {
  id: string;
  label: string;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
  const input =
    error && isValidElement<{ 'aria-invalid'?: boolean; 'aria-describedby'?: string }>(children)
      ? cloneElement(children, { 'aria-invalid': true, 'aria-describedby': errorIdFor(id) })
      : children;
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      {input}
      {error && (
        <p id={errorIdFor(id)} className="field-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** A failed request's message, with its field messages listed (except those the form shows on its own fields). */
export function ActionError({ error, except = [] }: { error: Error | null; except?: readonly string[] }) {
  if (!error) return null;
  const fields = 'fields' in error ? (error.fields as Record<string, string[]>) : {};
  const details = Object.entries(fields)
    .filter(([k]) => !except.includes(k))
    .flatMap(([k, v]) => v.map((m) => (k === '_' ? m : `${k}: ${m}`)));
  return (
    <div className="field-error" role="alert">
      {error.message}
      {details.length > 0 && (
        <ul className="ml-4 list-disc">
          {details.map((d) => (
            <li key={d}>{d}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
