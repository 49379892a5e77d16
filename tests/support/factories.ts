import { describeEdtf } from '@shared/reckoner/dates';
import type { SourceType, WorkflowState } from '@shared/catalogue/vocabulary';
import type { Creator } from '@server/models/source';

let sequence = 0;
const nextId = (prefix: 'S' | 'E') => `${prefix}${String(Date.now() % 1e5).padStart(5, '0')}${String(++sequence % 100).padStart(2, '0')}`.slice(0, 8);

/** A source row straight in the database (fast, no HTTP), with a revision for its version. */
export async function buildSource(
  contributorId: number,
  overrides: Partial<{ title: string; sourceType: SourceType; status: WorkflowState; dateEdtf: string; creators: Creator[]; shelfmark: string | null; holdingInstitution: string | null; place: string | null; languages: string[] }> = {},
) {
  const { Source, Revision } = await import('@server/models');
  const dateEdtf = overrides.dateEdtf ?? '1702';
  const date = describeEdtf(dateEdtf);
  const status = overrides.status ?? 'approved';
  const source = await Source.create({
    publicId: nextId('S'),
    title: overrides.title ?? 'Inventory of the music room at Castle Velmark',
    sourceType: overrides.sourceType ?? 'inventory',
    creators: overrides.creators ?? [{ name: 'Harrowgate, Edmund', role: 'compiler' }],
    dateEdtf,
    dateEarliest: date.earliest,
    dateLatest: date.latest,
    dateLabel: date.label,
    place: overrides.place === undefined ? 'Oderstadt' : overrides.place,
    languages: overrides.languages ?? ['de'],
    holdingInstitution: overrides.holdingInstitution === undefined ? 'Velmark Family Archive (fictional)' : overrides.holdingInstitution,
    shelfmark: overrides.shelfmark === undefined ? 'VFA Inv. 12' : overrides.shelfmark,
    publication: null,
    externalUrl: null,
    rightsStatement: 'Fictional test material; free to use.',
    status,
    contributorId,
    approvedVersion: status === 'approved' ? 1 : null,
    submittedAt: null,
  });
  await Revision.create({ entityType: 'source', entityId: source.id, version: 1, snapshot: source.toJSON(), authorId: contributorId, reason: null });
  return source;
}

export async function buildExcerpt(
  source: { id: number; contributorId: number },
  overrides: Partial<{ status: WorkflowState; locatorType: 'page' | 'folio'; locatorValue: string; diplomatic: string; normalised: string | null; translation: string | null; sizeSlug: string; term: string; aHz: number }> = {},
) {
  const { Excerpt, InstrumentMention, PitchTag, Revision } = await import('@server/models');
  const status = overrides.status ?? 'approved';
  const excerpt = await Excerpt.create({
    publicId: nextId('E'),
    sourceId: source.id,
    locatorType: overrides.locatorType ?? 'folio',
    locatorValue: overrides.locatorValue ?? '12v',
    facsimilePage: 3,
    diplomatic: overrides.diplomatic ?? 'Item zwo Handtflöten im Cammerthon, so ein Thon vnter dem Chorthon',
    normalised: overrides.normalised === undefined ? 'Item zwei Handflöten im Kammerton, so einen Ton unter dem Chorton' : overrides.normalised,
    translation: overrides.translation === undefined ? 'Also two hand-flutes at chamber pitch, a tone below choir pitch' : overrides.translation,
    translationLanguage: 'en',
    translator: 'Test Translator',
    commentary: null,
    dateEdtf: null,
    dateEarliest: null,
    dateLatest: null,
    dateLabel: null,
    topics: ['pitch'],
    status,
    contributorId: source.contributorId,
    approvedVersion: status === 'approved' ? 1 : null,
  });
  await InstrumentMention.create({ excerptId: excerpt.id, term: overrides.term ?? 'Handtflöten', language: 'de', sizeSlug: overrides.sizeSlug ?? 'alto', certainty: 'probable', note: null });
  const aHz = overrides.aHz ?? 415;
  await PitchTag.create({ excerptId: excerpt.id, statement: 'ein Thon vnter dem Chorthon', aHz, centsFrom440: Math.round(12000 * Math.log2(aHz / 440)) / 10, derivation: 'inferred', note: null });
  await Revision.create({ entityType: 'excerpt', entityId: excerpt.id, version: 1, snapshot: excerpt.toJSON(), authorId: source.contributorId, reason: null });
  return excerpt;
}
