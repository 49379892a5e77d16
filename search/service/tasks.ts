/**
 * The asynchronous task queue: writes are answered 202 with an enqueued
 * task, then run one at a time in enqueue order on later ticks, so large
 * batches never block the request that enqueued them. Task uids count from
 * 0 for the whole instance and survive restarts (see persistence.ts).
 */
import { ApiError, toApiError, type ErrorBody } from './errors';

export type TaskStatus = 'enqueued' | 'processing' | 'succeeded' | 'failed' | 'canceled';

export interface TaskView {
  uid: number;
  batchUid: number | null;
  indexUid: string | null;
  status: TaskStatus;
  type: string;
  canceledBy: null;
  details: Record<string, unknown>;
  error: ErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

type Run = (task: TaskView) => Promise<Record<string, unknown> | void>;

const tick = () => new Promise<void>((r) => setImmediate(r));

export class TaskQueue {
  nextUid = 0;
  nextBatch = 0;
  readonly tasks = new Map<number, TaskView>();
  private readonly queue: { task: TaskView; run: Run; onFail?: Record<string, unknown> }[] = [];
  private pumping: Promise<void> | null = null;
  /** called whenever the queue becomes empty (persistence hook) */
  onIdle: () => Promise<void> = async () => {};

  enqueue(indexUid: string | null, type: string, details: Record<string, unknown>, run: Run, onFail?: Record<string, unknown>): Record<string, unknown> {
    const task: TaskView = {
      uid: this.nextUid++, batchUid: null, indexUid, status: 'enqueued', type, canceledBy: null,
      details, error: null, duration: null, enqueuedAt: new Date().toISOString(), startedAt: null, finishedAt: null,
    };
    this.tasks.set(task.uid, task);
    this.queue.push({ task, run, onFail });
    if (!this.pumping) this.pumping = this.pump().finally(() => { this.pumping = null; });
    return { taskUid: task.uid, indexUid, status: 'enqueued', type, enqueuedAt: task.enqueuedAt };
  }

  private async pump(): Promise<void> {
    for (;;) {
      await tick();
      const job = this.queue.shift();
      if (!job) break;
      const { task } = job;
      task.status = 'processing';
      task.batchUid = this.nextBatch++;
      task.startedAt = new Date().toISOString();
      const t0 = performance.now();
      try {
        const d = await job.run(task);
        if (d) task.details = d;
        task.status = 'succeeded';
      } catch (e) {
        const err = toApiError(e);
        task.status = 'failed';
        task.error = err.toJSON();
        if (job.onFail) task.details = { ...task.details, ...job.onFail };
      }
      task.duration = `PT${((performance.now() - t0) / 1000).toFixed(6)}S`;
      task.finishedAt = new Date().toISOString();
      if (!this.queue.length) await this.onIdle().catch((e) => console.error('search service: persisting failed', e));
    }
  }

  /** Resolves once every enqueued task has run and the idle hook finished. */
  async drain(): Promise<void> {
    while (this.pumping) await this.pumping;
  }

  get(uid: number): TaskView {
    const t = this.tasks.get(uid);
    if (!t) throw new ApiError('task_not_found', `Task \`${uid}\` not found.`);
    return t;
  }

  /** GET /tasks with the common filters (uids, statuses, types, indexUids), newest first. */
  list(q: URLSearchParams): Record<string, unknown> {
    const csv = (k: string) => q.get(k)?.split(',').filter(Boolean) ?? null;
    const uids = csv('uids'), statuses = csv('statuses'), types = csv('types'), indexUids = csv('indexUids');
    const limit = Number(q.get('limit') ?? 20);
    const from = q.has('from') ? Number(q.get('from')) : Infinity;
    const all = [...this.tasks.values()].reverse().filter((t) =>
      (!uids || uids.includes(String(t.uid))) && (!statuses || statuses.includes(t.status)) &&
      (!types || types.includes(t.type)) && (!indexUids || (t.indexUid !== null && indexUids.includes(t.indexUid))));
    const page = all.filter((t) => t.uid <= from);
    const results = page.slice(0, limit);
    return { results, total: all.length, limit, from: results[0]?.uid ?? null, next: page[limit]?.uid ?? null };
  }

  /** Restores counters and history after a restart; unfinished tasks are marked failed. */
  restore(state: { nextUid: number; nextBatch: number; tasks: TaskView[] }): void {
    this.nextUid = Math.max(this.nextUid, state.nextUid);
    this.nextBatch = Math.max(this.nextBatch, state.nextBatch);
    for (const t of state.tasks) {
      if (t.status === 'enqueued' || t.status === 'processing') {
        t.status = 'failed';
        t.error = new ApiError('internal', 'The search service stopped before this task ran.').toJSON();
      }
      this.tasks.set(t.uid, t);
    }
  }

  snapshot(keep = 10_000): { nextUid: number; nextBatch: number; tasks: TaskView[] } {
    const tasks = [...this.tasks.values()].slice(-keep);
    return { nextUid: this.nextUid, nextBatch: this.nextBatch, tasks };
  }
}
