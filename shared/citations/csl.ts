/**
 * Pure mapping of Windway's sources and excerpts to CSL-JSON (CSL 1.0.2; csl-data.json v1.0),
 * shared by the citation service, the programme renderer and the client's previews.
 *
 * Decisions (see also ./dates.ts and ./names.ts):
 * - Type: archival (non-printed) sources are `manuscript`; a printed treatise or tutor with a
 *   publisher is a `book`; a treatise or tutor without a publisher but with a shelfmark is a
 *   manuscript treatise (`manuscript`); everything else (prefaces to printed music, newspapers,
 *   printed material without a publisher) is a `document`.
 * - Archive: `archive` is the holding institution; when it is written "Institution, City" the part
 *   after the last comma is `archive-place` (CMOS 14.232: repository, then place). `archive_location`
 *   is the shelfmark. Books keep their archive data too (the copy consulted).
 * - An excerpt is cited as its source with a locator ("keep the source as container"): the
 *   item carries the source's fields, the excerpt's id, permalink and version, and `locator`
 *   (a csl-data.json variable). The locator's label is not an item variable in csl-data.json, so
 *   it travels in `custom.label` and, for formatting, in the cite item (`{ id, locator, label }`).
 * - Locator labels: page → `page`, folio → `folio`, column → `column` (CSL terms). CSL 1.0.2 has
 *   no term for a signature or a plate, so both are cited with label `page` and the abbreviation
 *   in the locator ("sig. B3v", "pl. 7"): Chicago prints page locators bare, so the note reads
 *   "…, sig. B3v". (A style that prints "p." before pages would show "p. sig. B3v".)
 * - The excerpt's own date is not used: the item is the document, dated as the source.
 */
import { locatorLabels } from '../catalogue/locator';
import { printedSourceTypes, type CreatorRole, type LocatorType, type SourceType } from '../catalogue/vocabulary';
import { cslToday, edtfToCslDate, type CslDate } from './dates';
import { creatorsToCsl, type CslName } from './names';

export type { CslDate } from './dates';
export type { CslName } from './names';

export type CslType = 'manuscript' | 'book' | 'document';
/** CSL locator terms Windway uses. */
export type CslLabel = 'page' | 'folio' | 'column';

export interface CslItem {
  id: string;
  type: CslType;
  'citation-key'?: string;
  title: string;
  'title-short'?: string;
  author?: CslName[];
  editor?: CslName[];
  translator?: CslName[];
  compiler?: CslName[];
  contributor?: CslName[];
  issued?: CslDate;
  accessed?: CslDate;
  archive?: string;
  archive_location?: string;
  'archive-place'?: string;
  publisher?: string;
  'publisher-place'?: string;
  edition?: string;
  language?: string;
  URL?: string;
  version?: string;
  locator?: string;
  note?: string;
  custom?: Record<string, unknown>;
}

/** What a CSL processor needs to cite one item with a pinpoint (csl-citation.json `citationItems`). */
export interface CiteItem {
  id: string;
  locator?: string;
  label?: CslLabel;
  prefix?: string;
  suffix?: string;
}

export interface CitableSource {
  publicId: string;
  title: string;
  sourceType: SourceType;
  creators: { name: string; role: CreatorRole }[];
  dateEdtf: string;
  place: string | null;
  languages: string[];
  holdingInstitution: string | null;
  shelfmark: string | null;
  publication: { publisher: string | null; place: string | null; edition: string | null } | null;
  version: number;
}

export interface CitableExcerpt {
  publicId: string;
  locatorType: LocatorType;
  locatorValue: string;
  version: number;
}

export interface CslOptions {
  /** Origin of permalinks, e.g. `https://windway.example` (no trailing slash). */
  publicUrl: string;
  /** The `accessed` date; today when omitted. */
  accessed?: Date;
}

export function cslTypeOf(source: Pick<CitableSource, 'sourceType' | 'publication' | 'shelfmark'>): CslType {
  const printed = printedSourceTypes.includes(source.sourceType);
  if (!printed) return 'manuscript';
  const isTreatise = source.sourceType === 'treatise' || source.sourceType === 'tutor';
  if (isTreatise && source.publication?.publisher) return 'book';
  if (isTreatise && source.shelfmark && !source.publication?.publisher) return 'manuscript';
  return 'document';
}

/** "Bibliothèque nationale de France, Paris" → archive + archive-place. */
export function splitArchive(holding: string | null): { archive?: string; place?: string } {
  if (!holding?.trim()) return {};
  const text = holding.trim();
  const comma = text.lastIndexOf(',');
  if (comma <= 0) return { archive: text };
  const place = text.slice(comma + 1).trim();
  if (!place || place.split(/\s+/).length > 3) return { archive: text };
  return { archive: text.slice(0, comma).trim(), place };
}

/** A short title for subsequent notes: up to the first colon, semicolon or full stop; at most five words. */
const TRAILING_FUNCTION_WORDS = new Set(
  'the a an of and or for in on at to with by from de du des la le les et pour sur der die das des und von zu mit für het een van en voor il lo la di del della e per con in da'.split(' '),
);

export function shortTitle(title: string): string | undefined {
  const head = title.split(/\s*[:;.]\s|,\s+(?:or|ou|oder|o)\s/i)[0].trim();
  const words = head.split(/\s+/);
  const kept = words.length > 5 ? words.slice(0, 4) : words;
  // CMOS 17 §14.32 (from memory): a short title keeps the key words, so it never ends on an article,
  // preposition or conjunction ("Household Book of the" → "Household Book").
  while (kept.length > 1 && TRAILING_FUNCTION_WORDS.has(kept[kept.length - 1].toLowerCase().replace(/[,;]$/, ''))) kept.pop();
  const short = kept.join(' ').replace(/[,;]$/, '');
  return short && short !== title ? short : undefined;
}

export const sourcePermalink = (publicUrl: string, id: string, version: number) => `${publicUrl}/sources/${id}/v/${version}`;
export const excerptPermalink = (publicUrl: string, id: string, version: number) => `${publicUrl}/excerpts/${id}/v/${version}`;

export function sourceToCsl(source: CitableSource, options: CslOptions): CslItem {
  const type = cslTypeOf(source);
  const item: CslItem = { id: source.publicId, 'citation-key': source.publicId, type, title: source.title };
  const short = shortTitle(source.title);
  if (short) item['title-short'] = short;
  Object.assign(item, creatorsToCsl(source.creators));
  const issued = edtfToCslDate(source.dateEdtf);
  if (issued) item.issued = issued;
  const { archive, place } = splitArchive(source.holdingInstitution);
  if (archive) item.archive = archive;
  if (place) item['archive-place'] = place;
  if (source.shelfmark) item.archive_location = source.shelfmark;
  if (type !== 'manuscript') {
    const publisher = source.publication?.publisher;
    const publisherPlace = source.publication?.place ?? source.place;
    if (publisher) item.publisher = publisher;
    if (publisherPlace) item['publisher-place'] = publisherPlace;
    if (source.publication?.edition) item.edition = source.publication.edition;
  }
  if (source.languages[0]) item.language = source.languages[0];
  item.URL = sourcePermalink(options.publicUrl, source.publicId, source.version);
  item.version = String(source.version);
  item.accessed = cslToday(options.accessed);
  item.custom = { windwayId: source.publicId, sourceType: source.sourceType };
  return item;
}

/** The CSL label and locator text for a catalogue locator (see the module comment). */
export function cslLocator(type: LocatorType, value: string): { label: CslLabel; locator: string } {
  const normalised = value.trim().replace(/\s*-\s*/, '–');
  if (type === 'page' || type === 'folio' || type === 'column') return { label: type, locator: normalised };
  return { label: 'page', locator: `${locatorLabels[type].abbreviation} ${normalised}` };
}

export function excerptToCsl(excerpt: CitableExcerpt, source: CitableSource, options: CslOptions): { item: CslItem; cite: CiteItem } {
  const base = sourceToCsl(source, options);
  const { label, locator } = cslLocator(excerpt.locatorType, excerpt.locatorValue);
  const item: CslItem = {
    ...base,
    id: excerpt.publicId,
    'citation-key': excerpt.publicId,
    URL: excerptPermalink(options.publicUrl, excerpt.publicId, excerpt.version),
    version: String(excerpt.version),
    locator,
    custom: { ...base.custom, windwayId: excerpt.publicId, sourceId: source.publicId, sourceVersion: source.version, label, locatorType: excerpt.locatorType },
  };
  return { item, cite: { id: excerpt.publicId, locator, label } };
}

/**
 * Locator, shelfmark, repository and place as one line, in CMOS 14.232's note order: BibTeX
 * `note` / RIS `N1` (citation-js drops `archive` from both).
 */
export function archiveNote(item: CslItem, locatorText?: string): string | undefined {
  const parts = [locatorText, item.archive_location, item.archive, item['archive-place']].filter(Boolean);
  return parts.length ? parts.join(', ') : undefined;
}
