import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { resolve, join } from 'node:path';

const root = resolve(import.meta.dirname, '../..');

function newestMtime(path: string): number {
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)));
  return newest;
}

/** Builds the client with Vite unless dist/ is newer than everything it is built from. */
export function buildClientIfStale(log: (line: string) => void = console.log): void {
  const built = resolve(root, 'dist/index.html');
  const inputs = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json'].map((p) => resolve(root, p)).filter(existsSync);
  if (existsSync(built) && statSync(built).mtimeMs >= Math.max(...inputs.map(newestMtime))) return;
  log('Building the web client…');
  execFileSync(process.execPath, [resolve(root, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: root,
    stdio: 'inherit',
    // Always a production bundle, whatever NODE_ENV the caller runs under (tests set `test`).
    env: { ...process.env, NODE_ENV: 'production' },
  });
}
