/**
 * `npm run restore -- <backup folder>`: loads a backup into an EMPTY database and
 * storage folder, checks row counts and file hashes, then rebuilds the search index.
 * Locally, set DATABASE_URL to an empty database (or remove .data/mariadb first).
 */
import { restoreBackup } from '../services/backups';
import { withLocalEnvironment } from './local-services';

const source = process.argv[2];
if (!source) {
  console.error('Usage: npm run restore -- <backup folder>');
  process.exit(2);
}

await withLocalEnvironment(async (env) => {
  const manifest = await restoreBackup({ databaseUrl: env.DATABASE_URL!, storageDir: env.STORAGE_DIR!, source });
  console.log(`Restored ${Object.keys(manifest.tables).length} tables and ${Object.keys(manifest.files).length} files from ${manifest.createdAt}.`);
  const { reindexAll } = await import('../../search/indexer');
  const result = await reindexAll({ onProgress: (p) => process.stdout.write(`\rRe-indexing ${p.done}/${p.total}`) });
  console.log(`\nSearch index rebuilt: ${result.done} excerpts.`);
});
