import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { resolve } from 'node:path';

export const dataRoot = resolve(import.meta.dirname, '../../.data');

export interface LocalSecrets {
  sessionSecret: string;
  databasePassword: string;
  searchKey: string;
  demoPasswords: Record<'reader' | 'contributor' | 'editor' | 'admin', string>;
}

const word = () => randomBytes(6).toString('base64url');

/** Secrets for local use, generated once and kept in the git-ignored .data folder. */
export function localSecrets(): LocalSecrets {
  mkdirSync(dataRoot, { recursive: true });
  const file = resolve(dataRoot, 'local-secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as LocalSecrets;
  const secrets: LocalSecrets = {
    sessionSecret: randomBytes(48).toString('base64url'),
    databasePassword: randomBytes(18).toString('base64url'),
    searchKey: randomBytes(24).toString('base64url'),
    demoPasswords: {
      reader: `reader-${word()}`,
      contributor: `contrib-${word()}`,
      editor: `editor-${word()}`,
      admin: `admin-${word()}`,
    },
  };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
