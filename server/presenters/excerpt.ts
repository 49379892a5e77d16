import type { Excerpt, Source, User } from '../models';
import type { DateView, ExcerptDetail, ExcerptSummary, MentionView, PitchTagView } from '@shared/catalogue/types';
import { formatLocator } from '@shared/catalogue/locator';
import { centsFromModern, roundTo } from '@shared/reckoner/pitch';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { renderCommentary } from '../services/commentary-html';
import { presentCredit } from './user';
import { iso, presentSourceSummary } from './source';

/** Size slug → display name, from the editors' vocabulary (falls back to the seed list). */
export type SizeNames = Map<string, string>;

const seedNames: SizeNames = new Map(INSTRUMENT_SIZES.map((s) => [s.slug, s.name]));

function effectiveDate(excerpt: Excerpt, source: Source): DateView & { inherited: boolean } {
  if (excerpt.dateEdtf && excerpt.dateEarliest && excerpt.dateLatest && excerpt.dateLabel) {
    return { edtf: excerpt.dateEdtf, label: excerpt.dateLabel, earliest: excerpt.dateEarliest, latest: excerpt.dateLatest, inherited: false };
  }
  return { edtf: source.dateEdtf, label: source.dateLabel, earliest: source.dateEarliest, latest: source.dateLatest, inherited: true };
}

const locatorOf = (excerpt: Excerpt) => ({
  type: excerpt.locatorType,
  value: excerpt.locatorValue,
  label: formatLocator(excerpt.locatorType, excerpt.locatorValue),
});

const byPosition = <T extends { position: number }>(rows: T[] | undefined) => [...(rows ?? [])].sort((a, b) => a.position - b.position);

export function presentPitchTag(tag: { statement: string; aHz: number | string; derivation: PitchTagView['derivation']; note: string | null }): PitchTagView {
  const aHz = Number(tag.aHz);
  // Computed here rather than trusting the stored column, so the rounding rule has one home.
  return { statement: tag.statement, aHz, centsFrom440: roundTo(centsFromModern(aHz), 1), derivation: tag.derivation, note: tag.note };
}

export function presentMention(
  mention: { term: string; language: string; sizeSlug: string; certainty: MentionView['certainty']; note: string | null },
  sizeNames: SizeNames = seedNames,
): MentionView {
  return {
    term: mention.term,
    language: mention.language,
    sizeSlug: mention.sizeSlug,
    sizeName: sizeNames.get(mention.sizeSlug) ?? seedNames.get(mention.sizeSlug) ?? mention.sizeSlug,
    certainty: mention.certainty,
    note: mention.note,
  };
}

/** A list entry; `excerpt.mentions` and `excerpt.pitchTags` should be loaded. */
export function presentExcerptSummary(excerpt: Excerpt, source: Source): ExcerptSummary {
  const text = excerpt.diplomatic.replace(/\s+/g, ' ').trim();
  return {
    id: excerpt.publicId,
    sourceId: source.publicId,
    locator: locatorOf(excerpt),
    facsimilePage: excerpt.facsimilePage,
    snippet: text.length > 200 ? `${text.slice(0, 199)}…` : text,
    date: effectiveDate(excerpt, source),
    sizes: [...new Set(byPosition(excerpt.mentions).map((m) => m.sizeSlug))],
    aHz: byPosition(excerpt.pitchTags).map((t) => Number(t.aHz)),
    status: excerpt.status,
    version: excerpt.version,
  };
}

export function presentExcerptDetail(
  excerpt: Excerpt,
  source: Source,
  options: { sizeNames?: SizeNames; contributor?: Pick<User, 'id' | 'displayName'> | null; showingApprovedVersion?: boolean } = {},
): ExcerptDetail {
  return {
    id: excerpt.publicId,
    source: presentSourceSummary(source),
    locator: locatorOf(excerpt),
    facsimilePage: excerpt.facsimilePage,
    diplomatic: excerpt.diplomatic,
    normalised: excerpt.normalised,
    translation: excerpt.translation,
    translationLanguage: excerpt.translationLanguage,
    translator: excerpt.translator,
    commentary: excerpt.commentary,
    commentaryHtml: renderCommentary(excerpt.commentary),
    date: effectiveDate(excerpt, source),
    dateEdtf: excerpt.dateEdtf,
    topics: [...excerpt.topics],
    mentions: byPosition(excerpt.mentions).map((m) => presentMention(m, options.sizeNames)),
    pitchTags: byPosition(excerpt.pitchTags).map(presentPitchTag),
    status: excerpt.status,
    version: excerpt.version,
    approvedVersion: excerpt.approvedVersion,
    contributor: presentCredit(options.contributor ?? excerpt.contributor),
    createdAt: iso(excerpt.createdAt)!,
    updatedAt: iso(excerpt.updatedAt)!,
    showingApprovedVersion: options.showingApprovedVersion ?? false,
  };
}
