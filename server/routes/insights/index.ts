import { Router } from 'express';
import { insightsQuerySchema, type InsightsQuery } from '@shared/insights/schema';
import { validate } from '../../http/validate';
import { withSearchService } from '../../services/search-calls';
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
    const body = await withSearchService((client) => buildInsights(client, query, req.user), searchDown);
    res.set('Cache-Control', req.user ? 'private, no-store' : 'no-cache').json(body);
  });
  return router;
}
