import { useSearchParams } from 'react-router-dom';
import type { InsightScope } from '@shared/insights/schema';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useInsights } from '../api/get-insights';
import { insightsQueryString } from '../lib/filters';
import { useDecadeFilter } from '../lib/use-decade-filter';
import { PitchChart } from './pitch-chart';
import { TimelineChart } from './timeline-chart';

export interface InsightsPanelProps {
  /** `public`: all approved material (home); `search`: what the current URL's search finds. */
  scope: InsightScope;
  /** Where a decade choice goes: narrow this page's search, or open the search page. */
  decadeTarget: 'current' | 'search';
  title?: string;
}

/** The timeline and the pitch chart of a search (or of all approved material). */
export function InsightsPanel({ scope, decadeTarget, title = 'The archive at a glance' }: InsightsPanelProps) {
  const [params] = useSearchParams();
  const queryString = insightsQueryString(scope === 'public' ? new URLSearchParams() : params, scope);
  const insights = useInsights(queryString);
  const decade = useDecadeFilter(decadeTarget);

  return (
    <section aria-labelledby="insights-title" className="space-y-4" aria-busy={insights.isFetching || undefined}>
      <h2 id="insights-title" className="font-serif text-2xl font-medium text-ink">
        {title}
      </h2>
      {insights.isPending ? (
        <PageSpinner label="Loading the charts…" />
      ) : insights.isError ? (
        <Alert tone="caution" title="The charts are not available" action={<Button size="sm" variant="secondary" onClick={() => void insights.refetch()}>Try again</Button>}>
          {errorMessage(insights.error)}
        </Alert>
      ) : (
        <div className="grid gap-6">
          <TimelineChart
            timeline={insights.data.timeline}
            total={insights.data.total}
            onDecade={decade.choose}
            selectedDecade={decade.selected}
            decadeVerb={decadeTarget === 'current' ? 'narrow the search to' : 'search'}
            headingLevel={3}
          />
          <PitchChart points={insights.data.pitch.points} truncated={insights.data.pitch.truncated} headingLevel={3} />
        </div>
      )}
    </section>
  );
}

/** Home page: all approved material; a decade opens the search for it. */
export function HomeInsights() {
  return <InsightsPanel scope="public" decadeTarget="search" />;
}

/** Search page: follows the URL's filters; a decade narrows the search. */
export function SearchInsights() {
  return <InsightsPanel scope="search" decadeTarget="current" title="Your results in pictures" />;
}
