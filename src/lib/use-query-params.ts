import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * The page's URL search params, with an updater that sets the given keys and drops
 * those given as empty — so filters, sort and page live in the URL (shareable, and
 * the back button works).
 */
export function useQueryParams() {
  const [params, setParams] = useSearchParams();
  const setQuery = useCallback(
    (changes: Record<string, string | undefined>) =>
      setParams((previous) => {
        const next = new URLSearchParams(previous);
        for (const [key, value] of Object.entries(changes)) {
          if (value) next.set(key, value);
          else next.delete(key);
        }
        return next;
      }),
    [setParams],
  );
  return [params, setQuery] as const;
}
