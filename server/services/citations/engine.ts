/** citation-js 0.7 with its BibTeX, RIS and CSL plugins, and direct access to the citeproc engine (cluster API). */
import { Cite, plugins } from '@citation-js/core';
import '@citation-js/plugin-bibtex';
import '@citation-js/plugin-ris';
import '@citation-js/plugin-csl';
import type { CiteItem, CslItem } from '@shared/citations/csl';
import { useStyle } from './styles';
import { safeCitationHtml } from './safe-html';

export { Cite };
export const LOCALE = 'en-US';

export interface Cluster {
  items: CiteItem[];
  /** Note number for note styles (1-based); ignored by in-text styles. */
  noteIndex: number;
}

interface CiteprocEngine {
  rebuildProcessorState(citations: unknown[], format: string, uncited: unknown[]): [string, number, string][];
  makeBibliography(): [{ entry_ids: string[][] }, string[]] | false;
}

/**
 * Formats clusters in order through citeproc, so a note style sees every earlier note
 * (first citation full, later ones short; CMOS 17's author-only form for an immediate repeat).
 * Returns one string per cluster and the bibliography of the items cited, sorted by the style.
 */
export function renderClusters(items: CslItem[], clusters: Cluster[], styleId: string, format: 'text' | 'html') {
  const style = useStyle(styleId);
  // Item-level `locator` and `custom` are data for other tools; citeproc reads pinpoints from the cite items.
  // `version` is left out too: Chicago prints it as a software version ("…, version 2"); the permalink carries it.
  const data = items.map(({ locator: _locator, custom: _custom, version: _version, ...item }) => item);
  const engine = plugins.config.get('@csl').engine(data, styleId, LOCALE, format) as CiteprocEngine;
  const citations = clusters.map((cluster, i) => ({
    citationID: `c${i + 1}`,
    citationItems: cluster.items.map(({ id, locator, label, prefix, suffix }) => ({
      id, ...(locator ? { locator, label: label ?? 'page' } : {}), ...(prefix ? { prefix } : {}), ...(suffix ? { suffix } : {}),
    })),
    properties: { noteIndex: style.kind === 'note' ? cluster.noteIndex : 0 },
  }));
  const rendered = citations.length ? engine.rebuildProcessorState(citations, format, []) : [];
  const byId = new Map(rendered.map(([id, , text]) => [id, text]));
  const clean = (text: string) => (format === 'html' ? safeCitationHtml(text) : text);
  const texts = citations.map((c) => clean(byId.get(c.citationID) ?? ''));
  const bib = engine.makeBibliography();
  const bibliography = bib ? bib[1].map((text, i) => ({ id: String(bib[0].entry_ids[i]?.[0] ?? ''), text: clean(unwrapEntry(text)) })) : [];
  return { kind: style.kind, texts, bibliography };
}

/** BibTeX or RIS from CSL items through citation-js. */
export function exportWith(format: 'bibtex' | 'ris', items: CslItem[]): string {
  return new Cite(items).format(format, { format: 'text' });
}

/** Parses BibTeX or RIS text into CSL-JSON items (citation-js input plugins). */
export function parseBibliographic(text: string, format: 'bibtex' | 'ris'): Record<string, unknown>[] {
  const type = format === 'bibtex' ? '@biblatex/text' : '@ris/file';
  return plugins.input.chain(text, { forceType: type, generateGraph: false, target: '@csl/list+object' });
}

/** citeproc's HTML entries come wrapped in `<div class="csl-entry">`; callers wrap them their own way. */
function unwrapEntry(text: string): string {
  return text.trim().replace(/^<div class="csl-entry">([\s\S]*)<\/div>$/, '$1').trim();
}
