/** `npm run migrate [-- down]`: runs pending migrations (or undoes the last) against DATABASE_URL. */
import { getSequelize, closeSequelize } from '../db';
import { createMigrator } from '../migrator';

const migrator = createMigrator(getSequelize(), console);
const done = process.argv[2] === 'down' ? await migrator.down() : await migrator.up();
console.log(done.length ? `Applied: ${done.map((m) => m.name).join(', ')}` : 'Nothing to do.');
await closeSequelize();
