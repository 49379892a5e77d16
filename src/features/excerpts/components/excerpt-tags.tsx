import type { ExcerptDetail } from '@shared/catalogue/types';
import { languageName } from '@/features/contribute/lib/language-tags';
import { signed } from './pitch-reading';

const certaintyWords = { certain: 'certain', probable: 'probable', conjectural: 'conjectural' } as const;
const derivationWords = { stated: 'stated', measured: 'measured from an instrument', inferred: 'inferred' } as const;

/** Sizes, pitch, date and topics of an excerpt, as a definition list. */
export function ExcerptTags({ excerpt }: { excerpt: ExcerptDetail }) {
  return (
    <dl className="space-y-4 text-[0.9375rem]">
      <div>
        <dt className="label-caps text-ink-muted">Date</dt>
        <dd className="figures">
          {excerpt.date.label}
          {excerpt.date.inherited && <span className="text-ink-muted"> (the source’s date)</span>}
        </dd>
      </div>
      {excerpt.mentions.length > 0 && (
        <div>
          <dt className="label-caps text-ink-muted">Instrument sizes</dt>
          <dd>
            <ul className="mt-1 space-y-1.5">
              {excerpt.mentions.map((m, i) => (
                <li key={`${m.term}-${i}`}>
                  <span lang={m.language} className="font-serif italic">
                    {m.term}
                  </span>{' '}
                  <span aria-hidden="true">→</span>
                  <span className="sr-only">denotes</span> <strong className="font-medium">{m.sizeName}</strong>{' '}
                  <span className="text-sm text-ink-muted">
                    ({certaintyWords[m.certainty]}; {languageName(m.language)})
                  </span>
                  {m.note && <span className="block text-sm text-ink-muted">{m.note}</span>}
                </li>
              ))}
            </ul>
          </dd>
        </div>
      )}
      {excerpt.pitchTags.length > 0 && (
        <div>
          <dt className="label-caps text-ink-muted">Pitch</dt>
          <dd>
            <ul className="mt-1 space-y-2">
              {excerpt.pitchTags.map((p, i) => (
                <li key={i}>
                  <span className="figures font-medium">a′ = {p.aHz} Hz</span>{' '}
                  <span className="figures text-ink-muted">({signed(p.centsFrom440)} cents from 440)</span>
                  <span className="block font-serif">“{p.statement}”</span>
                  <span className="text-sm text-ink-muted">
                    {derivationWords[p.derivation]}
                    {p.note ? ` · ${p.note}` : ''}
                  </span>
                </li>
              ))}
            </ul>
          </dd>
        </div>
      )}
      {excerpt.topics.length > 0 && (
        <div>
          <dt className="label-caps text-ink-muted">Topics</dt>
          <dd>{excerpt.topics.join(', ')}</dd>
        </div>
      )}
    </dl>
  );
}
