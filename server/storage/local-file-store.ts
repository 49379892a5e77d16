import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, opendir, rename, rm, stat } from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import { dirname, join, relative, sep } from 'node:path';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { FileStore, StoredFileStat } from './file-store';

const keyPattern = /^[a-z0-9]+(\/[A-Za-z0-9._-]+)+$/;

/** Files under one directory; writes go to a temp file first and are renamed into place. */
export class LocalFileStore implements FileStore {
  constructor(readonly root: string) {}

  private path(key: string): string {
    if (!keyPattern.test(key) || key.split('/').some((part) => part === '..' || part === '.')) {
      throw new Error(`Not a storage key: ${JSON.stringify(key)}`);
    }
    return join(this.root, ...key.split('/'));
  }

  /** Temp files live inside the root so the final rename never crosses filesystems. */
  get tempDir(): string {
    return join(this.root, '.tmp', 'store');
  }

  async put(key: string, body: Readable | Buffer | Uint8Array): Promise<void> {
    const target = this.path(key);
    await mkdir(this.tempDir, { recursive: true });
    const temp = join(this.tempDir, `${randomBytes(8).toString('hex')}.part`);
    try {
      await pipeline(Buffer.isBuffer(body) || body instanceof Uint8Array ? Readable.from([body]) : body, createWriteStream(temp, { flags: 'wx' }));
      await mkdir(dirname(target), { recursive: true });
      await rename(temp, target);
    } finally {
      await rm(temp, { force: true });
    }
  }

  async get(key: string): Promise<Readable> {
    const path = this.path(key);
    await stat(path); // fail with ENOENT here, not later on the stream
    return createReadStream(path);
  }

  async exists(key: string): Promise<boolean> {
    return (await this.stat(key)) !== null;
  }

  async delete(key: string): Promise<void> {
    await rm(this.path(key), { force: true });
  }

  async stat(key: string): Promise<StoredFileStat | null> {
    try {
      const info = await stat(this.path(key));
      return info.isFile() ? { size: info.size, modifiedAt: info.mtime } : null;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  async *list(prefix: string): AsyncIterable<string> {
    const start = join(this.root, ...prefix.split('/').filter(Boolean));
    yield* this.walk(start);
  }

  private async *walk(dir: string): AsyncIterable<string> {
    let handle;
    try {
      handle = await opendir(dir);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return;
      throw error;
    }
    for await (const entry of handle) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) yield* this.walk(path);
      else if (entry.isFile()) yield relative(this.root, path).split(sep).join('/');
    }
  }
}
