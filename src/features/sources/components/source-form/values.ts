import type { SourceFields, SourceInput } from '@shared/catalogue/schemas';
import type { SourceDetail } from '@shared/catalogue/types';
import { printedSourceTypes, type SourceType } from '@shared/catalogue/vocabulary';

/** The form holds the schema's input shape; empty optional text is '' until the schema turns it into null. */
export type SourceFormValues = SourceInput;

export const sourceFormId = 'source';

export const sourceFieldLabels: Record<string, string> = {
  title: 'Title',
  sourceType: 'Kind of source',
  creators: 'Creator',
  'creators.*.name': 'name',
  'creators.*.role': 'role',
  dateEdtf: 'Date (EDTF)',
  calendarNote: 'Calendar',
  place: 'Place',
  languages: 'Languages',
  holdingInstitution: 'Holding institution',
  shelfmark: 'Shelfmark',
  externalUrl: 'Link to the holding’s record or digitisation',
  publication: 'Publication',
  'publication.publisher': 'Publisher or printer',
  'publication.place': 'Place of publication',
  'publication.edition': 'Edition',
  rightsStatement: 'Rights statement',
  facsimileAccess: 'Who may see the facsimile',
};

export function emptySourceValues(): SourceFormValues {
  return {
    title: '',
    // No kind chosen yet: the schema's message asks for one.
    sourceType: '' as SourceType,
    creators: [],
    dateEdtf: '',
    calendarNote: 'unstated',
    place: '',
    languages: [],
    holdingInstitution: '',
    shelfmark: '',
    publication: { publisher: '', place: '', edition: '' },
    externalUrl: '',
    rightsStatement: '',
    facsimileAccess: 'signed-in',
  };
}

/** A saved source as form values. */
export function sourceToFormValues(source: SourceDetail): SourceFormValues {
  return {
    title: source.title,
    sourceType: source.sourceType,
    creators: source.creators.map((c) => ({ name: c.name, role: c.role })),
    dateEdtf: source.date.edtf,
    calendarNote: source.calendarNote,
    place: source.place ?? '',
    languages: [...source.languages],
    holdingInstitution: source.holdingInstitution ?? '',
    shelfmark: source.shelfmark ?? '',
    publication: {
      publisher: source.publication?.publisher ?? '',
      place: source.publication?.place ?? '',
      edition: source.publication?.edition ?? '',
    },
    externalUrl: source.externalUrl ?? '',
    rightsStatement: source.rightsStatement ?? '',
    facsimileAccess: source.facsimileAccess,
  };
}

export function isPrinted(type: string | undefined): boolean {
  return (printedSourceTypes as readonly string[]).includes(type ?? '');
}

/** What is sent: publication data only for printed kinds, and only when some of it is filled in. */
export function toSourcePayload(fields: SourceFields): SourceFields {
  const publication = fields.publication;
  const hasPublication = publication && (publication.publisher || publication.place || publication.edition);
  return { ...fields, publication: isPrinted(fields.sourceType) && hasPublication ? publication : null };
}
