import { Router } from 'express';
import { MeilisearchApiError, MeilisearchError } from 'meilisearch';
import { insightsQuerySchema, type InsightsQuery } from '@shared/insights/schema';
import { getSearchClient } from '@search/client';
import { validate } from '../../http/validate';
import { unavailable } from '../../errors';
import { buildInsights } from './build';

const searchDown = 'The charts read the search index, which is unavailable right now; the archive itself is fine. Please try again in a minute.';

/**
 * `GET /api/insights`: the timeline (spans and decade counts) and the pitch chart
 * (a′ over time) of the excerpts a search with the same filters finds. Open to
 * everyone; each person sees what their search would show them.
 */
export function insightsRouter(): Router {
  const router = Router();
  router.get('/', validate({ query: insightsQuerySchema }), async (req, res) => {
    const query = req.query as unknown as InsightsQuery;
    const client = getSearchClient();
    if (!client) throw unavailable('Search is not configured on this server (MEILI_HOST is unset).');
    try {
      const body = await buildInsights(client, query, req.user);
      res.set('Cache-Control', req.user ? 'private, no-store' : 'no-cache').json(body);
    } catch (error) {
      if (error instanceof MeilisearchApiError && (error.response?.status ?? 500) < 500) throw error;
      if (error instanceof MeilisearchError) throw unavailable(searchDown);
      throw error;
    }
  });
  return router;
}
