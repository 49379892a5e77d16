import { useCallback, useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { INSTRUMENT_SIZES } from '@shared/reckoner';

/** Everything a reckoning depends on; each field is one URL search parameter of the same name. */
export interface ReckonerState {
  size: string;
  a: string;
  desc: string;
  key: string;
  lowest: string;
  highest: string;
  date: string;
  calendar: 'gregorian' | 'julian';
  yearStart: 'jan1' | 'mar25';
}

export type ReckonerUpdate = (patch: Partial<ReckonerState>, options?: { immediate?: boolean }) => void;

const FIELDS = ['size', 'a', 'desc', 'key', 'lowest', 'highest', 'date', 'calendar', 'yearStart'] as const;

export const DEFAULT_STATE: ReckonerState = {
  size: 'alto',
  a: '415',
  desc: '',
  key: '',
  lowest: '',
  highest: '',
  date: '',
  calendar: 'gregorian',
  yearStart: 'jan1',
};

/** How long typing pauses before results and the URL catch up. */
export const SETTLE_MS = 250;

export function stateFromParams(params: URLSearchParams): ReckonerState {
  const read = (name: keyof ReckonerState) => params.get(name) ?? DEFAULT_STATE[name];
  const size = read('size');
  return {
    size: INSTRUMENT_SIZES.some((s) => s.slug === size) ? size : DEFAULT_STATE.size,
    a: read('a'),
    desc: read('desc'),
    key: read('key'),
    lowest: read('lowest'),
    highest: read('highest'),
    date: read('date'),
    calendar: read('calendar') === 'julian' ? 'julian' : 'gregorian',
    yearStart: read('yearStart') === 'mar25' ? 'mar25' : 'jan1',
  };
}

/** Fields that say something, in a fixed order, so the same reckoning always has the same link. */
export function paramsFromState(state: ReckonerState): URLSearchParams {
  const params = new URLSearchParams();
  for (const field of FIELDS) {
    const value = state[field].trim();
    // The calendar and year start mean nothing without a date, and their defaults need no saying.
    const implied = (field === 'calendar' || field === 'yearStart') && (state.date.trim() === '' || value === DEFAULT_STATE[field]);
    if (value !== '' && !implied) params.set(field, value);
  }
  return params;
}

/**
 * The page's state: `values` follow every keystroke (the inputs are bound to them), `settled`
 * follows after a short pause and drives the results and the URL. Discrete choices (a select,
 * a quick pick) pass `immediate` so their results appear at once. A URL changed from outside
 * (back/forward, a pasted link) replaces the state.
 */
export function useReckonerState() {
  const [params, setParams] = useSearchParams();
  const search = params.toString();
  const [values, setValues] = useState<ReckonerState>(() => stateFromParams(params));
  const [settled, setSettled] = useState<ReckonerState>(values);
  const lastSearch = useRef(search);
  const edited = useRef(false);
  const immediate = useRef(false);

  useEffect(() => {
    if (search === lastSearch.current) return;
    lastSearch.current = search;
    const next = stateFromParams(new URLSearchParams(search));
    immediate.current = true;
    setValues(next);
  }, [search]);

  useEffect(() => {
    if (immediate.current) {
      immediate.current = false;
      setSettled(values);
      return;
    }
    const timer = setTimeout(() => setSettled(values), SETTLE_MS);
    return () => clearTimeout(timer);
  }, [values]);

  useEffect(() => {
    if (!edited.current) return;
    const next = paramsFromState(settled);
    const text = next.toString();
    if (text === lastSearch.current) return;
    lastSearch.current = text;
    setParams(next, { replace: true, preventScrollReset: true });
  }, [settled, setParams]);

  const update = useCallback<ReckonerUpdate>((patch, options) => {
    edited.current = true;
    if (options?.immediate) immediate.current = true;
    setValues((prev) => ({ ...prev, ...patch }));
  }, []);

  return { values, settled, update };
}
