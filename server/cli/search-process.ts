import { spawn } from 'node:child_process';
import { resolve } from 'node:path';
import { freePort } from './mariadb';

const root = resolve(import.meta.dirname, '../..');

/** Runs the local search service as its own process (its own core), on loopback. */
export async function startSearchProcess(options: { dataDir?: string; masterKey: string; log?: (l: string) => void }) {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', resolve(root, 'search/cli/serve.ts')], {
    cwd: root,
    env: {
      ...process.env,
      SEARCH_HOST: '127.0.0.1',
      SEARCH_PORT: String(port),
      MEILI_MASTER_KEY: options.masterKey,
      SEARCH_DATA_DIR: options.dataDir ?? '',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  let exited = false;
  child.once('exit', () => (exited = true));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (exited) throw new Error('The local search service stopped while starting.');
    try {
      const res = await fetch(`${url}/health`);
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error('The local search service did not answer within 60 s.');
    await new Promise((r) => setTimeout(r, 150));
  }
  return {
    url,
    pid: child.pid,
    async stop() {
      if (exited) return;
      child.kill('SIGTERM');
      await new Promise((r) => child.once('exit', r));
    },
  };
}
