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

interface LabelledFieldProps {
  inputId: string;
  label: ReactNode;
  labelSuffix?: ReactNode;
  hintId?: string;
  hint?: ReactNode;
  errorId?: string;
  error?: string;
  className?: string;
  children: ReactNode;
}

/** The visible label, hint and error around any control (text input, textarea…). */
export function LabelledField({ inputId, label, labelSuffix, hintId, hint, errorId, error, className, children }: LabelledFieldProps) {
  return (
    <div className={className}>
      <label htmlFor={inputId} className="block text-sm font-medium text-ink">
        {label}
        {labelSuffix && <span className="ml-1 font-normal text-ink-muted">{labelSuffix}</span>}
      </label>
      <FieldHint id={hintId}>{hint}</FieldHint>
      {children}
      <FieldError id={errorId} message={error} />
    </div>
  );
}
