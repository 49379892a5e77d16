import type { Readable } from 'node:stream';
import { resolve } from 'node:path';
import { getConfig } from '../config';
import { LocalFileStore } from './local-file-store';

export interface StoredFileStat {
  size: number;
  modifiedAt: Date;
}

/**
 * Where facsimile files live. Keys are content addresses (`sha256/ab/abcdef…`), so the
 * same bytes are stored once and a key never changes meaning. Implementations must make
 * `put` atomic: a reader sees the whole file or none of it.
 */
export interface FileStore {
  put(key: string, body: Readable | Buffer | Uint8Array): Promise<void>;
  get(key: string): Promise<Readable>;
  exists(key: string): Promise<boolean>;
  delete(key: string): Promise<void>;
  stat(key: string): Promise<StoredFileStat | null>;
  /** Every key under a prefix, for the orphan sweeper. */
  list(prefix: string): AsyncIterable<string>;
}

export const contentKey = (sha256: string) => `sha256/${sha256.slice(0, 2)}/${sha256}`;

/** Scratch space for uploads in progress, always on local disk (also with an object store). */
export const uploadTempDir = () => resolve(getConfig().STORAGE_DIR, '.tmp', 'uploads');

/**
 * The configured store. `STORAGE_DRIVER` unset or `local`: files under STORAGE_DIR.
 * For S3-compatible object storage, add `server/storage/s3-file-store.ts` implementing
 * FileStore (put = PutObject/multipart upload, get = GetObject body stream, stat = HeadObject,
 * list = ListObjectsV2), move STORAGE_DRIVER and its S3_* settings into config.ts, and return it
 * here for `STORAGE_DRIVER=s3`: nothing else in the app changes.
 */
export function getFileStore(): FileStore {
  const driver = process.env.STORAGE_DRIVER ?? 'local';
  if (driver === 'local') return new LocalFileStore(resolve(getConfig().STORAGE_DIR));
  throw new Error(`STORAGE_DRIVER=${driver} is not available in this build; use "local" (see server/storage/file-store.ts).`);
}
