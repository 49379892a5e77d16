/**
 * Runs the local search service from the environment:
 *   SEARCH_HOST (127.0.0.1), SEARCH_PORT (7700), MEILI_MASTER_KEY, SEARCH_DATA_DIR
 * Prints its URL; on SIGINT/SIGTERM finishes queued tasks and persists before exiting.
 */
import { startSearchService } from '../service/server';

const env = process.env;
const service = await startSearchService({
  host: env.SEARCH_HOST || '127.0.0.1',
  port: env.SEARCH_PORT ? Number(env.SEARCH_PORT) : 7700,
  masterKey: env.MEILI_MASTER_KEY || undefined,
  dataDir: env.SEARCH_DATA_DIR || undefined,
});
console.log(`search service listening on ${service.url}${env.SEARCH_DATA_DIR ? ` (data in ${env.SEARCH_DATA_DIR})` : ' (in memory)'}`);

let stopping = false;
for (const sig of ['SIGINT', 'SIGTERM'] as const) {
  process.on(sig, () => {
    if (stopping) return;
    stopping = true;
    console.log(`search service: ${sig}, persisting…`);
    service.close().then(
      () => process.exit(0),
      (e) => { console.error(e); process.exit(1); },
    );
  });
}
