import { createServer, type Server } from 'node:http';
import { getConfig, resetConfigCache } from './config';
import { createApp } from './app';
import { closeSequelize, getSequelize, waitForIdleDatabase } from './db';
import { migrateToLatest } from './migrator';
import { startBackgroundWork } from './background';

export interface RunningApp {
  url: string;
  server: Server;
  close(): Promise<void>;
}

/** Migrates, then serves the app and runs its background work until `close()`. */
export async function startWindway(options: { migrate?: boolean } = {}): Promise<RunningApp> {
  const config = getConfig();
  if (options.migrate !== false) await migrateToLatest(getSequelize());
  const server = createServer(createApp());
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(config.PORT, config.HOST, () => resolve());
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.PORT;
  if (!config.PUBLIC_URL && port !== config.PORT) {
    // Started on port 0 (tests): links in mail and citations must name the port really in use.
    process.env.PUBLIC_URL = `http://${config.HOST}:${port}`;
    resetConfigCache();
  }
  const stopBackground = startBackgroundWork();
  return {
    url: `http://${config.HOST}:${port}`,
    server,
    async close() {
      // Requests in flight finish before the database goes (for a few seconds at most),
      // rather than fail against a closed pool.
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      const grace = new Promise<void>((resolve) => setTimeout(resolve, 5_000).unref());
      await Promise.race([closed, grace]);
      server.closeAllConnections();
      await closed;
      await stopBackground();
      await waitForIdleDatabase();
      await closeSequelize();
    },
  };
}
