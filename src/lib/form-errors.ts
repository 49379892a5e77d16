import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api';

/**
 * Copy the server's per-field messages onto a react-hook-form form.
 * Returns true when at least one field message was placed.
 */
export function applyServerFieldErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  knownFields: readonly Path<T>[],
): boolean {
  if (!(error instanceof ApiError) || !error.fields) return false;
  let placed = false;
  for (const [field, message] of Object.entries(error.fields)) {
    if ((knownFields as readonly string[]).includes(field)) {
      // The form's error summary takes focus; the field shows its message inline.
      setError(field as Path<T>, { type: 'server', message });
      placed = true;
    }
  }
  return placed;
}
