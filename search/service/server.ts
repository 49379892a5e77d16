/**
 * Windway's local search service: a loopback HTTP server speaking the subset
 * of Meilisearch's REST API in shared/handbook/search-api.md, so the official
 * `meilisearch` client works against it unchanged in development and tests.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { Engine } from './engine';
import { Store } from './persistence';
import { makeHandler } from './http';

export interface SearchServiceOptions {
  host?: string;
  /** 0 = a random free port */
  port?: number;
  /** when set, every route but /health needs `Authorization: Bearer <masterKey>` */
  masterKey?: string;
  /** when set, indexes and the task counter persist here; otherwise memory only */
  dataDir?: string;
}

export interface SearchService {
  url: string;
  port: number;
  /** Stops accepting requests, finishes queued tasks and persists. */
  close(): Promise<void>;
}

export async function startSearchService({ host = '127.0.0.1', port = 0, masterKey, dataDir }: SearchServiceOptions = {}): Promise<SearchService> {
  const engine = new Engine(dataDir ? new Store(dataDir) : null);
  const server = http.createServer(makeHandler(engine, masterKey));
  // Longer than clients' own keep-alive (undici: 4 s), so the client always closes idle sockets first and never races a server-side close.
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => { server.off('error', reject); resolve(); });
  });
  const actual = (server.address() as AddressInfo).port;
  const shownHost = host.includes(':') ? `[${host}]` : host;
  let closing: Promise<void> | null = null;
  return {
    url: `http://${shownHost}:${actual}`,
    port: actual,
    close() {
      closing ??= (async () => {
        await new Promise<void>((resolve) => { server.close(() => resolve()); server.closeAllConnections(); });
        await engine.flush();
      })();
      return closing;
    },
  };
}
