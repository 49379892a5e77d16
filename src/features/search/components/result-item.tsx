import { Link } from 'react-router-dom';
import type { SearchHit } from '@shared/search/schema';
import { sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { stateLabels } from '@shared/catalogue/workflow';
import { sizeName } from '../lib/labels';
import { Snippet } from './snippet';

const fieldLabels: Record<SearchHit['snippetField'], string> = {
  diplomatic: 'Transcription',
  normalised: 'Normalised text',
  translation: 'Translation',
  commentary: 'Commentary',
};

/** One passage: where it is, what it says (highlighted), and its tags. */
export function ResultItem({ hit }: { hit: SearchHit }) {
  return (
    <article className="border-b border-rule py-5 last:border-b-0" aria-labelledby={`hit-${hit.excerptId}`}>
      <header className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h3 id={`hit-${hit.excerptId}`} className="font-serif text-xl text-ink">
          <Link to={`/excerpts/${encodeURIComponent(hit.excerptId)}`}>
            {hit.sourceTitle}
            <span className="text-ink-muted">, {hit.locator}</span>
          </Link>
        </h3>
        <p className="figures text-sm text-ink-muted">{hit.dateLabel}</p>
      </header>
      <p className="label-caps mt-2 text-ink-faint">
        {fieldLabels[hit.snippetField]}
        {hit.status !== 'approved' && <span className="ml-2 rounded-sm border border-caution px-1 text-caution">{stateLabels[hit.status as keyof typeof stateLabels] ?? hit.status}</span>}
      </p>
      <div className="mt-1 max-w-reading">
        <Snippet html={hit.snippet} lang={hit.snippetField === 'translation' || hit.snippetField === 'commentary' ? undefined : hit.languages[0]} />
      </div>
      <dl className="mt-3 flex flex-wrap gap-x-6 gap-y-1 text-sm">
        {hit.sizes.length > 0 && (
          <div className="flex gap-1.5">
            <dt className="text-ink-muted">Sizes</dt>
            <dd className="text-ink">{hit.sizes.map(sizeName).join(', ')}</dd>
          </div>
        )}
        {hit.aHz.length > 0 && (
          <div className="flex gap-1.5">
            <dt className="text-ink-muted">Pitch</dt>
            <dd className="figures text-ink">{hit.aHz.map((hz) => `a′ = ${hz} Hz`).join('; ')}</dd>
          </div>
        )}
        <div className="flex gap-1.5">
          <dt className="text-ink-muted">Source</dt>
          <dd className="text-ink">{sourceTypeLabels[hit.sourceType] ?? hit.sourceType}</dd>
        </div>
      </dl>
    </article>
  );
}
