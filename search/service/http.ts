/**
 * HTTP routing for the Meilisearch REST subset (search-api.md §1): auth,
 * CORS, JSON bodies and error mapping. Handlers are thin; the work is in
 * Engine.
 */
import type { IncomingMessage, ServerResponse } from 'node:http';
import { timingSafeEqual } from 'node:crypto';
import { ApiError, toApiError } from './errors';
import type { Engine } from './engine';
import { parseSearchBody, parseSearchQuery } from './params';
import { SUB_ROUTES } from './settings';
import { runSearch } from './search';

const MAX_BODY = 100 * 1024 * 1024;
export const VERSION = { commitSha: 'windway-local-search', commitDate: '2025-01-01T00:00:00Z', pkgVersion: '1.50.0' };

function send(res: ServerResponse, status: number, body: unknown): void {
  const data = body === undefined ? '' : JSON.stringify(body);
  res.writeHead(status, { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(data) });
  res.end(data);
}

async function readBody(req: IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const c of req) {
    size += (c as Buffer).length;
    if (size > MAX_BODY) throw new ApiError('payload_too_large', `The provided payload reached the size limit. The maximum accepted payload size is ${MAX_BODY} bytes.`);
    chunks.push(c as Buffer);
  }
  const text = Buffer.concat(chunks).toString('utf8');
  if (text.trim() === '') return undefined;
  try { return JSON.parse(text); } catch (e) {
    throw new ApiError('malformed_payload', `The json payload provided is malformed. \`${(e as Error).message}\`.`);
  }
}

function checkAuth(req: IncomingMessage, masterKey: string | undefined): void {
  if (!masterKey) return;
  const h = req.headers.authorization;
  if (!h) throw new ApiError('missing_authorization_header', 'The Authorization header is missing. It must use the bearer authorization method.');
  const m = /^Bearer (.+)$/.exec(h.trim());
  const given = Buffer.from(m ? m[1] : '');
  const want = Buffer.from(masterKey);
  if (!m || given.length !== want.length || !timingSafeEqual(given, want)) throw new ApiError('invalid_api_key', 'The provided API key is invalid.');
}

function cors(req: IncomingMessage, res: ServerResponse): void {
  res.setHeader('Access-Control-Allow-Origin', req.headers.origin ?? '*');
  res.setHeader('Vary', 'Origin');
  res.setHeader('Access-Control-Allow-Methods', 'GET, POST, PUT, PATCH, DELETE, OPTIONS');
  res.setHeader('Access-Control-Allow-Headers', req.headers['access-control-request-headers'] ?? 'Authorization, Content-Type, X-Meilisearch-Client');
  res.setHeader('Access-Control-Expose-Headers', '*');
  res.setHeader('Access-Control-Max-Age', '86400');
}

const csv = (v: string | null) => (v === null ? null : v.split(',').map((s) => s.trim()).filter(Boolean));

export function makeHandler(engine: Engine, masterKey: string | undefined) {
  return async (req: IncomingMessage, res: ServerResponse): Promise<void> => {
    cors(req, res);
    try {
      if (req.method === 'OPTIONS') { res.writeHead(204); res.end(); return; }
      const url = new URL(req.url ?? '/', 'http://localhost');
      const parts = url.pathname.split('/').filter(Boolean).map(decodeURIComponent);
      const method = req.method ?? 'GET';
      if (parts[0] === 'health' && parts.length === 1 && method === 'GET') return send(res, 200, { status: 'available' });
      checkAuth(req, masterKey);
      const body = method === 'GET' || method === 'DELETE' ? await readBody(req).catch(() => undefined) : await readBody(req);
      const out = route(engine, method, parts, url.searchParams, body);
      send(res, out[0], out[1]);
    } catch (e) {
      const err = toApiError(e);
      if (err.status >= 500) console.error('search service:', e);
      send(res, err.status, err.toJSON());
    }
  };
}

type Result = [number, unknown];
const notFound = (): never => { throw new ApiError('not_found', 'Route not found.'); };

function route(engine: Engine, method: string, p: string[], q: URLSearchParams, body: unknown): Result {
  const [a, uid, sub, id] = p;
  if (a === 'version' && p.length === 1 && method === 'GET') return [200, VERSION];
  if (a === 'tasks') {
    if (p.length === 1 && method === 'GET') return [200, engine.queue.list(q)];
    if (p.length === 2 && method === 'GET') {
      if (!/^\d+$/.test(uid)) throw new ApiError('invalid_task_uids', `Invalid value in parameter \`taskUid\`: could not parse \`${uid}\` as a positive integer`);
      return [200, engine.queue.get(Number(uid))];
    }
  }
  if (a === 'multi-search' && p.length === 1 && method === 'POST') return [200, multiSearch(engine, body)];
  if (a !== 'indexes') return notFound();
  if (p.length === 1) {
    if (method === 'GET') {
      const all = [...engine.indexes.values()].sort((x, y) => (x.uid < y.uid ? -1 : 1)).map((ix) => engine.indexView(ix));
      const offset = Number(q.get('offset') ?? 0), limit = Number(q.get('limit') ?? 20);
      return [200, { results: all.slice(offset, offset + limit), offset, limit, total: all.length }];
    }
    if (method === 'POST') return [202, engine.createIndex(body)];
    return notFound();
  }
  if (p.length === 2) {
    if (method === 'GET') return [200, engine.indexView(engine.index(uid))];
    if (method === 'DELETE') return [202, engine.deleteIndex(uid)];
    return notFound();
  }
  if (sub === 'search' && p.length === 3) {
    if (method === 'POST') return [200, engine.search(uid, parseSearchBody(body ?? {}))];
    if (method === 'GET') return [200, engine.search(uid, parseSearchQuery(q))];
  }
  if (sub === 'stats' && p.length === 3 && method === 'GET') return [200, engine.stats(uid)];
  if (sub === 'settings') {
    if (p.length === 3) {
      if (method === 'GET') return [200, engine.getSettings(uid)];
      if (method === 'PATCH') return [202, engine.updateSettings(uid, body)];
      if (method === 'DELETE') return [202, engine.updateSettings(uid, Object.fromEntries(Object.values(SUB_ROUTES).map((k) => [k, null])))];
    }
    const field = p.length === 4 ? SUB_ROUTES[id] : undefined;
    if (field) {
      if (method === 'GET') return [200, engine.getSettings(uid)[field]];
      if (method === 'PUT' || method === 'PATCH' || method === 'POST') return [202, engine.updateSettings(uid, { [field]: body ?? null })];
      if (method === 'DELETE') return [202, engine.updateSettings(uid, { [field]: null })];
    }
    return notFound();
  }
  if (sub === 'documents') {
    if (p.length === 3) {
      const pk = q.get('primaryKey');
      if (method === 'POST') return [202, engine.addDocuments(uid, body, 'replace', pk)];
      if (method === 'PUT') return [202, engine.addDocuments(uid, body, 'update', pk)];
      if (method === 'DELETE') return [202, engine.deleteAll(uid)];
      if (method === 'GET') return [200, engine.getDocuments(uid, Number(q.get('offset') ?? 0), Number(q.get('limit') ?? 20), csv(q.get('fields')))];
    }
    if (p.length === 4) {
      if (id === 'delete-batch' && method === 'POST') {
        if (!Array.isArray(body)) throw new ApiError('bad_request', 'Invalid value type: expected an array of document ids.');
        return [202, engine.deleteDocuments(uid, body)];
      }
      if (id === 'delete' && method === 'POST') return [202, engine.deleteByFilter(uid, (body as { filter?: unknown } | undefined)?.filter)];
      if (method === 'GET') return [200, engine.getDocument(uid, id, csv(q.get('fields')))];
      if (method === 'DELETE') return [202, engine.deleteDocuments(uid, [id])];
    }
  }
  return notFound();
}

/** Runs each query in order; the first failing one fails the whole request, as Meilisearch does. */
function multiSearch(engine: Engine, body: unknown): unknown {
  const b = body as { queries?: unknown; federation?: unknown } | undefined;
  if (!b || !Array.isArray(b.queries)) throw new ApiError('bad_request', 'Missing field `queries`');
  if (b.federation !== undefined && b.federation !== null) throw new ApiError('bad_request', 'The local search service does not support federated multi-search.');
  const results = b.queries.map((raw, i) => {
    try {
      const { indexUid, ...rest } = (raw ?? {}) as Record<string, unknown>;
      if (typeof indexUid !== 'string') throw new ApiError('missing_index_uid', 'Missing field `indexUid`');
      const params = parseSearchBody(rest, ['federationOptions']);
      return { indexUid, ...runSearch(engine.index(indexUid), params) };
    } catch (e) {
      const err = toApiError(e);
      throw new ApiError(err.code, `Inside \`.queries[${i}]\`: ${err.message}`);
    }
  });
  return { results };
}
