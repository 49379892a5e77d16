import type { ReactNode } from 'react';
import type { SourceDetail } from '@shared/catalogue/types';
import { sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { languageName } from '@/features/contribute/lib/language-tags';

const roleWords: Record<string, string> = {
  author: 'author',
  compiler: 'compiler',
  scribe: 'scribe',
  maker: 'maker',
  editor: 'editor',
  translator: 'translator',
};

const accessWords = { public: 'shown to everyone', 'signed-in': 'shown to signed-in users', hidden: 'not shown' } as const;
const calendarWords = { unstated: '', 'old-style': 'Old Style in the source (converted to the Gregorian calendar)', 'new-style': 'New Style in the source' } as const;

function Row({ term, children }: { term: string; children: ReactNode }) {
  if (children === null || children === undefined || children === '' || children === false) return null;
  return (
    <div className="grid gap-1 border-b border-rule py-2.5 last:border-0 sm:grid-cols-[11rem_1fr] sm:gap-4">
      <dt className="label-caps pt-0.5 text-ink-muted">{term}</dt>
      <dd className="text-ink">{children}</dd>
    </div>
  );
}

/** The bibliographic description of a source, as a definition list. */
export function SourceDetails({ source }: { source: SourceDetail }) {
  const publication = source.publication;
  const publicationLine = publication ? [publication.place, publication.publisher, publication.edition].filter(Boolean).join(', ') : '';
  return (
    <dl>
      <Row term="Kind">{sourceTypeLabels[source.sourceType]}</Row>
      <Row term="Creators">
        {source.creators.length > 0 ? (
          <ul>
            {source.creators.map((c, i) => (
              <li key={`${c.name}-${i}`}>
                {c.name} <span className="text-ink-muted">({roleWords[c.role] ?? c.role})</span>
              </li>
            ))}
          </ul>
        ) : (
          <span className="text-ink-muted">Anonymous or not known</span>
        )}
      </Row>
      <Row term="Date">
        <span className="figures">{source.date.label}</span>{' '}
        <code className="figures text-sm text-ink-muted">{source.date.edtf}</code>
        {calendarWords[source.calendarNote] && <span className="block text-sm text-ink-muted">{calendarWords[source.calendarNote]}</span>}
      </Row>
      <Row term="Place">{source.place}</Row>
      <Row term="Languages">{source.languages.map(languageName).join(', ')}</Row>
      <Row term="Held at">
        {source.holdingInstitution || source.shelfmark ? (
          <>
            {source.holdingInstitution}
            {source.shelfmark && (
              <>
                {source.holdingInstitution ? ', ' : ''}
                <span className="whitespace-nowrap">{source.shelfmark}</span>
              </>
            )}
          </>
        ) : null}
      </Row>
      <Row term="Publication">{publicationLine}</Row>
      <Row term="Link">
        {source.externalUrl && (
          <a href={source.externalUrl} rel="noopener noreferrer" target="_blank" className="break-all">
            {source.externalUrl}
            <span className="sr-only"> (opens in a new tab)</span>
          </a>
        )}
      </Row>
      <Row term="Rights">
        {source.rightsStatement || <span className="text-ink-muted">No rights statement yet</span>}
        <span className="block text-sm text-ink-muted">Facsimile {accessWords[source.facsimileAccess]}.</span>
      </Row>
      <Row term="Contributed by">
        {source.contributor?.displayName}
        <span className="figures text-ink-muted">
          {source.contributor ? ' · ' : ''}version {source.version}
        </span>
      </Row>
    </dl>
  );
}
