/**
 * `npm start`: everything Windway needs on one machine, on loopback — a private
 * MariaDB, the local search service, a mail capture server — then migrations,
 * the fictional demo data and the app. Ctrl-C stops all of it.
 */
import { resolve } from 'node:path';
import { ensureSystemPackages } from './system-packages';
import { startPrivateMariaDb, type PrivateMariaDb } from './mariadb';
import { dataRoot, localSecrets } from './local-env';
import { startSearchProcess } from './search-process';
import { buildClientIfStale } from './client-build';
import { startCaptureServer } from '../mail/capture-server';

const log = (line: string) => console.log(`[windway] ${line}`);
const stops: (() => Promise<void>)[] = [];

async function main() {
  const secrets = localSecrets();
  const env = process.env;
  ensureSystemPackages(env.DATABASE_URL ? ['citation-style-language-styles'] : ['mariadb-server', 'citation-style-language-styles'], log);

  let db: PrivateMariaDb | undefined;
  if (!env.DATABASE_URL) {
    db = await startPrivateMariaDb({
      dir: resolve(dataRoot, 'mariadb'),
      port: env.DB_PORT ? Number(env.DB_PORT) : undefined,
      database: 'windway',
      password: secrets.databasePassword,
      log,
    });
    stops.unshift(() => db!.stop());
    env.DATABASE_URL = db.url;
    log(`MariaDB is up on 127.0.0.1:${db.port} (data in .data/mariadb)`);
  }
  if (!env.MEILI_HOST) {
    const search = await startSearchProcess({ dataDir: resolve(dataRoot, 'search'), masterKey: secrets.searchKey, log });
    stops.unshift(() => search.stop());
    env.MEILI_HOST = search.url;
    env.MEILI_KEY = secrets.searchKey;
    log(`Local search service is up at ${search.url}`);
  }
  if (!env.SMTP_URL) {
    env.MAIL_CAPTURE_DIR = resolve(dataRoot, 'mail');
    const capture = await startCaptureServer({ dir: env.MAIL_CAPTURE_DIR });
    stops.unshift(() => capture.close());
    env.SMTP_URL = capture.url;
    log(`Mail capture (SMTP) is up at ${capture.url}; messages appear under Admin → Outbox`);
  }
  env.SESSION_SECRET ??= secrets.sessionSecret;
  env.STORAGE_DIR ??= resolve(dataRoot, 'files');
  env.DEMO ??= '1';

  buildClientIfStale(log);

  // Imported only now: these read the environment prepared above.
  const { startWindway } = await import('../index');
  const { seedDemo } = await import('../seeders/demo');
  const { getSequelize } = await import('../db');
  const { migrateToLatest } = await import('../migrator');
  await migrateToLatest(getSequelize());
  await (await import('../seeders/sizes')).seedInstrumentSizes();
  if (env.DEMO === '1') await seedDemo(secrets.demoPasswords, log);
  const app = await startWindway({ migrate: false });
  stops.unshift(() => app.close());

  log(`Windway is running at ${app.url}`);
  if (env.DEMO === '1') {
    log('Demo accounts (fictional demo data; passwords are for this machine only):');
    for (const [role, password] of Object.entries(secrets.demoPasswords)) log(`  ${role.padEnd(12)} ${role}@demo.windway.invalid   ${password}`);
  }
  log('Press Ctrl-C to stop.');
}

let stopping = false;
async function shutdown(code: number) {
  if (stopping) return;
  stopping = true;
  log('Stopping…');
  for (const stop of stops) {
    try {
      await stop();
    } catch (error) {
      console.error(error);
    }
  }
  process.exit(code);
}

process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));
main().catch((error) => {
  console.error(`[windway] ${error instanceof Error ? error.message : String(error)}`);
  void shutdown(1);
});
