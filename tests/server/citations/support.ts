/** Approved sources and excerpts made straight with the models (status approved, approvedVersion 1, a Revision each). */
import { describeEdtf } from '@shared/reckoner/dates';
import type { CitableSource } from '@shared/citations/csl';
import type { LocatorType } from '@shared/catalogue/vocabulary';
import { createUser } from '../../support/http';

let n = 0;
const alphabet = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
/** A fresh public id with the given prefix (random, like newPublicId). */
export function testId(prefix: 'S' | 'E'): string {
  n += 1;
  let id = '';
  for (let i = 0; i < 7; i += 1) id += alphabet[Math.floor(Math.random() * alphabet.length)];
  return `${prefix}${id}`;
}

export async function approvedSource(fields: Partial<CitableSource> & { status?: 'approved' | 'draft' } = {}) {
  const { Source, Revision } = await import('@server/models');
  const { snapshotSource } = await import('@server/presenters/revision');
  const owner = await createUser('contributor');
  const dateEdtf = fields.dateEdtf ?? '1703-05-12';
  const date = describeEdtf(dateEdtf);
  const status = fields.status ?? 'approved';
  const source = await Source.create({
    publicId: fields.publicId ?? testId('S'),
    title: fields.title ?? 'Inventarium der Instrumente der Hofkapelle',
    sourceType: fields.sourceType ?? 'inventory',
    creators: fields.creators ?? [{ name: 'Quellmann, Jobst Anselm', role: 'author' }],
    dateEdtf: date.edtf,
    dateEarliest: date.earliest,
    dateLatest: date.latest,
    dateLabel: date.label,
    place: fields.place ?? 'Oderstadt',
    languages: fields.languages ?? ['de'],
    holdingInstitution: fields.holdingInstitution === undefined ? 'Fürstliches Hausarchiv Velmark, Oderstadt' : fields.holdingInstitution,
    shelfmark: fields.shelfmark === undefined ? 'Loc. 44/7' : fields.shelfmark,
    publication: fields.publication ?? null,
    externalUrl: null,
    rightsStatement: null,
    status,
    contributorId: owner.id,
    version: 1,
    approvedVersion: status === 'approved' ? 1 : null,
    submittedAt: null,
  });
  await Revision.create({ entityType: 'source', entityId: source.id, version: 1, snapshot: snapshotSource(source), authorId: owner.id, reason: 'Created' });
  return source;
}

export async function approvedExcerpt(source: { id: number; publicId: string }, locatorType: LocatorType = 'folio', locatorValue = '12v', status: 'approved' | 'draft' = 'approved') {
  const { Excerpt, Revision } = await import('@server/models');
  const owner = await createUser('contributor');
  const excerpt = await Excerpt.create({
    publicId: testId('E'),
    sourceId: source.id,
    locatorType,
    locatorValue,
    facsimilePage: null,
    diplomatic: 'Vier Stück Fleutes douces, eine davon in D.',
    normalised: null,
    translation: 'Four recorders, one of them in D.',
    translationLanguage: 'en',
    translator: null,
    commentary: null,
    dateEdtf: null,
    dateEarliest: null,
    dateLatest: null,
    dateLabel: null,
    topics: [],
    status,
    contributorId: owner.id,
    version: 1,
    approvedVersion: status === 'approved' ? 1 : null,
  });
  await Revision.create({ entityType: 'excerpt', entityId: excerpt.id, version: 1, snapshot: { publicId: excerpt.publicId, locatorType, locatorValue }, authorId: owner.id, reason: 'Created' });
  return excerpt;
}

export const printedTreatise = {
  title: 'Principes de la flute traversiere, ou flute d’Allemagne; de la flute a bec, ou flute douce, et du haut-bois',
  sourceType: 'treatise' as const,
  creators: [{ name: 'Jacques-Martin Hotteterre', role: 'author' as const }],
  dateEdtf: '1707',
  languages: ['fr'],
  holdingInstitution: 'Bibliothèque nationale de France, Paris',
  shelfmark: 'VM8 F-1',
  publication: { publisher: 'Christophe Ballard', place: 'Paris', edition: null },
};
