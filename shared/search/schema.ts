/**
 * `GET /api/search`: the query schema (server validation, client URL state, tests)
 * and the response shape. Every filter value is whitelisted or typed here, so the
 * server never has to trust user text when it builds the search filter.
 */
import { z } from 'zod';
import { sourceTypes, type SourceType } from '../catalogue/vocabulary';
import { INSTRUMENT_SIZES, SIZE_SLUGS } from '../reckoner/sizes';
import { languageTagSchema } from '../catalogue/schemas';

export const SIZE_FAMILIES = [...new Set(INSTRUMENT_SIZES.map((s) => s.family))] as readonly string[];

/** The year and a′ ranges the search page offers (the API accepts wider values). */
export const YEAR_RANGE = { min: 1500, max: 1800 } as const;
export const PITCH_RANGE = { min: 380, max: 480 } as const;
export const PITCH_MARKS = [392, 415, 440, 466] as const;
export const PER_PAGE = { default: 20, max: 50 } as const;
/** Deepest result the index pages to (the index's `maxTotalHits`). */
export const MAX_RESULT_WINDOW = 10_000;

export const searchSorts = ['relevance', 'oldest', 'newest', 'title'] as const;
export type SearchSort = (typeof searchSorts)[number];

/** Facet groups the response counts, in display order. */
export const facetNames = ['sizes', 'families', 'sourceType', 'languages', 'decades'] as const;
export type FacetName = (typeof facetNames)[number];

/** `size=alto&size=tenor`, `size=alto,tenor` or a mix → `['alto', 'tenor']`. */
function multi<O extends string>(item: z.ZodType<O, string>, max = 20) {
  return z
    .union([z.string(), z.array(z.string())])
    .optional()
    .transform((v) => (v === undefined ? [] : (Array.isArray(v) ? v : [v]).flatMap((s) => s.split(',')).map((s) => s.trim()).filter(Boolean)))
    .pipe(z.array(item).max(max, { error: `Choose at most ${max} values` }))
    .transform((list) => [...new Set(list)]);
}

/** One scalar query value; a repeated parameter is refused rather than guessed at. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const single = <O>(inner: z.ZodType<O, any>, name: string) =>
  z.preprocess((v) => (v === '' ? undefined : v), z.string({ error: `Give ${name} once, as a single value` }).optional()).pipe(inner);

const intIn = (name: string, min: number, max: number) =>
  single(
    z.coerce
      .number({ error: `${name} must be a number` })
      .int({ error: `${name} must be a whole number` })
      .min(min, { error: `${name} must be at least ${min}` })
      .max(max, { error: `${name} must be at most ${max}` })
      .optional(),
    name,
  );

const hzIn = (name: string) =>
  single(
    z.coerce
      .number({ error: `${name} must be a number of hertz` })
      .min(300, { error: `${name} must be at least 300 Hz` })
      .max(600, { error: `${name} must be at most 600 Hz` })
      .optional(),
    name,
  );

export const searchQuerySchema = z
  .object({
    q: single(z.string().trim().max(200, { error: 'Search with at most 200 characters' }).optional(), 'q').transform((v) => v ?? ''),
    size: multi(z.enum(SIZE_SLUGS as [string, ...string[]], { error: `Unknown size: use ${SIZE_SLUGS.join(', ')}` })),
    family: multi(z.enum(SIZE_FAMILIES as [string, ...string[]], { error: `Unknown family: use ${SIZE_FAMILIES.join(', ')}` })),
    type: multi(z.enum(sourceTypes, { error: `Unknown source type: use ${sourceTypes.join(', ')}` })),
    lang: multi(languageTagSchema),
    from: intIn('from', 1000, 2100),
    to: intIn('to', 1000, 2100),
    aMin: hzIn('aMin'),
    aMax: hzIn('aMax'),
    page: intIn('page', 1, 10_000).transform((v) => v ?? 1),
    perPage: intIn('perPage', 1, PER_PAGE.max).transform((v) => v ?? PER_PAGE.default),
    sort: single(z.enum(searchSorts, { error: `sort is one of ${searchSorts.join(', ')}` }).optional(), 'sort').transform((v) => v ?? 'relevance'),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.from !== undefined && v.to !== undefined && v.from > v.to) ctx.addIssue({ code: 'custom', path: ['to'], message: 'to must not be before from' });
    if (v.aMin !== undefined && v.aMax !== undefined && v.aMin > v.aMax) ctx.addIssue({ code: 'custom', path: ['aMax'], message: 'aMax must not be below aMin' });
    if (v.page * v.perPage > MAX_RESULT_WINDOW) ctx.addIssue({ code: 'custom', path: ['page'], message: `Results page at most to the ${MAX_RESULT_WINDOW}th hit: narrow the search` });
  });

export type SearchQuery = z.output<typeof searchQuerySchema>;
export type SearchQueryInput = z.input<typeof searchQuerySchema>;

export interface SearchHit {
  /** The excerpt's public id: the page is /excerpts/:excerptId. */
  excerptId: string;
  sourceId: string;
  sourceTitle: string;
  /** As a citation prints it, e.g. `fol. 12v`. */
  locator: string;
  /** A cropped passage, HTML-escaped; only `<mark>…</mark>` is markup. */
  snippet: string;
  /** Which text the snippet comes from. */
  snippetField: 'diplomatic' | 'normalised' | 'translation' | 'commentary';
  sizes: string[];
  aHz: number[];
  dateLabel: string;
  sourceType: SourceType;
  languages: string[];
  /** Only ever non-approved for the excerpt's own contributor or an editor. */
  status: string;
}

export type FacetCounts = Record<string, number>;

export interface SearchResponse {
  hits: SearchHit[];
  /** Matching excerpts (counted up to the result window). */
  total: number;
  facets: Record<FacetName, FacetCounts>;
  page: number;
  perPage: number;
  processingTimeMs: number;
}

/** Splits a server snippet into plain and marked runs (for rendering without innerHTML). */
export function snippetRuns(snippet: string): { text: string; marked: boolean }[] {
  const unescape = (s: string) =>
    s.replace(/&(lt|gt|quot|#39|amp);/g, (_m, e: string) => ({ lt: '<', gt: '>', quot: '"', '#39': "'", amp: '&' })[e]!);
  const runs: { text: string; marked: boolean }[] = [];
  const re = /<mark>([\s\S]*?)<\/mark>/g;
  let last = 0;
  for (let m = re.exec(snippet); m; m = re.exec(snippet)) {
    if (m.index > last) runs.push({ text: unescape(snippet.slice(last, m.index)), marked: false });
    runs.push({ text: unescape(m[1]), marked: true });
    last = m.index + m[0].length;
  }
  if (last < snippet.length) runs.push({ text: unescape(snippet.slice(last)), marked: false });
  return runs;
}
