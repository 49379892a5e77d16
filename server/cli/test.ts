/**
 * `npm test`: the whole suite against real parts — a throwaway private MariaDB, the
 * local search service, a mail capture server and, for end-to-end tests, the built
 * app on its own database in Debian's chromium. Arguments go on to vitest.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, mkdirSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { resolve } from 'node:path';
import { ensureSystemPackages } from './system-packages';
import { startPrivateMariaDb } from './mariadb';
import { dataRoot } from './local-env';
import { startSearchProcess } from './search-process';
import { buildClientIfStale } from './client-build';
import { startCaptureServer } from '../mail/capture-server';

const log = (line: string) => console.log(`[test] ${line}`);
const root = resolve(import.meta.dirname, '../..');

async function main(): Promise<number> {
  const started = Date.now();
  ensureSystemPackages(['mariadb-server', 'citation-style-language-styles', 'chromium'], log);
  mkdirSync(dataRoot, { recursive: true });
  const runDir = mkdtempSync(resolve(dataRoot, 'test-run-'));
  const stops: (() => Promise<void>)[] = [() => Promise.resolve(rmSync(runDir, { recursive: true, force: true }))];
  const env = process.env;
  try {
    const password = randomBytes(12).toString('hex');
    const db = await startPrivateMariaDb({ dir: resolve(runDir, 'mariadb'), database: 'windway_e2e', password });
    stops.unshift(() => db.stop());
    const searchKey = randomBytes(16).toString('hex');
    const search = await startSearchProcess({ dataDir: resolve(runDir, 'search'), masterKey: searchKey });
    stops.unshift(() => search.stop());
    const mailDir = resolve(runDir, 'mail');
    const capture = await startCaptureServer({ dir: mailDir });
    stops.unshift(() => capture.close());
    Object.assign(env, {
      NODE_ENV: 'test',
      TEST_DATABASE_ADMIN_URL: db.adminUrl,
      DATABASE_URL: db.url,
      MEILI_HOST: search.url,
      MEILI_KEY: searchKey,
      SMTP_URL: capture.url,
      MAIL_CAPTURE_DIR: mailDir,
      SESSION_SECRET: randomBytes(48).toString('hex'),
      STORAGE_DIR: resolve(runDir, 'files'),
      TEST_RUN_DIR: runDir,
    });
    log(`MariaDB, search and mail capture up in ${((Date.now() - started) / 1000).toFixed(1)} s`);

    const args = process.argv.slice(2);
    const wantsE2e = args.length === 0 || args.some((a) => a.includes('e2e'));
    if (wantsE2e) {
      buildClientIfStale(log);
      env.PORT = '0';
      env.SEARCH_INDEX_PREFIX = 'e2e_';
      env.DEMO = '1';
      const { startWindway } = await import('../index');
      const { getSequelize } = await import('../db');
      const { migrateToLatest } = await import('../migrator');
      const { seedDemo } = await import('../seeders/demo');
      await migrateToLatest(getSequelize());
      // The browser journeys run on the fictional demo world, with passwords made for this run.
      const passwords = { reader: '', contributor: '', editor: '', admin: '' };
      for (const role of Object.keys(passwords) as (keyof typeof passwords)[]) {
        passwords[role] = `${role}-${randomBytes(9).toString('base64url')}`;
        env[`E2E_PASSWORD_${role.toUpperCase()}`] = passwords[role];
      }
      await seedDemo(passwords);
      const app = await startWindway({ migrate: false });
      stops.unshift(() => app.close());
      env.E2E_BASE_URL = app.url;
      log(`App for end-to-end tests at ${app.url}`);
    }
    const code = await new Promise<number>((resolveCode) => {
      const vitest = spawn(process.execPath, [resolve(root, 'node_modules/vitest/vitest.mjs'), 'run', ...args], {
        cwd: root,
        env: { ...env, SEARCH_INDEX_PREFIX: '', PORT: '3000', DEMO: '0' },
        stdio: 'inherit',
      });
      vitest.once('exit', (exitCode) => resolveCode(exitCode ?? 1));
    });
    log(`Finished in ${((Date.now() - started) / 1000).toFixed(1)} s`);
    return code;
  } finally {
    for (const stop of stops) await stop().catch((error) => console.error(error));
  }
}

main().then(
  (code) => process.exit(code),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
