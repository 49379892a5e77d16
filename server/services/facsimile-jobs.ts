/**
 * Background work for facsimiles, run beside the HTTP server (server/background.ts):
 * extracting text from pending uploads, and sweeping files nothing refers to any more.
 */
import { readdir, rm, rmdir, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Op } from 'sequelize';
import { Facsimile } from '../models';
import { getConfig } from '../config';
import { getFileStore } from '../storage/file-store';
import { extractFacsimileText } from './text-extraction';
import { stopPdfReader, warmUpPdfReader } from '../pdf/reader';

/** A 'running' claim not touched for this long belongs to a process that died. */
const STALE_CLAIM_MS = 10 * 60 * 1000;
const HOUR_MS = 60 * 60 * 1000;

/**
 * Takes one facsimile to extract. The conditional UPDATE is the lock: with several app
 * processes polling, only the one whose UPDATE changed the row goes on.
 */
export async function claimNextFacsimile(): Promise<Facsimile | null> {
  const staleBefore = new Date(Date.now() - STALE_CLAIM_MS);
  const candidates = await Facsimile.findAll({
    where: { [Op.or]: [{ extractionStatus: 'pending' }, { extractionStatus: 'running', updatedAt: { [Op.lt]: staleBefore } }] },
    attributes: ['id', 'extractionStatus'],
    order: [['id', 'ASC']],
    limit: 5,
  });
  for (const candidate of candidates) {
    const guard = candidate.extractionStatus === 'pending' ? { extractionStatus: 'pending' as const } : { extractionStatus: 'running' as const, updatedAt: { [Op.lt]: staleBefore } };
    const [claimed] = await Facsimile.update({ extractionStatus: 'running', extractionProgress: 0, extractionError: null }, { where: { id: candidate.id, ...guard } });
    if (claimed === 1) return Facsimile.findByPk(candidate.id);
  }
  return null;
}

/** Extracts everything pending now; resolves when there is nothing left (tests call this). */
export async function drainExtractionQueue(shouldStop: () => boolean = () => false): Promise<number> {
  let done = 0;
  while (!shouldStop()) {
    const facsimile = await claimNextFacsimile();
    if (!facsimile) break;
    await extractFacsimileText(facsimile, shouldStop);
    done += 1;
  }
  return done;
}

/**
 * Removes files older than `cutoff` under `dir` (never `dir` itself), then the old folders left
 * empty. A folder goes only through `rmdir`, which refuses one that is not empty, so an upload
 * that has just put a file into an old folder keeps it.
 */
async function removeOldEntries(dir: string, cutoff: number, removed: string[]): Promise<void> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch {
    return;
  }
  for (const name of names) {
    const path = join(dir, name);
    const info = await stat(path).catch(() => null);
    if (!info) continue;
    if (info.isDirectory()) {
      await removeOldEntries(path, cutoff, removed);
      // Its time as found (removing its files just renewed it); rmdir leaves it if anything is inside.
      if (info.mtimeMs < cutoff && (await rmdir(path).then(() => true, () => false))) removed.push(path);
    } else if (info.mtimeMs < cutoff) {
      await rm(path, { force: true });
      removed.push(path);
    }
  }
}

/**
 * Deletes stored files no facsimile row references and temp files left by a crash, once
 * they are older than `olderThanMs` (default an hour) — a file stored a moment ago may
 * belong to an upload whose row is not committed yet.
 */
export async function sweepOrphanFiles(options: { olderThanMs?: number } = {}): Promise<{ files: string[]; temp: string[] }> {
  const cutoff = Date.now() - (options.olderThanMs ?? HOUR_MS);
  const store = getFileStore();
  const files: string[] = [];
  for await (const key of store.list('sha256')) {
    const info = await store.stat(key);
    if (!info || info.modifiedAt.getTime() >= cutoff) continue;
    if ((await Facsimile.count({ where: { storageKey: key } })) > 0) continue;
    await store.delete(key);
    files.push(key);
  }
  const temp: string[] = [];
  // The scratch roots (.tmp/uploads, .tmp/store) stay: uploads make their folders inside them.
  const scratch = resolve(getConfig().STORAGE_DIR, '.tmp');
  for (const root of await readdir(scratch).catch(() => [] as string[])) await removeOldEntries(join(scratch, root), cutoff, temp);
  return { files, temp };
}

/** The job for server/background.ts: poll about every second, sweep every ten minutes. */
export function startFacsimileWork(options: { pollMs?: number; sweepEveryMs?: number } = {}): () => Promise<void> {
  const pollMs = options.pollMs ?? 1000;
  const sweepEveryMs = options.sweepEveryMs ?? 10 * 60 * 1000;
  let stopped = false;
  let lastSweep = 0;
  let timer: NodeJS.Timeout | undefined;
  let running: Promise<void> = Promise.resolve();

  const tick = async () => {
    try {
      await drainExtractionQueue(() => stopped);
      if (!stopped && Date.now() - lastSweep >= sweepEveryMs) {
        lastSweep = Date.now();
        await sweepOrphanFiles();
      }
    } catch (error) {
      console.error('[facsimiles] background work failed; retrying', error);
    } finally {
      if (!stopped) timer = setTimeout(() => (running = tick()), pollMs);
    }
  };
  timer = setTimeout(() => (running = tick()), pollMs);
  warmUpPdfReader().catch((error) => console.error('[facsimiles] could not load the PDF reader', error));

  return async () => {
    stopped = true;
    clearTimeout(timer);
    await running;
    await stopPdfReader();
  };
}
