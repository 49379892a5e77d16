import { Link } from 'react-router-dom';
import type { ExcerptSummary } from '@shared/catalogue/types';
import { INSTRUMENT_SIZES } from '@shared/reckoner';
import { StatusBadge } from './status-badge';

function sizeName(slug: string): string {
  return INSTRUMENT_SIZES.find((s) => s.slug === slug)?.name ?? slug;
}

/** The excerpts of a source in locator order, with what each is tagged with. */
export function ExcerptsList({ excerpts, showStatus }: { excerpts: ExcerptSummary[]; showStatus: boolean }) {
  return (
    <ol className="divide-y divide-rule rounded-soft border border-rule bg-paper-raised">
      {excerpts.map((excerpt) => (
        <li key={excerpt.id} className="px-4 py-3">
          <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
            <Link to={`/excerpts/${excerpt.id}`} className="font-medium">
              {excerpt.locator.label}
            </Link>
            <span className="figures text-sm text-ink-muted">{excerpt.date.label}{excerpt.date.inherited ? ' (source date)' : ''}</span>
            {showStatus && excerpt.status !== 'approved' && <StatusBadge status={excerpt.status} />}
          </div>
          <p className="mt-1 line-clamp-2 font-serif text-[1.0625rem] text-ink">{excerpt.snippet}</p>
          {(excerpt.sizes.length > 0 || excerpt.aHz.length > 0) && (
            <ul className="mt-1 flex flex-wrap gap-2 text-sm" aria-label="Tags">
              {excerpt.sizes.map((slug) => (
                <li key={slug} className="rounded-full border border-rule-strong px-2">
                  {sizeName(slug)}
                </li>
              ))}
              {excerpt.aHz.map((hz) => (
                <li key={hz} className="figures rounded-full border border-dashed border-rule-strong px-2">
                  a′ = {hz} Hz
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ol>
  );
}
