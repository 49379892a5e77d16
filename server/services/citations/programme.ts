/**
 * Programme notes → numbered footnotes and a bibliography, through citeproc's cluster API:
 * each well-formed marker is one citation cluster, numbered in order of use (note styles), so the
 * style itself gives the first citation of an item in full and later ones in short form. An
 * excerpt is cited as its source with the excerpt's locator (or the marker's own), so the
 * bibliography lists each source once, sorted by the style. Malformed markers and unknown ids
 * stay in the text, marked, and are reported with their position.
 */
import { marked } from 'marked';
import sanitizeHtml from 'sanitize-html';
import { cslLocator, sourceToCsl, type CiteItem, type CslItem } from '@shared/citations/csl';
import { checkIds, citedKeys, parseMarkers, type Marker, type MarkerProblem } from '@shared/programmes/markers';
import type { BibliographyEntry, ProgrammePreview, RenderedNote } from '@shared/programmes/types';
import { renderClusters } from './engine';
import { cslOptions, findCitables, type CitableTarget } from './load';
import { useStyle } from './styles';

export interface RenderedNotes extends ProgrammePreview {
  /** The Markdown with markers replaced by tokens ⟦n⟧ (a note or in-text citation) and ⟦!k⟧ (a problem). */
  tokenised: string;
  /** Problem markers by token index: raw text and message. */
  marked: { raw: string; message: string }[];
  /** Plain-text in-text citations by note number (in-text styles). */
  inline: string[];
  targets: Map<string, CitableTarget>;
  items: CslItem[];
}

const INLINE_TAGS = ['i', 'b', 'em', 'strong', 'span', 'sup', 'sub', 'a', 'sc'];
const cleanInline = (html: string) =>
  sanitizeHtml(html, { allowedTags: INLINE_TAGS, allowedAttributes: { a: ['href'], span: ['style', 'class'] }, allowedStyles: { span: { 'font-variant': [/^small-caps$/], 'font-style': [/^italic$/] } } });
export const htmlToText = (html: string) =>
  sanitizeHtml(html, { allowedTags: [], allowedAttributes: {} }).replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&nbsp;/g, ' ');

function citeItemsFor(marker: Marker, targets: Map<string, CitableTarget>): CiteItem[] {
  return marker.items.map((m) => {
    const target = targets.get(m.key)!;
    const excerpt = target.excerpt;
    const type = m.locatorType ?? (m.locator ? (excerpt?.locatorType ?? 'page') : excerpt?.locatorType);
    const value = m.locator ?? (m.locatorType ? null : excerpt?.locatorValue);
    const pin = type && value ? cslLocator(type, value) : undefined;
    return {
      id: target.source.publicId,
      ...(pin ? { locator: pin.locator, label: pin.label } : {}),
      ...(m.prefix ? { prefix: `${m.prefix} ` } : {}),
      ...(m.suffix ? { suffix: ` ${m.suffix}` } : {}),
    };
  });
}

export async function renderNotes(text: string, styleId: string, accessed?: Date): Promise<RenderedNotes> {
  const style = useStyle(styleId, 'citationStyle');
  const parsed = parseMarkers(text);
  const { found } = await findCitables(citedKeys(parsed).filter((k) => /^[SE]/.test(k)));
  const problems: MarkerProblem[] = [...parsed.problems, ...checkIds(text, parsed, new Set(found.keys()))].sort((a, b) => a.start - b.start);
  const badStarts = new Set(problems.map((p) => p.start));
  const good = parsed.markers.filter((m) => !badStarts.has(m.start));

  const items = new Map<string, CslItem>();
  for (const target of found.values()) {
    if (!items.has(target.source.publicId)) items.set(target.source.publicId, sourceToCsl(target.source, cslOptions(accessed)));
  }
  const clusters = good.map((marker, i) => ({ items: citeItemsFor(marker, found), noteIndex: i + 1 }));
  const itemList = [...items.values()];
  const html = renderClusters(itemList, clusters, styleId, 'html');

  // Replace markers (good and bad) from the end, so offsets stay valid.
  const spans = [
    ...good.map((m, i) => ({ start: m.start, end: m.end, token: `⟦${i + 1}⟧` })),
    ...problems.filter((p, i, all) => all.findIndex((q) => q.start === p.start) === i).map((p, k) => ({ start: p.start, end: p.end, token: `⟦!${k}⟧`, problem: p })),
  ].sort((a, b) => b.start - a.start);
  const markedProblems: { raw: string; message: string }[] = [];
  let tokenised = text;
  for (const span of spans) {
    if ('problem' in span && span.problem) {
      const k = Number(span.token.slice(2, -1));
      const messages = problems.filter((p) => p.start === span.start).map((p) => p.message).join(' ');
      markedProblems[k] = { raw: text.slice(span.start, span.end), message: messages };
    }
    tokenised = tokenised.slice(0, span.start) + span.token + tokenised.slice(span.end);
  }

  // A note is a sentence: a prefix written in lower case ("see") opens it with a capital (CMOS 17 §14.36, from memory).
  const texts = html.texts.map((t, i) => (style.kind === 'note' && clusters[i]?.items[0]?.prefix ? capitalise(t) : t));
  const notes: RenderedNote[] = texts.map((t, i) => ({ number: i + 1, html: cleanInline(t), text: htmlToText(t) }));
  const bibliography: BibliographyEntry[] = html.bibliography.map((b) => ({ id: b.id, html: cleanInline(b.text), text: htmlToText(b.text) }));
  const body = sanitizeHtml(await marked.parse(tokenised, { async: true }), {
    allowedTags: sanitizeHtml.defaults.allowedTags.concat(['h1', 'h2', 'sup', 'del']),
    allowedAttributes: { a: ['href', 'title'] },
  });
  const withRefs = body
    .replace(/⟦(\d+)⟧/g, (_m, n: string) =>
      style.kind === 'note'
        ? `<sup class="footnote-ref"><a href="#fn-${n}" id="fnref-${n}">${n}</a></sup>`
        : `<span class="citation">${notes[Number(n) - 1]?.html ?? ''}</span>`,
    )
    .replace(/⟦!(\d+)⟧/g, (_m, k: string) => {
      const p = markedProblems[Number(k)];
      return `<mark class="citation-problem" title="${escapeAttr(p?.message ?? '')}">${escapeText(p?.raw ?? '')}</mark>`;
    });
  return {
    html: withRefs,
    notes,
    bibliography,
    problems,
    styleKind: style.kind,
    tokenised,
    marked: markedProblems,
    inline: notes.map((n) => n.text),
    targets: found,
    items: itemList,
  };
}

export function escapeText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}
export function escapeAttr(text: string): string {
  return escapeText(text).replace(/"/g, '&quot;');
}

function capitalise(html: string): string {
  return html.replace(/^((?:<[^>]+>)*)(\p{Ll})/u, (_m, tags: string, letter: string) => tags + letter.toUpperCase());
}
