import { reindexAll, type ReindexProgress } from '@search/indexer';
import type { ReindexState } from '@shared/search/reindex';

/** One re-index at a time per app process, run in the background while the app serves. */
let state: ReindexState = { running: false, startedAt: null, finishedAt: null, done: 0, total: 0, docsPerSecond: 0, error: null };

export const reindexState = (): ReindexState => ({ ...state });

/** Starts a full re-index unless one is running; answers with the state either way. */
export function startReindex(): ReindexState {
  if (state.running) return reindexState();
  state = { running: true, startedAt: new Date().toISOString(), finishedAt: null, done: 0, total: 0, docsPerSecond: 0, error: null };
  const onProgress = (p: ReindexProgress) => Object.assign(state, { done: p.done, total: p.total, docsPerSecond: Math.round(p.docsPerSecond) });
  reindexAll({ onProgress })
    .then((result) => Object.assign(state, { done: result.done, total: result.total, docsPerSecond: Math.round(result.docsPerSecond) }))
    .catch((error: unknown) => {
      state.error = error instanceof Error ? error.message : String(error);
      console.error('[reindex]', error);
    })
    .finally(() => Object.assign(state, { running: false, finishedAt: new Date().toISOString() }));
  return reindexState();
}
