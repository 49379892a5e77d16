import { Link } from 'react-router-dom';
import type { SortingState, Updater } from '@tanstack/react-table';
import { sourceTypes, workflowStates, type SourceType, type WorkflowState } from '@shared/catalogue/vocabulary';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { Pagination } from '@/components/pagination';
import { PageSpinner } from '@/components/spinner';
import { hasRole, useSession } from '@/features/auth/api/get-session';
import { useQueryParams } from '@/lib/use-query-params';
import { errorMessage } from '@/lib/api';
import { contributorRoles } from '@/lib/roles';
import { sourceSortFields, useSources } from '../api/get-sources';
import { SourceFilters, type SourceFilterValues } from '../components/source-filters';
import { SourcesTable } from '../components/sources-table';

const perPage = 25;
const defaultSort: SortingState = [{ id: 'date', desc: false }];

function parseSort(value: string | null): SortingState {
  if (!value) return defaultSort;
  const desc = value.startsWith('-');
  const id = desc ? value.slice(1) : value;
  return (sourceSortFields as readonly string[]).includes(id) ? [{ id, desc }] : defaultSort;
}

function formatSort(sorting: SortingState): string | undefined {
  const first = sorting[0];
  return first ? `${first.desc ? '-' : ''}${first.id}` : undefined;
}

function oneOf<T extends string>(list: readonly T[], value: string | null): T | '' {
  return value && (list as readonly string[]).includes(value) ? (value as T) : '';
}

/** /sources: every source the visitor may see, filtered and sorted on the server; all state lives in the URL. */
export function Component() {
  const [params, setQuery] = useQueryParams();
  const session = useSession();
  const contributor = hasRole(session.role, contributorRoles);

  const page = Math.max(1, Number.parseInt(params.get('page') ?? '1', 10) || 1);
  const sorting = parseSort(params.get('sort'));
  const filters: SourceFilterValues = {
    q: params.get('q') ?? '',
    type: oneOf<SourceType>(sourceTypes, params.get('type')),
    status: contributor ? oneOf<WorkflowState>(workflowStates, params.get('status')) : '',
    from: /^1\d{3}$|^20\d{2}$/.test(params.get('from') ?? '') ? (params.get('from') as string) : '',
    to: /^1\d{3}$|^20\d{2}$/.test(params.get('to') ?? '') ? (params.get('to') as string) : '',
    lang: params.get('lang') ?? '',
    mine: contributor && params.get('mine') === '1',
  };
  const filtered = Boolean(filters.q || filters.type || filters.status || filters.from || filters.to || filters.lang || filters.mine);

  const sources = useSources({
    page,
    perPage,
    sort: formatSort(sorting),
    q: filters.q || undefined,
    type: filters.type || undefined,
    status: filters.status || undefined,
    from: filters.from ? Number(filters.from) : undefined,
    to: filters.to ? Number(filters.to) : undefined,
    lang: filters.lang || undefined,
    mine: filters.mine || undefined,
  });

  const onSortingChange = (updater: Updater<SortingState>) => {
    const next = typeof updater === 'function' ? updater(sorting) : updater;
    setQuery({ sort: formatSort(next), page: undefined });
  };

  const onFilters = (f: SourceFilterValues) =>
    setQuery({
      q: f.q || undefined,
      type: f.type || undefined,
      status: f.status || undefined,
      from: f.from || undefined,
      to: f.to || undefined,
      lang: f.lang || undefined,
      mine: f.mine ? '1' : undefined,
      page: undefined,
    });

  return (
    <>
      <PageHeader
        title="Sources"
        description="Treatises, tutors, accounts, inventories, letters and other documents of 1500–1800 that speak of woodwinds."
        actions={
          contributor ? (
            <Link to="/contribute" className={buttonClasses('primary')}>
              Catalogue a source
            </Link>
          ) : undefined
        }
      />
      <SourceFilters values={filters} onChange={onFilters} showContributorFilters={contributor} />

      {sources.isPending ? (
        <PageSpinner label="Loading sources…" />
      ) : sources.isError ? (
        <Alert
          tone="danger"
          title="Sources could not be loaded"
          action={
            <Button variant="secondary" onClick={() => void sources.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(sources.error)}
        </Alert>
      ) : sources.data.data.length === 0 ? (
        <EmptyState
          title={filtered ? 'No sources match these filters' : 'No sources yet'}
          action={
            filtered ? (
              <Button variant="secondary" onClick={() => setQuery(Object.fromEntries([...params.keys()].map((key) => [key, undefined])))}>
                Clear all filters
              </Button>
            ) : contributor ? (
              <Link to="/contribute">Catalogue the first source</Link>
            ) : undefined
          }
        >
          {filtered ? 'Try a wider year range, another kind of source, or fewer words.' : 'Sources appear here once contributors have catalogued them and editors have approved them.'}
        </EmptyState>
      ) : (
        <div aria-busy={sources.isFetching || undefined}>
          <SourcesTable
            caption={`Sources, page ${sources.data.page}`}
            sources={sources.data.data}
            sorting={sorting}
            onSortingChange={onSortingChange}
            showStatus={contributor}
          />
          <Pagination
            label="Source pages"
            noun="sources"
            page={sources.data.page}
            perPage={sources.data.perPage}
            total={sources.data.total}
            disabled={sources.isFetching}
            onPageChange={(p) => setQuery({ page: p > 1 ? String(p) : undefined })}
          />
        </div>
      )}
    </>
  );
}
