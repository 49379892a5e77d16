import type { ReactNode } from 'react';

/** Ids for a field's hint and error, and the aria-describedby that joins them. */
export function fieldIds(id: string, hint?: ReactNode, error?: string) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return { hintId, errorId, describedBy };
}

export function FieldHint({ id, children }: { id?: string; children?: ReactNode }) {
  if (!id || !children) return null;
  return (
    <p id={id} className="mt-1 text-sm text-ink-muted">
      {children}
    </p>
  );
}

/** The error under a field; the word "Error" keeps meaning without colour. */
export function FieldError({ id, message }: { id?: string; message?: string }) {
  if (!id || !message) return null;
  return (
    <p id={id} className="mt-1 text-sm font-medium text-danger">
      <span className="sr-only">Error: </span>
      <span aria-hidden="true">✕ </span>
      {message}
    </p>
  );
}
