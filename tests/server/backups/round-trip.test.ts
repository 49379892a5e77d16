/**
 * Backup and restore lose nothing: rows (counts and table checksums), stored files
 * (SHA-256), and a search rebuilt from the restored database finds the same excerpts.
 * ASVS 4.0.3 V8.1.5 — regular backups of important data, and test restoration.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { QueryTypes, Sequelize } from 'sequelize';
import { dataRoot } from '@server/cli/local-env';
import { resetConfigCache, getConfig } from '@server/config';
import { closeSequelize, getSequelize } from '@server/db';
import { createBackup, restoreBackup, tableCounts } from '@server/services/backups';
import { getSearchClient, resetSearchClient } from '@search/client';
import { excerptsUid, forgetEnsuredIndex } from '@search/settings';
import { reindexAll } from '@search/indexer';
import { searchExcerpts } from '@search/query';
import { searchQuerySchema } from '@shared/search/schema';
import { createUser } from '../../support/http';
import { buildExcerpt, buildSource } from '../../support/factories';
import { smallPdf } from '../security/world';

const work = mkdtempSync(resolve(dataRoot, 'backup-test-'));
// This file's own storage folder, so other files' uploads never enter its hashes.
process.env.STORAGE_DIR = join(work, 'files');
resetConfigCache();

const original = { url: process.env.DATABASE_URL!, prefix: process.env.SEARCH_INDEX_PREFIX! };
const restoredName = `${new URL(original.url).pathname.slice(1)}_restored`;
const restored = { url: Object.assign(new URL(original.url), { pathname: `/${restoredName}` }).toString(), prefix: `${original.prefix}restored_`, storage: join(work, 'restored-files') };
const admin = new Sequelize(process.env.TEST_DATABASE_ADMIN_URL!, { dialect: 'mariadb', logging: false });

function hashTree(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (folder: string) => {
    for (const name of readdirSync(folder)) {
      const path = join(folder, name);
      if (statSync(path).isDirectory()) walk(path);
      else out[relative(dir, path)] = createHash('sha256').update(readFileSync(path)).digest('hex');
    }
  };
  walk(dir);
  return out;
}

async function checksums(database: string): Promise<Record<string, string>> {
  const tables = await admin.query<{ t: string }>('SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name', { replacements: [database], type: QueryTypes.SELECT });
  const out: Record<string, string> = {};
  for (const { t } of tables) {
    const [row] = await admin.query<{ Checksum: string }>(`CHECKSUM TABLE \`${database}\`.\`${t}\` EXTENDED`, { type: QueryTypes.SELECT });
    out[t] = String(row.Checksum);
  }
  return out;
}

const find = async (q: string) => (await searchExcerpts(getSearchClient()!, searchQuerySchema.parse({ q }), null)).hits.map((h) => h.excerptId).sort();

let approvedIds: string[] = [];

beforeAll(async () => {
  const contributor = await createUser('contributor');
  await createUser('editor');
  await createUser('reader');
  const source = await buildSource(contributor.id, { title: 'Backup inventory of the Velmark music room' });
  approvedIds = [
    (await buildExcerpt(source, { diplomatic: 'Zwo Marmotteflöten im Cammerthon', locatorValue: '1r' })).publicId,
    (await buildExcerpt(source, { diplomatic: 'Ein Bass Marmotteflöte', locatorValue: '2v', sizeSlug: 'bass' })).publicId,
  ].sort();
  const draftSource = await buildSource(contributor.id, { title: 'A draft nobody else sees', status: 'draft' });
  await buildExcerpt(draftSource, { diplomatic: 'Marmotteflöte in a draft', status: 'draft' });
  // A stored facsimile written through the storage module, with its row.
  const bytes = await smallPdf('Backup facsimile');
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const { contentKey, getFileStore } = await import('@server/storage/file-store');
  const { Facsimile } = await import('@server/models');
  await getFileStore().put(contentKey(sha256), bytes);
  await Facsimile.create({
    sourceId: source.id, storageKey: contentKey(sha256), originalName: 'backup.pdf', mediaType: 'application/pdf', byteSize: bytes.length, sha256,
    pageCount: 1, extractionStatus: 'done', extractionProgress: 1, extractionError: null, pageTexts: ['Backup facsimile'], rightsConfirmedAt: new Date(), uploadedById: contributor.id,
  });
  await admin.query(`DROP DATABASE IF EXISTS \`${restoredName}\``);
  await admin.query(`CREATE DATABASE \`${restoredName}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
}, 60_000);

afterAll(async () => {
  const client = getSearchClient();
  await client?.deleteIndex(excerptsUid()).catch(() => {});
  await closeSequelize();
  Object.assign(process.env, { DATABASE_URL: original.url, SEARCH_INDEX_PREFIX: original.prefix });
  resetConfigCache();
  resetSearchClient();
  forgetEnsuredIndex();
  await getSearchClient()?.deleteIndex(excerptsUid()).catch(() => {});
  await admin.query(`DROP DATABASE IF EXISTS \`${restoredName}\``);
  await admin.close();
  rmSync(work, { recursive: true, force: true });
}, 60_000);

describe('backup → restore round trip', () => {
  it('restores every row and file into an empty database and folder, and search finds the same', async () => {
    await reindexAll();
    const foundBefore = await find('Marmotteflöte');
    expect(foundBefore).toEqual(approvedIds);

    const storageDir = getConfig().STORAGE_DIR;
    const filesBefore = hashTree(storageDir);
    expect(Object.keys(filesBefore).filter((f) => f.startsWith('sha256'))).toHaveLength(1);
    const countsBefore = await tableCounts(original.url);
    const sumsBefore = await checksums(new URL(original.url).pathname.slice(1));
    const settings = (await getSearchClient()!.index(excerptsUid()).getSettings()) as Record<string, unknown>;

    const target = join(work, 'backup');
    const manifest = await createBackup({ databaseUrl: original.url, storageDir, target, searchSettings: settings });
    expect(manifest.tables).toEqual(countsBefore);
    expect(manifest.tables.sources).toBe(2);
    expect(manifest.tables.excerpts).toBe(3);
    expect(manifest.tables.facsimiles).toBe(1);
    expect(manifest.tables.users).toBe(3);
    expect(manifest.files).toEqual(filesBefore);
    expect(manifest.searchSettings).toMatchObject({ filterableAttributes: expect.any(Array) });

    await restoreBackup({ databaseUrl: restored.url, storageDir: restored.storage, source: target });
    expect(await tableCounts(restored.url)).toEqual(countsBefore);
    expect(await checksums(restoredName)).toEqual(sumsBefore);
    expect(hashTree(restored.storage)).toEqual(filesBefore);

    // The search, rebuilt from the restored database only, under a new index name.
    Object.assign(process.env, { DATABASE_URL: restored.url, SEARCH_INDEX_PREFIX: restored.prefix, STORAGE_DIR: restored.storage });
    resetConfigCache();
    await closeSequelize();
    resetSearchClient();
    forgetEnsuredIndex();
    expect(excerptsUid()).toBe(`${restored.prefix}excerpts`);
    const result = await reindexAll();
    expect(result.done).toBe(3);
    expect(await find('Marmotteflöte')).toEqual(foundBefore);
    // The restored app reads the same source through its models.
    const [row] = await getSequelize().query<{ title: string }>("SELECT title FROM sources WHERE status = 'approved'", { type: QueryTypes.SELECT });
    expect(row.title).toBe('Backup inventory of the Velmark music room');
  }, 120_000);

  it('refuses to restore over a database that is not empty', async () => {
    await expect(restoreBackup({ databaseUrl: original.url, storageDir: join(work, 'elsewhere'), source: join(work, 'backup') })).rejects.toThrow(/not empty/);
  });

  it('refuses a folder without a manifest (a half-made backup)', async () => {
    const empty = join(work, `half-${randomBytes(3).toString('hex')}`);
    await expect(restoreBackup({ databaseUrl: restored.url, storageDir: join(work, 'x'), source: empty })).rejects.toThrow(/manifest/);
  });
});
