/**
 * The citation API, shared by server and client.
 *
 * GET  /api/excerpts/:id/cite?format=&style=&version=&download=1
 * GET  /api/sources/:id/cite?format=&style=&version=&download=1
 * POST /api/cite   { ids: string[], format, style? }            (many: a search result, a programme)
 * GET  /api/cite/styles → { data: CitationStyle[] }
 *
 * Only approved material is citable (404 otherwise, as if it did not exist). `version` names an
 * approved version (the current approved one by default); the permalink in the citation carries it.
 *
 * Response bodies:
 * - `Accept: application/json` (first in the header, as the web client sends) → JSON
 *   `CiteResponse`: `data` is the exact text of the export, `items` the CSL-JSON, and for
 *   text/html `entries` gives each item's note (or in-text citation) and bibliography entry.
 * - otherwise the export itself: bibtex, ris, text → `text/plain; charset=utf-8`; csl-json →
 *   `application/vnd.citationstyles.csl+json`; html → `text/html; charset=utf-8`.
 *   `download=1` adds `Content-Disposition: attachment; filename=windway-<id>.<ext>`.
 * - text/html in a note style hold the footnote form (with the locator) and the bibliography
 *   entry; in an in-text style, the citation and the reference-list entry (see formatCitations).
 * - An unknown format or style is a 400 naming the field; styles are never silently replaced.
 */
import { z } from 'zod';

export const citeFormats = ['bibtex', 'ris', 'csl-json', 'text', 'html'] as const;
export type CiteFormat = (typeof citeFormats)[number];

/** Windway's names for its two default styles; any other id from GET /api/cite/styles works too. */
export const defaultStyles = { notes: 'Notes and bibliography (Chicago 17th ed., full notes)', 'author-date': 'Author-date (Chicago 17th ed.)' } as const;
export type StyleKind = 'note' | 'in-text';

export interface CitationStyle {
  id: string;
  title: string;
  kind: StyleKind;
}

export interface FormattedEntry {
  id: string;
  /** Note styles: the first (full) footnote, with the locator. */
  note?: string;
  /** Note styles: the form of a later note on the same item. */
  shortNote?: string;
  /** In-text styles: the parenthetical citation. */
  citation?: string;
  bibliography: string;
}

export interface CiteResponse {
  format: CiteFormat;
  style: string | null;
  data: string;
  items: Record<string, unknown>[];
  entries?: FormattedEntry[];
}

export const fileExtensions: Record<CiteFormat, string> = { bibtex: 'bib', ris: 'ris', 'csl-json': 'json', text: 'txt', html: 'html' };
export const contentTypes: Record<CiteFormat, string> = {
  bibtex: 'text/plain; charset=utf-8',
  ris: 'text/plain; charset=utf-8',
  text: 'text/plain; charset=utf-8',
  'csl-json': 'application/vnd.citationstyles.csl+json; charset=utf-8',
  html: 'text/html; charset=utf-8',
};

const formatSchema = z.enum(citeFormats, { error: `Choose a format: ${citeFormats.join(', ')}` });
const styleSchema = z.string().trim().min(1).max(200).regex(/^[a-z0-9][a-z0-9._-]*$/i, { error: 'Use a style id from GET /api/cite/styles' });
const windwayId = z.string().trim().regex(/^[SE][0-9A-HJKMNP-TV-Z]{7}$/, { error: 'Use an excerpt (E…) or source (S…) id' });

export const citeQuerySchema = z
  .object({
    format: formatSchema.default('csl-json'),
    style: styleSchema.default('notes'),
    version: z.coerce.number().int().positive().optional(),
    download: z.enum(['0', '1']).optional(),
  })
  .strict();
export type CiteQuery = z.output<typeof citeQuerySchema>;

export const citeManySchema = z
  .object({
    ids: z.array(windwayId).min(1, { error: 'Give at least one id' }).max(500),
    format: formatSchema,
    style: styleSchema.default('notes'),
  })
  .strict();
export type CiteManyBody = z.output<typeof citeManySchema>;

export const citeParamsSchema = z.object({ id: z.string().trim().min(1).max(12) }).strict();
