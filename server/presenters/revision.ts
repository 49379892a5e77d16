import type { Excerpt, InstrumentMention, PitchTag, Revision, Source } from '../models';
import type { EntityKind, RevisionSummary, VersionSnapshot } from '@shared/review/types';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { presentCredit } from './user';

/**
 * The full snapshot a Revision stores: every content field, plus status and version,
 * with the attribute names of the models. Restore reads the same names back.
 */
export function snapshotSource(source: Source): Record<string, unknown> {
  return {
    publicId: source.publicId,
    title: source.title,
    sourceType: source.sourceType,
    creators: source.creators,
    dateEdtf: source.dateEdtf,
    dateEarliest: source.dateEarliest,
    dateLatest: source.dateLatest,
    dateLabel: source.dateLabel,
    calendarNote: source.calendarNote,
    place: source.place,
    languages: source.languages,
    holdingInstitution: source.holdingInstitution,
    shelfmark: source.shelfmark,
    publication: source.publication,
    externalUrl: source.externalUrl,
    rightsStatement: source.rightsStatement,
    facsimileAccess: source.facsimileAccess,
    contributorId: source.contributorId,
    status: source.status,
    version: source.version,
    approvedVersion: source.approvedVersion,
  };
}

const byPosition = <T extends { position: number }>(rows: T[] | undefined) => [...(rows ?? [])].sort((a, b) => a.position - b.position);

export const snapshotMention = (m: Pick<InstrumentMention, 'term' | 'language' | 'sizeSlug' | 'certainty' | 'note'>) => ({
  term: m.term,
  language: m.language,
  sizeSlug: m.sizeSlug,
  certainty: m.certainty,
  note: m.note,
});

export const snapshotPitchTag = (t: Pick<PitchTag, 'statement' | 'aHz' | 'centsFrom440' | 'derivation' | 'note'>) => ({
  statement: t.statement,
  aHz: Number(t.aHz),
  centsFrom440: Number(t.centsFrom440),
  derivation: t.derivation,
  note: t.note,
});

/** `excerpt.mentions` and `excerpt.pitchTags` must be loaded. */
export function snapshotExcerpt(excerpt: Excerpt): Record<string, unknown> {
  return {
    publicId: excerpt.publicId,
    sourceId: excerpt.sourceId,
    locatorType: excerpt.locatorType,
    locatorValue: excerpt.locatorValue,
    facsimilePage: excerpt.facsimilePage,
    diplomatic: excerpt.diplomatic,
    normalised: excerpt.normalised,
    translation: excerpt.translation,
    translationLanguage: excerpt.translationLanguage,
    translator: excerpt.translator,
    commentary: excerpt.commentary,
    dateEdtf: excerpt.dateEdtf,
    dateEarliest: excerpt.dateEarliest,
    dateLatest: excerpt.dateLatest,
    dateLabel: excerpt.dateLabel,
    topics: excerpt.topics,
    mentions: byPosition(excerpt.mentions).map(snapshotMention),
    pitchTags: byPosition(excerpt.pitchTags).map(snapshotPitchTag),
    contributorId: excerpt.contributorId,
    status: excerpt.status,
    version: excerpt.version,
    approvedVersion: excerpt.approvedVersion,
  };
}

export const snapshotStatus = (snapshot: Record<string, unknown>): WorkflowState | null =>
  typeof snapshot.status === 'string' ? (snapshot.status as WorkflowState) : null;

/** `approvedVersions`: the versions whose content readers saw as approved. */
export function presentRevision(revision: Revision, approvedVersions: ReadonlySet<number>): RevisionSummary {
  return {
    version: revision.version,
    status: snapshotStatus(revision.snapshot),
    reason: revision.reason,
    author: presentCredit(revision.author),
    createdAt: revision.createdAt.toISOString(),
    approved: approvedVersions.has(revision.version),
  };
}

export function presentVersion(
  kind: EntityKind,
  publicId: string,
  revision: Revision,
  current: { version: number; title: string },
): VersionSnapshot {
  return {
    kind,
    id: publicId,
    version: revision.version,
    currentVersion: current.version,
    title: current.title,
    createdAt: revision.createdAt.toISOString(),
    author: presentCredit(revision.author),
    reason: revision.reason,
    snapshot: revision.snapshot,
  };
}
