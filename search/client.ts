import { Meilisearch } from 'meilisearch';
import { getConfig } from '@server/config';

let client: Meilisearch | null | undefined;

/** The official client, pointed by MEILI_HOST at the local service or a real Meilisearch; null when unset. */
export function getSearchClient(): Meilisearch | null {
  if (client !== undefined) return client;
  const { MEILI_HOST, MEILI_KEY } = getConfig();
  client = MEILI_HOST ? new Meilisearch({ host: MEILI_HOST, apiKey: MEILI_KEY, timeout: 5000 }) : null;
  return client;
}

export function resetSearchClient(): void {
  client = undefined;
}

/** Index uids carry a prefix so test files and deployments can share one search service. */
export function indexUid(name: string): string {
  return `${getConfig().SEARCH_INDEX_PREFIX}${name}`;
}
