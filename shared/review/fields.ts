import type { EntityKind } from './types';

/**
 * The content fields of sources and excerpts, in reading order, with the labels the
 * review page, the diff and field-anchored comments use. Status and version numbers
 * are not content: they never appear in a diff.
 */
export const sourceFieldLabels = {
  title: 'Title',
  sourceType: 'Kind of source',
  creators: 'Creators',
  dateEdtf: 'Date (EDTF)',
  calendarNote: 'Calendar',
  place: 'Place',
  languages: 'Languages',
  holdingInstitution: 'Holding institution',
  shelfmark: 'Shelfmark',
  publication: 'Publication',
  externalUrl: 'External link',
  rightsStatement: 'Rights statement',
  facsimileAccess: 'Facsimile access',
} as const;

export const excerptFieldLabels = {
  locatorType: 'Locator type',
  locatorValue: 'Locator',
  facsimilePage: 'Facsimile page',
  diplomatic: 'Diplomatic transcription',
  normalised: 'Normalised text',
  translation: 'Translation',
  translationLanguage: 'Translation language',
  translator: 'Translator',
  commentary: 'Commentary',
  dateEdtf: 'Date (EDTF)',
  topics: 'Topics',
  mentions: 'Instrument mentions',
  pitchTags: 'Pitch tags',
} as const;

export type SourceField = keyof typeof sourceFieldLabels;
export type ExcerptField = keyof typeof excerptFieldLabels;

export const fieldLabels: Record<EntityKind, Record<string, string>> = {
  source: sourceFieldLabels,
  excerpt: excerptFieldLabels,
};

/** Long texts are compared word by word; lists item by item; the rest as a whole value. */
export const textFields: readonly string[] = ['title', 'rightsStatement', 'diplomatic', 'normalised', 'translation', 'commentary'];
export const listFields: readonly string[] = ['creators', 'languages', 'topics', 'mentions', 'pitchTags'];

export function fieldLabel(kind: EntityKind, field: string): string {
  return fieldLabels[kind][field] ?? field;
}

export const isContentField = (kind: EntityKind, field: string) => field in fieldLabels[kind];
