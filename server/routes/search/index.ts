import { Router } from 'express';
import { MeilisearchApiError, MeilisearchError } from 'meilisearch';
import { searchQuerySchema, type SearchQuery } from '@shared/search/schema';
import { getSearchClient } from '@search/client';
import { searchExcerpts } from '@search/query';
import { validate } from '../../http/validate';
import { unavailable } from '../../errors';

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
    const client = getSearchClient();
    if (!client) throw unavailable('Search is not configured on this server (MEILI_HOST is unset).');
    try {
      const body = await searchExcerpts(client, query, req.user);
      res.set('Cache-Control', req.user ? 'private, no-store' : 'no-cache').json(body);
    } catch (error) {
      // The service away, timing out or failing inside: a 503 with a plain message.
      if (error instanceof MeilisearchApiError && (error.response?.status ?? 500) < 500) throw error;
      if (error instanceof MeilisearchError) throw unavailable(searchDown);
      throw error;
    }
  });
  return router;
}
