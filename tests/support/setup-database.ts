/**
 * Runs in each server test file's worker: gives the file its own empty database
 * (migrated) and its own search index prefix on the services `npm test` started,
 * so files run in parallel without seeing each other's rows.
 */
import { afterAll } from 'vitest';
import { randomBytes } from 'node:crypto';
import { Sequelize } from 'sequelize';

const adminUrl = process.env.TEST_DATABASE_ADMIN_URL;
if (!adminUrl) throw new Error('Server tests need the environment of `npm test` (TEST_DATABASE_ADMIN_URL is unset).');

const name = `t_${randomBytes(5).toString('hex')}`;
const admin = new Sequelize(adminUrl, { dialect: 'mariadb', logging: false });
await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);

const url = new URL(process.env.DATABASE_URL!);
url.pathname = `/${name}`;
process.env.DATABASE_URL = url.toString();
process.env.SEARCH_INDEX_PREFIX = `${name}_`;
process.env.LOGIN_MAX_ATTEMPTS ??= '5';

const { resetConfigCache } = await import('@server/config');
resetConfigCache();
const { getSequelize, closeSequelize } = await import('@server/db');
const { migrateToLatest } = await import('@server/migrator');
await migrateToLatest(getSequelize());
await (await import('@server/seeders/sizes')).seedInstrumentSizes();

afterAll(async () => {
  await closeSequelize();
  await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
  await admin.close();
});
