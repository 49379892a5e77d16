import type { ExcerptDetail } from '@shared/catalogue/types';
import { languageName } from '@/features/contribute/lib/language-tags';

function Block({ title, lang, children }: { title: string; lang?: string | null; children: React.ReactNode }) {
  return (
    <section className="space-y-2">
      <h2 className="label-caps text-ink-muted">{title}</h2>
      <div lang={lang ?? undefined}>{children}</div>
    </section>
  );
}

/** Transcription, normalised text, translation (credited) and commentary of one excerpt. */
export function ExcerptText({ excerpt }: { excerpt: ExcerptDetail }) {
  const sourceLang = excerpt.source.languages[0];
  return (
    <div className="space-y-8">
      <Block title="Diplomatic transcription" lang={sourceLang}>
        <blockquote className="transcription border-l-2 border-rule-strong pl-4 text-ink">{excerpt.diplomatic}</blockquote>
      </Block>
      {excerpt.normalised && (
        <Block title="Normalised text" lang={sourceLang}>
          <p className="transcription text-ink">{excerpt.normalised}</p>
        </Block>
      )}
      {excerpt.translation && (
        <Block title={`Translation${excerpt.translationLanguage ? ` into ${languageName(excerpt.translationLanguage).replace(/ \(.*\)$/, '')}` : ''}`} lang={excerpt.translationLanguage}>
          <p className="transcription text-ink">{excerpt.translation}</p>
          <p className="mt-2 text-sm text-ink-muted">
            {excerpt.translator ? <>Translated by {excerpt.translator}</> : 'Translator not named'}
            <span className="figures">, version {excerpt.version}</span>
          </p>
        </Block>
      )}
      {excerpt.commentaryHtml && (
        <Block title="Commentary">
          {/* The one HTML field: rendered from Markdown and sanitised on the server. */}
          <div className="commentary max-w-reading leading-relaxed [&_a]:underline [&_p]:mb-3" dangerouslySetInnerHTML={{ __html: excerpt.commentaryHtml }} />
          {excerpt.contributor && (
            <p className="mt-2 text-sm text-ink-muted">
              Commentary by {excerpt.contributor.displayName}
              <span className="figures">, version {excerpt.version}</span>
            </p>
          )}
        </Block>
      )}
    </div>
  );
}
