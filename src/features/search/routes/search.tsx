import { useCallback, useEffect, useId, useRef, useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { searchSorts, type SearchQuery } from '@shared/search/schema';
import { PageHeader } from '@/components/page-header';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { Pagination } from '@/components/pagination';
import { Select } from '@/components/select';
import { Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useSearchExcerpts } from '../api/search-excerpts';
import { SearchFilters } from '../components/search-filters';
import { ResultItem } from '../components/result-item';
import { hasFilters, queryFromUrl, urlOf, withChange } from '../lib/url-state';
import { useDebounced } from '../lib/use-debounced';
import { SearchInsights } from '@/features/insights/components/insights-panel'; // insights charts (issue 9)

const sortLabels: Record<SearchQuery['sort'], string> = { relevance: 'Best match', oldest: 'Oldest first', newest: 'Newest first', title: 'Source title' };

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const query = queryFromUrl(params);
  const inputId = useId();
  const [text, setText] = useState(query.q);
  const typed = useDebounced(text, 250);
  const lastPushed = useRef(query.q);

  // Back/forward (or a link) changed q: show it in the box.
  useEffect(() => {
    if (query.q !== lastPushed.current) {
      lastPushed.current = query.q;
      setText(query.q);
    }
  }, [query.q]);

  const go = useCallback(
    (next: SearchQuery, replace = false) => navigate(urlOf(next), { replace, preventScrollReset: true }),
    [navigate],
  );
  // Typing settles into the URL; one history entry per search, not per keystroke.
  useEffect(() => {
    const q = typed.trim();
    if (q === query.q.trim()) return;
    lastPushed.current = q;
    go(withChange(query, { q }), query.q !== '' && q !== '');
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [typed]);

  const onChange = useCallback((change: Partial<SearchQuery>) => go(withChange(queryFromUrl(new URLSearchParams(window.location.search)), change)), [go]);
  const result = useSearchExcerpts(query);
  const data = result.data;
  const filtered = hasFilters(query);

  return (
    <div>
      <PageHeader title="Search" description="Transcriptions, normalised texts, translations and commentary; old spellings, accents and small slips are forgiven." />
      <form role="search" onSubmit={(e) => { e.preventDefault(); lastPushed.current = text.trim(); go(withChange(query, { q: text.trim() })); }}>
        <label htmlFor={inputId} className="block text-sm font-medium text-ink">Words or "a phrase in quotes"</label>
        <input
          id={inputId} type="search" value={text} onChange={(e) => setText(e.target.value)} autoComplete="off"
          className="field-control mt-1 font-serif text-xl" placeholder="flûte douce, a′ 415, voice flute…"
        />
      </form>

      <div className="mt-8 grid gap-10 lg:grid-cols-[17rem_minmax(0,1fr)]">
        <aside aria-label="Filters" className="order-2 lg:order-1">
          <SearchFilters query={query} facets={data?.facets} onChange={onChange} />
          {filtered && (
            <Button variant="quiet" className="mt-6" onClick={() => go({ ...queryFromUrl(new URLSearchParams()), q: query.q })}>
              Clear all filters
            </Button>
          )}
        </aside>

        <section aria-labelledby="results-title" className="order-1 min-w-0 lg:order-2">
          <div className="flex flex-wrap items-end justify-between gap-3 border-b border-rule pb-3">
            <h2 id="results-title" className="text-lg font-semibold text-ink" aria-live="polite">
              {data ? <span className="figures">{data.total === 1 ? '1 passage' : `${data.total.toLocaleString('en')} passages`}</span> : 'Passages'}
              {result.isFetching && <Spinner size="sm" label="Searching…" className="ml-3 inline-flex align-middle" />}
            </h2>
            <Select
              label="Order" value={query.sort} containerClassName="w-44"
              options={searchSorts.map((s) => ({ value: s, label: sortLabels[s] }))}
              onChange={(e) => onChange({ sort: e.target.value as SearchQuery['sort'] })}
            />
          </div>

          {result.isError && (
            <Alert tone="danger" title="The search did not answer" className="mt-4" action={<Button variant="secondary" size="sm" onClick={() => void result.refetch()}>Try again</Button>}>
              {errorMessage(result.error)}
            </Alert>
          )}
          {!result.isError && data && data.total === 0 && (
            <div className="mt-6">
              <EmptyState
                title="No passages match"
                action={filtered ? <Button variant="secondary" onClick={() => go({ ...queryFromUrl(new URLSearchParams()), q: query.q })}>Remove all filters</Button> : undefined}
              >
                {filtered ? 'Try removing a filter, or widening the years or the pitch range.' : 'Try another spelling, a shorter phrase, or the name of an instrument size.'}
              </EmptyState>
            </div>
          )}
          {!result.isError && !data && <Spinner label="Searching…" className="mt-6" />}
          {data && data.total > 0 && (
            <div className={result.isPlaceholderData ? 'opacity-60 transition-opacity' : undefined}>
              {data.hits.map((hit) => <ResultItem key={hit.excerptId} hit={hit} />)}
              <Pagination
                page={query.page} perPage={query.perPage} total={data.total} label="Result pages" noun="passages"
                onPageChange={(page) => { go({ ...query, page }); window.scrollTo({ top: 0 }); }}
              />
            </div>
          )}
        </section>
      </div>
      {/* insights charts (issue 9): follow the URL's filters */}
      <div className="mt-14"><SearchInsights /></div>
    </div>
  );
}
