import { useCallback, useEffect, useRef, useState } from 'react';
import type { FieldValues, UseFormReturn } from 'react-hook-form';

/** What is kept in localStorage for an unsaved form. */
export interface StoredDraft<T> {
  savedAt: string;
  /** The record version the draft was based on (null for a new record). */
  baseVersion: number | null;
  values: T;
}

const prefix = 'windway:draft:';
const delayMs = 400;

export function readDraft<T>(key: string): StoredDraft<T> | null {
  try {
    const raw = window.localStorage.getItem(prefix + key);
    if (!raw) return null;
    const parsed = JSON.parse(raw) as StoredDraft<T>;
    return parsed && typeof parsed === 'object' && 'values' in parsed ? parsed : null;
  } catch {
    return null;
  }
}

function writeDraft<T>(key: string, draft: StoredDraft<T>): void {
  try {
    window.localStorage.setItem(prefix + key, JSON.stringify(draft));
  } catch {
    // Storage full or disabled (private mode): the form still works, only without a safety copy.
  }
}

export function removeDraft(key: string): void {
  try {
    window.localStorage.removeItem(prefix + key);
  } catch {
    /* nothing to remove */
  }
}

export interface FormDraft<T> {
  /** A draft found on opening the form, waiting for the person to restore or discard it. */
  pending: StoredDraft<T> | null;
  restore: () => void;
  discard: () => void;
  /** Forget the draft after a successful save. */
  clear: () => void;
  /** When the current values were last copied to this browser. */
  savedAt: string | null;
}

/**
 * Keeps a copy of a form's values in localStorage while the person types, so a reload,
 * a crash or a closed tab loses nothing. A copy found on opening is offered back, never
 * applied silently; autosaving waits until the person has answered, so the old copy is not overwritten.
 */
export function useFormDraft<T extends FieldValues>(
  form: UseFormReturn<T, any, any>,
  key: string,
  options: { baseVersion?: number | null; enabled?: boolean } = {},
): FormDraft<T> {
  const { baseVersion = null, enabled = true } = options;
  // What the form held when it opened: a draft equal to it carries nothing worth offering.
  const baseline = useRef<string | null>(null);
  baseline.current ??= JSON.stringify(form.getValues());
  const [pending, setPending] = useState<StoredDraft<T> | null>(() => {
    const found = enabled ? readDraft<T>(key) : null;
    if (found && JSON.stringify(found.values) === baseline.current) {
      removeDraft(key);
      return null;
    }
    return found;
  });
  const [savedAt, setSavedAt] = useState<string | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef<T | null>(null);
  const paused = useRef(pending !== null);
  paused.current = pending !== null;
  const versionRef = useRef(baseVersion);
  versionRef.current = baseVersion;

  const flush = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (!latest.current || paused.current) return;
    if (JSON.stringify(latest.current) === baseline.current) {
      // Back to what was saved: nothing to keep.
      removeDraft(key);
      latest.current = null;
      return;
    }
    const draft = { savedAt: new Date().toISOString(), baseVersion: versionRef.current, values: latest.current };
    writeDraft(key, draft);
    latest.current = null;
    setSavedAt(draft.savedAt);
  }, [key]);

  useEffect(() => {
    if (!enabled) return;
    const subscription = form.watch((values) => {
      if (paused.current) return;
      latest.current = structuredClone(values) as T;
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(flush, delayMs);
    });
    const onHide = () => flush();
    window.addEventListener('pagehide', onHide);
    return () => {
      subscription.unsubscribe();
      window.removeEventListener('pagehide', onHide);
      flush();
    };
  }, [form, enabled, flush]);

  const restore = useCallback(() => {
    if (!pending) return;
    form.reset(pending.values, { keepDefaultValues: true });
    setPending(null);
  }, [form, pending]);

  const discard = useCallback(() => {
    removeDraft(key);
    setPending(null);
  }, [key]);

  const clear = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    latest.current = null;
    removeDraft(key);
    setSavedAt(null);
  }, [key]);

  return { pending, restore, discard, clear, savedAt };
}
