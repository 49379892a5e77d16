/**
 * `npm run backup [-- <folder>]`: dumps the database, copies the stored facsimiles and
 * saves the search settings (when MEILI_HOST is set) into a folder (default .data/backups/<time>). Uses the same
 * environment as the app; for the local setup it starts the private MariaDB if needed.
 */
import { resolve } from 'node:path';
import { createBackup } from '../services/backups';
import { withLocalEnvironment } from './local-services';

const target = process.argv[2] ?? resolve(import.meta.dirname, '../../.data/backups', new Date().toISOString().replace(/[:.]/g, '-'));

await withLocalEnvironment(async (env) => {
  const { getSearchClient } = await import('../../search/client');
  const { excerptsUid } = await import('../../search/settings');
  const client = getSearchClient();
  const searchSettings = client ? ((await client.index(excerptsUid()).getSettings().catch(() => null)) as Record<string, unknown> | null) : null;
  const manifest = await createBackup({ databaseUrl: env.DATABASE_URL!, storageDir: env.STORAGE_DIR!, target, searchSettings });
  const rows = Object.values(manifest.tables).reduce((a, b) => a + b, 0);
  console.log(`Backup written to ${target}: ${Object.keys(manifest.tables).length} tables, ${rows} rows, ${Object.keys(manifest.files).length} files.`);
  // The local search service is not started for a backup (it may be serving the running app);
  // its settings are re-applied and the index rebuilt from the database by `npm run restore`.
}, { search: !!process.env.MEILI_HOST });
