import { Router } from 'express';
import { searchQuerySchema, type SearchQuery } from '@shared/search/schema';
import { searchExcerpts } from '@search/query';
import { validate } from '../../http/validate';
import { withSearchService } from '../../services/search-calls';

const searchDown = 'Search is unavailable right now; the archive itself is fine. Please try again in a minute.';

/**
 * `GET /api/search`: open to everyone; what each person finds is decided by the
 * visibility filter search/query.ts builds from the session (public material; a
 * contributor's own drafts; everything for editors).
 */
export function searchRouter(): Router {
  const router = Router();
  router.get('/', validate({ query: searchQuerySchema }), async (req, res) => {
    const query = req.query as unknown as SearchQuery;
    const body = await withSearchService((client) => searchExcerpts(client, query, req.user), searchDown);
    res.set('Cache-Control', req.user ? 'private, no-store' : 'no-cache').json(body);
  });
  return router;
}
