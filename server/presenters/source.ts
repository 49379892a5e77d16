import type { Facsimile, Source, User } from '../models';
import type { ExcerptSummary, SourceDetail, SourceSummary } from '@shared/catalogue/types';
import { presentCredit } from './user';
import { presentFacsimile } from './facsimile';

/** Dates may come back from a snapshot as strings. */
export const iso = (value: Date | string | null | undefined): string | null =>
  value == null ? null : value instanceof Date ? value.toISOString() : new Date(value).toISOString();

export function presentSourceSummary(source: Source, contributor: Pick<User, 'id' | 'displayName'> | null | undefined = source.contributor): SourceSummary {
  return {
    id: source.publicId,
    title: source.title,
    sourceType: source.sourceType,
    creators: source.creators.map((c) => ({ name: c.name, role: c.role })),
    date: { edtf: source.dateEdtf, label: source.dateLabel, earliest: source.dateEarliest, latest: source.dateLatest },
    place: source.place,
    languages: [...source.languages],
    holdingInstitution: source.holdingInstitution,
    shelfmark: source.shelfmark,
    status: source.status,
    version: source.version,
    approvedVersion: source.approvedVersion,
    contributor: presentCredit(contributor),
    createdAt: iso(source.createdAt)!,
    updatedAt: iso(source.updatedAt)!,
  };
}

export function presentSourceDetail(
  source: Source,
  related: { facsimiles: Facsimile[]; excerpts: ExcerptSummary[]; showingApprovedVersion?: boolean; contributor?: Pick<User, 'id' | 'displayName'> | null },
): SourceDetail {
  return {
    ...presentSourceSummary(source, related.contributor ?? source.contributor),
    calendarNote: source.calendarNote,
    publication: source.publication ? { publisher: source.publication.publisher, place: source.publication.place, edition: source.publication.edition } : null,
    externalUrl: source.externalUrl,
    rightsStatement: source.rightsStatement,
    facsimileAccess: source.facsimileAccess,
    submittedAt: iso(source.submittedAt),
    facsimiles: related.facsimiles.map((f) => presentFacsimile(f, source.publicId)),
    excerpts: related.excerpts,
    showingApprovedVersion: related.showingApprovedVersion ?? false,
  };
}
