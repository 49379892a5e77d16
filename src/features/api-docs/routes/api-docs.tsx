import { useDeferredValue, useMemo, useState } from 'react';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { TextField } from '@/components/text-field';
import { errorMessage } from '@/lib/api';
import { useOpenApi } from '../api/get-openapi';
import { ApiIntro } from '../components/api-intro';
import { EndpointCard } from '../components/endpoint-card';
import { endpointsOf, groupEndpoints, matches } from '../lib/openapi';

const anchor = (group: string) => `group-${group.replace(/[^\w-]+/g, '-')}`;

/** /api-docs: the live OpenAPI description as a readable, searchable list of endpoints. */
export function Component() {
  const openapi = useOpenApi();
  const [filter, setFilter] = useState('');
  const deferred = useDeferredValue(filter);
  const endpoints = useMemo(() => (openapi.data ? endpointsOf(openapi.data) : []), [openapi.data]);
  const shown = useMemo(() => endpoints.filter((e) => matches(e, deferred)), [endpoints, deferred]);
  const groups = useMemo(() => groupEndpoints(shown), [shown]);
  const filtering = deferred.trim() !== '';

  return (
    <div className="space-y-10">
      <PageHeader
        eyebrow="For developers"
        title="The Windway API"
        description="Search the archive, cite its excerpts and take its records in open standards from your own tools."
        actions={
          <a className="text-sm" href="/api/openapi.json">
            OpenAPI 3.1 JSON
          </a>
        }
      />
      <ApiIntro />
      <section aria-labelledby="endpoints-title" className="space-y-4">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <h2 id="endpoints-title" className="font-serif text-2xl font-medium">
            Endpoints
            {openapi.data && <span className="ml-2 align-middle text-sm font-normal text-ink-muted">version {openapi.data.info.version}</span>}
          </h2>
          <TextField
            type="search"
            label="Find an endpoint"
            hint="By path, method, parameter or name, e.g. “cite style”."
            value={filter}
            onChange={(e) => setFilter(e.target.value)}
            containerClassName="w-full sm:w-80"
          />
        </div>
        <p role="status" className="text-sm text-ink-muted">
          {openapi.data ? (filtering ? `${shown.length} of ${endpoints.length} endpoints match.` : `${endpoints.length} endpoints in ${groups.length} groups.`) : ''}
        </p>
        {openapi.isPending ? (
          <PageSpinner label="Loading the API description…" />
        ) : openapi.isError ? (
          <Alert tone="danger" title="The API description could not be loaded" action={<Button size="sm" variant="secondary" onClick={() => void openapi.refetch()}>Try again</Button>}>
            {errorMessage(openapi.error)}
          </Alert>
        ) : (
          <div className="grid gap-8 lg:grid-cols-[12rem_1fr]">
            <nav aria-label="Endpoint groups" className="lg:sticky lg:top-4 lg:self-start">
              <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm lg:block lg:space-y-1">
                {groups.map((g) => (
                  <li key={g.group}>
                    <a href={`#${anchor(g.group)}`}>
                      /{g.group} <span className="figures text-ink-faint">({g.endpoints.length})</span>
                    </a>
                  </li>
                ))}
              </ul>
            </nav>
            <div className="space-y-8">
              {groups.length === 0 && <p className="text-ink-muted">No endpoint matches “{deferred}”.</p>}
              {groups.map((g) => (
                <section key={g.group} id={anchor(g.group)} aria-labelledby={`${anchor(g.group)}-title`} className="scroll-mt-4 space-y-2">
                  <h3 id={`${anchor(g.group)}-title`} className="font-mono text-lg text-ink">
                    /{g.group}
                  </h3>
                  {g.endpoints.map((e) => (
                    <EndpointCard key={e.id} endpoint={e} open={filtering && shown.length <= 3} />
                  ))}
                </section>
              ))}
            </div>
          </div>
        )}
      </section>
    </div>
  );
}
