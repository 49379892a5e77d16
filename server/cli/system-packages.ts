import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** Debian packages the project needs, with a file that proves each is installed. */
export const systemPackages = {
  'mariadb-server': '/usr/sbin/mariadbd',
  'citation-style-language-styles': '/usr/share/citation-style-language/styles',
  chromium: '/usr/bin/chromium',
} as const;

export type SystemPackage = keyof typeof systemPackages;

/**
 * Installs what is missing with apt-get (as root). Anything else on a fresh machine
 * is a clear message rather than a half-started app.
 */
export function ensureSystemPackages(names: SystemPackage[], log: (line: string) => void = console.log): void {
  const missing = names.filter((name) => !existsSync(systemPackages[name]));
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) {
    throw new Error(
      `Windway needs these Debian packages: ${missing.join(', ')}.\nInstall them as root: sudo apt-get install -y ${missing.join(' ')}`,
    );
  }
  log(`Installing ${missing.join(', ')} with apt-get (once; about a minute)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  if (update.status !== 0) throw new Error('apt-get update failed; check the network access to Debian mirrors.');
  execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...missing], { stdio: ['ignore', 'ignore', 'inherit'], env });
  for (const name of missing) {
    if (!existsSync(systemPackages[name])) throw new Error(`apt-get finished but ${name} is still missing (${systemPackages[name]}).`);
  }
}
