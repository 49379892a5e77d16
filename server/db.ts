import { Sequelize } from 'sequelize';
import { getConfig } from './config';
import { initModels } from './models';

let instance: Sequelize | undefined;

/** The one Sequelize instance of this process, created on first use from DATABASE_URL. */
export function getSequelize(): Sequelize {
  if (instance) return instance;
  const config = getConfig();
  instance = new Sequelize(config.DATABASE_URL, {
    dialect: 'mariadb',
    logging: false,
    define: { underscored: true },
    timezone: '+00:00',
    dialectOptions: { connectTimeout: 5000 },
    pool: { max: 10, min: 0, acquire: 10_000, idle: 10_000 },
    retry: { max: 0 },
  });
  initModels(instance);
  return instance;
}

export async function closeSequelize(): Promise<void> {
  if (!instance) return;
  const closing = instance;
  instance = undefined;
  await closing.close();
}

interface PoolCounts {
  using: number;
  waiting: number;
}

/**
 * Resolves once no query has been running or queued for two checks in a row (or after
 * `maxMs`): a request whose client has gone away still runs to its end, and shutting down
 * waits for it instead of failing its last queries against a closed pool.
 */
export async function waitForIdleDatabase(maxMs = 5_000): Promise<void> {
  const pool = (instance?.connectionManager as unknown as { pool?: PoolCounts } | undefined)?.pool;
  if (!pool || typeof pool.using !== 'number') return;
  const deadline = Date.now() + maxMs;
  let quietChecks = 0;
  while (quietChecks < 2 && Date.now() < deadline) {
    await new Promise((r) => setTimeout(r, 50));
    quietChecks = pool.using + pool.waiting === 0 ? quietChecks + 1 : 0;
  }
}
