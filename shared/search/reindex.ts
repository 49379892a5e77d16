/** GET/POST /api/admin/reindex: the state of the one full re-index an app process runs at a time. */
export interface ReindexState {
  running: boolean;
  startedAt: string | null;
  finishedAt: string | null;
  done: number;
  total: number;
  docsPerSecond: number;
  error: string | null;
}
