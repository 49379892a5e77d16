/**
 * A small validator written by us after the CSL-JSON schema `csl-data.json`, version 1.0
 * (citation-style-language/schema, input/1.0/csl-data.json — the schema accompanying CSL 1.0.2):
 * an array of objects with required `type` (closed list) and `id`, `additionalProperties: false`,
 * name variables of the listed parts only, date variables as `date-parts` (1–2 arrays of 1–3
 * numbers or strings) with `season`, `circa`, `literal`, `raw`, `edtf`, or an EDTF string.
 */
const TYPES = new Set([
  'article', 'article-journal', 'article-magazine', 'article-newspaper', 'bill', 'book', 'broadcast', 'chapter', 'classic', 'collection',
  'dataset', 'document', 'entry', 'entry-dictionary', 'entry-encyclopedia', 'event', 'figure', 'graphic', 'hearing', 'interview', 'legal_case',
  'legislation', 'manuscript', 'map', 'motion_picture', 'musical_score', 'pamphlet', 'paper-conference', 'patent', 'performance', 'periodical',
  'personal_communication', 'post', 'post-weblog', 'regulation', 'report', 'review', 'review-book', 'software', 'song', 'speech', 'standard',
  'thesis', 'treaty', 'webpage',
]);
const NAMES = new Set([
  'author', 'chair', 'collection-editor', 'compiler', 'composer', 'container-author', 'contributor', 'creator', 'curator', 'director', 'editor',
  'editorial-director', 'executive-producer', 'guest', 'host', 'interviewer', 'illustrator', 'narrator', 'organizer', 'original-author',
  'performer', 'producer', 'recipient', 'reviewed-author', 'translator', 'writer',
]);
const DATES = new Set(['accessed', 'available-date', 'event-date', 'issued', 'original-date', 'submitted']);
const STRINGS = new Set([
  'citation-key', 'language', 'journalAbbreviation', 'shortTitle', 'abstract', 'annote', 'archive', 'archive_collection', 'archive_location',
  'archive-place', 'authority', 'call-number', 'citation-label', 'collection-title', 'container-title', 'container-title-short', 'dimensions',
  'division', 'DOI', 'event', 'event-place', 'genre', 'ISBN', 'ISSN', 'jurisdiction', 'keyword', 'medium', 'note', 'original-publisher',
  'original-publisher-place', 'original-title', 'part-title', 'PMCID', 'PMID', 'publisher', 'publisher-place', 'references', 'reviewed-genre',
  'reviewed-title', 'scale', 'section', 'source', 'status', 'title', 'title-short', 'translated-title', 'translated-title-short', 'URL',
  'version', 'volume-title', 'volume-title-short', 'year-suffix',
]);
const STRING_OR_NUMBER = new Set([
  'chapter-number', 'citation-number', 'collection-number', 'edition', 'first-reference-note-number', 'issue', 'locator', 'number',
  'number-of-pages', 'number-of-volumes', 'page', 'page-first', 'part', 'printing', 'supplement', 'volume',
]);
const NAME_PARTS: Record<string, string[]> = {
  family: ['string'], given: ['string'], 'dropping-particle': ['string'], 'non-dropping-particle': ['string'], suffix: ['string'],
  'comma-suffix': ['string', 'number', 'boolean'], 'static-ordering': ['string', 'number', 'boolean'], literal: ['string'],
  'parse-names': ['string', 'number', 'boolean'],
};
const EDTF = /^[0-9-%~X?./]{4,}$/;

export function validateCslData(data: unknown): string[] {
  const errors: string[] = [];
  if (!Array.isArray(data)) return ['root: must be an array'];
  data.forEach((item, i) => {
    const at = `[${i}]`;
    if (typeof item !== 'object' || item === null || Array.isArray(item)) return void errors.push(`${at}: must be an object`);
    const record = item as Record<string, unknown>;
    if (!('type' in record)) errors.push(`${at}: type is required`);
    if (!('id' in record)) errors.push(`${at}: id is required`);
    for (const [key, value] of Object.entries(record)) {
      const path = `${at}.${key}`;
      if (key === 'type') {
        if (typeof value !== 'string' || !TYPES.has(value)) errors.push(`${path}: not a CSL type`);
      } else if (key === 'id') {
        if (typeof value !== 'string' && typeof value !== 'number') errors.push(`${path}: must be a string or number`);
      } else if (key === 'categories') {
        if (!Array.isArray(value) || value.some((v) => typeof v !== 'string')) errors.push(`${path}: must be an array of strings`);
      } else if (key === 'custom') {
        if (typeof value !== 'object' || value === null || Array.isArray(value)) errors.push(`${path}: must be an object`);
      } else if (NAMES.has(key)) {
        if (!Array.isArray(value)) errors.push(`${path}: must be an array of names`);
        else value.forEach((name, j) => checkName(name, `${path}[${j}]`, errors));
      } else if (DATES.has(key)) {
        checkDate(value, path, errors);
      } else if (STRINGS.has(key)) {
        if (typeof value !== 'string') errors.push(`${path}: must be a string`);
      } else if (STRING_OR_NUMBER.has(key)) {
        if (typeof value !== 'string' && typeof value !== 'number') errors.push(`${path}: must be a string or number`);
      } else {
        errors.push(`${path}: additional property not allowed`);
      }
    }
  });
  return errors;
}

function checkName(name: unknown, path: string, errors: string[]) {
  if (typeof name !== 'object' || name === null) return void errors.push(`${path}: must be an object`);
  for (const [part, value] of Object.entries(name)) {
    const allowed = NAME_PARTS[part];
    if (!allowed) errors.push(`${path}.${part}: additional property not allowed`);
    else if (!allowed.includes(typeof value)) errors.push(`${path}.${part}: wrong type`);
  }
}

function checkDate(date: unknown, path: string, errors: string[]) {
  if (typeof date === 'string') return void (EDTF.test(date) || errors.push(`${path}: not an EDTF string`));
  if (typeof date !== 'object' || date === null) return void errors.push(`${path}: must be a date object`);
  for (const [key, value] of Object.entries(date)) {
    if (key === 'date-parts') {
      const ok = Array.isArray(value) && value.length >= 1 && value.length <= 2 &&
        value.every((p) => Array.isArray(p) && p.length >= 1 && p.length <= 3 && p.every((v) => typeof v === 'number' || typeof v === 'string'));
      if (!ok) errors.push(`${path}.date-parts: 1–2 arrays of 1–3 numbers or strings`);
    } else if (key === 'season') {
      if (typeof value !== 'string' && typeof value !== 'number') errors.push(`${path}.season: wrong type`);
    } else if (key === 'circa') {
      if (!['string', 'number', 'boolean'].includes(typeof value)) errors.push(`${path}.circa: wrong type`);
    } else if (key === 'literal' || key === 'raw') {
      if (typeof value !== 'string') errors.push(`${path}.${key}: must be a string`);
    } else if (key === 'edtf') {
      if (typeof value !== 'string' || !EDTF.test(value)) errors.push(`${path}.edtf: not EDTF`);
    } else errors.push(`${path}.${key}: additional property not allowed`);
  }
}
