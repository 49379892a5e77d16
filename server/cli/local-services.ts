import { resolve } from 'node:path';
import { ensureSystemPackages } from './system-packages';
import { startPrivateMariaDb } from './mariadb';
import { dataRoot, localSecrets } from './local-env';
import { startSearchProcess } from './search-process';

/**
 * Runs `task` with the app's environment: the configured external services, or the
 * private local ones `npm start` uses (started here and stopped afterwards).
 */
export async function withLocalEnvironment(task: (env: NodeJS.ProcessEnv) => Promise<void>, options: { search?: boolean } = {}): Promise<void> {
  const env = process.env;
  const secrets = localSecrets();
  const stops: (() => Promise<void>)[] = [];
  try {
    if (!env.DATABASE_URL) {
      ensureSystemPackages(['mariadb-server']);
      const db = await startPrivateMariaDb({ dir: resolve(dataRoot, 'mariadb'), database: 'windway', password: secrets.databasePassword });
      stops.unshift(() => db.stop());
      env.DATABASE_URL = db.url;
    }
    if (!env.MEILI_HOST && options.search !== false) {
      const search = await startSearchProcess({ dataDir: resolve(dataRoot, 'search'), masterKey: secrets.searchKey });
      stops.unshift(() => search.stop());
      env.MEILI_HOST = search.url;
      env.MEILI_KEY = secrets.searchKey;
    }
    env.SESSION_SECRET ??= secrets.sessionSecret;
    env.STORAGE_DIR ??= resolve(dataRoot, 'files');
    await task(env);
    const { closeSequelize } = await import('../db');
    await closeSequelize();
  } finally {
    for (const stop of stops) await stop().catch((error) => console.error(error));
  }
}
