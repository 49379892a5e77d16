/**
 * Import of BibTeX and RIS: a syntax check that names the line (RIS has no parser errors of its
 * own in citation-js), and the mapping of parsed CSL-JSON entries to draft source fields.
 */
import type { SourceInput } from '../catalogue/schemas';
import type { SourceType } from '../catalogue/vocabulary';
import { nameToCreator, type CslName } from './names';

export const importFormats = ['bibtex', 'ris'] as const;
export type ImportFormat = (typeof importFormats)[number];

export interface SyntaxError {
  line: number;
  message: string;
}

/** Line (1-based) where each record starts: `@type{` for BibTeX, `TY  - ` for RIS. */
export function recordLines(text: string, format: ImportFormat): number[] {
  const lines = text.split(/\r?\n/);
  const pattern = format === 'bibtex' ? /^\s*@(?!comment|preamble|string)[A-Za-z]+\s*[{(]/i : /^TY {2}- /;
  return lines.flatMap((line, i) => (pattern.test(line) ? [i + 1] : []));
}

/** RIS (RIS Format Specifications, 2011): `XX  - value` lines; each record opens with TY and closes with ER. */
export function checkRisSyntax(text: string): SyntaxError | null {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  let open = 0;
  let records = 0;
  for (let i = 0; i < lines.length; i += 1) {
    const line = lines[i];
    if (!line.trim()) continue;
    const match = /^([A-Z][A-Z0-9]) {2}-( .*)?$/.exec(line.trimEnd());
    if (!match) return { line: i + 1, message: `Line ${i + 1} is not a RIS tag line ("XX  - value"): "${line.slice(0, 40)}".` };
    const tag = match[1];
    if (tag === 'TY') {
      if (open) return { line: i + 1, message: `Line ${i + 1}: a new record (TY) starts before the record from line ${open} ended with ER.` };
      open = i + 1;
      records += 1;
    } else if (!open) {
      return { line: i + 1, message: `Line ${i + 1}: ${tag} is outside a record; every record starts with TY.` };
    } else if (tag === 'ER') {
      open = 0;
    }
  }
  if (open) return { line: open, message: `The record starting on line ${open} has no ER line at its end.` };
  if (!records) return { line: 1, message: 'No RIS record found (a record starts with "TY  - ").' };
  return null;
}

/** citation-js's BibTeX errors read "… at line 4 col 1: …"; keep the first line of the message and the line. */
export function bibtexErrorFrom(error: unknown): SyntaxError {
  const message = error instanceof Error ? error.message : String(error);
  const line = Number(/at line (\d+)/.exec(message)?.[1] ?? 1);
  return { line, message: `Line ${line}: ${message.split('\n')[0].replace(/ at line \d+ col \d+:?$/, '')}.` };
}

const LANGUAGE_NAMES: Record<string, string> = {
  english: 'en', french: 'fr', francais: 'fr', français: 'fr', german: 'de', deutsch: 'de', latin: 'la', italian: 'it', italiano: 'it',
  dutch: 'nl', nederlands: 'nl', spanish: 'es', español: 'es', portuguese: 'pt', danish: 'da', swedish: 'sv', czech: 'cs', polish: 'pl',
  ngerman: 'de', british: 'en-GB', american: 'en-US',
};

export function languageTag(value: unknown): string | null {
  if (typeof value !== 'string' || !value.trim()) return null;
  const v = value.trim();
  if (/^[a-z]{2,3}(-[A-Z][a-z]{3})?(-([A-Z]{2}|\d{3}))?$/.test(v)) return v;
  if (/^[a-z]{2}[-_][a-z]{2}$/i.test(v)) return `${v.slice(0, 2).toLowerCase()}-${v.slice(3).toUpperCase()}`;
  return LANGUAGE_NAMES[v.toLowerCase()] ?? null;
}

type Csl = Record<string, unknown>;

function edtfFromCsl(date: unknown): string | null {
  if (!date || typeof date !== 'object') return null;
  const d = date as { 'date-parts'?: unknown[][]; circa?: unknown; literal?: string; raw?: string };
  const part = (p: unknown[] | undefined) =>
    p && p.length && p[0] !== undefined && p[0] !== ''
      ? p.slice(0, 3).map((v, i) => (i === 0 ? String(v).padStart(4, '0') : String(v).padStart(2, '0'))).join('-')
      : null;
  const parts = d['date-parts'];
  const mark = d.circa ? '~' : '';
  if (parts?.length) {
    const from = part(parts[0]);
    const to = part(parts[1]);
    if (from && to && to !== from) return `${from}${mark}/${to}${mark}`;
    if (from) return `${from}${mark}`;
  }
  const text = d.literal ?? d.raw;
  const year = text ? /\b(1[0-9]{3}|20[0-9]{2})\b/.exec(text)?.[1] : undefined;
  return year ? year : null;
}

function sourceTypeOf(type: unknown, hasPublisher: boolean): SourceType {
  switch (type) {
    case 'book':
    case 'chapter':
      return 'treatise';
    case 'article-newspaper':
      return 'newspaper';
    case 'musical_score':
      return 'music-preface';
    case 'personal_communication':
      return 'letter';
    default:
      return hasPublisher ? 'treatise' : 'other';
  }
}

const str = (v: unknown) => (typeof v === 'string' && v.trim() ? v.trim() : null);

/** A parsed entry → the fields of a draft source (the user can still edit them in the preview). */
export function cslToSourceInput(entry: Csl): SourceInput {
  const creators = (['author', 'editor', 'translator', 'compiler'] as const).flatMap((role) =>
    ((entry[role] as CslName[] | undefined) ?? []).map((name) => ({ name: nameToCreator(name), role })),
  );
  const publisher = entry.type === 'manuscript' ? null : str(entry.publisher);
  const publisherPlace = str(entry['publisher-place']);
  const archive = str(entry.archive) ?? (entry.type === 'manuscript' ? str(entry.publisher) : null);
  const archivePlace = str(entry['archive-place']);
  const language = languageTag(entry.language);
  const edition = entry.edition !== undefined && entry.edition !== null ? String(entry.edition) : null;
  return {
    title: str(entry.title) ?? '',
    sourceType: sourceTypeOf(entry.type, !!publisher),
    creators,
    dateEdtf: edtfFromCsl(entry.issued) ?? '',
    place: publisherPlace,
    languages: language ? [language] : [],
    holdingInstitution: archive ? (archivePlace ? `${archive}, ${archivePlace}` : archive) : null,
    shelfmark: str(entry.archive_location) ?? str(entry['call-number']),
    publication: publisher || edition ? { publisher, place: publisherPlace, edition } : null,
    externalUrl: str(entry.URL),
  };
}
