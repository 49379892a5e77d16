import { useCallback } from 'react';
import { PITCH_MARKS, PITCH_RANGE, YEAR_RANGE, type SearchQuery, type SearchResponse } from '@shared/search/schema';
import { FacetGroup } from './facet-group';
import { RangeSlider } from './range-slider';
import { familyOptions, languageOptions, sizeOptions, typeOptions } from '../lib/labels';

export interface SearchFiltersProps {
  query: SearchQuery;
  facets: SearchResponse['facets'] | undefined;
  onChange: (change: Partial<SearchQuery>) => void;
}

const decadeLabel = (d: string) => `${d}s`;

/** Facets with counts, the two ranges, and the decades as quick year ranges. */
export function SearchFilters({ query, facets, onChange }: SearchFiltersProps) {
  const counts = facets ?? { sizes: {}, families: {}, sourceType: {}, languages: {}, decades: {} };
  const onYears = useCallback((from?: number, to?: number) => onChange({ from, to }), [onChange]);
  const onPitch = useCallback((aMin?: number, aMax?: number) => onChange({ aMin, aMax }), [onChange]);
  const decades = Object.entries(counts.decades).sort(([a], [b]) => Number(a) - Number(b));

  return (
    <div className="space-y-7">
      <FacetGroup title="Instrument size" values={sizeOptions} counts={counts.sizes} selected={query.size} onChange={(size) => onChange({ size })} />
      <FacetGroup title="Family" values={familyOptions} counts={counts.families} selected={query.family} onChange={(family) => onChange({ family })} />
      <RangeSlider
        label="Years" min={YEAR_RANGE.min} max={YEAR_RANGE.max} step={5} low={query.from} high={query.to}
        lowLabel="Earliest year" highLabel="Latest year" onCommit={onYears}
      />
      {decades.length > 1 && (
        <div>
          <p className="text-sm font-semibold text-ink" id="decades-title">Decades</p>
          <ul className="mt-2 flex flex-wrap gap-1.5" aria-labelledby="decades-title">
            {decades.map(([decade, n]) => (
              <li key={decade}>
                <button
                  type="button"
                  className="figures rounded-soft border border-rule px-2 py-0.5 text-sm text-ink hover:border-rule-strong"
                  aria-label={`${decadeLabel(decade)}: ${n} passages; show only these years`}
                  onClick={() => onChange({ from: Number(decade), to: Number(decade) + 9 })}
                >
                  {decadeLabel(decade)} <span className="text-ink-muted">{n}</span>
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
      <RangeSlider
        label="Pitch (a′)" min={PITCH_RANGE.min} max={PITCH_RANGE.max} low={query.aMin} high={query.aMax}
        marks={PITCH_MARKS} format={(hz) => `${hz} Hz`} lowLabel="Lowest a′ in hertz" highLabel="Highest a′ in hertz" onCommit={onPitch}
      />
      <FacetGroup title="Kind of source" values={typeOptions} counts={counts.sourceType} selected={query.type} onChange={(type) => onChange({ type: type as SearchQuery['type'] })} />
      <FacetGroup title="Language" values={languageOptions(counts.languages, query.lang)} counts={counts.languages} selected={query.lang} onChange={(lang) => onChange({ lang })} />
    </div>
  );
}
