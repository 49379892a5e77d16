import { useCallback } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { decadeOf, withDecade } from './filters';

/**
 * What choosing a decade does: on the search page, narrow the current search
 * (its other filters kept); elsewhere, open the search for that decade.
 */
export function useDecadeFilter(target: 'current' | 'search') {
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const choose = useCallback(
    (decade: number) => {
      if (target === 'current') setParams(withDecade(params, decade));
      else void navigate(`/search?${withDecade(new URLSearchParams(), decade).toString()}`);
    },
    [navigate, params, setParams, target],
  );
  return { choose, selected: target === 'current' ? decadeOf(params) : null };
}
