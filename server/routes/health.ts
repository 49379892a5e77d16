import { Router } from 'express';
import { getSequelize } from '../db';
import { getSearchClient } from '@search/client';
import { staleOutboxRows } from '@search/outbox-worker';

type PartState = 'ok' | 'down' | 'absent' | 'degraded';

async function databaseState(): Promise<PartState> {
  try {
    await getSequelize().query('SELECT 1');
    return 'ok';
  } catch {
    return 'down';
  }
}

/** Degraded when the service does not answer, or the outbox holds changes that failed to sync for over a minute. */
async function searchState(): Promise<PartState> {
  const client = getSearchClient();
  if (!client) return 'absent';
  try {
    const health = await client.health();
    if (health.status !== 'available') return 'degraded';
  } catch {
    return 'degraded';
  }
  const stale = await staleOutboxRows(60).catch(() => 0);
  return stale > 0 ? 'degraded' : 'ok';
}

/**
 * `GET /api/health`, per the contract: 200 `{ status: 'ok' }` when every part is ok,
 * otherwise 503 naming the failing part (search `degraded`: the app still serves and
 * writes; only search results lag). An unconfigured search (`absent`) is not a failure.
 */
export function healthRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const [db, search] = await Promise.all([databaseState(), searchState()]);
    const status = db === 'ok' && search === 'ok' ? 'ok' : db === 'ok' ? 'degraded' : 'down';
    res.status(db === 'ok' && search !== 'degraded' ? 200 : 503).set('Cache-Control', 'no-store').json({ status, db, search });
  });
  return router;
}
