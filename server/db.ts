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
