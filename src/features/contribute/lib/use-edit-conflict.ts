import { useEffect, useRef, useState } from 'react';
import type { FieldValues } from 'react-hook-form';
import { mergeChanges } from './merge-changes';

export interface ConflictState {
  /** Null while the person has not yet re-applied their edits to the latest version. */
  reappliedVersion: number | null;
  /** Labels of fields both they and someone else changed (their text was kept). */
  overlapping: string[];
}

/**
 * Optimistic locking on an edit form: the version being edited, the saved values it
 * started from, and — after a 409 — re-applying the person's edits on top of the
 * latest saved record, so nothing they typed is lost.
 */
export function useEditConflict<T extends FieldValues>(
  form: { getValues: () => T; reset: (values: T, options: { keepDefaultValues: boolean }) => void },
  initial: { version: number | null; values: T | null },
  fieldLabels: Partial<Record<string, string>>,
) {
  const [version, setVersion] = useState<number | null>(initial.version);
  const base = useRef<T | null>(initial.values);
  const [conflict, setConflict] = useState<ConflictState | null>(null);
  const [reapplying, setReapplying] = useState(false);
  const conflictRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (conflict && conflict.reappliedVersion === null) conflictRef.current?.focus();
  }, [conflict]);

  /** Loads the latest version and merges; failures go to the caller, which shows them. */
  const reapply = async (loadLatest: () => Promise<{ version: number; values: T }>) => {
    if (!base.current) return;
    setReapplying(true);
    try {
      const latest = await loadLatest();
      const merged = mergeChanges(base.current, form.getValues(), latest.values);
      base.current = latest.values;
      setVersion(latest.version);
      form.reset(merged.values, { keepDefaultValues: true });
      setConflict({ reappliedVersion: latest.version, overlapping: merged.overlapping.map((k) => fieldLabels[String(k)] ?? String(k)) });
    } finally {
      setReapplying(false);
    }
  };

  return {
    version,
    conflict,
    conflictRef,
    reapplying,
    reapply,
    markConflict: () => setConflict({ reappliedVersion: null, overlapping: [] }),
    clearConflict: () => setConflict(null),
  };
}
