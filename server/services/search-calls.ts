import type { Meilisearch } from 'meilisearch';
import { MeilisearchApiError, MeilisearchError } from 'meilisearch';
import { getSearchClient } from '@search/client';
import { unavailable } from '../errors';

/**
 * Runs a request against the search service. The service away, timing out or failing
 * inside becomes a 503 with `downMessage`; its 4xx answers (our own bad request) pass on.
 */
export async function withSearchService<T>(run: (client: Meilisearch) => Promise<T>, downMessage: string): Promise<T> {
  const client = getSearchClient();
  if (!client) throw unavailable('Search is not configured on this server (MEILI_HOST is unset).');
  try {
    return await run(client);
  } catch (error) {
    if (error instanceof MeilisearchApiError && (error.response?.status ?? 500) < 500) throw error;
    if (error instanceof MeilisearchError) throw unavailable(downMessage);
    throw error;
  }
}
