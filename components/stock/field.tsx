import type { ReactNode } from 'react';

/** A labelled form field with its error underneath. */
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
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      {children}
      {error && (
        <p className="field-error" role="alert">
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
