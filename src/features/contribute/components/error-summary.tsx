import { useEffect, useId, useRef } from 'react';
import { fieldDomId, type FlatError } from '../lib/flatten-errors';

export interface ErrorSummaryProps {
  /** Changes on every failed submit, so the summary takes focus again. */
  attempt: number;
  errors: FlatError[];
  /** Form id prefix used by {@link fieldDomId}. */
  form: string;
  /** Path → label; numbered paths fall back to their first segment's label ("creators.0.name" → "Creators"). */
  labels: Record<string, string>;
  /** A message for the whole form, e.g. from the server. */
  message?: string;
  title?: string;
}

function labelFor(path: string, labels: Record<string, string>): string {
  if (labels[path]) return labels[path];
  const parts = path.split('.');
  const head = labels[parts[0]] ?? parts[0];
  const index = parts.find((p) => /^\d+$/.test(p));
  const leaf = parts.length > 2 ? labels[`${parts[0]}.*.${parts[parts.length - 1]}`] ?? parts[parts.length - 1] : '';
  return [head, index !== undefined ? `no. ${Number(index) + 1}` : '', leaf].filter(Boolean).join(' ');
}

/** The input for a path, or for the nearest enclosing path that has one (`languages.0` → `languages`). */
function findField(form: string, path: string): HTMLElement | null {
  const parts = path.split('.');
  while (parts.length) {
    const found = document.getElementById(fieldDomId(form, parts.join('.')));
    if (found) return found;
    parts.pop();
  }
  return null;
}

/** The list of problems at the top of a form after a failed submit; each item links to its field. */
export function ErrorSummary({ attempt, errors, form, labels, message, title = 'Please check these fields' }: ErrorSummaryProps) {
  const ref = useRef<HTMLDivElement>(null);
  const titleId = useId();
  const visible = errors.length > 0 || Boolean(message);
  useEffect(() => {
    if (attempt > 0 && visible) ref.current?.focus();
    // Focus only when a submit fails, not while the person fixes fields.
  }, [attempt]); // eslint-disable-line react-hooks/exhaustive-deps
  if (!visible || attempt === 0) return null;
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
      {message && <p className="mt-1 text-ink">{message}</p>}
      {errors.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-ink">
          {errors.map((error) => (
            <li key={error.path}>
              <a
                href={`#${fieldDomId(form, error.path)}`}
                onClick={(event) => {
                  const target = findField(form, error.path);
                  if (!target) return;
                  event.preventDefault();
                  target.focus();
                  target.scrollIntoView?.({ block: 'center' });
                }}
              >
                {labelFor(error.path, labels)}: {error.message}
              </a>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
