import { Router } from 'express';
import { getSequelize } from '../db';
import { getSearchClient } from '@search/client';

type PartState = 'ok' | 'down' | 'absent' | 'degraded';

async function databaseState(): Promise<PartState> {
  try {
    await getSequelize().query('SELECT 1');
    return 'ok';
  } catch {
    return 'down';
  }
}

async function searchState(): Promise<PartState> {
  const client = getSearchClient();
  if (!client) return 'absent';
  try {
    const health = await client.health();
    return health.status === 'available' ? 'ok' : 'degraded';
  } catch {
    return 'degraded';
  }
}

/** `GET /api/health`: 200 when the database answers; search being away degrades, it does not fail. */
export function healthRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const [db, search] = await Promise.all([databaseState(), searchState()]);
    const status = db === 'ok' && search === 'ok' ? 'ok' : db === 'ok' ? 'degraded' : 'down';
    res.status(db === 'ok' && search !== 'degraded' ? 200 : 503).set('Cache-Control', 'no-store').json({ status, db, search });
  });
  return router;
}
