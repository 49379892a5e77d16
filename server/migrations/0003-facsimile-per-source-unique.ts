import type { Migration } from './types';

/** The same bytes are stored once per source: concurrent duplicate uploads cannot both create a row. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('facsimiles', ['source_id', 'sha256'], { unique: true, name: 'facsimiles_source_sha256_unique' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('facsimiles', 'facsimiles_source_sha256_unique');
};
