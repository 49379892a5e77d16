/**
 * On-disk state under dataDir:
 *   tasks.json                     task counter + recent task history (atomic rename)
 *   indexes/<uid>/snapshot.jsonl   line 1 = meta and settings, then one document per line
 *   indexes/<uid>/ops.jsonl        operations applied since the snapshot, appended per task
 * Appending each task's operation keeps writes proportional to the batch
 * (not to the index); the snapshot is rewritten (tmp file + rename) when the
 * log outgrows it or at shutdown, and ops already in the snapshot are skipped
 * on load by task uid, so a crash between rename and truncation is harmless.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Doc, SearchIndex } from './index-store';
import type { Settings } from './settings';
import type { TaskView } from './tasks';

export type Op =
  | { t: 'docs'; task: number; mode: 'replace' | 'update'; pk: string; docs: Doc[] }
  | { t: 'delete'; task: number; ids: string[] }
  | { t: 'clear'; task: number }
  | { t: 'settings'; task: number; patch: Record<string, unknown> };

export interface Meta { uid: string; primaryKey: string | null; createdAt: string; updatedAt: string; settings: Settings; lastTask: number }

const tick = () => new Promise<void>((r) => setImmediate(r));

function writeAtomic(file: string, data: string): void {
  const tmp = `${file}.tmp-${process.pid}`;
  fs.writeFileSync(tmp, data);
  fs.renameSync(tmp, file);
}

export class Store {
  private readonly logBytes = new Map<string, number>();
  private readonly snapBytes = new Map<string, number>();
  constructor(readonly dir: string) { fs.mkdirSync(path.join(dir, 'indexes'), { recursive: true }); }

  private idir(uid: string): string { return path.join(this.dir, 'indexes', uid); }

  loadTasks(): { nextUid: number; nextBatch: number; tasks: TaskView[] } | null {
    try { return JSON.parse(fs.readFileSync(path.join(this.dir, 'tasks.json'), 'utf8')); } catch { return null; }
  }
  saveTasks(state: { nextUid: number; nextBatch: number; tasks: TaskView[] }): void {
    writeAtomic(path.join(this.dir, 'tasks.json'), JSON.stringify(state));
  }

  appendOp(uid: string, op: Op): void { this.appendLine(uid, JSON.stringify(op) + '\n'); }

  /** Appends one already-serialised op line (see Engine: large batches are serialised in slices). */
  appendLine(uid: string, line: string): void {
    fs.mkdirSync(this.idir(uid), { recursive: true });
    fs.appendFileSync(path.join(this.idir(uid), 'ops.jsonl'), line);
    this.logBytes.set(uid, (this.logBytes.get(uid) ?? 0) + Buffer.byteLength(line));
  }

  /** Worth compacting: the log is larger than the snapshot (and not tiny). */
  shouldCompact(uid: string): boolean {
    const log = this.logBytes.get(uid) ?? 0;
    return log > 8 * 1024 * 1024 && log > (this.snapBytes.get(uid) ?? 0);
  }
  hasLog(uid: string): boolean { return (this.logBytes.get(uid) ?? 0) > 0; }

  /** Writes the whole index, yielding between chunks; then empties the log. */
  async snapshot(ix: SearchIndex, lastTask: number, yieldBetween = true): Promise<void> {
    const dir = this.idir(ix.uid);
    fs.mkdirSync(dir, { recursive: true });
    const file = path.join(dir, 'snapshot.jsonl');
    const tmp = `${file}.tmp-${process.pid}`;
    const fd = fs.openSync(tmp, 'w');
    let bytes = 0;
    try {
      const meta: Meta = { uid: ix.uid, primaryKey: ix.primaryKey, createdAt: ix.createdAt, updatedAt: ix.updatedAt, settings: ix.settings, lastTask };
      bytes += fs.writeSync(fd, JSON.stringify(meta) + '\n');
      const slots = ix.liveSlots();
      // Small chunks: each is serialised synchronously, and searches wait for it.
      for (let i = 0; i < slots.length; i += 500) {
        let chunk = '';
        for (let j = i; j < Math.min(i + 500, slots.length); j++) chunk += JSON.stringify(ix.docs[slots[j]]) + '\n';
        bytes += fs.writeSync(fd, chunk);
        if (yieldBetween) await tick();
      }
      fs.fsyncSync(fd);
    } finally { fs.closeSync(fd); }
    fs.renameSync(tmp, file);
    fs.writeFileSync(path.join(dir, 'ops.jsonl'), '');
    this.logBytes.set(ix.uid, 0);
    this.snapBytes.set(ix.uid, bytes);
  }

  deleteIndex(uid: string): void {
    fs.rmSync(this.idir(uid), { recursive: true, force: true });
    this.logBytes.delete(uid);
    this.snapBytes.delete(uid);
  }

  /** Reads every stored index: its snapshot meta, documents, and the ops logged after it. */
  *readIndexes(): Generator<{ meta: Meta; docs: Doc[]; ops: Op[] }> {
    const root = path.join(this.dir, 'indexes');
    for (const uid of fs.readdirSync(root)) {
      const dir = path.join(root, uid);
      let meta: Meta | null = null;
      const docs: Doc[] = [];
      const snap = path.join(dir, 'snapshot.jsonl');
      if (fs.existsSync(snap)) {
        const text = fs.readFileSync(snap, 'utf8');
        this.snapBytes.set(uid, Buffer.byteLength(text));
        let start = 0;
        for (let end = text.indexOf('\n'); end >= 0; start = end + 1, end = text.indexOf('\n', start)) {
          const line = text.slice(start, end);
          if (!meta) meta = JSON.parse(line) as Meta;
          else docs.push(JSON.parse(line) as Doc);
        }
      }
      const ops: Op[] = [];
      const log = path.join(dir, 'ops.jsonl');
      if (fs.existsSync(log)) {
        const text = fs.readFileSync(log, 'utf8');
        this.logBytes.set(uid, Buffer.byteLength(text));
        for (const line of text.split('\n')) {
          if (!line) continue;
          try { ops.push(JSON.parse(line) as Op); } catch { break; /* torn last line from a crash */ }
        }
      }
      if (!meta) continue;
      yield { meta, docs, ops: ops.filter((o) => o.task > meta!.lastTask) };
    }
  }
}
