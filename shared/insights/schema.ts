/**
 * `GET /api/insights`: the timeline and pitch pictures of a search. It takes the
 * same filter parameters as `GET /api/search` — the very field schemas, taken from
 * its shape — without the paging and sorting ones, which a picture has no use for.
 */
import { z } from 'zod';
import { searchQuerySchema, YEAR_RANGE, type SearchQuery } from '../search/schema';

/** At most this many excerpt spans (earliest first) and pitch points are sent; `truncated` says when more matched. */
export const TIMELINE_CAP = 1000;
export const PITCH_CAP = 1000;

/** The decades the charts count: 1500 … 1790, i.e. 1500–1799, the archive's period. */
export const FIRST_DECADE = YEAR_RANGE.min;
export const LAST_DECADE = YEAR_RANGE.max - 10;
export const DECADES: readonly number[] = Array.from({ length: (LAST_DECADE - FIRST_DECADE) / 10 + 1 }, (_, i) => FIRST_DECADE + i * 10);

const s = searchQuerySchema.shape;

/**
 * `search` (default): what this person's search finds (their own drafts, or everything
 * for editors); `public`: approved material only, whoever asks (the home page).
 * It can only narrow what a person sees, never widen it.
 */
export const insightScopes = ['search', 'public'] as const;
export type InsightScope = (typeof insightScopes)[number];

/** The search's filters (q, size, family, type, lang, from, to, aMin, aMax) and the scope. */
export const insightsQuerySchema = z
  .object({
    q: s.q, size: s.size, family: s.family, type: s.type, lang: s.lang, from: s.from, to: s.to, aMin: s.aMin, aMax: s.aMax,
    scope: z.enum(insightScopes, { error: `scope is one of ${insightScopes.join(', ')}` }).optional().default('search'),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.from !== undefined && v.to !== undefined && v.from > v.to) ctx.addIssue({ code: 'custom', path: ['to'], message: 'to must not be before from' });
    if (v.aMin !== undefined && v.aMax !== undefined && v.aMin > v.aMax) ctx.addIssue({ code: 'custom', path: ['aMax'], message: 'aMax must not be below aMin' });
  });

export type InsightsQuery = z.output<typeof insightsQuerySchema>;
export type InsightsQueryInput = z.input<typeof insightsQuerySchema>;

/** The filter parameter names, in URL order (the client copies exactly these from the search page's URL). */
export const INSIGHTS_PARAMS = ['q', 'size', 'family', 'type', 'lang', 'from', 'to', 'aMin', 'aMax'] as const;

/** An insights query as a full search query (first page, relevance), for the search filter builder. */
export const asSearchQuery = (q: InsightsQuery): SearchQuery => ({ ...q, page: 1, perPage: 1, sort: 'relevance' });

export interface TimelineSpan {
  excerptId: string;
  sourceId: string;
  sourceTitle: string;
  yearEarliest: number;
  yearLatest: number;
  sizes: string[];
  /** As the catalogue prints the date, e.g. "c. 1700", "1690s". */
  dateLabel: string;
  /** True when the date is a range of more than one year or qualified (c., ?, ~): draw it as a span. */
  approximate: boolean;
}

export interface DecadeCount {
  /** First year of the decade: 1550 stands for 1550–1559. */
  decade: number;
  /** Excerpts whose date range touches the decade (an excerpt dated 1695–1705 counts in two). */
  count: number;
}

export interface PitchPoint {
  excerptId: string;
  sourceTitle: string;
  /** Midpoint of the date range, for placing the point. */
  year: number;
  yearEarliest: number;
  yearLatest: number;
  dateLabel: string;
  aHz: number;
  /** From a′ = 440 Hz, one decimal. */
  cents: number;
  sizes: string[];
}

export interface InsightsResponse {
  timeline: {
    /** Dated excerpts overlapping 1500–1800, earliest first, at most TIMELINE_CAP. */
    spans: TimelineSpan[];
    truncated: boolean;
    /** Every decade 1500–1790, zeros included: the search's `decades` facet counts. */
    decades: DecadeCount[];
  };
  pitch: {
    /** One point per pitch tag (a′) of a dated excerpt; excerpts at most PITCH_CAP. */
    points: PitchPoint[];
    truncated: boolean;
  };
  /** All excerpts the filters match, dated or not. */
  total: number;
}
