import { Umzug, SequelizeStorage } from 'umzug';
import type { Sequelize } from 'sequelize';
import { migrations } from './migrations';

/** Umzug over the explicit migration list, recording what ran in `schema_migrations`. */
export function createMigrator(sequelize: Sequelize, logger: Pick<Console, 'info' | 'warn' | 'error'> | undefined = undefined) {
  return new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: logger ? { info: logger.info, warn: logger.warn, error: logger.error, debug: () => {} } : undefined,
  });
}

export async function migrateToLatest(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
