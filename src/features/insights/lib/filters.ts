import { INSIGHTS_PARAMS, insightsQuerySchema, type InsightScope } from '@shared/insights/schema';

/**
 * The search filters in a page's URL, as the query string of `GET /api/insights`:
 * only the filter names (paging and sorting stay on the search page), and — like the
 * search page itself — without values that do not validate, so a hand-edited link
 * still draws the charts of the search the page shows.
 */
export function insightsQueryString(params: URLSearchParams, scope: InsightScope = 'search'): string {
  const raw: Record<string, string> = {};
  for (const name of INSIGHTS_PARAMS) {
    const values = params.getAll(name).filter((v) => v !== '');
    if (values.length) raw[name] = values.join(',');
  }
  for (let attempt = 0; attempt < INSIGHTS_PARAMS.length; attempt++) {
    const parsed = insightsQuerySchema.safeParse(raw);
    if (parsed.success) break;
    for (const issue of parsed.error.issues) delete raw[String(issue.path[0] ?? '')];
  }
  const out = new URLSearchParams(raw);
  if (scope !== 'search') out.set('scope', scope);
  return out.toString();
}

/** The URL params that filter the search to one decade (1550 → from=1550&to=1559), back to its first page. */
export function withDecade(params: URLSearchParams, decade: number): URLSearchParams {
  const next = new URLSearchParams(params);
  next.set('from', String(decade));
  next.set('to', String(decade + 9));
  next.delete('page');
  return next;
}

/** The decade the URL filters to, when from/to are exactly one decade. */
export function decadeOf(params: URLSearchParams): number | null {
  const from = Number(params.get('from'));
  const to = Number(params.get('to'));
  if (!params.get('from') || !Number.isInteger(from) || from % 10 !== 0 || to !== from + 9) return null;
  return from;
}

export const decadeLabel = (decade: number) => `${decade}s`;
