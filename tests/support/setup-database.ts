/**
 * Runs before each server test file: gives the file an empty, migrated database of
 * its own worker (created once per worker, emptied between files — much faster than
 * a new database per file) and its own search index prefix on the services `npm test`
 * started, so files run in parallel without seeing each other's rows.
 */
import { afterAll } from 'vitest';
import { randomBytes } from 'node:crypto';
import { QueryTypes, Sequelize } from 'sequelize';

const adminUrl = process.env.TEST_DATABASE_ADMIN_URL;
if (!adminUrl) throw new Error('Server tests need the environment of `npm test` (TEST_DATABASE_ADMIN_URL is unset).');

const name = `t_worker_${process.env.VITEST_POOL_ID ?? '0'}`;
const admin = new Sequelize(adminUrl, { dialect: 'mariadb', logging: false });
await admin.query(`CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);

const url = new URL(process.env.DATABASE_URL!);
url.pathname = `/${name}`;
process.env.DATABASE_URL = url.toString();
process.env.SEARCH_INDEX_PREFIX = `t${randomBytes(5).toString('hex')}_`;
process.env.LOGIN_MAX_ATTEMPTS ??= '5';

const { resetConfigCache } = await import('@server/config');
resetConfigCache();
const { getSequelize, closeSequelize } = await import('@server/db');
const { migrateToLatest } = await import('@server/migrator');
const sequelize = getSequelize();
await migrateToLatest(sequelize);

// Empty every table an earlier file of this worker filled (the schema's history stays).
const tables = await sequelize.query<{ name: string }>(
  `SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? AND table_name <> 'schema_migrations'`,
  { replacements: [name], type: QueryTypes.SELECT },
);
await sequelize.transaction(async (transaction) => {
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 0', { transaction });
  for (const { name: table } of tables) await sequelize.query(`TRUNCATE TABLE \`${table}\``, { transaction });
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 1', { transaction });
});
await (await import('@server/seeders/sizes')).seedInstrumentSizes();

afterAll(async () => {
  await closeSequelize();
  await admin.close();
});
