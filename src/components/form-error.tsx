import { useEffect, useId, useRef } from 'react';
import { ApiError, errorMessage } from '@/lib/api';

export interface FormErrorProps {
  /** What the mutation threw (an ApiError or anything else); nothing is shown when empty. */
  error?: unknown;
  title?: string;
  /** Replaces the error's own message, e.g. a friendlier wording for a known status. */
  message?: string;
  /** Field name → visible label, to name the server's field messages; unknown fields show their key. */
  fieldLabels?: Record<string, string>;
  /** Field name → input id, to link each message to its input. */
  fieldIds?: Record<string, string>;
}

/**
 * The summary at the top of a form after a failed submit: the server's message and
 * its per-field messages, focused so keyboard and screen-reader users land on it.
 */
export function FormError({
  error,
  title = 'This could not be saved',
  message,
  fieldLabels = {},
  fieldIds = {},
}: FormErrorProps) {
  const ref = useRef<HTMLDivElement>(null);
  const titleId = useId();
  useEffect(() => {
    if (error) ref.current?.focus();
  }, [error]);
  if (!error) return null;

  const fields = error instanceof ApiError && error.fields ? Object.entries(error.fields) : [];
  return (
    <div
      ref={ref}
      tabIndex={-1}
      role="alert"
      aria-labelledby={titleId}
      className="rounded-soft border border-l-4 border-danger bg-danger-soft px-4 py-3"
    >
      <p id={titleId} className="font-semibold text-ink">
        {title}
      </p>
      <p className="mt-1 text-ink">{message ?? errorMessage(error)}</p>
      {fields.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-ink">
          {fields.map(([field, message]) => (
            <li key={field}>
              {fieldIds[field] ? (
                <a href={`#${fieldIds[field]}`}>
                  {fieldLabels[field] ?? field}: {message}
                </a>
              ) : (
                <>
                  {fieldLabels[field] ?? field}: {message}
                </>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
