import type { ExcerptInput } from '@shared/catalogue/schemas';
import type { ExcerptDetail } from '@shared/catalogue/types';

/** The form holds the schema's input shape; empty optional text is '' until the schema turns it into null. */
export type ExcerptFormValues = ExcerptInput;

export const excerptFormId = 'excerpt';

export const excerptFieldLabels: Record<string, string> = {
  locatorType: 'Locator type',
  locatorValue: 'Locator',
  facsimilePage: 'Facsimile page',
  diplomatic: 'Diplomatic transcription',
  normalised: 'Normalised text',
  translation: 'Translation',
  translationLanguage: 'Language of the translation',
  translator: 'Translator',
  commentary: 'Commentary',
  dateEdtf: 'Date of the passage (EDTF)',
  topics: 'Topics',
  mentions: 'Instrument mention',
  'mentions.*.term': 'term as written',
  'mentions.*.language': 'language',
  'mentions.*.sizeSlug': 'size',
  'mentions.*.certainty': 'certainty',
  'mentions.*.note': 'note',
  pitchTags: 'Pitch tag',
  'pitchTags.*.statement': 'what the source says',
  'pitchTags.*.aHz': 'a′ in Hz',
  'pitchTags.*.derivation': 'derivation',
  'pitchTags.*.note': 'note',
};

export function emptyExcerptValues(): ExcerptFormValues {
  return {
    locatorType: 'page',
    locatorValue: '',
    facsimilePage: null,
    diplomatic: '',
    normalised: '',
    translation: '',
    translationLanguage: 'en',
    translator: '',
    commentary: '',
    // null: the passage takes the source's date.
    dateEdtf: null,
    topics: [],
    mentions: [],
    pitchTags: [],
  };
}

export function excerptToFormValues(excerpt: ExcerptDetail): ExcerptFormValues {
  return {
    locatorType: excerpt.locator.type,
    locatorValue: excerpt.locator.value,
    facsimilePage: excerpt.facsimilePage,
    diplomatic: excerpt.diplomatic,
    normalised: excerpt.normalised ?? '',
    translation: excerpt.translation ?? '',
    translationLanguage: excerpt.translationLanguage ?? 'en',
    translator: excerpt.translator ?? '',
    commentary: excerpt.commentary ?? '',
    dateEdtf: excerpt.dateEdtf,
    topics: [...excerpt.topics],
    mentions: excerpt.mentions.map((m) => ({ term: m.term, language: m.language, sizeSlug: m.sizeSlug, certainty: m.certainty, note: m.note ?? '' })),
    pitchTags: excerpt.pitchTags.map((p) => ({ statement: p.statement, aHz: p.aHz, derivation: p.derivation, note: p.note ?? '' })),
  };
}

/** '' → null, for optional inputs whose schema does not accept an empty string. */
export const emptyToNull = (value: unknown) => (typeof value === 'string' && value.trim() === '' ? null : value);

/** A number input's text → number; '' → null (optional) or undefined (required, so the schema names it). */
export const toNumber = (empty: null | undefined) => (value: unknown) => {
  if (typeof value === 'number') return value;
  if (typeof value !== 'string' || value.trim() === '') return empty;
  return Number(value.replace(',', '.'));
};
