/** Citation exports: BibTeX, RIS, CSL-JSON, and text/HTML in a CSL style. */
import { createHash } from 'node:crypto';
import { LRUCache } from 'lru-cache';
import type { CiteFormat, FormattedEntry } from '@shared/citations/api';
import { archiveNote, type CiteItem, type CslItem } from '@shared/citations/csl';
import { locatorLabels } from '@shared/catalogue/locator';
import type { LocatorType } from '@shared/catalogue/vocabulary';
import { exportWith, renderClusters } from './engine';
import { useStyle } from './styles';

export interface Citable {
  item: CslItem;
  cite: CiteItem;
}

export interface FormatResult {
  data: string;
  items: CslItem[];
  entries?: FormattedEntry[];
}

/**
 * citeproc costs milliseconds per item, and the same approved excerpt is cited again and again.
 * The result is a pure function of the items, the format and the style, so it is cached under a
 * hash of exactly those: an edit, a new version or another access date is another key.
 */
const formatted = new LRUCache<string, FormatResult>({ max: 2000 });

export function formatCitations(citables: Citable[], format: CiteFormat, styleId: string): FormatResult {
  const key = createHash('sha256').update(JSON.stringify([format, styleId, citables])).digest('base64url');
  const cached = formatted.get(key);
  if (cached) return cached;
  const result = formatUncached(citables, format, styleId);
  formatted.set(key, result);
  return result;
}

function formatUncached(citables: Citable[], format: CiteFormat, styleId: string): FormatResult {
  const items = citables.map((c) => c.item);
  switch (format) {
    case 'csl-json':
      return { data: `${JSON.stringify(items, null, 2)}\n`, items };
    case 'bibtex':
      return { data: toBibtex(citables), items };
    case 'ris':
      return { data: toRis(citables), items };
    case 'text':
    case 'html':
      return formatStyled(citables, format, styleId);
  }
}

function locatorText(item: CslItem): string | undefined {
  const type = item.custom?.locatorType as LocatorType | undefined;
  if (!item.locator || !type) return undefined;
  const label = item.custom?.label;
  return label === 'page' && (type === 'signature' || type === 'plate') ? item.locator : `${locatorLabels[type].abbreviation} ${item.locator}`;
}

/**
 * What BibTeX and RIS get from an item. citation-js drops `archive` from both, so archive,
 * shelfmark and locator go to `note` (BibTeX note / RIS N1). Patashnik's *BibTeXing* requires
 * author, title and note for @unpublished, and author/editor, title, publisher and year for
 * @book: an item without them is exported as a `document` (→ @misc, which requires nothing).
 */
function forExport(item: CslItem): CslItem {
  // `version` would make citation-js write RIS/BibTeX fields of software; the permalink carries the version.
  const { custom: _custom, locator: _locator, 'title-short': _short, version: _version, ...rest } = item;
  const copy: CslItem = { ...rest };
  const note = archiveNote(item, locatorText(item));
  if (note) copy.note = note;
  const hasAuthor = !!(item.author?.length || item.editor?.length);
  if (copy.type === 'manuscript' && (!item.author?.length || !note)) copy.type = 'document';
  if (copy.type === 'book' && (!hasAuthor || !item.publisher || !item.issued?.['date-parts'])) copy.type = 'document';
  return copy;
}

export function toBibtex(citables: Citable[]): string {
  return exportWith('bibtex', citables.map((c) => forExport(c.item))).trim() + '\n';
}

/**
 * RIS (RIS Format Specifications, 2011): citation-js writes `TY` first and `ER` last, MANSCPT for a
 * manuscript, BOOK, GEN; we add `AV` (location in archives: the shelfmark), which it reads back
 * as `archive_location` but does not write.
 */
export function toRis(citables: Citable[]): string {
  const records = exportWith('ris', citables.map((c) => forExport(c.item)))
    .split(/\r?\nER {2}-\s*/)
    .map((r) => r.trim())
    .filter(Boolean);
  return records
    .map((record, i) => {
      // citation-js wraps long values onto continuation lines, which the RIS tag format does not allow: join them.
      const lines: string[] = [];
      for (const line of record.split(/\r?\n/)) {
        if (/^[A-Z][A-Z0-9] {2}-/.test(line) || !lines.length) lines.push(line);
        else lines[lines.length - 1] += line;
      }
      const shelfmark = citables[i]?.item.archive_location;
      if (shelfmark && !lines.some((l) => l.startsWith('AV  - '))) lines.push(`AV  - ${shelfmark}`);
      return [...lines, 'ER  - '].join('\r\n');
    })
    .join('\r\n\r\n') + '\r\n';
}

/**
 * Text/HTML. Note style: each item's first (full) footnote with its locator, a later short note,
 * and the bibliography; in-text style: the citation and the reference list. Each item is cited
 * twice in one processor run (notes 4i+1 and 4i+3, so the second is "subsequent", not an
 * immediate repeat).
 */
function formatStyled(citables: Citable[], format: 'text' | 'html', styleId: string): FormatResult {
  const style = useStyle(styleId);
  const items = citables.map((c) => c.item);
  const merged = mergeBySource(citables);
  const clusters = merged.cites.flatMap((cite, i) => [
    { items: [cite], noteIndex: 4 * i + 1 },
    { items: [cite], noteIndex: 4 * i + 3 },
  ]);
  const { texts, bibliography } = renderClusters(merged.items, clusters, styleId, format);
  const bibById = new Map(bibliography.map((b) => [b.id, b.text]));
  const entries: FormattedEntry[] = citables.map((c, i) => {
    const first = texts[2 * i];
    const bib = bibById.get(merged.cites[i].id) ?? '';
    return style.kind === 'note'
      ? { id: c.item.id, note: first, shortNote: texts[2 * i + 1], bibliography: bib }
      : { id: c.item.id, citation: first, bibliography: bib };
  });
  const noteLabel = style.kind === 'note' ? 'Notes' : 'Citations';
  const seen = new Set<string>();
  const uniqueBibliography = bibliography.filter((b) => !seen.has(b.text) && seen.add(b.text));
  const bibLabel = style.kind === 'note' ? 'Bibliography' : 'References';
  const lead = entries.map((e) => (style.kind === 'note' ? e.note! : e.citation!));
  if (format === 'text') {
    const numbered = lead.map((t, i) => (style.kind === 'note' ? `${i + 1}. ${t}` : t));
    const data = `${noteLabel}\n${numbered.join('\n')}\n\n${bibLabel}\n${uniqueBibliography.map((b) => b.text).join('\n')}\n`;
    return { data, items, entries };
  }
  const list = lead.map((t) => `<li>${t}</li>`).join('');
  const data =
    `<section class="csl-${style.kind === 'note' ? 'notes' : 'citations'}"><h2>${noteLabel}</h2><${style.kind === 'note' ? 'ol' : 'ul'}>${list}</${style.kind === 'note' ? 'ol' : 'ul'}></section>\n` +
    `<section class="csl-bibliography"><h2>${bibLabel}</h2><div class="csl-bib-body">${uniqueBibliography.map((b) => `<div class="csl-entry">${b.text}</div>`).join('')}</div></section>\n`;
  return { data, items, entries };
}

/**
 * Several excerpts of one source (or a source and its excerpts) are one document: they are cited
 * as the source item with each excerpt's locator, so the bibliography lists the source once
 * (otherwise author-date styles would invent "1703a", "1703b"). A lone excerpt keeps its own item,
 * whose permalink names the excerpt and its version.
 */
function mergeBySource(citables: Citable[]): { items: CslItem[]; cites: CiteItem[] } {
  const sourceOf = (c: Citable) => String(c.item.custom?.sourceId ?? c.item.id);
  const counts = new Map<string, number>();
  for (const c of citables) counts.set(sourceOf(c), (counts.get(sourceOf(c)) ?? 0) + 1);
  const items = new Map<string, CslItem>();
  const cites = citables.map((c) => {
    const sourceId = sourceOf(c);
    if ((counts.get(sourceId) ?? 0) < 2) {
      items.set(c.item.id, c.item);
      return c.cite;
    }
    const own = citables.find((o) => o.item.id === sourceId)?.item;
    if (!items.has(sourceId)) items.set(sourceId, own ?? sourceItemOf(c.item));
    return { ...c.cite, id: sourceId };
  });
  return { items: [...items.values()], cites };
}

/** The source's item, from an excerpt's item (same fields, the source's id, permalink and version). */
function sourceItemOf(item: CslItem): CslItem {
  const sourceId = String(item.custom?.sourceId);
  const version = String(item.custom?.sourceVersion ?? '');
  const { locator: _locator, ...rest } = item;
  return { ...rest, id: sourceId, 'citation-key': sourceId, URL: item.URL?.replace(/\/excerpts\/[^/]+\/v\/\d+$/, `/sources/${sourceId}/v/${version}`), version, custom: { windwayId: sourceId, sourceType: item.custom?.sourceType } };
}
